import { type MeasuredPoint, conditionsOf, curvesOf } from '../extraction/measured-curves.js';
import type { Problem } from '../schemas/api-error.js';
import { CURVE_FILE_MAX_POINTS, type CurveSummary, type SignConvention } from '../schemas/extraction.js';
import type { Polarity } from '../schemas/process.js';
import { parseQuantity } from '../units/parse-quantity.js';
import { readCell } from './curve-cells.js';
import { type ColumnRole, type CurveColumn, EXAMPLE_HEADER, defaultUnitOf, readHeader } from './curve-columns.js';
import { csvRows } from './csv-rows.js';
import { readSigns } from './sign-convention.js';

/** What the form gives beside the file: the polarity, and W, L, fingers, temperature when the file has no such column. */
export interface CurveFileOptions {
  polarity: Polarity;
  /** Quantities as typed: "10u", "10 µm", "1e-5". */
  w?: string;
  l?: string;
  fingers?: number;
  temperature?: string;
}

/** A curve file read: its points polarity-normalised in SI, each with its line in the file. */
export interface CurveFile {
  points: MeasuredPoint[];
  /** The line of the file each point came from. */
  rows: number[];
  convention: SignConvention;
  /** How the file was read: units assumed, columns ignored, signs turned. */
  notes: string[];
  curves: CurveSummary[];
}

export type CurveFileReading = { ok: true; file: CurveFile } | { ok: false; problems: Problem[] };

/** Fewest points an extraction can fit, and fewest VGS values a curve needs (gm by central differences). */
export const MIN_POINTS = 5;
export const MIN_CURVE_POINTS = 3;
/** Most problems listed; the rest are counted in a last line. */
const MAX_PROBLEMS = 100;
const LABEL: Record<ColumnRole, string> = { vgs: 'VGS', vds: 'VDS', vsb: 'VSB', id: 'ID', temperature: 'temperature', w: 'W', l: 'L', fingers: 'fingers' };

/** A form field's quantity, or its problem. */
function formQuantity(text: string | undefined, unit: string, field: string, label: string, problems: Problem[]): number | undefined {
  if (text === undefined) return undefined;
  const parsed = parseQuantity(text, unit);
  if (!parsed.ok) {
    problems.push({ field, message: `${label}: ${parsed.reason}` });
    return undefined;
  }
  return parsed.value;
}

/** The form field a missing column falls back to. */
function fallbacks(options: CurveFileOptions, columns: readonly CurveColumn[], problems: Problem[], notes: string[]): Partial<Record<ColumnRole, number>> {
  const has = (role: ColumnRole) => columns.some((c) => c.role === role);
  const constant: Partial<Record<ColumnRole, number>> = {};
  const fields: [ColumnRole, string | number | undefined, string, string][] = [
    ['w', options.w, 'm', 'W'],
    ['l', options.l, 'm', 'L'],
    ['temperature', options.temperature, '°C', 'temperature'],
  ];
  for (const [role, given, unit, label] of fields) {
    if (has(role) && given !== undefined) {
      problems.push({ field: role, message: `${label} is both a column of the file and a form field; give it once` });
    } else if (!has(role)) {
      const value = formQuantity(given as string | undefined, unit, role, label, problems);
      if (value === undefined && given === undefined) {
        problems.push({ field: role, message: `The file has no ${label} column: give ${label} in the form (e.g. ${role === 'temperature' ? '27' : '10u'}) or add a "${label} [${role === 'temperature' ? '°C' : 'um'}]" column` });
      }
      if (value !== undefined) constant[role] = value;
    }
  }
  if (has('fingers') && options.fingers !== undefined) problems.push({ field: 'fingers', message: 'fingers is both a column of the file and a form field; give it once' });
  if (!has('fingers')) constant.fingers = options.fingers ?? 1;
  if (!has('vsb')) {
    constant.vsb = 0;
    notes.push('The file has no VSB column: every point is read at VSB = 0');
  }
  return constant;
}

/** Plausibility of geometry and temperature, so that a forgotten unit does not pass silently. */
function implausible(role: ColumnRole, value: number): string | null {
  if ((role === 'w' || role === 'l') && (value <= 0 || value > 1e-3)) return `${value} m is not a plausible drawn ${LABEL[role]} (0 … 1 mm): is the unit in the header right?`;
  if (role === 'temperature' && (value < -273.15 || value > 400)) return `${value} °C is not a plausible temperature`;
  if (role === 'fingers' && (!Number.isInteger(value) || value < 1)) return `${value} is not a whole number of fingers`;
  if ((role === 'vgs' || role === 'vds' || role === 'vsb') && Math.abs(value) > 100) return `${value} V is not a plausible bias (|V| ≤ 100 V): is the unit in the header right?`;
  if (role === 'id' && Math.abs(value) > 10) return `${value} A is not a plausible drain current: is the unit in the header right?`;
  return null;
}

/**
 * Reads an uploaded curve file (docs/extraction.md): a CSV (comma, semicolon or tab; double quotes; "#" comment
 * lines; a byte-order mark is dropped) whose header names VGS, VDS, ID and optionally VSB, T, W, L and fingers, each
 * with its unit in brackets ("ID [uA]", "VGS [mV]", "T [°C]"). Every problem is listed with its row (the line of the
 * file) and column, and then nothing is read; otherwise the points come out polarity-normalised in SI units, grouped
 * into curves (VGS sweeps).
 */
export function readCurveFile(text: string, options: CurveFileOptions): CurveFileReading {
  const problems: Problem[] = [];
  const notes: string[] = [];
  const parsed = csvRows(text);
  problems.push(...parsed.problems);
  const [headerRow, ...dataRows] = parsed.rows;
  if (!headerRow) return { ok: false, problems: [{ row: 1, field: 'file', message: `The file is empty: it needs a header (e.g. ${EXAMPLE_HEADER}) and rows of numbers` }] };
  const header = readHeader(headerRow.cells, headerRow.line);
  problems.push(...header.problems);
  if (header.ignored.length > 0) notes.push(`Columns not read: ${header.ignored.map((h) => `"${h}"`).join(', ')}`);
  for (const column of header.columns) {
    if (column.unit === null && column.role !== 'fingers') notes.push(`"${column.header}" has no unit in its header: read in ${defaultUnitOf(column.role)}`);
  }
  if (problems.length > 0 && header.problems.length > 0) return { ok: false, problems: limited(problems) };
  const constant = fallbacks(options, header.columns, problems, notes);
  if (dataRows.length < MIN_POINTS) {
    problems.push({ row: headerRow.line, field: 'file', message: `The file has ${dataRows.length === 1 ? 'a single data row' : `${dataRows.length} data rows`}; an extraction needs at least ${MIN_POINTS} points (curves of ID against VGS)` });
  }
  if (dataRows.length > CURVE_FILE_MAX_POINTS) {
    problems.push({ row: dataRows[CURVE_FILE_MAX_POINTS].line, field: 'file', message: `The file has ${dataRows.length} data rows; at most ${CURVE_FILE_MAX_POINTS} are read (thin the sweeps)` });
    return { ok: false, problems: limited(problems) };
  }

  const decimalComma = parsed.delimiter === ';';
  const values: Partial<Record<ColumnRole, number[]>> = {};
  for (const column of header.columns) values[column.role] = [];
  const ownUnits = new Map<CurveColumn, { with: number; without: number }>();
  for (const row of dataRows) {
    for (const column of header.columns) {
      const cell = readCell(row.cells[column.index] ?? '', column, decimalComma);
      if (!cell.ok) {
        problems.push({ row: row.line, field: column.header, message: `Row ${row.line}, column "${column.header}": ${cell.reason}` });
        values[column.role]?.push(Number.NaN);
        continue;
      }
      const note = implausible(column.role, cell.value);
      if (note) problems.push({ row: row.line, field: column.header, message: `Row ${row.line}, column "${column.header}": ${note}` });
      const counts = ownUnits.get(column) ?? { with: 0, without: 0 };
      counts[cell.ownUnit ? 'with' : 'without'] += 1;
      ownUnits.set(column, counts);
      values[column.role]?.push(cell.value);
    }
  }
  for (const [column, counts] of ownUnits) {
    if (counts.with > 0 && counts.without > 0) {
      const row = dataRows.find((r) => !/[a-zA-Zµμ°]/.test(r.cells[column.index] ?? ''))?.line ?? headerRow.line;
      problems.push({ row, field: column.header, message: `Row ${row}, column "${column.header}": mixed units: some values carry a unit and others do not; put the unit in the header ("${column.name} [${defaultUnitOf(column.role) || '1'}]") and plain numbers below` });
    }
  }
  if (decimalComma && dataRows.some((r) => r.cells.some((c) => /\d,\d/.test(c)))) notes.push('Semicolon-separated, with decimal commas: read as decimal points');
  if (problems.length > 0) return { ok: false, problems: limited(problems) };

  const lines = dataRows.map((r) => r.line);
  const signs = readSigns(options.polarity, header.columns, values, lines);
  notes.push(...signs.notes);
  if (signs.problems.length > 0) return { ok: false, problems: limited(signs.problems) };
  const current = values.id as number[];
  if (current.every((v) => v === 0)) {
    const column = header.columns.find((c) => c.role === 'id') as CurveColumn;
    return { ok: false, problems: [{ row: lines[0], field: column.header, message: `Column "${column.header}": every current is zero; nothing to fit` }] };
  }

  const at = (role: ColumnRole, k: number) => (values[role] ? (values[role] as number[])[k] * (signs.factors[role] ?? 1) : (constant[role] as number));
  const points: MeasuredPoint[] = lines.map((_, k) => ({
    vgs: at('vgs', k),
    vds: at('vds', k),
    vsb: at('vsb', k),
    temperature: at('temperature', k),
    id: at('id', k),
    w: at('w', k),
    l: at('l', k),
    fingers: at('fingers', k),
  }));
  const curves = summaries(points, lines);
  const short = curves.filter((c) => c.points < MIN_CURVE_POINTS);
  if (short.length > 0) {
    const rows = short.slice(0, 5).map((c) => c.firstRow);
    return {
      ok: false,
      problems: [
        {
          row: rows[0],
          field: 'file',
          message: `${short.length === 1 ? 'A curve has' : `${short.length} curves have`} fewer than ${MIN_CURVE_POINTS} VGS values (rows ${rows.join(', ')}${short.length > 5 ? ' …' : ''}): a curve is a sweep of VGS at one VDS, VSB, temperature, W and L, with at least ${MIN_CURVE_POINTS} points (ID–VDS sweeps cannot be read)`,
        },
      ],
    };
  }
  return { ok: true, file: { points, rows: lines, convention: signs.convention, notes, curves } };
}

function summaries(points: readonly MeasuredPoint[], lines: readonly number[]): CurveSummary[] {
  return curvesOf(points).map((curve) => {
    const rows = curve.indices.map((i) => lines[i]);
    const vgs = curve.indices.map((i) => points[i].vgs);
    return {
      ...conditionsOf(curve),
      points: curve.indices.length,
      vgsMin: Math.min(...vgs),
      vgsMax: Math.max(...vgs),
      firstRow: Math.min(...rows),
      lastRow: Math.max(...rows),
    };
  });
}

function limited(problems: Problem[]): Problem[] {
  if (problems.length <= MAX_PROBLEMS) return problems;
  return [...problems.slice(0, MAX_PROBLEMS), { field: 'file', message: `… and ${problems.length - MAX_PROBLEMS} more problems` }];
}
