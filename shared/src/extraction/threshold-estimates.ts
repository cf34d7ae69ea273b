import type { MeasuredCurve, MeasuredPoint } from './measured-curves.js';

/**
 * The classical estimates from one ID–VGS curve, before any model is fitted (A. Ortiz-Conde et al., "A review
 * of recent MOSFET threshold voltage extraction methods", Microelectronics Reliability 42, 583–596, 2002;
 * D. K. Schroder, Semiconductor Material and Device Characterization, 3rd ed., Wiley, 2006, ch. 4).
 */
export interface CurveEstimates {
  /**
   * Threshold: at VDS ≤ 0.15 V the maximum-gm linear extrapolation VT = VGS − ID/gm − VDS/2 at the point of
   * largest gm; above, the extrapolation of √ID to zero at its steepest point (saturation). null when the
   * curve has no strong-inversion points.
   */
  vt: number | null;
  /** The steepest d√ID/dVGS, √A/V (saturation curves), or the largest gm/VDS, A/V² (linear curves). */
  slope: number | null;
  /** Subthreshold swing: the smallest dVGS/dlog10(ID) below the threshold, V/decade; null without such points. */
  swing: number | null;
}

/** Below this VDS a curve is read in the linear region (maximum-gm method). */
export const LINEAR_REGION_VDS = 0.15;

/**
 * Derivatives are least-squares slopes over 2·window + 1 points, at least 7 and a tenth of the curve, so a
 * point's noise does not make the maximum.
 */
const WINDOW = 3;
const windowOf = (count: number) => Math.max(WINDOW, Math.round(count / 20));

/** The least-squares line through points. */
function lineThrough(x: readonly number[], y: readonly number[]): { slope: number; intercept: number } {
  const m = x.length;
  const mx = x.reduce((a, b) => a + b, 0) / m;
  const my = y.reduce((a, b) => a + b, 0) / m;
  let sxy = 0;
  let sxx = 0;
  for (let j = 0; j < m; j++) {
    sxy += (x[j] - mx) * (y[j] - my);
    sxx += (x[j] - mx) ** 2;
  }
  const slope = sxx > 0 ? sxy / sxx : 0;
  return { slope, intercept: my - slope * mx };
}

function windowSlope(x: readonly number[], y: readonly number[], k: number, window: number): number {
  let sx = 0;
  let sy = 0;
  for (let j = k - window; j <= k + window; j++) {
    sx += x[j];
    sy += y[j];
  }
  const m = 2 * window + 1;
  const mx = sx / m;
  const my = sy / m;
  let sxy = 0;
  let sxx = 0;
  for (let j = k - window; j <= k + window; j++) {
    sxy += (x[j] - mx) * (y[j] - my);
    sxx += (x[j] - mx) ** 2;
  }
  return sxx > 0 ? sxy / sxx : 0;
}

export function curveEstimates(points: readonly MeasuredPoint[], curve: MeasuredCurve): CurveEstimates {
  const vgs = curve.indices.map((i) => points[i].vgs);
  const id = curve.indices.map((i) => points[i].id);
  const count = vgs.length;
  if (count < 2 * WINDOW + 3) return { vt: null, slope: null, swing: null };
  const linear = curve.vds <= LINEAR_REGION_VDS;
  const y = linear ? id : id.map((current) => Math.sqrt(Math.max(current, 0)));
  const window = windowOf(count);
  const slopes = vgs.map((_, k) => (k >= window && k < count - window ? windowSlope(vgs, y, k, window) : -Infinity));
  const best = Math.max(...slopes);
  let vt: number | null = null;
  let slope: number | null = null;
  if (best > 0) {
    // The straight part of ID (linear region) or √ID (saturation): every point whose local slope is within
    // 10 % of the steepest; a line through them crosses zero at the extrapolated threshold.
    const straight = slopes.map((value, k) => (value >= 0.9 * best ? k : -1)).filter((k) => k >= 0);
    const line = lineThrough(straight.map((k) => vgs[k]), straight.map((k) => y[k]));
    if (line.slope > 0) {
      vt = -line.intercept / line.slope - (linear ? curve.vds / 2 : 0);
      slope = linear ? line.slope / curve.vds : line.slope;
    }
  }
  // Swing: the steepest decade below the threshold (where log ID still rises fastest).
  const decades = id.map((current) => (current > 0 ? Math.log10(current) : Number.NaN));
  let swing: number | null = null;
  for (let k = WINDOW; k < count - WINDOW; k++) {
    if (vt !== null && vgs[k] > vt - 0.05) break;
    const perVolt = windowSlope(vgs, decades, k, WINDOW);
    if (!(perVolt > 0)) continue;
    if (swing === null || 1 / perVolt < swing) swing = 1 / perVolt;
  }
  return { vt, slope, swing };
}
