import type { Problem } from '../schemas/api-error.js';
import { readUnit } from '../units/unit-expression.js';

/** What a column of a curve file holds. */
export type ColumnRole = 'vgs' | 'vds' | 'vsb' | 'id' | 'temperature' | 'w' | 'l' | 'fingers';

/** A column the reader uses: where it is, how the header named it and what its numbers are multiplied by. */
export interface CurveColumn {
  role: ColumnRole;
  index: number;
  /** The header cell as written, e.g. "ID [uA]": problems name the column by it. */
  header: string;
  /** The name without its unit, upper case: "VGS", "VBS", "ISD". */
  name: string;
  /** value in the file × 10^exponent + offset = value in SI (°C for temperatures). */
  exponent: number;
  offset: number;
  /** The unit of the header as written ("uA"), or null when the header has none. */
  unit: string | null;
}

/** Names a column may go by (upper case, spaces and underscores removed), by role. */
const NAMES: Record<ColumnRole, readonly string[]> = {
  vgs: ['VGS', 'VSG'],
  vds: ['VDS', 'VSD'],
  vsb: ['VSB', 'VBS'],
  id: ['ID', 'IDS', 'ISD', 'IDRAIN'],
  temperature: ['T', 'TEMP', 'TEMPERATURE'],
  w: ['W', 'WIDTH'],
  l: ['L', 'LENGTH'],
  fingers: ['NF', 'FINGERS'],
};

/** The SI unit of each role, as the header's unit must measure it ("" for a count). */
const SI_UNIT: Record<ColumnRole, string> = { vgs: 'V', vds: 'V', vsb: 'V', id: 'A', temperature: '°C', w: 'm', l: 'm', fingers: '' };
const QUANTITY: Record<ColumnRole, string> = {
  vgs: 'a voltage',
  vds: 'a voltage',
  vsb: 'a voltage',
  id: 'a current',
  temperature: 'a temperature',
  w: 'a length',
  l: 'a length',
  fingers: 'a count',
};

/** The columns a file must have. */
export const REQUIRED_ROLES: readonly ColumnRole[] = ['vgs', 'vds', 'id'];
export const EXAMPLE_HEADER = 'VGS [V],VDS [V],VSB [V],T [°C],ID [uA]';

/** "ID [uA]", "ID (uA)", "ID/uA" → name and unit; "ID" → no unit. */
function splitHeader(cell: string): { name: string; unit: string | null } {
  const bracketed = /^(.*?)\s*[[(]\s*(.*?)\s*[\])]\s*$/.exec(cell);
  if (bracketed) return { name: bracketed[1], unit: bracketed[2] };
  const slashed = /^([A-Za-z_ ]+?)\s*\/\s*(\S.*)$/.exec(cell);
  if (slashed) return { name: slashed[1], unit: slashed[2] };
  return { name: cell, unit: null };
}

function roleOf(name: string): ColumnRole | undefined {
  const key = name.toUpperCase().replace(/[\s_]+/g, '');
  return (Object.keys(NAMES) as ColumnRole[]).find((role) => NAMES[role].includes(key));
}

/** Scale and offset from the header's unit into SI; a temperature in kelvin is turned into °C. */
function unitScale(role: ColumnRole, unit: string | null): { exponent: number; offset: number } | { problem: string } {
  if (unit === null || unit === '') return { exponent: 0, offset: 0 };
  const reading = readUnit(unit);
  if (!reading.ok) return { problem: reading.reason };
  const { dimension, scaleExponent } = reading.unit;
  const symbols = Object.keys(dimension);
  if (role === 'temperature') {
    if (symbols.length === 1 && symbols[0] === '°C') return { exponent: 0, offset: 0 };
    if (symbols.length === 1 && symbols[0] === 'K' && dimension.K === 1) return { exponent: scaleExponent, offset: -273.15 };
    return { problem: `"${unit}" is not a temperature unit (°C or K)` };
  }
  const expected = SI_UNIT[role];
  const fits = expected === '' ? symbols.length === 0 : symbols.length === 1 && symbols[0] === expected && dimension[expected] === 1;
  if (!fits) return { problem: `"${unit}" does not measure ${QUANTITY[role]}${expected ? ` (${expected})` : ''}` };
  return { exponent: scaleExponent, offset: 0 };
}

/**
 * Reads the header row: which column holds what, in which unit. Problems name the header cell; columns the reader
 * does not know are listed in `ignored`.
 */
export function readHeader(cells: readonly string[], line: number): { columns: CurveColumn[]; ignored: string[]; problems: Problem[] } {
  const columns: CurveColumn[] = [];
  const ignored: string[] = [];
  const problems: Problem[] = [];
  cells.forEach((header, index) => {
    if (header === '') return;
    const { name, unit } = splitHeader(header);
    const role = roleOf(name);
    if (!role) {
      ignored.push(header);
      return;
    }
    const twin = columns.find((c) => c.role === role);
    if (twin) {
      problems.push({ row: line, field: header, message: `Row ${line}: columns "${twin.header}" and "${header}" both hold ${role.toUpperCase()}; keep one` });
      return;
    }
    const scale = unitScale(role, unit);
    if ('problem' in scale) {
      problems.push({ row: line, field: header, message: `Row ${line}, column "${header}": ${scale.problem}` });
      return;
    }
    columns.push({ role, index, header, name: name.toUpperCase().replace(/[\s_]+/g, ''), unit, ...scale });
  });
  for (const role of REQUIRED_ROLES) {
    if (!columns.some((c) => c.role === role) && !problems.some((p) => roleOf(splitHeader(p.field ?? '').name) === role)) {
      problems.push({
        row: line,
        field: 'header',
        message: `Row ${line}: there is no ${role.toUpperCase()} column (named ${NAMES[role].join(', ')}); the header needs VGS, VDS and ID with their units, e.g. ${EXAMPLE_HEADER}`,
      });
    }
  }
  return { columns, ignored, problems };
}

/** The SI unit a column without a unit in its header is read in. */
export function defaultUnitOf(role: ColumnRole): string {
  return SI_UNIT[role];
}
