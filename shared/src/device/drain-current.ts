import { normalisedCharge } from './inversion-charge.js';
import { type ChannelTerms, LONG_CHANNEL } from './short-channel.js';

/**
 * Drain current and its analytic derivatives, polarity-normalised, for the two models of docs/model.md.
 * Inputs in SI: beta = kp(T)·Weff/Leff (A/V²), n, ut = kT/q (V), lambda (1/V, already scaled by L),
 * vov = VGS − VT (V; VT already lowered by DIBL), vds > 0 (V), and the short-channel terms of the
 * all-region model at this length (theta, esat, clm, eta; see short-channel.ts — the square law ignores them).
 * Each `…Into` function writes into `out`:
 *   out[0] = ID (A), out[1] = gm = ∂ID/∂VGS (S), out[2] = gds = ∂ID/∂VDS at fixed VGS (S, DIBL included),
 *   out[3] = gm/ID (1/V), out[4] = VDSsat (V).
 * gm/ID is computed as its own ratio, so it stays finite (→ 1/(n·UT)) where ID underflows in deep weak inversion.
 * No allocation; the sweep runs the column kernels (allRegionColumns, squareLawColumns) over a whole series.
 */

export type CurrentModel = 'all-region' | 'square-law';

export const ID = 0;
export const GM = 1;
export const GDS = 2;
export const GM_ID = 3;
export const VDSAT = 4;
/** Length of the `out` array the kernels write. */
export const KERNEL_OUTPUTS = 5;

/**
 * Per-point inputs and outputs of the column kernels. Entry i of an output is point i; an input holds
 * either one value per point or, with length 1, one value for every point (no need to fill a whole
 * array with a constant).
 */
export interface KernelColumns {
  /** kp(T)·Weff/Leff, A/V² */
  beta: Float64Array;
  n: Float64Array;
  /** kT/q, V */
  ut: Float64Array;
  /** 1/V, already scaled by L */
  lambda: Float64Array;
  /** VGS − VT, V */
  vov: Float64Array;
  /** > 0, V */
  vds: Float64Array;
  /** θ = θ0 + θ1/Leff, 1/V (all-region only) */
  theta: Float64Array;
  /** θ2, 1/V² (all-region only) */
  theta2: Float64Array;
  /** Esat·Leff, V; Infinity without velocity saturation (all-region only) */
  esat: Float64Array;
  /** Pclm/Leff (all-region only) */
  clm: Float64Array;
  /** DIBL η, V/V: adds η·gm to gds (all-region only) */
  eta: Float64Array;
  id: Float64Array;
  gm: Float64Array;
  gds: Float64Array;
  gmId: Float64Array;
  vdsat: Float64Array;
}

/**
 * All-region model: the charge-based EKV long-channel current (C. C. Enz, E. A. Vittoz, Charge-Based MOS
 * Transistor Modeling, Wiley, 2006, ch. 3; C. C. Enz, F. Krummenacher, E. A. Vittoz, Analog Integrated Circuits
 * and Signal Processing 8, 83–114, 1995) for points 0 … count−1, with the short-channel terms of docs/model.md §6.3:
 *   ID = I_spec·[i_f − i_r]·(1 + λ·VDS)·M_clm / (1 + θ·V_P + θ2·V_P²),  I_spec = 2·n·β·UT²,  i = q² + q,  v = 2q + ln q,
 *   v_f = VOV/(n·UT),  v_r = (VOV − n·VDS)/(n·UT)  (inversion-charge.ts),  V_P = 2nUT·q_f (a smooth VOV),
 *   M_clm = 1 + k·ln(1 + (VDS − VDSsat)₊/VDSsat),  k = clm/(1 + V_P/esat),
 *   VDSsat = 2(V_P/n)/(1 + √(1 + 2V_P/(n·esat))) + 4UT/(1 + q_f),
 * with its analytic gm, gds (+ η·gm for DIBL), gm/ID and VDSsat. Without the short-channel terms this is
 * (β/2n)·VOV² in strong saturation, I_spec·e^(VOV/(nUT))·(1 − e^(−VDS/UT)) in weak inversion, and
 * gm·nUT/ID = 1/(0.5 + √(0.25 + IC)) between. The one place this formula is written; the sweep runs it over
 * whole series, the scalar functions over one point.
 */
export function allRegionColumns(count: number, c: KernelColumns): void {
  const { beta, n, ut, lambda, vov, vds, theta, theta2, esat, clm, eta, id, gm, gds, gmId, vdsat } = c;
  const [mb, mn, mu, ml, mo, md, mt, me, mc, mh, mq] = [beta, n, ut, lambda, vov, vds, theta, esat, clm, eta, theta2].map(maskOf);
  for (let i = 0; i < count; i++) {
    const nI = n[i & mn];
    const u = ut[i & mu];
    const nu = nI * u;
    const v = vds[i & md];
    const ispec = 2 * nI * beta[i & mb] * u * u;
    // 1. The long-channel core: the normalised charges at source and drain, d = i_f − i_r and its derivatives.
    const vf = vov[i & mo] / nu;
    const qf = normalisedCharge(vf);
    const qr = normalisedCharge(vf - v / u);
    const dq = qf - qr;
    const d = dq * (qf + qr + 1);
    const dVov = dq / nu;
    const dVds = qr / u;
    // VDS so small that i_f − i_r rounds to 0: the limit of the ratio, 1/(nUT·(2q + 1)).
    const coreGmId = d > 0 ? dVov / d : 1 / (nu * (2 * qf + 1));
    // 2. Saturation voltage: V_P/n in strong inversion (lowered by velocity saturation), 4UT in weak.
    const e = esat[i & me];
    const vp = 2 * nu * qf;
    const root = e === Infinity ? 1 : Math.sqrt(1 + (2 * vp) / (nI * e));
    const sat = (2 * vp) / (nI * (1 + root)) + (4 * u) / (1 + qf);
    // 3. Mobility degradation and velocity saturation in the current: ÷ (1 + θ·V_P + θ2·V_P²).
    const th = theta[i & mt];
    const th2 = theta2[i & mq];
    const degradation = 1 + vp * (th + th2 * vp);
    // dV_P/dVOV = 2q_f/(2q_f + 1), the smooth overdrive's slope.
    const vpSlope = (2 * qf) / (2 * qf + 1);
    let lnKSlopeVov = th === 0 && th2 === 0 ? 0 : -((th + 2 * th2 * vp) * vpSlope) / degradation;
    // 4. Channel-length modulation beyond VDSsat, logarithmic in VDS − VDSsat (smooth over 2UT).
    let clmFactor = 1;
    let lnClmSlopeVds = 0;
    const k0 = clm[i & mc];
    if (k0 > 0) {
      const satSlope = vpSlope / (nI * root) - (4 * u * vpSlope) / (2 * nu * (1 + qf) * (1 + qf));
      const k = k0 / (1 + vp / e);
      const s = 2 * u;
      const z = (v - sat) / s;
      const excess = z > 0 ? s * (z + Math.log1p(Math.exp(-z))) : s * Math.log1p(Math.exp(z));
      const excessSlope = z > 0 ? 1 / (1 + Math.exp(-z)) : Math.exp(z) / (1 + Math.exp(z));
      const logTerm = Math.log1p(excess / sat);
      clmFactor = 1 + k * logTerm;
      const kSlope = (-k * (vpSlope / e)) / (1 + vp / e);
      const logSlope = (satSlope * (1 - excessSlope)) / (sat + excess) - satSlope / sat;
      lnKSlopeVov += (kSlope * logTerm + k * logSlope) / clmFactor;
      lnClmSlopeVds = (k * excessSlope) / ((sat + excess) * clmFactor);
    }
    const lam = lambda[i & ml];
    const lengthFactor = 1 + lam * v;
    const scale = (ispec * lengthFactor * clmFactor) / degradation;
    const current = scale * d;
    const transconductance = scale * (dVov + d * lnKSlopeVov);
    id[i] = current;
    gm[i] = transconductance;
    gds[i] = scale * (dVds + d * (lam / lengthFactor + lnClmSlopeVds)) + eta[i & mh] * transconductance;
    gmId[i] = coreGmId + lnKSlopeVov;
    vdsat[i] = sat;
  }
}

/**
 * Square law (Shichman & Hodges, IEEE JSSC 3(3), 285–289, 1968) exactly as SPICE level 1 computes it:
 * saturation (VDS ≥ VOV) ID = (β/2)·VOV²·(1 + λ·VDS), triode ID = β·(VOV·VDS − VDS²/2)·(1 + λ·VDS);
 * below VOV = 2nUT an exponential tail ID = (β/2)(2nUT)²·exp((VOV − 2nUT)/(nUT))·(1 − e^(−VDS/UT))·(1 + λ·VDS),
 * which meets the saturated square law at VOV = 2nUT with the same ID and gm (gm/ID = 1/(nUT) on both sides)
 * up to the factor (1 − e^(−VDS/UT)). VDSsat = max(VOV, 4·UT).
 */
export function squareLawColumns(count: number, c: KernelColumns): void {
  const { beta, n, ut, lambda, vov, vds, id, gm, gds, gmId, vdsat } = c;
  const [mb, mn, mu, ml, mo, md] = [beta, n, ut, lambda, vov, vds].map(maskOf);
  for (let i = 0; i < count; i++) {
    const u = ut[i & mu];
    const a = 2 * n[i & mn] * u;
    const v = vds[i & md];
    const o = vov[i & mo];
    const b = beta[i & mb];
    const lambdaI = lambda[i & ml];
    const m = 1 + lambdaI * v;
    vdsat[i] = Math.max(o, 4 * u);
    if (o >= a) {
      if (v >= o) {
        const core = 0.5 * b * o * o;
        id[i] = core * m;
        gm[i] = b * o * m;
        gds[i] = lambdaI * core;
        gmId[i] = 2 / o;
      } else {
        const core = o * v - 0.5 * v * v;
        id[i] = b * core * m;
        gm[i] = b * v * m;
        gds[i] = b * (m * (o - v) + lambdaI * core);
        gmId[i] = v / core;
      }
      continue;
    }
    const p = 0.5 * b * a * a;
    const e = Math.exp((2 * (o - a)) / a);
    const h = -Math.expm1(-v / u);
    const current = p * e * h * m;
    id[i] = current;
    gm[i] = (2 * current) / a;
    gds[i] = p * e * (lambdaI * h + (m * (1 - h)) / u);
    gmId[i] = 2 / a;
  }
}

/** Index mask of an input column: 0 for a length-1 column (every point reads entry 0), all ones otherwise. */
export function maskOf(column: Float64Array): number {
  return column.length === 1 ? 0 : -1;
}

function oneColumn(): Float64Array {
  return new Float64Array(1);
}

const single: KernelColumns = {
  beta: oneColumn(), n: oneColumn(), ut: oneColumn(), lambda: oneColumn(), vov: oneColumn(), vds: oneColumn(),
  theta: oneColumn(), theta2: oneColumn(), esat: oneColumn(), clm: oneColumn(), eta: oneColumn(),
  id: oneColumn(), gm: oneColumn(), gds: oneColumn(), gmId: oneColumn(), vdsat: oneColumn(),
};

function runOnePoint(columns: (count: number, c: KernelColumns) => void, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array, terms: ChannelTerms): void {
  single.beta[0] = beta;
  single.n[0] = n;
  single.ut[0] = ut;
  single.lambda[0] = lambda;
  single.vov[0] = vov;
  single.vds[0] = vds;
  single.theta[0] = terms.theta;
  single.theta2[0] = terms.theta2;
  single.esat[0] = terms.esat;
  single.clm[0] = terms.clm;
  single.eta[0] = terms.eta;
  columns(1, single);
  out[ID] = single.id[0];
  out[GM] = single.gm[0];
  out[GDS] = single.gds[0];
  out[GM_ID] = single.gmId[0];
  out[VDSAT] = single.vdsat[0];
}

/** One point of the all-region model into out (see the top of this file); long channel unless terms are given. */
export function allRegionCurrentInto(beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array, terms: ChannelTerms = LONG_CHANNEL): void {
  runOnePoint(allRegionColumns, beta, n, ut, lambda, vov, vds, out, terms);
}

/** One point of the square law into out (see the top of this file). */
export function squareLawCurrentInto(beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array): void {
  runOnePoint(squareLawColumns, beta, n, ut, lambda, vov, vds, out, LONG_CHANNEL);
}

/** Dispatches to the chosen model; see allRegionCurrentInto and squareLawCurrentInto. */
export function drainCurrentInto(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array, terms: ChannelTerms = LONG_CHANNEL): void {
  if (model === 'square-law') squareLawCurrentInto(beta, n, ut, lambda, vov, vds, out);
  else allRegionCurrentInto(beta, n, ut, lambda, vov, vds, out, terms);
}

const scratch = new Float64Array(KERNEL_OUTPUTS);

/** ID in amperes for one bias point (see drainCurrentInto for the arguments). */
export function drainCurrent(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, terms: ChannelTerms = LONG_CHANNEL): number {
  drainCurrentInto(model, beta, n, ut, lambda, vov, vds, scratch, terms);
  return scratch[ID];
}
