import { epsilon0, epsilonRSiO2 } from '../units/constants.js';
import { normalisedCharge } from './inversion-charge.js';

/** Cox = εr(SiO2)·ε0/tox in F/m² (εr = 3.9, ε0 CODATA 2018). 10 nm → 3.4531e-3 F/m² = 3.4531 fF/µm². */
export function oxideCapacitance(tox: number): number {
  return (epsilonRSiO2 * epsilon0) / tox;
}

/** The bias of the channel as the charges see it (polarity-normalised; VOV already lowered by DIBL). */
export interface ChargeBias {
  readonly vov: number;
  readonly vds: number;
  readonly n: number;
  /** kT/q, V */
  readonly ut: number;
}

export interface GateCapacitances {
  /** Intrinsic Cgs plus the source overlap W·cgdo, F. */
  cgs: number;
  /** Intrinsic Cgd plus the drain overlap W·cgdo, F. */
  cgd: number;
  /** Intrinsic gate–body capacitance, F. */
  cgb: number;
  /** Cgg = Cgs + Cgd + Cgb: all the gate charge a driver moves per volt, F. */
  cgg: number;
}

/**
 * Charge-based gate capacitances in every region (Enz & Vittoz, Charge-Based MOS Transistor Modeling, Wiley,
 * 2006, ch. 5, from memory): with the normalised source and drain charges q_s, q_d of the drain-current model
 * (2q + ln q = v, v_s = VOV/(nUT), v_d = (VOV − n·VDS)/(nUT); inversion-charge.ts),
 *   Cgs/(W·L·Cox) = q_s(2q_s + 4q_d + 3) / (3(q_s + q_d + 1)²),  Cgd/(W·L·Cox) = q_d(4q_s + 2q_d + 3) / (3(q_s + q_d + 1)²),
 *   Cgb/(W·L·Cox) = ((n − 1)/n)·(1 − Cgs/(W·L·Cox) − Cgd/(W·L·Cox)),
 * plus the overlaps W·cgdo on Cgs and Cgd. Limits: strong saturation Cgs = (2/3)·W·L·Cox, Cgb = (n − 1)/(3n)·W·L·Cox
 * (Meyer's values and their body term); weak inversion Cgs → 0, Cgb → (n − 1)/n·W·L·Cox; triode at VDS → 0
 * Cgs = Cgd = W·L·Cox/2. w and l are the effective width and length.
 */
export function gateCapacitances(w: number, l: number, cox: number, cgdo: number, bias: ChargeBias): GateCapacitances {
  const nu = bias.n * bias.ut;
  const qs = normalisedCharge(bias.vov / nu);
  const qd = normalisedCharge((bias.vov - bias.n * bias.vds) / nu);
  const denominator = 3 * (qs + qd + 1) ** 2;
  const gs = (qs * (2 * qs + 4 * qd + 3)) / denominator;
  const gd = (qd * (4 * qs + 2 * qd + 3)) / denominator;
  const gb = ((bias.n - 1) / bias.n) * (1 - gs - gd);
  const area = w * l * cox;
  const overlap = w * cgdo;
  const cgs = gs * area + overlap;
  const cgd = gd * area + overlap;
  const cgb = gb * area;
  return { cgs, cgd, cgb, cgg: cgs + cgd + cgb };
}

/** The junction of a source or drain: its grading and the reverse bias across it. */
export interface JunctionBias {
  /** Reverse bias, V (drain: VDS + VSB; source: VSB); negative is forward. */
  readonly reverse: number;
  /** Built-in potential, V. */
  readonly pb: number;
  /** Grading coefficients of the area and the sidewall. */
  readonly mj: number;
  readonly mjsw: number;
}

/** Built-in potential and grading coefficients when the profile gives none: the SPICE defaults (Vladimirescu, The SPICE Book, Wiley, 1994, from memory). */
export const DEFAULT_JUNCTION = Object.freeze({ pb: 0.8, mj: 0.5, mjsw: 0.33 });

/** Forward bias beyond FC·PB is linearised, as SPICE does (FC = 0.5), so the law stays finite. */
const FORWARD_LIMIT = 0.5;

/** C0/(1 + VR/PB)^M, linear beyond a forward bias of FC·PB (SPICE depletion-capacitance law). */
function depletionFactor(reverse: number, pb: number, m: number): number {
  const forward = -reverse;
  if (forward <= FORWARD_LIMIT * pb) return (1 + reverse / pb) ** -m;
  return (1 - FORWARD_LIMIT) ** -(1 + m) * (1 - FORWARD_LIMIT * (1 + m) + (m * forward) / pb);
}

/**
 * Capacitance of one source or drain junction at its reverse bias, F:
 * cj·W·ldiff/(1 + VR/PB)^MJ + cjsw·(W + 2·ldiff)/(1 + VR/PB)^MJSW (the sidewall on three sides, not along the
 * gate; one diffusion stripe of width W, no finger sharing). At zero bias the zero-bias values.
 */
export function junctionCapacitance(w: number, ldiff: number, cj: number, cjsw: number, bias: JunctionBias = { reverse: 0, ...DEFAULT_JUNCTION }): number {
  return cj * w * ldiff * depletionFactor(bias.reverse, bias.pb, bias.mj) + cjsw * (w + 2 * ldiff) * depletionFactor(bias.reverse, bias.pb, bias.mjsw);
}

/** fT = gm / (2π·Cgg) in Hz; 0 when there is no capacitance to charge. */
export function transitFrequency(gm: number, cgg: number): number {
  return cgg > 0 ? gm / (2 * Math.PI * cgg) : 0;
}
