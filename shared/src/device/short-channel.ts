import type { DeviceParams } from '../schemas/process.js';
import { EngineError } from './errors.js';
import { say } from './say.js';

/**
 * The short-channel terms of the all-region model at one length (docs/model.md §6.3). Each is optional in a
 * profile; a profile without them gets LONG_CHANNEL, which is the long-channel model exactly.
 */
export interface ChannelTerms {
  /** θ = θ0 + θ1/Leff, 1/V: ID ÷ (1 + θ·VOV) (mobility degradation and velocity saturation). */
  readonly theta: number;
  /** Leff/θ1 = Esat·Leff, V: the velocity-saturation voltage that lowers VDSsat; Infinity without θ1. */
  readonly esat: number;
  /** Pclm/Leff: strength of the channel-length modulation term; 0 without pclm. */
  readonly clm: number;
  /** DIBL coefficient η at this length, V/V: VT falls by η·VDS. */
  readonly eta: number;
}

export const LONG_CHANNEL: ChannelTerms = Object.freeze({ theta: 0, esat: Infinity, clm: 0, eta: 0 });

/** DIBL falls as ((lmin − ΔL)/Leff)^diblExp away from lmin; the exponent when the profile gives none (common practice, no source). */
export const DEFAULT_DIBL_EXPONENT = 2;

type ShortChannelParams = Pick<DeviceParams, 'lmin' | 'dl' | 'theta0' | 'theta1' | 'dibl' | 'diblExp' | 'pclm'>;

/** Leff = L − ΔL, m (ΔL = 0 when the profile gives none). A length with no channel left is refused. */
export function effectiveLength(params: Pick<DeviceParams, 'dl'>, l: number, field = 'l'): number {
  const leff = l - (params.dl ?? 0);
  if (!(leff > 0)) {
    throw new EngineError('L_BELOW_LMIN', `L = ${say(l, 'm')} leaves no channel: the process shortens the drawn length by ΔL = ${say(params.dl ?? 0, 'm')}`, field);
  }
  return leff;
}

/** Weff = W − fingers·ΔW, m: every finger loses ΔW (ΔW = 0 when the profile gives none). */
export function effectiveWidth(params: Pick<DeviceParams, 'dw'>, w: number, fingers = 1): number {
  return w - fingers * (params.dw ?? 0);
}

/** The terms at an effective length Leff (m). */
export function channelTermsAt(params: ShortChannelParams, leff: number): ChannelTerms {
  const theta1 = params.theta1 ?? 0;
  const eta = params.dibl === undefined ? 0 : params.dibl * ((params.lmin - (params.dl ?? 0)) / leff) ** (params.diblExp ?? DEFAULT_DIBL_EXPONENT);
  if (theta1 === 0 && params.theta0 === undefined && params.pclm === undefined && eta === 0) return LONG_CHANNEL;
  return {
    theta: (params.theta0 ?? 0) + theta1 / leff,
    esat: theta1 > 0 ? leff / theta1 : Infinity,
    clm: (params.pclm ?? 0) / leff,
    eta,
  };
}

/** The mobility temperature exponent at Leff: muExp + muExpL/Leff (velocity saturation weakens the temperature law at short L). */
export function mobilityExponentAt(params: Pick<DeviceParams, 'muExp' | 'muExpL'>, leff: number): number {
  return params.muExp + (params.muExpL ?? 0) / leff;
}

/** True when the profile gives any short-channel term of the all-region model. */
export function hasShortChannelTerms(params: Partial<Pick<DeviceParams, 'dl' | 'dw' | 'theta0' | 'theta1' | 'dibl' | 'pclm' | 'muExpL'>>): boolean {
  return [params.dl, params.dw, params.theta0, params.theta1, params.dibl, params.pclm, params.muExpL].some((value) => value !== undefined);
}
