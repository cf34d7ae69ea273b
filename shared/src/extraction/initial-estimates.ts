import type { FitParameter } from './fit-parameters.js';
import type { ExtractionInput } from './extract-parameters.js';
import type { MeasuredCurve, MeasuredPoint } from './measured-curves.js';
import { celsiusToKelvin } from '../units/temperature.js';
import { thermalVoltage } from '../device/thermal-voltage.js';
import { type CurveEstimates, LINEAR_REGION_VDS, curveEstimates } from './threshold-estimates.js';

export interface InitialEstimates {
  readonly initial: Partial<Record<FitParameter, number>>;
  /** A threshold estimate at a point's VSB and temperature (no DIBL), or null before any is known. */
  vtAt(point: MeasuredPoint): number | null;
}

interface Read {
  readonly curve: MeasuredCurve;
  readonly estimate: CurveEstimates;
}

function closest<T>(items: readonly T[], key: (item: T) => number, target: number): T[] {
  if (items.length === 0) return [];
  const best = Math.min(...items.map((item) => Math.abs(key(item) - target)));
  return items.filter((item) => Math.abs(key(item) - target) <= best + 1e-9);
}

/** Least-squares slope of y against x. */
function slope(xs: readonly number[], ys: readonly number[]): number {
  const n = xs.length;
  const mx = xs.reduce((a, b) => a + b, 0) / n;
  const my = ys.reduce((a, b) => a + b, 0) / n;
  let sxy = 0;
  let sxx = 0;
  for (let k = 0; k < n; k++) {
    sxy += (xs[k] - mx) * (ys[k] - my);
    sxx += (xs[k] - mx) ** 2;
  }
  return sxx > 0 ? sxy / sxx : 0;
}

/** γ and 2φF from VT against VSB: for each 2φF on a grid, γ by least squares; the pair with the least residual. */
export function bodyEffectFit(vsb: readonly number[], vt: readonly number[], vt0: number): { gamma: number; twoPhiF: number } {
  let best = { gamma: 0, twoPhiF: 0.8, residual: Infinity };
  for (let twoPhiF = 0.4; twoPhiF <= 1.3 + 1e-9; twoPhiF += 0.005) {
    const x = vsb.map((v) => Math.sqrt(twoPhiF + v) - Math.sqrt(twoPhiF));
    const sxx = x.reduce((a, b) => a + b * b, 0);
    if (sxx === 0) continue;
    const gamma = Math.max(0, x.reduce((a, b, k) => a + b * (vt[k] - vt0), 0) / sxx);
    const residual = x.reduce((a, b, k) => a + (vt[k] - vt0 - gamma * b) ** 2, 0);
    if (residual < best.residual) best = { gamma, twoPhiF, residual };
  }
  return { gamma: best.gamma, twoPhiF: best.twoPhiF };
}

/**
 * Starting values for the joint fit from the classical per-curve estimates (threshold-estimates.ts), read at
 * the reference conditions: the temperature nearest tnom, the VSB nearest 0, the longest length. What the
 * data cannot tell starts at the base profile's value.
 */
export function initialEstimates(input: ExtractionInput, curves: readonly MeasuredCurve[]): InitialEstimates {
  const { base, model, points } = input;
  const params = base.params;
  const reads: Read[] = curves.map((curve) => ({ curve, estimate: curveEstimates(points, curve) })).filter((r) => r.estimate.vt !== null);
  const atTnom = closest(reads, (r) => r.curve.temperature, base.tnom);
  const atZeroBody = closest(atTnom, (r) => Math.abs(r.curve.vsb), 0);
  const longest = closest(atZeroBody, (r) => -r.curve.l, -Infinity);
  const byDrain = [...longest].sort((a, b) => a.curve.vds - b.curve.vds);
  const reference = byDrain[0];
  const saturated = byDrain[byDrain.length - 1];

  const initial: Partial<Record<FitParameter, number>> = {
    vt0: reference?.estimate.vt ?? params.vt0,
    gamma: params.gamma,
    twoPhiF: params.twoPhiF,
    lambda: model === 'square-law' ? params.lambda : 0,
    dl: params.dl ?? 0,
    theta0: params.theta0 ?? 0.05,
    theta1: params.theta1 ?? 0,
    theta2: params.theta2 ?? 0,
    dibl: params.dibl ?? 0.01,
    diblExp: params.diblExp ?? 2,
    vtl: params.vtl ?? 0,
    vtlExp: params.vtlExp ?? 2,
    nl: params.nl ?? 0,
    pclm: params.pclm ?? 1e-8,
    vtTc: params.vtTc,
    muExp: params.muExp,
    muExpL: params.muExpL ?? 0,
  };
  const vt0 = initial.vt0 as number;

  // n from the swing of the most saturated curve at the longest length, and its rise at the shortest (nl).
  const nOfSwing = (read: Read | undefined) => {
    const swing = read?.estimate.swing;
    const found = swing ? swing / (Math.LN10 * thermalVoltage(celsiusToKelvin(read.curve.temperature))) : undefined;
    return found !== undefined && found >= 1 && found <= 3 ? found : undefined;
  };
  const n = nOfSwing(saturated) ?? params.n ?? 1 + params.gamma / (2 * Math.sqrt(params.twoPhiF));
  initial.n = n;
  const shortSaturated = [...closest(atZeroBody, (r) => r.curve.l, 0)].sort((a, b) => b.curve.vds - a.curve.vds)[0];
  const nShort = nOfSwing(shortSaturated);
  if (nShort !== undefined && shortSaturated && saturated && shortSaturated.curve.l < saturated.curve.l) {
    // Δn(L) = nl·(lmin/L)² (the exponent's starting value): solve nl from the two lengths.
    const reach = (l: number) => (params.lmin / l) ** 2;
    initial.nl = (nShort - n) / (reach(shortSaturated.curve.l) - reach(saturated.curve.l));
    initial.n = n - initial.nl * reach(saturated.curve.l);
  }

  // γ and 2φF from the threshold against VSB at the reference length, drain voltage and temperature.
  if (reference) {
    const sameBias = closest(closest(atTnom, (r) => -r.curve.l, -Infinity), (r) => r.curve.vds, reference.curve.vds);
    const vsb = sameBias.map((r) => r.curve.vsb);
    if (new Set(vsb).size >= 2) {
      const fitted = bodyEffectFit(vsb, sameBias.map((r) => r.estimate.vt as number), vt0);
      initial.gamma = fitted.gamma;
      if (new Set(vsb).size >= 3) initial.twoPhiF = fitted.twoPhiF;
    }
  }

  // kp from the steepest √ID (saturation) or gm/VDS (linear region) of the reference length.
  const kpOf = (read: Read | undefined): number | undefined => {
    if (!read || read.estimate.slope === null) return undefined;
    const { w, l, vds } = read.curve;
    const bulk = model === 'square-law' ? 1 : n;
    return vds <= LINEAR_REGION_VDS ? (bulk * read.estimate.slope * l) / w : (2 * bulk * read.estimate.slope ** 2 * l) / w;
  };
  initial.kp = kpOf(saturated) ?? kpOf(reference) ?? params.kp;

  // DIBL from the threshold shift between drain voltages at the shortest length.
  const shortest = closest(atZeroBody, (r) => r.curve.l, 0).sort((a, b) => a.curve.vds - b.curve.vds);
  if (shortest.length >= 2) {
    const [low, high] = [shortest[0], shortest[shortest.length - 1]];
    const eta = -((high.estimate.vt as number) - (low.estimate.vt as number)) / (high.curve.vds - low.curve.vds);
    if (eta > 0 && eta < 0.5) initial.dibl = eta;
  }

  // vtTc and muExp from the threshold and kp against temperature at the reference geometry and bias.
  if (reference) {
    const overTemperature = reads.filter((r) => Math.abs(r.curve.vsb - reference.curve.vsb) < 1e-9 && Math.abs(r.curve.l - reference.curve.l) < 1e-12 && Math.abs(r.curve.vds - reference.curve.vds) < 1e-9);
    if (new Set(overTemperature.map((r) => r.curve.temperature)).size >= 2) {
      initial.vtTc = slope(overTemperature.map((r) => r.curve.temperature), overTemperature.map((r) => r.estimate.vt as number));
      const kps = overTemperature.map((r) => kpOf(r));
      if (kps.every((k) => k !== undefined && k > 0)) {
        const tnomK = celsiusToKelvin(base.tnom);
        initial.muExp = slope(overTemperature.map((r) => Math.log(celsiusToKelvin(r.curve.temperature) / tnomK)), kps.map((k) => Math.log(k as number)));
      }
    }
  }

  const gamma = initial.gamma as number;
  const twoPhiF = initial.twoPhiF as number;
  const vtTc = initial.vtTc as number;
  return {
    initial,
    vtAt: (point) => (twoPhiF + point.vsb > 0 ? vt0 + gamma * (Math.sqrt(twoPhiF + point.vsb) - Math.sqrt(twoPhiF)) + vtTc * (point.temperature - base.tnom) : null),
  };
}
