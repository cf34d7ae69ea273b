import { bodyEffectSlope } from './threshold.js';

/**
 * Subthreshold slope factor n at a source–body voltage: n = 1 + Cdep/Cox = 1 + γ/(2·√(2φF + VSB))
 * (Tsividis & McAndrew 2011, ch. 4). A process that gives n (at VSB = 0) keeps that value's VSB law:
 * n(VSB) = 1 + (n − 1)·√(2φF/(2φF + VSB)), because Cdep falls as 1/√(2φF + VSB). So gmb/gm = n − 1 at
 * every VSB, and the gm/ID ceiling 1/(n·UT) of a stacked device rises as its n falls. Held constant in temperature.
 */
export function slopeFactor(params: { readonly gamma: number; readonly twoPhiF: number; readonly n?: number }, vsb: number): number {
  if (params.n === undefined) return 1 + bodyEffectSlope(params.gamma, params.twoPhiF, vsb);
  return 1 + (params.n - 1) * Math.sqrt(params.twoPhiF / (params.twoPhiF + vsb));
}
