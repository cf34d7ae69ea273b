import type { ParameterInfo } from '@channelwright/shared/schemas';
import { describeDimension, parseQuantity, readUnit, sameDimension } from '@channelwright/shared/units';

export type CellReading = { ok: true; value: number } | { ok: false; field: 'value' | 'unit'; message: string };

const STARTS_WITH_NUMBER = /^[+\-−]?(?:\d|\.\d)/;

/**
 * A number from the value and unit cells, in the parameter's SI unit. With the unit cell empty the value
 * carries its own unit or takes the parameter's ("290 µA/V²", "290u", "0.45"); with a unit in the unit cell
 * the value is a number with at most an SI prefix ("290u" + "A/V²", "290" + "µA/V²", "90m" + "1/V").
 * The unit is checked against the parameter's (a kp given in V is refused); prefixes after the SI Brochure.
 */
export function readNumberCell(value: string, unit: string, info: ParameterInfo, label: string): CellReading {
  if (value === '') return { ok: false, field: 'value', message: `${label}: the value is missing` };
  if (!STARTS_WITH_NUMBER.test(value)) return { ok: false, field: 'value', message: `${label}: "${value}" is not a number` };
  if (unit === '') {
    const parsed = parseQuantity(value, info.unit);
    return parsed.ok ? { ok: true, value: parsed.value } : { ok: false, field: 'value', message: `${label}: ${parsed.reason}` };
  }
  const given = readUnit(unit);
  if (!given.ok) return { ok: false, field: 'unit', message: `${label}: ${given.reason}` };
  const expected = readUnit(info.unit);
  if (expected.ok && !sameDimension(given.unit, expected.unit)) {
    return {
      ok: false,
      field: 'unit',
      message: `${label} takes ${describeDimension(expected.unit.dimension)}, but its unit "${unit}" is ${describeDimension(given.unit.dimension)}`,
    };
  }
  // The value alone as a plain number: a prefix is read as a prefix ("90m" is 0.09), a unit is one too many.
  const number = parseQuantity(value, '');
  if (!number.ok) {
    const alone = parseQuantity(value);
    const message = alone.ok ? `"${value}" carries a unit and the unit cell says "${unit}": write the unit once` : alone.reason;
    return { ok: false, field: 'value', message: `${label}: ${message}` };
  }
  return { ok: true, value: scaled(number.value, given.unit.scaleExponent) };
}

/** value × 10^exponent through the decimal digits, so 290 in µA/V² is exactly 290e-6. */
function scaled(value: number, exponent: number): number {
  if (exponent === 0) return value;
  if (!Number.isInteger(exponent)) return value * 10 ** exponent;
  const [mantissa, own] = value.toExponential(15).split('e');
  return Number(`${mantissa}e${Number(own) + exponent}`);
}
