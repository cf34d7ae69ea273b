import type { DeviceParams } from '../schemas/process.js';
import { type CurrentModel, KERNEL_OUTPUTS, VDSAT, drainCurrentInto } from './drain-current.js';
import { type ChannelTerms, LONG_CHANNEL } from './short-channel.js';
import { slopeFactor } from './slope-factor.js';
import { bodyEffectSlope } from './threshold.js';

export type Region = 'weak' | 'moderate' | 'strong';

const scratch = new Float64Array(KERNEL_OUTPUTS);

/** Region boundaries of the inversion coefficient: weak < 0.1 ≤ moderate ≤ 10 < strong (Binkley, Tradeoffs and Optimization in Analog CMOS Design, Wiley, 2008, ch. 3). */
export const WEAK_INVERSION_IC = 0.1;
export const STRONG_INVERSION_IC = 10;

/**
 * IC = ID / I_spec, I_spec = 2·n·β·UT² (EKV normalisation; Enz & Vittoz, Charge-Based MOS Transistor Modeling,
 * Wiley, 2006). The all-region model carries the same I_spec, so IC = ln²(1 + e^(VOV/(2nUT))) in saturation and
 * IC = 1 at VOV = 2nUT·ln(e − 1) (without the short-channel terms).
 */
export function inversionCoefficient(id: number, beta: number, n: number, ut: number): number {
  return id / (2 * n * beta * ut * ut);
}

export function regionOf(ic: number): Region {
  if (ic < WEAK_INVERSION_IC) return 'weak';
  return ic <= STRONG_INVERSION_IC ? 'moderate' : 'strong';
}

/**
 * VDSsat in volts. All-region: V_P/n + 4UT·(1 − σ(x)), V_P = 2nUT·ln(1 + eˣ), x = VOV/(2nUT), σ the logistic
 * function: → VOV/n in strong inversion (lowered further by velocity saturation, see drain-current.ts), → 4UT in
 * weak inversion (where the reverse term e^(−VDS/UT) is 1.8 %), smooth between.
 * Square law: max(VOV, 4UT): VOV as SPICE level 1, and 4UT in its exponential tail ((1 − e^(−4)) = 98 %).
 */
export function saturationVoltage(model: CurrentModel, vov: number, n: number, ut: number, terms: ChannelTerms = LONG_CHANNEL): number {
  drainCurrentInto(model, 1, n, ut, 0, vov, 1, scratch, terms);
  return scratch[VDSAT];
}

/**
 * gmb/gm. All-region: n(VSB) − 1, the EKV relation (the gate couples to the channel as 1/n of the body's
 * pull, Enz & Vittoz 2006). Square law: γ/(2√(2φF + VSB)) = dVT/dVSB, as SPICE level 1 computes it.
 * The two agree when n is derived from γ.
 */
export function gmbRatioOf(model: CurrentModel, params: Pick<DeviceParams, 'gamma' | 'twoPhiF' | 'n'>, vsb: number): number {
  return model === 'square-law' ? bodyEffectSlope(params.gamma, params.twoPhiF, vsb) : slopeFactor(params, vsb) - 1;
}

export interface SmallSignal {
  id: number;
  gm: number;
  gmb: number;
  gds: number;
  /** 1/gds; null when gds = 0 (λ = 0 in saturation): infinite. */
  ro: number | null;
  gmId: number;
  /** gm/gds; null when gds = 0. */
  intrinsicGain: number | null;
  ic: number;
  region: Region;
  vdsat: number;
  saturated: boolean;
}

/** Current and small-signal figures at one bias point; gmb = gm·gmbRatio (see gmbRatioOf). */
export function smallSignal(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, gmbRatio: number, terms: ChannelTerms = LONG_CHANNEL): SmallSignal {
  drainCurrentInto(model, beta, n, ut, lambda, vov, vds, scratch, terms);
  const [id, gm, gds, gmId, vdsat] = scratch;
  const ic = inversionCoefficient(id, beta, n, ut);
  return {
    id,
    gm,
    gmb: gm * gmbRatio,
    gds,
    ro: gds > 0 ? 1 / gds : null,
    gmId,
    intrinsicGain: gds > 0 ? gm / gds : null,
    ic,
    region: regionOf(ic),
    vdsat,
    saturated: vds >= vdsat,
  };
}
