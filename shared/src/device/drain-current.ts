/**
 * Drain current and its analytic derivatives, polarity-normalised, for the two models of docs/model.md.
 * Inputs in SI: beta = kp(T)·W/L (A/V²), n, ut = kT/q (V), lambda (1/V, already scaled by L),
 * vov = VGS − VT (V), vds > 0 (V). Each `…Into` function writes into `out`:
 *   out[0] = ID (A), out[1] = gm = ∂ID/∂VGS (S), out[2] = gds = ∂ID/∂VDS (S), out[3] = gm/ID (1/V),
 *   out[4] = VDSsat (V; see saturationVoltage in small-signal.ts).
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

/** Below xf = VOV/(2nUT) = −30, ln(1+eˣ) = eˣ to 1e-13: the exponential asymptote is used (no underflow in ratios). */
const WEAK_ASYMPTOTE_X = -30;

/**
 * Per-point inputs and outputs of the column kernels. Entry i of an output is point i; an input holds
 * either one value per point or, with length 1, one value for every point (no need to fill a whole
 * array with a constant).
 */
export interface KernelColumns {
  /** kp(T)·W/L, A/V² */
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
  id: Float64Array;
  gm: Float64Array;
  gds: Float64Array;
  gmId: Float64Array;
  vdsat: Float64Array;
}

/**
 * All-region interpolation (after Enz, Krummenacher & Vittoz, Analog Integrated Circuits and Signal
 * Processing 8, 83–114, 1995, with the square law's strong-inversion limit, no 1/n), for points 0 … count−1:
 * ID = (β/2)(2nUT)²·[F(VOV/(2nUT)) − F((VOV − VDS)/(2nUT))]·(1 + λ·VDS), F(x) = ln²(1 + eˣ),
 * with its analytic gm, gds, gm/ID and VDSsat (saturationVoltage in small-signal.ts). The one place this
 * formula is written; the sweep runs it over whole series, the scalar functions over one point.
 */
export function allRegionColumns(count: number, c: KernelColumns): void {
  const { beta, n, ut, lambda, vov, vds, id, gm, gds, gmId, vdsat } = c;
  const [mb, mn, mu, ml, mo, md] = [beta, n, ut, lambda, vov, vds].map(maskOf);
  for (let i = 0; i < count; i++) {
    const a = 2 * n[i & mn] * ut[i & mu];
    const inverseA = 1 / a;
    const v = vds[i & md];
    const lambdaI = lambda[i & ml];
    const xf = vov[i & mo] * inverseA;
    const m = 1 + lambdaI * v;
    const p = 0.5 * beta[i & mb] * a * a;
    if (xf < WEAK_ASYMPTOTE_X) {
      const ef = Math.exp(2 * xf);
      const g = -Math.expm1(-2 * v * inverseA);
      const current = p * m * ef * g;
      id[i] = current;
      gm[i] = 2 * current * inverseA;
      gds[i] = p * ef * (m * 2 * (1 - g) * inverseA + lambdaI * g);
      gmId[i] = 2 * inverseA;
      vdsat[i] = a * Math.exp(xf) + 2 * a * (1 - Math.exp(xf));
      continue;
    }
    const xr = xf - v * inverseA;
    let lf: number, sf: number, lr: number, sr: number;
    if (xf > 0) {
      const t = Math.exp(-xf);
      lf = xf + Math.log1p(t);
      sf = 1 / (1 + t);
    } else {
      const t = Math.exp(xf);
      lf = Math.log1p(t);
      sf = t / (1 + t);
    }
    if (xr > 0) {
      const t = Math.exp(-xr);
      lr = xr + Math.log1p(t);
      sr = 1 / (1 + t);
    } else {
      const t = Math.exp(xr);
      lr = Math.log1p(t);
      sr = t / (1 + t);
    }
    const d = (lf - lr) * (lf + lr);
    const slope = lf * sf - lr * sr;
    id[i] = p * m * d;
    gm[i] = p * m * 2 * slope * inverseA;
    gds[i] = p * (m * 2 * lr * sr * inverseA + lambdaI * d);
    // VDS so small that F(xf) − F(xr) rounds to 0: the limit F''/F' of the ratio.
    gmId[i] = d > 0 ? (2 * slope * inverseA) / d : ((sf + lf * (1 - sf)) * inverseA) / lf;
    vdsat[i] = a * (lf + 2 * (1 - sf));
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
  id: oneColumn(), gm: oneColumn(), gds: oneColumn(), gmId: oneColumn(), vdsat: oneColumn(),
};

function runOnePoint(columns: (count: number, c: KernelColumns) => void, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array): void {
  single.beta[0] = beta;
  single.n[0] = n;
  single.ut[0] = ut;
  single.lambda[0] = lambda;
  single.vov[0] = vov;
  single.vds[0] = vds;
  columns(1, single);
  out[ID] = single.id[0];
  out[GM] = single.gm[0];
  out[GDS] = single.gds[0];
  out[GM_ID] = single.gmId[0];
  out[VDSAT] = single.vdsat[0];
}

/** One point of the all-region model into out (see the top of this file). */
export function allRegionCurrentInto(beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array): void {
  runOnePoint(allRegionColumns, beta, n, ut, lambda, vov, vds, out);
}

/** One point of the square law into out (see the top of this file). */
export function squareLawCurrentInto(beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array): void {
  runOnePoint(squareLawColumns, beta, n, ut, lambda, vov, vds, out);
}

/** Dispatches to the chosen model; see allRegionCurrentInto and squareLawCurrentInto. */
export function drainCurrentInto(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number, out: Float64Array): void {
  if (model === 'square-law') squareLawCurrentInto(beta, n, ut, lambda, vov, vds, out);
  else allRegionCurrentInto(beta, n, ut, lambda, vov, vds, out);
}

const scratch = new Float64Array(KERNEL_OUTPUTS);

/** ID in amperes for one bias point (see drainCurrentInto for the arguments). */
export function drainCurrent(model: CurrentModel, beta: number, n: number, ut: number, lambda: number, vov: number, vds: number): number {
  drainCurrentInto(model, beta, n, ut, lambda, vov, vds, scratch);
  return scratch[ID];
}
