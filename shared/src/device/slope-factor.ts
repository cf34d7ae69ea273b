import { bodyEffectSlope } from './threshold.js';

/**
 * Subthreshold slope factor n: the process value when given, else n = 1 + γ/(2·√(2φF + VSB))
 * (= 1 + Cdep/Cox; Tsividis & McAndrew 2011, ch. 4). n is held independent of temperature.
 */
export function slopeFactor(params: { readonly gamma: number; readonly twoPhiF: number; readonly n?: number }, vsb: number): number {
  return params.n ?? 1 + bodyEffectSlope(params.gamma, params.twoPhiF, vsb);
}
