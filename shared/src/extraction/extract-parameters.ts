import { levenbergMarquardt } from 'ml-levenberg-marquardt';
import { Matrix, pseudoInverse } from 'ml-matrix';
import type { DeviceParams, Polarity, Process } from '../schemas/process.js';
import { celsiusToKelvin } from '../units/temperature.js';
import { channelCurrentAt } from '../device/channel-current.js';
import type { CurrentModel } from '../device/drain-current.js';
import { EngineError } from '../device/errors.js';
import { operatingPoint } from '../device/operating-point.js';
import { type PreparedDevice, prepareDevice } from '../device/resolve-device.js';
import { regionOf, type Region } from '../device/small-signal.js';
import { thermalVoltage } from '../device/thermal-voltage.js';
import { FIT_PARAMETER_INFO, type FitParameter, fitBounds, withFitted } from './fit-parameters.js';
import { type MeasuredCurve, type MeasuredPoint, curvesOf } from './measured-curves.js';
import { initialEstimates } from './initial-estimates.js';

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
  readonly excluded: ExcludedPoint[];
  readonly iterations: number;
  readonly converged: boolean;
  /** Per point ID_model/ID_measured − 1 (NaN for an excluded point), for the charts of data against fit. */
  readonly residuals: number[];
  /** Per point the model's current (NaN for an excluded point), A. */
  readonly modelled: number[];
}

export interface ExtractionProgress {
  readonly iterations: number;
  readonly maxIterations: number;
  /** Sum of squared ln(ID_model/ID_measured) so far. */
  readonly error: number;
}

const DEFAULT_NOISE_FLOOR = 1e-12;
const DEFAULT_MAX_ITERATIONS = 300;
const ITERATIONS_PER_ROUND = 10;
/** A round that improves the error by less than this fraction ends the fit. */
const CONVERGED_IMPROVEMENT = 1e-7;
/** A model that refuses a point (EngineError) costs this much in ln ID, so the search turns away from it. */
const REFUSAL_PENALTY = 10;

function processFor(input: ExtractionInput, params: DeviceParams): Process {
  return { name: 'extraction', tnom: input.base.tnom, vdd: input.base.vdd, corners: [], nmos: params, pmos: params };
}

/** Points a fit can read, and the reasons for the others. */
function screen(input: ExtractionInput, vtEstimate: (point: MeasuredPoint) => number | null): { usable: boolean[]; excluded: ExcludedPoint[] } {
  const floor = input.noiseFloor ?? DEFAULT_NOISE_FLOOR;
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
    ['dibl', allRegion && drains >= 2, 'all curves share one VDS'],
    ['diblExp', allRegion && drains >= 2 && lengths >= 3, 'DIBL needs several VDS at three or more lengths'],
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
  const allCurves = curvesOf(points);
  const estimates = initialEstimates(input, allCurves);
  const { usable, excluded } = screen(input, (point) => estimates.vtAt(point));
  const usableCount = usable.filter(Boolean).length;
  const curves = curvesOf(points, (index) => usable[index]);
  const { fit, held } = identifiable(input, curves);
  if (usableCount < fit.length + 3) {
    throw new EngineError('VALIDATION_FAILED', `Only ${usableCount} usable points for ${fit.length} parameters; measure more points (see the excluded list)`, 'points');
  }

  const lmin = input.base.params.lmin;
  const scale = fit.map((name) => FIT_PARAMETER_INFO[name].scale);
  const bounds = fit.map((name) => fitBounds(name, lmin));
  const initial = fit.map((name, k) => Math.min(Math.max(estimates.initial[name] ?? 0, bounds[k].min), bounds[k].max));
  const used = points.map((_, index) => index).filter((index) => usable[index]);
  const measuredLog = used.map((index) => Math.log(points[index].id));

  const currentsFor = (values: readonly number[]) => {
    const params = withFitted(input.base.params, fit, values);
    const process = processFor(input, params);
    const devices = new Map<number, PreparedDevice>();
    const deviceAt = (temperature: number) => {
      let device = devices.get(temperature);
      if (!device) {
        device = prepareDevice(process, input.polarity, { temperature });
        devices.set(temperature, device);
      }
      return device;
    };
    return (index: number): number => {
      const p = points[index];
      try {
        return channelCurrentAt(deviceAt(p.temperature), input.model, p.w, p.l, p.vgs, p.vds, p.vsb, p.fingers ?? 1);
      } catch {
        return Number.NaN;
      }
    };
  };
  const logModel = (normalised: number[]) => {
    const current = currentsFor(normalised.map((v, k) => v * scale[k]));
    return (k: number) => {
      const id = current(used[k]);
      return id > 0 && Number.isFinite(id) ? Math.log(id) : measuredLog[k] + REFUSAL_PENALTY;
    };
  };
  const errorOf = (normalised: number[]) => {
    const model = logModel(normalised);
    let sum = 0;
    for (let k = 0; k < used.length; k++) sum += (model(k) - measuredLog[k]) ** 2;
    return sum;
  };

  const data = { x: used.map((_, k) => k), y: measuredLog };
  const minValues = bounds.map((b, k) => b.min / scale[k]);
  const maxValues = bounds.map((b, k) => b.max / scale[k]);
  const maxIterations = input.maxIterations ?? DEFAULT_MAX_ITERATIONS;
  let values = initial.map((v, k) => v / scale[k]);
  let error = errorOf(values);
  let iterations = 0;
  let converged = false;
  let damping = 1e-2;
  onProgress?.({ iterations, maxIterations, error });
  while (iterations < maxIterations && !converged) {
    const round = levenbergMarquardt(data, logModel, {
      initialValues: values,
      minValues,
      maxValues,
      damping,
      gradientDifference: 1e-6,
      centralDifference: true,
      maxIterations: Math.min(ITERATIONS_PER_ROUND, maxIterations - iterations),
      errorTolerance: 1e-14,
    });
    iterations += Math.max(round.iterations, 1);
    const next = errorOf(round.parameterValues);
    if (next < error) {
      converged = (error - next) <= CONVERGED_IMPROVEMENT * error || next < 1e-12;
      values = round.parameterValues;
      error = next;
    } else {
      // No progress at this damping: a few more rounds with a steeper (smaller-step) descent, then stop.
      damping *= 100;
      converged = damping > 1e4;
    }
    onProgress?.({ iterations, maxIterations, error });
  }

  const fittedValues = values.map((v, k) => v * scale[k]);
  const fitted = withFitted(input.base.params, fit, fittedValues);
  const standardErrors = standardErrorsOf(logModel, values, used.length, error, scale);
  const current = currentsFor(fittedValues);
  const modelled = points.map((_, index) => (usable[index] ? current(index) : Number.NaN));
  const residuals = points.map((p, index) => (usable[index] ? modelled[index] / p.id - 1 : Number.NaN));
  return {
    model: input.model,
    parameters: fit.map((name, k) => ({ name, value: fittedValues[k], unit: FIT_PARAMETER_INFO[name].unit, initial: initial[k], standardError: standardErrors[k] })),
    held: held.map(({ name, reason }) => ({ name, value: input.base.params[name], reason })),
    fitted,
    rms: regionErrors(input, fitted, residuals, usable),
    excluded,
    iterations,
    converged,
    residuals,
    modelled,
  };
}

/** One standard error per parameter from the Jacobian at the solution: σ² = s²·diag((JᵀJ)⁻¹), s² = SSR/(N − P). */
function standardErrorsOf(logModel: (v: number[]) => (k: number) => number, values: number[], count: number, error: number, scale: number[]): (number | null)[] {
  const p = values.length;
  if (count <= p) return values.map(() => null);
  const base = logModel(values);
  const jacobian = new Matrix(count, p);
  for (let j = 0; j < p; j++) {
    const h = 1e-6 * Math.max(1, Math.abs(values[j]));
    const up = logModel(values.map((v, k) => (k === j ? v + h : v)));
    const down = logModel(values.map((v, k) => (k === j ? v - h : v)));
    for (let i = 0; i < count; i++) jacobian.set(i, j, (up(i) - down(i)) / (2 * h));
  }
  void base;
  const normal = jacobian.transpose().mmul(jacobian);
  const covariance = pseudoInverse(normal);
  const variance = error / (count - p);
  return values.map((_, k) => {
    const c = covariance.get(k, k) * variance;
    return Number.isFinite(c) && c > 0 ? Math.sqrt(c) * scale[k] : null;
  });
}

/** RMS of the relative current error per region of the fitted model (by its inversion coefficient) and overall. */
function regionErrors(input: ExtractionInput, fitted: DeviceParams, residuals: readonly number[], usable: readonly boolean[]): RegionError[] {
  const process = processFor(input, fitted);
  const sums: Record<Region | 'all', { sum: number; points: number }> = { weak: { sum: 0, points: 0 }, moderate: { sum: 0, points: 0 }, strong: { sum: 0, points: 0 }, all: { sum: 0, points: 0 } };
  const devices = new Map<number, PreparedDevice>();
  input.points.forEach((p, index) => {
    if (!usable[index] || !Number.isFinite(residuals[index])) return;
    let device = devices.get(p.temperature);
    if (!device) {
      device = prepareDevice(process, input.polarity, { temperature: p.temperature });
      devices.set(p.temperature, device);
    }
    let region: Region;
    try {
      region = regionOf(operatingPoint(device, input.model, p.w, p.l, { vgs: p.vgs, vds: p.vds, vsb: p.vsb }, p.fingers ?? 1).ic);
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
