import type { DeviceParams } from '../schemas/process.js';
import { lambdaAtLength } from './channel-length-modulation.js';
import type { CurrentModel } from './drain-current.js';
import { kpAtTemperature } from './mobility.js';
import { slopeFactor } from './slope-factor.js';
import { type PreparedDevice, thresholdAt } from './resolve-device.js';
import { type ChannelTerms, LONG_CHANNEL, channelTermsAt, effectiveLength, effectiveWidth, mobilityExponentAt } from './short-channel.js';

/** A prepared device drawn at one width and length, as the current equations see it. */
export interface Channel {
  /** Effective width and length, m (the drawn ones for the square law, which is SPICE level 1 without LD). */
  readonly weff: number;
  readonly leff: number;
  /** kp at the device's corner and temperature, with the mobility exponent of this length, A/V². */
  readonly kp: number;
  /** kp·Weff/Leff, A/V². */
  readonly beta: number;
  /** λ at the drawn length, 1/V. */
  readonly lambda: number;
  /** The short-channel terms at Leff (LONG_CHANNEL for the square law or a profile without them). */
  readonly terms: ChannelTerms;
}

/** kp at Leff: the prepared device's corner and temperature, with the mobility exponent muExp + muExpL/Leff. */
export function kpAtLength(device: PreparedDevice, leff: number): number {
  const params: DeviceParams = device.params;
  if (params.muExpL === undefined) return device.kp;
  return kpAtTemperature(params.kp, device.tempK, device.tnomK, mobilityExponentAt(params, leff), device.kpScale);
}

/**
 * The channel of a device of drawn width w (all fingers) and length l. The all-region model uses Leff = L − ΔL,
 * Weff = W − fingers·ΔW and the short-channel terms of the profile; the square law stays SPICE level 1.
 */
export function channelOf(device: PreparedDevice, model: CurrentModel, w: number, l: number, fingers = 1, lengthField = 'l'): Channel {
  const { params } = device;
  const lambda = lambdaAtLength(params, l);
  if (model === 'square-law') return { weff: w, leff: l, kp: device.kp, beta: (device.kp * w) / l, lambda, terms: LONG_CHANNEL };
  const leff = effectiveLength(params, l, lengthField);
  const weff = effectiveWidth(params, w, fingers);
  const kp = kpAtLength(device, leff);
  return { weff, leff, kp, beta: (kp * weff) / leff, lambda, terms: channelTermsAt(params, leff) };
}

/** VT of the channel at a bias: body effect, corner and temperature (thresholdAt), its length's shift, and DIBL at VDS. */
export function thresholdOf(device: PreparedDevice, channel: Pick<Channel, 'terms'>, vsb: number, vds: number): number {
  return thresholdAt(device, vsb) + channel.terms.vtShift - channel.terms.eta * vds;
}

/**
 * β of the channel at VSB, A/V²: kp·Weff/Leff ÷ (1 + θB·VSB). A body bias deepens the depletion charge, whose field
 * adds to the vertical field the carriers feel, so the mobility falls (Tsividis & McAndrew 2011, ch. 4, from memory:
 * µ = µ0/(1 + θ·VOV + θB·VSB), here as its own factor). θB = 0 for the square law and a profile without it.
 */
export function betaOf(channel: Pick<Channel, 'beta' | 'terms'>, vsb: number): number {
  return channel.terms.thetaB === 0 ? channel.beta : channel.beta / (1 + channel.terms.thetaB * vsb);
}

/** The slope factor of the channel at VSB: the body's law (slopeFactor) plus its length's rise. */
export function slopeFactorOf(device: PreparedDevice, channel: Pick<Channel, 'terms'>, vsb: number): number {
  return slopeFactor(device.params, vsb) + channel.terms.nShift;
}
