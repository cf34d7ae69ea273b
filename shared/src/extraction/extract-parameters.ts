import type { DeviceParams, Polarity } from '../schemas/process.js';
import { celsiusToKelvin } from '../units/temperature.js';
import type { CurrentModel } from '../device/drain-current.js';
import { EngineError } from '../device/errors.js';
import { operatingPoint } from '../device/operating-point.js';
import { regionOf, type Region } from '../device/small-signal.js';
import { thermalVoltage } from '../device/thermal-voltage.js';
import { FIT_PARAMETER_INFO, type FitParameter, fitBounds, withFitted } from './fit-parameters.js';
import { type LeastSquares, fitInRounds, standardErrors } from './fit-rounds.js';
import { initialEstimates } from './initial-estimates.js';
import { type MeasuredCurve, type MeasuredPoint, curvesOf } from './measured-curves.js';
import { ModelAtPoints } from './model-at-points.js';

export interface ExtractionInput {
  readonly polarity: Polarity;
  readonly points: readonly MeasuredPoint[];
  /** The profile the fitted parameters go into: every field not fitted (tox, lmin, capacitances …) comes from it. */
  readonly base: { readonly tnom: number; readonly vdd: number; readonly params: DeviceParams };
  /** Which model to fit: the square law (SPICE level 1's parameters) or the all-region model with its short-channel terms. */
  readonly model: CurrentModel;
  /** Parameters to keep at the base profile's value even where the data could tell them. */
  readonly fixed?: readonly FitParameter[];
  /** Currents below this are read as noise and left out, A; 1 pA when absent. */
  readonly noiseFloor?: number;
  /** Most Levenberg–Marquardt iterations; 300 when absent. */
  readonly maxIterations?: number;
  /**
   * Points whose measured gm/ID is below this are left out of an all-region fit: far above threshold, beyond the
   * range a designer biases in, where mobility degradation would otherwise bend the fit of what sizing needs;
   * 3 S/A when absent (0 keeps every point).
   */
  readonly minGmId?: number;
}

export interface FittedParameter {
  readonly name: FitParameter;
  readonly value: number;
  readonly unit: string;
  /** The estimate before the joint fit (classical method or the base profile). */
  readonly initial: number;
  /** One standard error of the value from the fit's covariance, in the unit; null when the data cannot tell it. */
  readonly standardError: number | null;
}

export interface ExcludedPoint {
  readonly index: number;
  readonly reason: string;
}

export interface RegionError {
  readonly region: Region | 'all';
  readonly points: number;
  /** Root-mean-square of ID_model/ID_measured − 1 over the points of the region. */
  readonly rms: number;
}

export interface ExtractionResult {
  readonly model: CurrentModel;
  readonly parameters: FittedParameter[];
  /** Parameters the data cannot tell, kept at the base profile's value, with the reason. */
  readonly held: { readonly name: FitParameter; readonly value: number | undefined; readonly reason: string }[];
  readonly fitted: DeviceParams;
  readonly rms: RegionError[];
  /**
   * All-region fits: RMS of ln(current density of the model / measured) at the measured gm/ID, over the points of
   * the sizing range the density was fitted on: how far a W sized by gm/ID is off, free of the threshold's error.
   */
  readonly densityRms: number | null;
  readonly excluded: ExcludedPoint[];
  readonly iterations: number;
  readonly converged: boolean;
  /** Per point ID_model/ID_measured − 1 (NaN for an excluded point), for the charts of data against fit. */
  readonly residuals: number[];
  /** Per point the model's current (NaN for an excluded point), A. */
  readonly modelled: number[];
}

export interface ExtractionProgress {
  /** Iterations done so far, all stages together. */
  readonly iterations: number;
  /** The most iterations the whole fit may take (maxIterations per stage, times the stages of the model). */
  readonly maxIterations: number;
  /** Sum of squared ln(ID_model/ID_measured) so far. */
  readonly error: number;
}

const DEFAULT_NOISE_FLOOR = 1e-12;
const DEFAULT_MAX_ITERATIONS = 300;
const DEFAULT_MIN_GM_ID = 3;
/**
 * The density fit reads points up to this fraction of a curve's highest gm/ID: 21.6 S/A of 31 on a 180 nm-class
 * device, so that the top of the sizing range (20 S/A) is fitted, not extrapolated.
 */
const DENSITY_CEILING_FRACTION = 0.7;
/**
 * The all-region fit runs its two stages twice: the density stage reads n at each VSB through γ and 2φF, which the
 * threshold stage fits, so the second pass fits the density with the body law the threshold stage found.
 */
const ALL_REGION_PASSES = 2;
/** Least-squares stages of a fit by model, each of up to maxIterations: the budget its progress counts against. */
export const FIT_STAGES: Record<CurrentModel, number> = { 'square-law': 1, 'all-region': 2 * ALL_REGION_PASSES };

/** Parameters of the current's shape: what the current does at a given VGS − VT (fitted with a threshold per curve). */
const SHAPE: ReadonlySet<FitParameter> = new Set(['kp', 'dl', 'dw', 'theta0', 'theta1', 'theta2', 'thetaB', 'nl', 'pclm', 'lambda', 'muExp', 'muExpL']);
/** Read off the subthreshold swing of the longest device (the physical n of weak inversion), not fitted. */
const FROM_SWING: ReadonlySet<FitParameter> = new Set(['n']);

/** gm/ID of each point from its curve, by central differences of ln ID (NaN at a curve's ends or where ID ≤ 0). */
function measuredGmId(points: readonly MeasuredPoint[]): number[] {
  const gmId = points.map(() => Number.NaN);
  for (const curve of curvesOf(points)) {
    const { indices } = curve;
    for (let k = 1; k < indices.length - 1; k++) {
      const [a, b] = [points[indices[k - 1]], points[indices[k + 1]]];
      if (a.id > 0 && b.id > 0 && b.vgs > a.vgs) gmId[indices[k]] = (Math.log(b.id) - Math.log(a.id)) / (b.vgs - a.vgs);
    }
  }
  return gmId;
}

/** Points a fit can read, and the reasons for the others. */
function screen(input: ExtractionInput, vtEstimate: (point: MeasuredPoint) => number | null): { usable: boolean[]; excluded: ExcludedPoint[] } {
  const floor = input.noiseFloor ?? DEFAULT_NOISE_FLOOR;
  const minGmId = input.model === 'all-region' ? (input.minGmId ?? DEFAULT_MIN_GM_ID) : 0;
  const gmId = minGmId > 0 ? measuredGmId(input.points) : [];
  const usable: boolean[] = [];
  const excluded: ExcludedPoint[] = [];
  input.points.forEach((point, index) => {
    let reason: string | null = null;
    const values = [point.vgs, point.vds, point.vsb, point.temperature, point.id, point.w, point.l];
    if (!values.every(Number.isFinite)) reason = 'a value is not a number';
    else if (point.id <= 0) reason = 'ID is zero or negative';
    else if (point.vds <= 0) reason = 'VDS is zero or negative';
    else if (point.w <= 0 || point.l <= 0) reason = 'W or L is zero or negative';
    else if (point.l < input.base.params.lmin * 0.999) reason = 'L is below the profile\'s lmin';
    else if (point.id < floor) reason = `ID is below the noise floor (${floor} A)`;
    else if (gmId[index] < minGmId) reason = `gm/ID is below ${minGmId} S/A: far above threshold, beyond the sizing range`;
    else if (input.model === 'square-law') {
      const vt = vtEstimate(point);
      if (vt !== null && point.vgs < vt + 0.15) reason = 'below threshold, where the square law does not hold';
    }
    usable.push(reason === null);
    if (reason !== null) excluded.push({ index, reason });
  });
  return { usable, excluded };
}

/** Which parameters the data can tell, given the spread of lengths, drain voltages, body voltages and temperatures. */
function identifiable(input: ExtractionInput, curves: readonly MeasuredCurve[]): { fit: FitParameter[]; held: { name: FitParameter; reason: string }[] } {
  const distinct = (values: number[]) => new Set(values.map((v) => v.toPrecision(6))).size;
  const lengths = distinct(curves.map((c) => c.l));
  const widths = distinct(curves.map((c) => c.w / c.fingers));
  const drains = distinct(curves.map((c) => c.vds));
  const bodies = distinct(curves.map((c) => c.vsb));
  const temperatures = distinct(curves.map((c) => c.temperature));
  const allRegion = input.model === 'all-region';
  const wanted: [FitParameter, boolean, string][] = [
    ['vt0', true, ''],
    ['kp', true, ''],
    ['n', allRegion, 'the square law has no slope factor in its current'],
    ['gamma', bodies >= 2, 'all curves share one VSB'],
    ['twoPhiF', bodies >= 3, 'fewer than three VSB values'],
    ['lambda', !allRegion && drains >= 2, allRegion ? 'the all-region fit uses Pclm instead' : 'all curves share one VDS'],
    ['dl', allRegion && lengths >= 2, 'all curves share one length'],
    ['theta0', allRegion, ''],
    ['theta1', allRegion && lengths >= 2, 'all curves share one length'],
    ['theta2', allRegion, ''],
    ['dw', allRegion && widths >= 2, 'all curves share one width per finger'],
    ['thetaB', allRegion && bodies >= 2, 'all curves share one VSB'],
    ['dibl', allRegion && drains >= 2, 'all curves share one VDS'],
    ['diblExp', allRegion && drains >= 2 && lengths >= 3, 'DIBL needs several VDS at three or more lengths'],
    ['vtl', allRegion && lengths >= 2, 'all curves share one length'],
    ['vtlExp', allRegion && lengths >= 3, 'fewer than three lengths'],
    ['nl', allRegion && lengths >= 2, 'all curves share one length'],
    ['pclm', allRegion && drains >= 2, 'all curves share one VDS'],
    ['vtTc', temperatures >= 2, 'all curves share one temperature'],
    ['muExp', temperatures >= 2, 'all curves share one temperature'],
    ['muExpL', allRegion && temperatures >= 2 && lengths >= 2, 'needs several temperatures at several lengths'],
  ];
  const fixed = new Set(input.fixed ?? []);
  const fit: FitParameter[] = [];
  const held: { name: FitParameter; reason: string }[] = [];
  for (const [name, possible, reason] of wanted) {
    if (fixed.has(name)) held.push({ name, reason: 'held at the base profile\'s value on request' });
    else if (possible) fit.push(name);
    else if (reason) held.push({ name, reason });
  }
  return { fit, held };
}

/**
 * Fits the parameters of a profile to measured ID points (docs/extraction.md): classical estimates per curve
 * first (maximum-gm and √ID extrapolation for VT, the swing for n, VT against VSB for γ and 2φF), then one
 * joint Levenberg–Marquardt least-squares fit of ln ID over every usable point, within bounds, so that
 * subthreshold points weigh as much as strong-inversion ones. A fit that has not converged after
 * maxIterations says so and keeps its last estimate. Pure: progress is reported through the callback.
 */
export function extractParameters(input: ExtractionInput, onProgress?: (progress: ExtractionProgress) => void): ExtractionResult {
  const { points } = input;
  if (points.length < 5) throw new EngineError('VALIDATION_FAILED', `An extraction needs at least 5 points; got ${points.length}`, 'points');
  const estimates = initialEstimates(input, curvesOf(points));
  const { usable, excluded } = screen(input, (point) => estimates.vtAt(point));
  const used = usable.map((ok, index) => (ok ? index : -1)).filter((index) => index >= 0);
  const curves = curvesOf(points, (index) => usable[index]);
  const { fit, held } = identifiable(input, curves);
  if (used.length < fit.length + 3) {
    throw new EngineError('VALIDATION_FAILED', `Only ${used.length} usable points for ${fit.length} parameters; measure more points (see the excluded list)`, 'points');
  }
  const lmin = input.base.params.lmin;
  const maxIterations = input.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  const startOf = (name: FitParameter) => {
    const { min, max } = fitBounds(name, lmin);
    return Math.min(Math.max(estimates.initial[name] ?? 0, min), max);
  };
  const model = new ModelAtPoints(input.polarity, input.model, input.base, points);
  let done = 0;
  // The all-region fit runs its stages (FIT_STAGES) of up to maxIterations each: progress counts against all together.
  const budget = maxIterations * FIT_STAGES[input.model];
  const report = (iterations: number, error: number) => onProgress?.({ iterations: done + iterations, maxIterations: budget, error });
  const boundsOf = (name: FitParameter) => fitBounds(name, lmin);
  const stage = (names: readonly FitParameter[], residualsOf: (params: DeviceParams) => Float64Array) => {
    const problem = fitProblem(input.base.params, names, values, boundsOf, residualsOf);
    const result = fitInRounds(problem, problem.start, maxIterations, report);
    done += result.iterations;
    values = problem.valuesOf(result.values);
    standardErrors(problem, result.values, result.error).forEach((e, k) => errors.set(names[k], e === null ? null : e * FIT_PARAMETER_INFO[names[k]].scale));
    return result.converged;
  };

  let values = new Map<FitParameter, number>(fit.map((name) => [name, startOf(name)]));
  const errors = new Map<FitParameter, number | null>();
  let converged: boolean;
  let densityRms: number | null = null;
  if (input.model === 'square-law') {
    // SPICE level 1's own parameters: one joint fit of ln ID over every usable point.
    converged = stage(fit, (params) => model.logResiduals(params, used));
  } else {
    // 1. The current density against gm/ID, point by point at the gm/ID each point shows: what sets W at a gm/ID,
    //    fitted free of the threshold (which only a first-order law describes), with n from the swing. Only where
    //    designers size, up to DENSITY_CEILING_FRACTION of the curve's highest gm/ID: nearer the weak-inversion
    //    ceiling the density is ill-conditioned and a first-order law cannot follow every compact model there.
    const gmId = measuredGmId(points);
    const ceiling = new Map<MeasuredCurve, number>(curves.map((curve) => [curve, Math.max(...curve.indices.map((i) => (Number.isFinite(gmId[i]) ? gmId[i] : 0)))]));
    const dense = curves.flatMap((curve) => curve.indices.filter((i) => Number.isFinite(gmId[i]) && gmId[i] <= DENSITY_CEILING_FRACTION * (ceiling.get(curve) as number)));
    const offsets = new Map<MeasuredCurve, number>();
    converged = true;
    for (let pass = 0; pass < ALL_REGION_PASSES; pass++) {
      const shaped = stage(fit.filter((name) => SHAPE.has(name)), (params) => model.densityResiduals(params, dense, gmId));
      // 2. The threshold law (VT0, body effect, DIBL, length, temperature) through the threshold each curve showed.
      const atShape = withFitted(input.base.params, [...values.keys()], [...values.values()]);
      model.shapeResiduals(atShape, curves, offsets);
      const thresholds = curves.map((curve) => model.thresholdOf(atShape, curve) + (offsets.get(curve) ?? 0));
      const lawed = stage(fit.filter((name) => !SHAPE.has(name) && !FROM_SWING.has(name)), (params) => Float64Array.from(curves, (curve, k) => model.thresholdOf(params, curve) - thresholds[k]));
      // The last pass decides: an earlier one only has to bring the body law near.
      converged = shaped && lawed;
    }
    const densityResiduals = model.densityResiduals(withFitted(input.base.params, [...values.keys()], [...values.values()]), dense, gmId);
    densityRms = Math.sqrt(densityResiduals.reduce((sum, r) => sum + r * r, 0) / Math.max(densityResiduals.length, 1));
  }

  const names = [...values.keys()];
  const fitted = withFitted(input.base.params, names, names.map((name) => values.get(name) as number));
  const modelled = points.map((_, index) => (usable[index] ? model.currentOf(fitted, index) : Number.NaN));
  const residuals = points.map((p, index) => (usable[index] ? modelled[index] / p.id - 1 : Number.NaN));
  return {
    model: input.model,
    parameters: fit.map((name) => ({ name, value: values.get(name) as number, unit: FIT_PARAMETER_INFO[name].unit, initial: startOf(name), standardError: errors.get(name) ?? null })),
    held: held.map(({ name, reason }) => ({ name, value: input.base.params[name], reason })),
    fitted,
    rms: regionErrors(input, fitted, residuals, usable),
    densityRms,
    excluded,
    iterations: done,
    converged,
    residuals,
    modelled,
  };
}

/** A least-squares problem over some parameters, the others held at their current values, in units of each one's scale. */
function fitProblem(
  base: DeviceParams,
  names: readonly FitParameter[],
  values: ReadonlyMap<FitParameter, number>,
  boundsOf: (name: FitParameter) => { min: number; max: number },
  residualsOf: (params: DeviceParams) => Float64Array,
) {
  const scale = names.map((name) => FIT_PARAMETER_INFO[name].scale);
  const bounds = names.map(boundsOf);
  const heldNames = [...values.keys()].filter((name) => !names.includes(name));
  const paramsOf = (normalised: readonly number[]) =>
    withFitted(base, [...heldNames, ...names], [...heldNames.map((name) => values.get(name) as number), ...names.map((_, k) => normalised[k] * scale[k])]);
  const start = names.map((name, k) => (values.get(name) as number) / scale[k]);
  const problem: LeastSquares & { start: number[]; valuesOf(normalised: readonly number[]): Map<FitParameter, number> } = {
    count: residualsOf(paramsOf(start)).length,
    residuals: (normalised) => residualsOf(paramsOf(normalised)),
    minValues: bounds.map((b, k) => b.min / scale[k]),
    maxValues: bounds.map((b, k) => b.max / scale[k]),
    start,
    valuesOf: (normalised) => new Map<FitParameter, number>([...values, ...names.map((name, k) => [name, normalised[k] * scale[k]] as const)]),
  };
  return problem;
}

/** RMS of the relative current error per region of the fitted model (by its inversion coefficient) and overall. */
function regionErrors(input: ExtractionInput, fitted: DeviceParams, residuals: readonly number[], usable: readonly boolean[]): RegionError[] {
  const deviceAt = new ModelAtPoints(input.polarity, input.model, input.base, input.points).devicesFor(fitted);
  const sums: Record<Region | 'all', { sum: number; points: number }> = { weak: { sum: 0, points: 0 }, moderate: { sum: 0, points: 0 }, strong: { sum: 0, points: 0 }, all: { sum: 0, points: 0 } };
  input.points.forEach((p, index) => {
    if (!usable[index] || !Number.isFinite(residuals[index])) return;
    let region: Region;
    try {
      region = regionOf(operatingPoint(deviceAt(p.temperature), input.model, p.w, p.l, { vgs: p.vgs, vds: p.vds, vsb: p.vsb }, p.fingers ?? 1).ic);
    } catch {
      return;
    }
    const r2 = residuals[index] ** 2;
    sums[region].sum += r2;
    sums[region].points += 1;
    sums.all.sum += r2;
    sums.all.points += 1;
  });
  return (['weak', 'moderate', 'strong', 'all'] as const)
    .filter((region) => sums[region].points > 0)
    .map((region) => ({ region, points: sums[region].points, rms: Math.sqrt(sums[region].sum / sums[region].points) }));
}

/** The subthreshold slope factor a swing stands for at a temperature: n = S/(ln 10·UT). */
export function slopeFactorOfSwing(swing: number, temperature: number): number {
  return swing / (Math.LN10 * thermalVoltage(celsiusToKelvin(temperature)));
}
