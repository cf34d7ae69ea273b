import { epsilon0, epsilonRSiO2 } from '../units/constants.js';

/** Cox = εr(SiO2)·ε0/tox in F/m² (εr = 3.9, ε0 CODATA 2018). 10 nm → 3.4531e-3 F/m² = 3.4531 fF/µm². */
export function oxideCapacitance(tox: number): number {
  return (epsilonRSiO2 * epsilon0) / tox;
}

export interface GateCapacitances {
  /** (2/3)·W·L·Cox + W·cgdo, F. */
  cgs: number;
  /** W·cgdo, F. */
  cgd: number;
}

/**
 * Gate capacitances in saturation (Meyer's strong-inversion values, e.g. Tsividis & McAndrew 2011, ch. 8):
 * Cgs = (2/3)·W·L·Cox + W·cgdo, Cgd = W·cgdo. The engine keeps these values in weak and moderate inversion
 * too, where the intrinsic Cgs really falls toward 0 and Cgb ≈ W·L·Cox·(n−1)/n takes over: there (2/3)·W·L·Cox
 * stands in for the gate charge a driver must move, and fT comes out low rather than high.
 */
export function gateCapacitances(w: number, l: number, cox: number, cgdo: number): GateCapacitances {
  return { cgs: gateSourceCapacitance(w, l, cox, cgdo), cgd: gateDrainCapacitance(w, cgdo) };
}

/** Cgs = (2/3)·W·L·Cox + W·cgdo, F (see gateCapacitances). */
export function gateSourceCapacitance(w: number, l: number, cox: number, cgdo: number): number {
  return (2 / 3) * w * l * cox + w * cgdo;
}

/** Cgd = W·cgdo (overlap only, saturation), F. */
export function gateDrainCapacitance(w: number, cgdo: number): number {
  return w * cgdo;
}

/**
 * Zero-bias capacitance of one source or drain junction, F: cj·W·ldiff + cjsw·(W + 2·ldiff)
 * (the sidewall on three sides, not along the gate; one diffusion stripe of width W, no finger sharing,
 * no reverse-bias reduction: an upper bound).
 */
export function junctionCapacitance(w: number, ldiff: number, cj: number, cjsw: number): number {
  return cj * w * ldiff + cjsw * (w + 2 * ldiff);
}

/** fT = gm / (2π·(Cgs + Cgd)) in Hz; 0 when there is no capacitance to charge. */
export function transitFrequency(gm: number, cgs: number, cgd: number): number {
  const c = cgs + cgd;
  return c > 0 ? gm / (2 * Math.PI * c) : 0;
}
