import { formatQuantity } from '../units/format-quantity.js';
import { EngineError } from './errors.js';

export interface ThresholdParams {
  readonly vt0: number;
  readonly gamma: number;
  readonly twoPhiF: number;
  readonly vtTc: number;
}

/**
 * Body effect γ·(√(2φF + VSB) − √(2φF)) in volts (long-channel depletion charge, e.g. Tsividis & McAndrew,
 * Operation and Modeling of the MOS Transistor, 3rd ed., 2011, ch. 4). VSB < 0 is a forward-biased
 * source–body junction and lowers VT; VSB ≤ −2φF has no real square root: EngineError VSB_BEYOND_FORWARD_LIMIT.
 */
export function bodyEffect(gamma: number, twoPhiF: number, vsb: number): number {
  if (!(twoPhiF + vsb > 0)) {
    throw new EngineError(
      'VSB_BEYOND_FORWARD_LIMIT',
      `The source–body voltage ${formatQuantity(vsb, 'V', { digits: 4 })} forward-biases the junction beyond −2φF = ${formatQuantity(-twoPhiF, 'V', { digits: 4 })}; the body-effect equation has no answer there`,
      'vsb',
    );
  }
  return gamma * (Math.sqrt(twoPhiF + vsb) - Math.sqrt(twoPhiF));
}

/** dVT/dVSB = γ/(2·√(2φF + VSB)), the ratio gmb/gm. */
export function bodyEffectSlope(gamma: number, twoPhiF: number, vsb: number): number {
  return gamma / (2 * Math.sqrt(twoPhiF + vsb));
}

/**
 * VT = vt0 + dvt + γ(√(2φF + VSB) − √(2φF)) + vtTc·(T − Tnom), polarity-normalised (−VTP for PMOS),
 * temperatures in kelvin. VSB = 0 at Tnom and dvt = 0 gives vt0 exactly.
 */
export function thresholdVoltage(params: ThresholdParams, vsb: number, tempK: number, tnomK: number, dvt = 0): number {
  return params.vt0 + dvt + params.vtTc * (tempK - tnomK) + bodyEffect(params.gamma, params.twoPhiF, vsb);
}
