import Papa from 'papaparse';
import type { Problem } from '../schemas/api-error.js';
import { deviceTargetsSchema, DEVICE_CONSTRAINTS, type DeviceConstraint, type DeviceTargets } from '../schemas/device-targets.js';
import { fieldOfIssue } from '../schemas/field-of-issue.js';
import { SHEET_CSV_COLUMNS, sheetCsvTitle, type SheetCsvColumn, type SheetCsvColumnInfo } from '../schemas/sheet-csv.js';
import { parseQuantity } from '../units/parse-quantity.js';
import { prepareCsvText } from './csv-lines.js';

/** One device row read from a sheet CSV: its line in the file and its targets, checked by deviceTargetsSchema. */
export interface SheetCsvRow {
  row: number;
  targets: DeviceTargets;
}

export interface SheetCsvReading {
  rows: SheetCsvRow[];
  /** By row (line of the file) and field (the column's title). */
  problems: Problem[];
  ignoredColumns: string[];
  /** The target columns the file has (a row updates only these fields of a device it names). */
  columns: SheetCsvColumn[];
  delimiter: ',' | ';';
}

interface HeaderColumn {
  info: SheetCsvColumnInfo;
  title: string;
  /** Factor from the header's unit to SI (1e-6 for µm). */
  scale: number;
}

const CONSTRAINT_COLUMN: Record<DeviceConstraint, SheetCsvColumn> = { vov: 'targetVov', gmId: 'targetGmId', w: 'targetW', vgs: 'targetVgs' };
const REQUIRED: readonly SheetCsvColumn[] = ['name', 'polarity', 'id', 'l', 'vds'];
const PLAIN_NUMBER = /^[+\-−]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+\-−]?\d+)?$/;
const BY_NAME = new Map<string, SheetCsvColumnInfo>(SHEET_CSV_COLUMNS.flatMap((c) => [[normalise(c.label), c], [normalise(c.key), c]]));

function normalise(text: string): string {
  return text.trim().toLowerCase().replace(/\s+/g, ' ');
}

/**
 * Reads the device rows of a sheet CSV as the export writes it (schemas/sheet-csv.ts): UTF-8 with or without
 * a byte-order mark, comma or semicolon separated, RFC 4180 quotes, `#` comment lines. Columns are found by
 * their title (or key), in any order; the unit in a title scales its numbers ("L (um)"), and a cell may carry
 * an SI prefix or unit of its own ("0.5u", "500 nm", "18 S/A"). Only the target columns are read: results
 * are computed again, and other columns are listed as ignored. Every problem names its row and column.
 */
export function readSheetCsv(raw: string): SheetCsvReading {
  const { text, headerLine, delimiter } = prepareCsvText(raw);
  const problems: Problem[] = [];
  if (headerLine === 0) return { rows: [], problems: [{ row: 1, field: 'file', message: 'The file has no header row' }], ignoredColumns: [], columns: [], delimiter };
  const parsed = Papa.parse<string[]>(text, { delimiter, skipEmptyLines: false });
  const lineOf = lineNumbers(text, parsed.data.length);
  const headerIndex = lineOf.findIndex((line) => line >= headerLine);
  const header = readHeader(parsed.data[headerIndex] ?? [], headerLine, problems);
  if (!header) return { rows: [], problems, ignoredColumns: [], columns: [], delimiter };
  const rows: SheetCsvRow[] = [];
  const seen = new Map<string, number>();
  for (let i = headerIndex + 1; i < parsed.data.length; i++) {
    const cells = parsed.data[i];
    if (cells.every((cell) => cell.trim() === '')) continue;
    const row = lineOf[i];
    const read = readRow(cells, header.columns, row, delimiter);
    problems.push(...read.problems);
    if (!read.targets) continue;
    const earlier = seen.get(read.targets.name);
    if (earlier !== undefined) {
      problems.push({ row, field: 'Name', message: `Name ${read.targets.name} is already used on row ${earlier}: each device appears once` });
      continue;
    }
    seen.set(read.targets.name, row);
    rows.push({ row, targets: read.targets });
  }
  for (const error of parsed.errors) {
    if (error.row !== undefined) problems.push({ row: lineOf[error.row] ?? headerLine, field: 'file', message: `${error.message} (put a double quote at both ends of a cell)` });
  }
  const columns = header.columns.flatMap((column) => (column ? [column.info.key as SheetCsvColumn] : []));
  return { rows, problems: problems.toSorted((a, b) => (a.row ?? 0) - (b.row ?? 0)), ignoredColumns: header.ignored, columns, delimiter };
}

/** The line of the file each parsed record starts on. */
function lineNumbers(text: string, count: number): number[] {
  const lines: number[] = [];
  let line = 1;
  let quoted = false;
  let atStart = true;
  for (let i = 0; i < text.length && lines.length < count; i++) {
    if (atStart) {
      lines.push(line);
      atStart = false;
    }
    const ch = text[i];
    if (ch === '"') quoted = !quoted;
    if (ch === '\n') {
      line++;
      if (!quoted) atStart = true;
    }
  }
  while (lines.length < count) lines.push(line);
  return lines;
}

function readHeader(cells: string[], row: number, problems: Problem[]): { columns: Array<HeaderColumn | null>; ignored: string[] } | null {
  const columns: Array<HeaderColumn | null> = [];
  const ignored: string[] = [];
  const found = new Set<string>();
  for (const cell of cells) {
    const title = cell.trim();
    const match = /^(.*?)\s*(?:\(([^()]*)\))?$/.exec(title);
    const info = BY_NAME.get(normalise(match?.[1] ?? title)) ?? BY_NAME.get(normalise(title));
    if (!info || !info.target) {
      columns.push(null);
      if (title !== '') ignored.push(title);
      continue;
    }
    if (found.has(info.key)) {
      problems.push({ row, field: title, message: `The column ${title} appears twice` });
      columns.push(null);
      continue;
    }
    const scale = headerScale(info, match?.[2], title, row, problems);
    if (scale === null) return null;
    found.add(info.key);
    columns.push({ info, title, scale });
  }
  const missing = REQUIRED.filter((key) => !found.has(key));
  if (missing.length > 0 || !DEVICE_CONSTRAINTS.some((c) => found.has(CONSTRAINT_COLUMN[c]))) {
    const titles = missing.map((key) => sheetCsvTitle(SHEET_CSV_COLUMNS.find((c) => c.key === key)!));
    if (!DEVICE_CONSTRAINTS.some((c) => found.has(CONSTRAINT_COLUMN[c]))) titles.push('one of Target VOV, Target gm/ID, Target W, Target VGS');
    problems.push({ row, field: 'header', message: `The header lacks ${titles.join(', ')} (the export's own titles, units in parentheses)` });
    return null;
  }
  return { columns, ignored };
}

function headerScale(info: SheetCsvColumnInfo, unitText: string | undefined, title: string, row: number, problems: Problem[]): number | null {
  if (info.unit === undefined || info.unit === '' || unitText === undefined || unitText.trim() === '') return 1;
  // The value of one of the header's unit in the column's SI unit: "um" in a length column is 1e-6.
  const probe = parseQuantity(`1 ${unitText.trim()}`, info.unit === 'degC' ? '°C' : info.unit);
  if (!probe.ok) {
    problems.push({ row, field: title, message: `The unit "${unitText}" of ${title} is not ${info.unit} or a prefixed ${info.unit}` });
    return null;
  }
  return probe.value;
}

function readRow(cells: string[], columns: Array<HeaderColumn | null>, row: number, delimiter: string): { targets?: DeviceTargets; problems: Problem[] } {
  const problems: Problem[] = [];
  const values = new Map<SheetCsvColumn, { text: string; column: HeaderColumn }>();
  columns.forEach((column, index) => {
    if (column) values.set(column.info.key as SheetCsvColumn, { text: (cells[index] ?? '').trim().replace(/^'(?=[=+\-@])/, ''), column });
  });
  const textOf = (key: SheetCsvColumn) => values.get(key)?.text ?? '';
  const titleOf = (key: SheetCsvColumn) => values.get(key)?.column.title ?? sheetCsvTitle(SHEET_CSV_COLUMNS.find((c) => c.key === key)!);
  const numberOf = (key: SheetCsvColumn): number | undefined => {
    const entry = values.get(key);
    if (!entry || entry.text === '') return undefined;
    const value = readNumber(entry.text, entry.column, delimiter);
    if (typeof value === 'string') {
      problems.push({ row, field: entry.column.title, message: value });
      return undefined;
    }
    return value;
  };
  const constraint = readConstraint(textOf('constraint'), (c) => textOf(CONSTRAINT_COLUMN[c]) !== '');
  if (typeof constraint === 'string' && !DEVICE_CONSTRAINTS.includes(constraint as DeviceConstraint)) {
    problems.push({ row, field: titleOf('constraint'), message: constraint });
  }
  const chosen = DEVICE_CONSTRAINTS.includes(constraint as DeviceConstraint) ? (constraint as DeviceConstraint) : undefined;
  const supply = textOf('supplyBranch').toLowerCase();
  const nodes = Object.fromEntries(
    (['drain', 'gate', 'source', 'bulk'] as const).flatMap((terminal) => {
      const text = textOf(`${terminal}Node` as SheetCsvColumn);
      return text === '' ? [] : [[terminal, text]];
    }),
  );
  const input: Record<string, unknown> = {
    name: textOf('name'),
    function: textOf('function'),
    polarity: textOf('polarity').toLowerCase(),
    flavour: textOf('flavour') || undefined,
    multiplier: numberOf('multiplier') ?? 1,
    matchGroup: textOf('matchGroup') || undefined,
    supplyBranch: supply === '' ? false : ['true', 'yes', '1', 'y'].includes(supply) ? true : ['false', 'no', '0', 'n'].includes(supply) ? false : supply,
    corner: textOf('corner') || undefined,
    temperature: numberOf('temperature'),
    model: textOf('model') || undefined,
    id: numberOf('id'),
    l: numberOf('l'),
    vds: numberOf('vds'),
    vsb: numberOf('vsb') ?? 0,
    notes: textOf('notes'),
    ...(Object.keys(nodes).length > 0 ? { nodes } : {}),
    ...(chosen ? { [chosen]: numberOf(CONSTRAINT_COLUMN[chosen]) } : {}),
  };
  if (problems.length > 0) return { problems };
  const checked = deviceTargetsSchema.safeParse(input);
  if (checked.success) return { targets: checked.data, problems };
  const byField = new Set<string>();
  for (const issue of checked.error.issues) {
    const field = fieldOfIssue(issue) ?? 'name';
    const key = columnOfField(field, chosen);
    const title = titleOf(key);
    if (byField.has(title)) continue;
    byField.add(title);
    const empty = textOf(key) === '' && issue.code === 'invalid_type';
    problems.push({ row, field: title, message: empty ? `${title} is empty` : issue.message });
  }
  return { problems };
}

/** The CSV column of a field of deviceTargetsSchema. */
function columnOfField(field: string, constraint: DeviceConstraint | undefined): SheetCsvColumn {
  const top = field.split('.')[0];
  if ((DEVICE_CONSTRAINTS as readonly string[]).includes(top)) return CONSTRAINT_COLUMN[top as DeviceConstraint];
  if (top === 'nodes') return `${field.split('.')[1] ?? 'drain'}Node` as SheetCsvColumn;
  if (top === 'vov' && constraint) return CONSTRAINT_COLUMN[constraint];
  return (SHEET_CSV_COLUMNS.some((c) => c.key === top) ? top : 'name') as SheetCsvColumn;
}

/** The constraint a row names ("vov", "gm/ID", "W" …), or the one target column it fills; a sentence when neither. */
function readConstraint(text: string, filled: (c: DeviceConstraint) => boolean): string {
  const spelled = text.toLowerCase().replace(/[\s/]/g, '');
  const named = DEVICE_CONSTRAINTS.find((c) => c.toLowerCase() === spelled);
  if (named) return named;
  if (text !== '') return `"${text}" is not a constraint: write vov, gmId, w or vgs`;
  const given = DEVICE_CONSTRAINTS.filter(filled);
  if (given.length === 1) return given[0];
  return given.length === 0 ? 'No constraint: fill Constraint and its target column' : `Constraint is empty and ${given.length} target columns are filled: say which one counts`;
}

/** A cell's number in SI: a plain number in the header's unit, or a number with its own prefix or unit. */
function readNumber(text: string, column: HeaderColumn, delimiter: string): number | string {
  // A file separated by semicolons comes from a spreadsheet that writes decimal commas: 0,5 and 0,5u are 0.5.
  const decimal = delimiter === ';' ? text.replace(/^([+\-−]?\d+),(\d)/, '$1.$2') : text;
  if (PLAIN_NUMBER.test(decimal)) return Number(decimal.replace(/−/g, '-')) * column.scale;
  const unit = column.info.unit === 'degC' ? '°C' : (column.info.unit ?? '');
  const parsed = parseQuantity(decimal, unit);
  return parsed.ok ? parsed.value : `${column.title}: ${parsed.reason}`;
}
