import { type CornersRequestInput, type CornersResponse, cornersRequestSchema } from '../schemas/corners.js';
import { fieldOfIssue } from '../schemas/field-of-issue.js';
import { type SizeRequest, type SizeRequestInput, type SizeResponse, sizeRequestSchema } from '../schemas/size.js';
import { type SweepColumn, type SweepColumnsResponse, type SweepField, type SweepPoint, type SweepRequest, type SweepRequestInput, type SweepResponse, sweepRequestSchema } from '../schemas/sweep.js';
import { type Polarity, type Process, processSchema } from '../schemas/process.js';
import type { Model } from '../schemas/request-fields.js';
import { compareResults } from './compare-results.js';
import { cornersWithTable } from './table-corners.js';
import { sizeWithTable } from './table-size.js';
import { TABLE_ACCURACY, type TableSource, tableOf } from './table-source.js';
import { sweepWithTable } from './table-sweep.js';
import { checkRequestAgainstProcess } from './check-request.js';
import { cornerAnalysis } from './corners.js';
import type { CurrentModel } from './drain-current.js';
import { ENGINE_VERSION } from './engine-version.js';
import { EngineError, isEngineError } from './errors.js';
import { parseOrThrow } from './parse-request.js';
import { modelAccuracyOf } from './model-accuracy.js';
import { deviceParamsOf, prepareDevice } from './resolve-device.js';
import { regionOf } from './small-signal.js';
import { type Sizing, solveSize } from './solve.js';
import { type SweepColumns, sweep } from './sweep.js';
import { zeroTemperatureCoefficientVgs } from './zero-temperature-coefficient.js';

/**
 * The three functions the server's compute controller calls. Each parses the request with its schema
 * (EngineError VALIDATION_FAILED with the field), takes the process given (a stored profile the server
 * resolved from processId) or else the request's inline process, checks the request against it, and
 * answers the response shape of schemas/compute.ts. Errors are EngineErrors with a code and a field.
 * Model "table" interpolates in the tables of the stored process version, which the caller finds (`tables`).
 */

/**
 * Stored processes already checked, by object: the server hands the same (frozen) parsed version on every request, so
 * it is checked once rather than on every call (a memo only: an object not seen before is always checked).
 */
const checkedProcesses = new WeakMap<object, Process>();

function resolveProcess(inline: Process | undefined, given: Process | undefined): Process {
  if (given !== undefined) {
    const known = typeof given === 'object' && given !== null && Object.isFrozen(given) ? checkedProcesses.get(given) : undefined;
    if (known) return known;
    const result = processSchema.safeParse(given);
    if (!result.success) {
      const issue = result.error.issues[0];
      throw new EngineError('PROCESS_INVALID', `The stored process is not valid: ${issue.message}`, `process.${fieldOfIssue(issue) ?? ''}`.replace(/\.$/, ''));
    }
    // Only a frozen object is remembered: one that can still change must be checked again.
    if (Object.isFrozen(given)) checkedProcesses.set(given, result.data);
    return result.data;
  }
  if (inline === undefined) throw new EngineError('PROCESS_REQUIRED', 'No process: give an inline process, or resolve processId before computing', 'processId');
  return inline;
}

function context(process: Process, polarity: Polarity, flavour: string | undefined, model: Model) {
  const accuracy = model === 'table' ? TABLE_ACCURACY : modelAccuracyOf(model, deviceParamsOf(process, polarity, flavour));
  return { engineVersion: ENGINE_VERSION, polarity, ...(flavour === undefined ? {} : { flavour }), model, accuracy };
}

function sizeResponse(process: Process, sizing: Sizing, polarity: Polarity, flavour: string | undefined, model: CurrentModel, corner: string, temperature: number): SizeResponse {
  return { ...sizing, ...context(process, polarity, flavour, model), corner, temperature, ztcVgs: ztcVgsOf(process, sizing, polarity, flavour, model, corner, temperature) };
}

function ztcVgsOf(process: Process, sizing: Sizing, polarity: Polarity, flavour: string | undefined, model: CurrentModel, corner: string, temperature: number): number | null {
  try {
    return zeroTemperatureCoefficientVgs(process, { polarity, flavour, corner, model, w: sizing.w, l: sizing.l, fingers: sizing.fingers, vds: sizing.vds, vsb: sizing.vsb }, temperature).vgs;
  } catch (error) {
    if (isEngineError(error)) return null;
    throw error;
  }
}

/** POST /api/compute/size; with `compare`, the same targets sized with the other model beside it. */
export function computeSize(request: SizeRequestInput, process?: Process, tables?: TableSource): SizeResponse {
  const parsed = parseOrThrow(sizeRequestSchema, request);
  const resolved = resolveProcess(parsed.process, process);
  checkRequestAgainstProcess(parsed, resolved);
  const result = sizeWith(parsed, parsed.model, resolved, tables);
  const other = parsed.compare;
  return other === undefined ? result : { ...result, comparison: compareResults(result, other, () => sizeWith(parsed, other, resolved, tables)) };
}

function sizeWith(parsed: SizeRequest, model: Model, resolved: Process, tables: TableSource | undefined): SizeResponse {
  if (model === 'table') return sizeWithTable(parsed, resolved, tableOf(tables, parsed.polarity, parsed.flavour));
  const device = prepareDevice(resolved, parsed.polarity, { corner: parsed.corner, temperature: parsed.temperature, flavour: parsed.flavour });
  return sizeResponse(resolved, solveSize(device, model, parsed), parsed.polarity, parsed.flavour, model, device.corner, device.temperature);
}

/** The parsed request, its process and the columnar sweep with its chosen point: one run of the engine. */
function runSweep(parsed: SweepRequest & { model: CurrentModel }, resolved: Process) {
  const result = sweep(parsed, resolved);
  const base = sizeResponse(resolved, result.base, parsed.polarity, parsed.flavour, parsed.model, parsed.corner, parsed.temperature ?? resolved.tnom);
  const head = { ...context(resolved, parsed.polarity, parsed.flavour, parsed.model), param: result.param, hold: result.hold, fields: [...result.fields], base };
  return { result, head };
}

/** The answer of a sweep request: an object per point, or with layout "columns" an array per field. */
export type ComputedSweep<R extends SweepRequestInput> = R extends { layout: 'columns' } ? SweepColumnsResponse : SweepResponse;

/** POST /api/compute/sweep: the columnar sweep as points or as columns, NaN and infinities as null. */
export function computeSweep<R extends SweepRequestInput>(request: R, process?: Process, tables?: TableSource): ComputedSweep<R>;
export function computeSweep(request: SweepRequestInput, process?: Process, tables?: TableSource): SweepResponse | SweepColumnsResponse {
  const parsed = parseOrThrow(sweepRequestSchema, request);
  const resolved = resolveProcess(parsed.process, process);
  checkRequestAgainstProcess(parsed, resolved);
  if (parsed.model === 'table') {
    const answer = sweepWithTable(parsed, resolved, tableOf(tables, parsed.polarity, parsed.flavour));
    return parsed.layout === 'columns' ? columnsOfPoints(answer) : answer;
  }
  const { result, head } = runSweep({ ...parsed, model: parsed.model }, resolved);
  if (parsed.layout === 'columns') {
    return {
      ...head,
      layout: 'columns',
      series: result.series.map((series) => ({ corner: series.corner, temperature: series.temperature, length: series.values.length, columns: columnsOf(result, series), warnings: series.warnings })),
    };
  }
  return {
    ...head,
    series: result.series.map((series) => ({ corner: series.corner, temperature: series.temperature, points: pointsOf(result, series), warnings: series.warnings })),
  };
}

/** One array per field: the engine's columns with NaN and infinities as null, regions named, saturation as booleans. */
function columnsOf(result: SweepColumns, series: SweepColumns['series'][number]): Partial<Record<SweepField, SweepColumn>> {
  const { param } = result;
  const { values, columns } = series;
  const out: Partial<Record<SweepField, SweepColumn>> = { [param]: Array.from(values, finiteOrNull) };
  for (const field of result.fields) {
    if (field === param) continue;
    if (field === 'region') out.region = Array.from(columns.ic as Float64Array, (ic) => (Number.isFinite(ic) ? regionOf(ic) : null));
    else if (field === 'saturated') out.saturated = Array.from(columns.saturated as Float64Array, (s) => (Number.isNaN(s) ? null : s === 1));
    else out[field] = Array.from(columns[field] as Float64Array, finiteOrNull);
  }
  return out;
}

const finiteOrNull = (value: number): number | null => (Number.isFinite(value) ? value : null);

/** The table model answers points; the columns layout transposes them. */
function columnsOfPoints(answer: SweepResponse): SweepColumnsResponse {
  const names = [answer.param, ...answer.fields.filter((field) => field !== answer.param)] as SweepField[];
  return {
    ...answer,
    layout: 'columns',
    series: answer.series.map(({ points, ...rest }) => {
      const columns: Partial<Record<SweepField, SweepColumn>> = {};
      for (const name of names) columns[name] = points.map((point) => (point as Record<string, number | string | boolean | null | undefined>)[name] ?? null) as SweepColumn;
      return { ...rest, length: points.length, columns };
    }),
  };
}

function pointsOf(result: SweepColumns, series: SweepColumns['series'][number]): SweepPoint[] {
  const { param } = result;
  const fields = result.fields.filter((field) => field !== param);
  const { values, columns } = series;
  const template: Record<string, null> = { [param]: null };
  for (const field of fields) template[field] = null;
  const points: Record<string, number | string | boolean | null>[] = new Array(values.length);
  for (let i = 0; i < values.length; i++) points[i] = { ...template };
  for (let i = 0; i < values.length; i++) points[i][param] = values[i];
  for (const field of fields) {
    if (field === 'region') {
      const ic = columns.ic as Float64Array;
      for (let i = 0; i < values.length; i++) points[i].region = Number.isFinite(ic[i]) ? regionOf(ic[i]) : null;
    } else if (field === 'saturated') {
      const saturated = columns.saturated as Float64Array;
      for (let i = 0; i < values.length; i++) points[i].saturated = Number.isNaN(saturated[i]) ? null : saturated[i] === 1;
    } else {
      const column = columns[field] as Float64Array;
      for (let i = 0; i < values.length; i++) {
        const value = column[i];
        points[i][field] = Number.isFinite(value) ? value : null;
      }
    }
  }
  return points as SweepPoint[];
}

/** POST /api/compute/corners. */
export function computeCorners(request: CornersRequestInput, process?: Process, tables?: TableSource): CornersResponse {
  const parsed = parseOrThrow(cornersRequestSchema, request);
  const resolved = resolveProcess(parsed.process, process);
  checkRequestAgainstProcess(parsed, resolved);
  if (parsed.model === 'table') {
    const choice = tableOf(tables, parsed.polarity, parsed.flavour);
    return { ...context(resolved, parsed.polarity, parsed.flavour, 'table'), table: choice.ref, bias: parsed.bias, ...cornersWithTable(parsed, resolved, choice) };
  }
  const analysis = cornerAnalysis({ ...parsed, model: parsed.model }, resolved);
  return { ...context(resolved, parsed.polarity, parsed.flavour, parsed.model), bias: parsed.bias, ...analysis };
}
