import { parseQuantity } from '../units/parse-quantity.js';
import { readUnit, sameDimension } from '../units/unit-expression.js';
import { type CurveColumn, defaultUnitOf } from './curve-columns.js';

const PLAIN_NUMBER = /^[+\-−]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+\-−]?\d+)?$/;
const DECIMAL_COMMA = /^[+\-−]?\d+,\d+(?:[eE][+\-−]?\d+)?$/;
const LEADING_NUMBER = /^[+\-−]?(?:\d+(?:[.,]\d*)?|[.,]\d+)(?:[eE][+\-−]?\d+)?/;

/** What a cell holds: a number in SI (°C for temperatures), and whether it carried its own unit; or why it cannot be read. */
export type CellReading = { ok: true; value: number; ownUnit: boolean } | { ok: false; reason: string };

/**
 * Reads one cell of a column. A plain number is in the header's unit (SI when the header has none). A number with
 * a unit of its own ("1.2 uA") is read when the header gives no unit, or gives the same one; a different unit is
 * refused as mixed units. A decimal comma is read only where cells are separated by semicolons.
 */
export function readCell(text: string, column: CurveColumn, decimalComma: boolean): CellReading {
  if (text === '') return { ok: false, reason: 'is empty' };
  const normalised = decimalComma && DECIMAL_COMMA.test(text) ? text.replace(',', '.') : text;
  if (PLAIN_NUMBER.test(normalised)) {
    const value = shifted(normalised.replace(/−/g, '-'), column.exponent) + column.offset;
    return Number.isFinite(value) ? { ok: true, value, ownUnit: false } : { ok: false, reason: `"${text}" is too large to be a number` };
  }
  const lead = LEADING_NUMBER.exec(normalised);
  if (!lead) return { ok: false, reason: `"${text}" is not a number` };
  const suffix = normalised.slice(lead[0].length).trim();
  if (column.unit !== null && column.unit !== '') {
    const own = readUnit(suffix);
    const header = readUnit(column.unit);
    const same = own.ok && header.ok && own.unit.scaleExponent === header.unit.scaleExponent && sameDimension(own.unit, header.unit);
    if (!same) return { ok: false, reason: `"${text}" has a unit of its own, unlike the header (${column.unit}): mixed units; write every value of a column as a plain number in the header's unit` };
    return readCell(lead[0], column, decimalComma);
  }
  if (column.role === 'fingers') return { ok: false, reason: `"${text}" is not a whole number` };
  const parsed = parseQuantity(normalised, defaultUnitOf(column.role));
  if (!parsed.ok) return { ok: false, reason: parsed.reason };
  return { ok: true, value: parsed.value, ownUnit: true };
}

/** A decimal number times 10^exponent, rounded once (through the decimal text), so "20" µm is exactly 2e-5. */
function shifted(number: string, exponent: number): number {
  if (exponent === 0) return Number(number);
  const [digits, own = '0'] = number.split(/[eE]/);
  return Number(`${digits}e${Number(own) + exponent}`);
}
