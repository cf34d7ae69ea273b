import { SWEEP_FIELDS, type SweepParam, type SweepPoint, type SweepRequest, type SweepResponse } from '../schemas/sweep.js';
import type { Process } from '../schemas/process.js';
import type { Warning, WarningCode } from '../schemas/warning.js';
import { ENGINE_VERSION } from './engine-version.js';
import { type PreparedDevice, prepareDevice } from './resolve-device.js';
import { constraintOf } from './solve.js';
import { CAUTIONS, Failures } from './sweep-cautions.js';
import { sweepValues } from './sweep-values.js';
import { tableFigures } from './table-figures.js';
import { type TableConditions, type TableLine, tableLine } from './table-lookup.js';
import { operatingPointOnLine, type TableOperatingPoint } from './table-operating-point.js';
import { sizeFromTable, vgsForGmId, vgsForOverdrive } from './table-sizing.js';
import { sizeWithTable } from './table-size.js';
import { TABLE_ACCURACY, type TableChoice } from './table-source.js';
import { WARNING_THRESHOLDS } from './warnings.js';

const GATE_PARAMS: ReadonlySet<SweepParam> = new Set(['vgs', 'vov', 'gmId']);

/**
 * POST /api/compute/sweep with model "table" (the request parsed and checked against the process), with the meaning
 * of the analytic sweep: hold "w" keeps the width and (unless the gate is swept) VGS of the request's own sizing and
 * lets the current follow; hold "id" re-sizes at every point for the request's ID, unsnapped, a swept vov, vgs or
 * gmId replacing the constraint. Point by point through the table; a point outside the grid has no answer (null,
 * counted in the series' warnings), never an extrapolation.
 */
export function sweepWithTable(request: SweepRequest, process: Process, choice: TableChoice): SweepResponse {
  const base = sizeWithTable(request, process, choice);
  const fields = request.fields ?? SWEEP_FIELDS;
  const values = sweepValues(request.sweep);
  const corners = request.corners ?? [request.corner];
  const temperatures: (number | null)[] = request.sweep.param === 'temperature' ? [null] : (request.temperatures ?? [base.temperature]);
  const series = corners.flatMap((corner) => temperatures.map((temperature) => tableSeries(request, process, choice, base, corner, temperature, values, fields)));
  return {
    engineVersion: ENGINE_VERSION,
    accuracy: TABLE_ACCURACY,
    polarity: request.polarity,
    ...(request.flavour === undefined ? {} : { flavour: request.flavour }),
    model: 'table',
    table: choice.ref,
    analyticFigures: base.analyticFigures,
    param: request.sweep.param,
    hold: request.hold,
    fields: [...fields],
    base,
    series,
  };
}

interface Counts {
  unsaturated: number;
  aboveVdd: number;
  nearGmIdLimit: number;
  narrow: number;
  forward: number;
  depletion: number;
  outside: number;
}

function tableSeries(
  request: SweepRequest,
  process: Process,
  choice: TableChoice,
  base: { w: number; vgs: number; fingers: number },
  corner: string,
  temperature: number | null,
  values: Float64Array,
  fields: readonly (typeof SWEEP_FIELDS)[number][],
): SweepResponse['series'][number] {
  const param = request.sweep.param;
  const failures = new Failures(values.length);
  const tableWarnings = new Map<WarningCode, Warning>();
  const counts: Counts = { unsaturated: 0, aboveVdd: 0, nearGmIdLimit: 0, narrow: 0, forward: 0, depletion: 0, outside: 0 };
  const constraint = constraintOf(request);
  const extras = fields.includes('ioff');
  const varies = !GATE_PARAMS.has(param);
  let seriesDevice: PreparedDevice | undefined;
  let seriesLine: TableLine | undefined;
  const points: SweepPoint[] = [];
  for (let i = 0; i < values.length; i++) {
    const value = values[i];
    try {
      const conditions: TableConditions = {
        corner,
        temperature: param === 'temperature' ? value : (temperature as number),
        l: param === 'l' ? value : request.l,
        vds: param === 'vds' ? value : request.vds,
        vsb: param === 'vsb' ? value : request.vsb,
      };
      const device =
        param === 'temperature' || !seriesDevice
          ? prepareDevice(process, request.polarity, { corner, temperature: conditions.temperature, flavour: request.flavour, cornerField: request.corners ? `corners.${request.corners.indexOf(corner)}` : 'corner' })
          : seriesDevice;
      seriesDevice ??= device;
      const line = varies || !seriesLine ? tableLine(choice.prepared, conditions) : seriesLine;
      seriesLine ??= line;
      const op = pointOf(request, choice, line, conditions, base, param, value, constraint);
      const { point } = tableFigures(op, line, device, choice.prepared, { extras });
      for (const warning of line.warnings) tableWarnings.set(warning.code, warning);
      count(counts, point, device, request.hold === 'id');
      const row: Record<string, number | string | boolean | null> = { [param]: value };
      for (const field of fields) {
        if (field === param) continue;
        row[field] = field === 'temperature' ? conditions.temperature : field === 'sigmaVt' ? point.sigmaVt : ((point as unknown as Record<string, number | string | boolean | null>)[field] ?? null);
      }
      points.push(row as SweepPoint);
    } catch (error) {
      failures.add(i, error);
      const row: Record<string, number | null> = { [param]: value };
      for (const field of fields) if (field !== param) row[field] = null;
      points.push(row as SweepPoint);
    }
  }
  return { corner, temperature, points, warnings: [...tableWarnings.values(), ...cautionsOf(counts, values.length), ...failures.warnings(param)] };
}

/** The operating point at one point of the series. */
function pointOf(request: SweepRequest, choice: TableChoice, line: TableLine, conditions: TableConditions, base: { w: number; vgs: number; fingers: number }, param: SweepParam, value: number, constraint: 'vov' | 'gmId' | 'w' | 'vgs'): TableOperatingPoint {
  const gate = GATE_PARAMS.has(param);
  if (request.hold === 'w') {
    const vgs = !gate ? base.vgs : param === 'vgs' ? value : param === 'vov' ? vgsForOverdrive(line, value) : vgsForGmId(line, value);
    return operatingPointOnLine(line, base.w, vgs, base.fingers);
  }
  const target = gate ? { [param]: value } : { [constraint]: request[constraint] };
  return sizeFromTable(choice.prepared, { ...conditions, id: request.id, ...target });
}

function count(counts: Counts, point: ReturnType<typeof tableFigures>['point'], device: PreparedDevice, unsnapped: boolean): void {
  if (!point.saturated) counts.unsaturated++;
  if (point.vgs > device.vdd) counts.aboveVdd++;
  if (point.gmId * point.n * point.ut > WARNING_THRESHOLDS.gmIdFractionOfLimit) counts.nearGmIdLimit++;
  if (unsnapped && point.w < device.params.wmin) counts.narrow++;
  if (point.vsb < 0) counts.forward++;
  if (point.leakage.conductsAtZeroVgs) counts.depletion++;
  const range = device.tempRange;
  if (range && (device.temperature < range.min || device.temperature > range.max)) counts.outside++;
}

/** The analytic sweep's series cautions that apply to a table (not the square law's, not the short-channel one). */
function cautionsOf(counts: Counts, total: number): Warning[] {
  const byCode: Partial<Record<WarningCode, number>> = {
    VDS_BELOW_VDSSAT: counts.unsaturated,
    VGS_ABOVE_VDD: counts.aboveVdd,
    GM_ID_NEAR_WEAK_INVERSION_LIMIT: counts.nearGmIdLimit,
    W_BELOW_WMIN: counts.narrow,
    SOURCE_BODY_FORWARD_BIASED: counts.forward,
    DEPLETION_CONDUCTS_AT_VGS0: counts.depletion,
    TEMPERATURE_OUTSIDE_PROCESS_RANGE: counts.outside,
  };
  return CAUTIONS.filter(([code]) => (byCode[code] ?? 0) > 0).map(([code, sentence]) => ({ code, message: `At ${byCode[code]} of ${total} points ${sentence}.` }));
}
