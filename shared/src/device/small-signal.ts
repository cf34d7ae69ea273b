import { type CurrentModel, KERNEL_OUTPUTS, VDSAT, drainCurrentInto } from './drain-current.js';

export type Region = 'weak' | 'moderate' | 'strong';

const scratch = new Float64Array(KERNEL_OUTPUTS);

/** Region boundaries of the inversion coefficient: weak < 0.1 ≤ moderate ≤ 10 < strong (Binkley, Tradeoffs and Optimization in Analog CMOS Design, Wiley, 2008, ch. 3). */
export const WEAK_INVERSION_IC = 0.1;
export const STRONG_INVERSION_IC = 10;

/** IC = ID / I_spec, I_spec = 2·n·β·UT² (EKV normalisation; Enz & Vittoz, Charge-Based MOS Transistor Modeling, Wiley, 2006). */
export function inversionCoefficient(id: number, beta: number, n: number, ut: number): number {
  return id / (2 * n * beta * ut * ut);
}

export function regionOf(ic: number): Region {
  if (ic < WEAK_INVERSION_IC) return 'weak';
  return ic <= STRONG_INVERSION_IC ? 'moderate' : 'strong';
}

/**
 * VDSsat in volts. All-region: 2nUT·ln(1 + eˣ) + 4nUT·(1 − σ(x)), x = VOV/(2nUT), σ the logistic function:
 * → VOV in strong inversion, → 4nUT in weak inversion (where the model's reverse term e^(−VDS/(nUT)) is 1.8 %), smooth between.
 * Square law: max(VOV, 4UT): VOV as SPICE level 1, and 4UT in its exponential tail ((1 − e^(−4)) = 98 %).
 */
export function saturationVoltage(model: CurrentModel, vov: number, n: number, ut: number): number {
  drainCurrentInto(model, 1, n, ut, 0, vov, 1, scratch);
  return scratch[VDSAT];
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

/**
 * Current and small-signal figures at one bias point. gmbRatio = dVT/dVSB = γ/(2√(2φF + VSB)), so
 * gmb = gm·γ/(2√(2φF + VSB)) (n held fixed in that derivative; exact when the process gives n).
 */
export function smallSignal(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, gmbRatio: number): SmallSignal {
  drainCurrentInto(model, beta, n, ut, lambda, vov, vds, scratch);
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
