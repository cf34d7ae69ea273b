/**
 * Monotone piecewise-cubic Hermite interpolation: Fritsch & Carlson, SIAM J. Numer. Anal. 17(2), 238–246 (1980),
 * with the weighted harmonic-mean slopes of Fritsch & Butland, SIAM J. Sci. Stat. Comput. 5(2), 300–304 (1984)
 * and the shape-preserving three-point end slopes, as in Moler, Numerical Computing with MATLAB, SIAM (2004), "pchip".
 * Monotone data give a monotone interpolant; at a local extremum of the data the slope is 0.
 */

/** Slope at an interior node from the secants on its left (width h0, slope d0) and right (h1, d1). */
export function interiorSlope(h0: number, d0: number, h1: number, d1: number): number {
  if (d0 === 0 || d1 === 0 || d0 > 0 !== d1 > 0) return 0;
  const w0 = 2 * h1 + h0;
  const w1 = h1 + 2 * h0;
  return (w0 + w1) / (w0 / d0 + w1 / d1);
}

/** Slope at an end node: the secant next to it (h0, d0), the one after (h1, d1). */
export function endSlope(h0: number, d0: number, h1: number, d1: number): number {
  const slope = ((2 * h0 + h1) * d0 - h0 * d1) / (h0 + h1);
  if (slope === 0 || slope > 0 !== d0 > 0) return 0;
  if (d0 > 0 !== d1 > 0 && Math.abs(slope) > Math.abs(3 * d0)) return 3 * d0;
  return slope;
}

/** The cubic Hermite between (x0, y0) slope s0 and (x0 + h, y1) slope s1, at x0 + t·h (0 ≤ t ≤ 1). */
export function hermite(y0: number, y1: number, s0: number, s1: number, h: number, t: number): number {
  const t2 = t * t;
  const t3 = t2 * t;
  return (2 * t3 - 3 * t2 + 1) * y0 + (t3 - 2 * t2 + t) * h * s0 + (-2 * t3 + 3 * t2) * y1 + (t3 - t2) * h * s1;
}

/**
 * The interpolant through points x[0..n−1] (ascending, n ≥ 1), y[0..n−1] at x[i] + t·(x[i+1] − x[i]), using
 * only the nodes i−1 … i+2 (the slopes at i and i+1 need no more). n = 1 gives y[0]; n = 2 a straight line.
 */
export function monotoneCubicAt(x: ArrayLike<number>, y: ArrayLike<number>, n: number, i: number, t: number): number {
  if (n === 1) return y[0];
  const h = x[i + 1] - x[i];
  const d = (y[i + 1] - y[i]) / h;
  if (n === 2) return y[i] + t * (y[i + 1] - y[i]);
  const s0 = slopeAt(x, y, n, i, h, d);
  const s1 = slopeAt(x, y, n, i + 1, h, d);
  return hermite(y[i], y[i + 1], s0, s1, h, t);
}

/** The slope at node k, given the secant (h, d) of the interval [i, i+1] that k is an end of. */
function slopeAt(x: ArrayLike<number>, y: ArrayLike<number>, n: number, k: number, h: number, d: number): number {
  if (k === 0) {
    const h1 = x[2] - x[1];
    return endSlope(h, d, h1, (y[2] - y[1]) / h1);
  }
  if (k === n - 1) {
    const h1 = x[n - 2] - x[n - 3];
    return endSlope(h, d, h1, (y[n - 2] - y[n - 3]) / h1);
  }
  const hl = x[k] - x[k - 1];
  const hr = x[k + 1] - x[k];
  return interiorSlope(hl, (y[k] - y[k - 1]) / hl, hr, (y[k + 1] - y[k]) / hr);
}

/**
 * The same interpolant with everything that depends only on x and t worked out once: for a stencil of up to
 * four grid values that many lines share (the lengths and VSB values around a query), so that each line costs
 * only its secants and slopes.
 */
export class MonotoneCubic {
  private readonly n: number;
  private readonly i: number;
  private readonly t: number;
  private readonly widths: Float64Array;
  private readonly inverseWidths: Float64Array;
  private readonly basis: Float64Array;

  /** x[0..n−1] ascending (n ≤ 4), evaluation in the interval [x[i], x[i+1]] at fraction t. */
  constructor(x: ArrayLike<number>, n: number, i: number, t: number) {
    this.n = n;
    this.i = i;
    this.t = t;
    this.widths = new Float64Array(Math.max(0, n - 1));
    for (let k = 0; k < n - 1; k++) this.widths[k] = x[k + 1] - x[k];
    this.inverseWidths = this.widths.map((w) => 1 / w);
    const h = n > 1 ? this.widths[i] : 0;
    const t2 = t * t;
    const t3 = t2 * t;
    this.basis = Float64Array.of(2 * t3 - 3 * t2 + 1, -2 * t3 + 3 * t2, (t3 - 2 * t2 + t) * h, (t3 - t2) * h);
  }

  /** The interpolant through y[0..n−1] at the stencil's point. */
  at(y: ArrayLike<number>): number {
    const { n, i, widths: w, inverseWidths: inverse, basis: b } = this;
    if (n === 1) return y[0];
    if (n === 2) return y[0] + this.t * (y[1] - y[0]);
    const d = (y[i + 1] - y[i]) * inverse[i];
    let s0: number;
    let s1: number;
    if (i === 0) {
      const d1 = (y[2] - y[1]) * inverse[1];
      s0 = endSlope(w[0], d, w[1], d1);
      s1 = interiorSlope(w[0], d, w[1], d1);
    } else {
      const dl = (y[i] - y[i - 1]) * inverse[i - 1];
      s0 = interiorSlope(w[i - 1], dl, w[i], d);
      s1 = i + 1 === n - 1 ? endSlope(w[i], d, w[i - 1], dl) : interiorSlope(w[i], d, w[i + 1], (y[i + 2] - y[i + 1]) * inverse[i + 1]);
    }
    return b[0] * y[i] + b[1] * y[i + 1] + b[2] * s0 + b[3] * s1;
  }
}
