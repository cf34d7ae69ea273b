import { prefixExponent } from './prefixes.js';
import { type UnitExpression, describeDimension, formatDimension, isUnitSymbol, readUnit, sameDimension } from './unit-expression.js';

/** A parsed quantity in SI (unprefixed) units, or the reason it could not be read. */
export type ParsedQuantity = { ok: true; value: number; unit: string } | { ok: false; reason: string };

const NUMBER = /^[+\-−]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+\-−]?\d+)?/;

/**
 * Reads "20u", "20 µA", "0.5um", "1.2 V", "3e-6", "1e17 cm^-3", "4.5 mV·µm" into a number in SI units.
 *
 * - With `expectedUnit` (e.g. "A", "A/V²", "m⁻³", "" for a plain number, "°C"), a value given in
 *   another quantity is refused with the reason ("20 µV is a voltage (V), but this field takes a
 *   current (A)"); a bare prefix ("20u") or a bare number takes the expected unit.
 * - A single letter that is both a prefix and a unit is the unit when it is the expected unit, and
 *   the prefix otherwise: "5m" is 5 m in a length field and 5 mV in a voltage field; with no
 *   expected unit it is read as the unit (5 m).
 * - Prefixes: SI Brochure, 9th ed., 2019, table 7 (see prefixes.ts); "u" and "μ" mean micro, "meg" mega.
 * - Refused with a reason, never NaN: empty text, a comma as decimal separator, an unknown unit,
 *   a prefix on °C, more than one "/", a value that overflows.
 * `unit` in the answer is the expected unit when given, else the SI unit of the text ("A/V²").
 */
export function parseQuantity(text: string, expectedUnit?: string): ParsedQuantity {
  const trimmed = text.trim();
  if (trimmed === '') return { ok: false, reason: 'Enter a number, e.g. 20u or 20 µA' };
  const match = NUMBER.exec(trimmed);
  if (!match) return { ok: false, reason: `"${trimmed}" does not start with a number` };
  const mantissa = match[0].replace(/−/g, '-');
  const rest = trimmed.slice(match[0].length).trim();
  if (/^,\d/.test(rest)) return { ok: false, reason: `"${trimmed}": use a point as the decimal separator (0.5, not 0,5)` };

  let expected: UnitExpression | undefined;
  if (expectedUnit !== undefined) {
    const reading = readUnit(expectedUnit);
    if (!reading.ok) return { ok: false, reason: `The expected unit is not readable: ${reading.reason}` };
    expected = reading.unit;
  }
  const given = readSuffix(rest, expected);
  if (!given.ok) return given;

  const unit = given.unit ?? expected ?? { dimension: {}, scaleExponent: 0 };
  if (expected && given.unit && !sameDimension(expected, given.unit) && !isGmIdSpelling(expected, given.unit)) {
    return {
      ok: false,
      reason: `${trimmed} is ${describeDimension(given.unit.dimension)}, but this field takes ${describeDimension(expected.dimension)}`,
    };
  }
  const value = scaled(mantissa, given.prefixExponent + (given.unit?.scaleExponent ?? 0));
  if (!Number.isFinite(value)) return { ok: false, reason: `${trimmed} is too large to be a number` };
  return { ok: true, value, unit: expectedUnit ?? formatDimension(unit.dimension) };
}

const PER_VOLT: UnitExpression = { dimension: { V: -1 }, scaleExponent: 0 };

/**
 * gm/ID is written 1/V, S/A (siemens per ampere, which is 1/V since S = A/V: SI Brochure, 9th ed., 2019,
 * table 4) or, in the trade's shorthand, A/V (common practice, no source): in a field that takes 1/V the two
 * others are read as 1/V.
 */
function isGmIdSpelling(expected: UnitExpression, given: UnitExpression): boolean {
  if (!sameDimension(expected, PER_VOLT)) return false;
  const spelled = (dimension: Record<string, number>) => sameDimension(given, { dimension, scaleExponent: 0 });
  return spelled({ S: 1, A: -1 }) || spelled({ A: 1, V: -1 });
}

type Suffix = { ok: true; prefixExponent: number; unit?: UnitExpression } | { ok: false; reason: string };

function readSuffix(rest: string, expected: UnitExpression | undefined): Suffix {
  if (rest === '') return { ok: true, prefixExponent: 0 };
  const alone = prefixExponent(rest);
  if (alone !== undefined) {
    const readAsUnit = isUnitSymbol(rest) ? readUnit(rest) : undefined;
    const unitFits = readAsUnit?.ok && (expected === undefined || sameDimension(readAsUnit.unit, expected));
    if (!unitFits) return { ok: true, prefixExponent: alone };
  }
  const reading = readUnit(rest);
  if (!reading.ok) return reading;
  return { ok: true, prefixExponent: 0, unit: reading.unit };
}

/** mantissa × 10^exponent, rounded once (through the decimal string) when the exponent is whole. */
function scaled(mantissa: string, exponent: number): number {
  if (Number.isInteger(exponent)) {
    const [digits, ownExponent = '0'] = mantissa.split(/[eE]/);
    return Number(`${digits}e${Number(ownExponent.replace('−', '-')) + exponent}`);
  }
  return Number(mantissa) * 10 ** exponent;
}
