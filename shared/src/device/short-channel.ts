import type { DeviceParams } from '../schemas/process.js';
import { EngineError } from './errors.js';
import { say } from './say.js';

/**
 * The short-channel terms of the all-region model at one length (docs/model.md §6.3). Each is optional in a
 * profile; a profile without them gets LONG_CHANNEL, which is the long-channel model exactly.
 */
export interface ChannelTerms {
  /** θ = θ0 + θ1/Leff, 1/V: ID ÷ (1 + θ·VOV + θ2·VOV²) (mobility degradation and velocity saturation). */
  readonly theta: number;
  /** θ2, 1/V²: the quadratic part of the degradation (surface roughness at high field). */
  readonly theta2: number;
  /** Leff/θ1 = Esat·Leff, V: the velocity-saturation voltage that lowers VDSsat; Infinity without θ1. */
  readonly esat: number;
  /** Pclm/Leff: strength of the channel-length modulation term; 0 without pclm. */
  readonly clm: number;
  /** θB, 1/V: β ÷ (1 + θB·VSB) (mobility degradation by the depletion charge of a body bias). */
  readonly thetaB: number;
  /** DIBL coefficient η at this length, V/V: VT falls by η·VDS. */
  readonly eta: number;
  /** VT shift of this length from the long-channel VT (roll-off < 0, reverse short-channel effect > 0), V. */
  readonly vtShift: number;
  /** Rise of the slope factor n at this length over the long-channel n (the drain's coupling to the channel). */
  readonly nShift: number;
}

export const LONG_CHANNEL: ChannelTerms = Object.freeze({ theta: 0, theta2: 0, thetaB: 0, esat: Infinity, clm: 0, eta: 0, vtShift: 0, nShift: 0 });

/** DIBL falls as ((lmin − ΔL)/Leff)^diblExp away from lmin; the exponent when the profile gives none (common practice, no source). */
export const DEFAULT_DIBL_EXPONENT = 2;
/** The threshold's length dependence falls as ((lmin − ΔL)/Leff)^vtlExp; the exponent when the profile gives none (common practice, no source). */
export const DEFAULT_VTL_EXPONENT = 2;
/** The slope factor's rise at short L falls as ((lmin − ΔL)/Leff)² (common practice, no source). */
export const N_RISE_EXPONENT = 2;

type ShortChannelParams = Pick<DeviceParams, 'lmin' | 'dl' | 'theta0' | 'theta1' | 'theta2' | 'thetaB' | 'dibl' | 'diblExp' | 'pclm' | 'vtl' | 'vtlExp' | 'nl'>;

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
  const shortest = (params.lmin - (params.dl ?? 0)) / leff;
  const eta = params.dibl === undefined ? 0 : params.dibl * shortest ** (params.diblExp ?? DEFAULT_DIBL_EXPONENT);
  const vtShift = params.vtl === undefined ? 0 : params.vtl * shortest ** (params.vtlExp ?? DEFAULT_VTL_EXPONENT);
  const nShift = params.nl === undefined ? 0 : params.nl * shortest ** N_RISE_EXPONENT;
  if (theta1 === 0 && params.theta0 === undefined && params.theta2 === undefined && params.thetaB === undefined && params.pclm === undefined && eta === 0 && vtShift === 0 && nShift === 0) return LONG_CHANNEL;
  return {
    theta: (params.theta0 ?? 0) + theta1 / leff,
    theta2: params.theta2 ?? 0,
    thetaB: params.thetaB ?? 0,
    esat: theta1 > 0 ? leff / theta1 : Infinity,
    clm: (params.pclm ?? 0) / leff,
    eta,
    vtShift,
    nShift,
  };
}

/** The mobility temperature exponent at Leff: muExp + muExpL/Leff (velocity saturation weakens the temperature law at short L). */
export function mobilityExponentAt(params: Pick<DeviceParams, 'muExp' | 'muExpL'>, leff: number): number {
  return params.muExp + (params.muExpL ?? 0) / leff;
}

/** True when the profile gives any short-channel term of the all-region model. */
export function hasShortChannelTerms(params: Partial<Pick<DeviceParams, 'dl' | 'dw' | 'theta0' | 'theta1' | 'theta2' | 'thetaB' | 'dibl' | 'pclm' | 'muExpL' | 'vtl' | 'nl'>>): boolean {
  return [params.dl, params.dw, params.theta0, params.theta1, params.theta2, params.thetaB, params.dibl, params.pclm, params.muExpL, params.vtl, params.nl].some((value) => value !== undefined);
}
