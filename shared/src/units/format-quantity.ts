import { engineeringPrefix } from './prefixes.js';
import { readUnit } from './unit-expression.js';

export interface FormatOptions {
  /** Significant digits, 1 … 15; default 4. Trailing zeros are dropped ("20 µA", not "20.00 µA"). */
  digits?: number;
}

/**
 * Writes a value in SI units in engineering notation: formatQuantity(2e-5, 'A') → "20 µA",
 * formatQuantity(5e-7, 'm') → "500 nm". Prefixes a … T only (SI Brochure, 9th ed., 2019, table 7);
 * beyond them, and for units whose first symbol is not to the first power ("F/m²", "1/V", "√V",
 * "m⁻³") or that take no prefix ("°C", ""), the value is written plainly or as "3.453e-3 F/m²".
 * NaN is written "—", infinities "∞ A" and "-∞ A". The minus is ASCII so parseQuantity reads it back.
 */
export function formatQuantity(value: number, unit = '', options: FormatOptions = {}): string {
  const digits = Math.min(15, Math.max(1, Math.round(options.digits ?? 4)));
  const withUnit = (number: string) => (unit === '' ? number : `${number} ${unit}`);
  if (Number.isNaN(value)) return '—';
  if (!Number.isFinite(value)) return withUnit(value > 0 ? '∞' : '-∞');
  if (value === 0) return withUnit('0');
  if (!takesPrefix(unit)) return withUnit(plain(value, digits));

  const [mantissaText, exponentText] = value.toExponential(digits - 1).split('e');
  const exponent = Number(exponentText);
  const engineering = Math.floor(exponent / 3) * 3;
  const prefix = engineeringPrefix(engineering);
  if (prefix === undefined) return withUnit(plain(value, digits));
  return `${shiftPoint(mantissaText, exponent - engineering)} ${prefix}${unit}`;
}

function takesPrefix(unit: string): boolean {
  if (unit === '' || unit === '%') return false;
  const reading = readUnit(unit);
  if (!reading.ok || reading.unit.scaleExponent !== 0) return false;
  const first = Object.entries(reading.unit.dimension)[0];
  return first !== undefined && first[0] !== '°C' && first[1] === 1 && !unit.startsWith('1/') && !unit.startsWith('√');
}

/** Plain digits between 1e-3 and 1e5, exponent form outside. */
function plain(value: number, digits: number): string {
  const magnitude = Math.abs(value);
  if (magnitude >= 1e-3 && magnitude < 1e5) {
    // toPrecision writes 12345 at 4 digits as "1.235e+4"; in this range the rounded number reads better.
    const text = value.toPrecision(digits);
    return text.includes('e') ? String(Number(text)) : trimZeros(text);
  }
  const [mantissa, exponent] = value.toExponential(digits - 1).split('e');
  return `${trimZeros(mantissa)}e${exponent.replace('+', '')}`;
}

/** "2.000" shifted by 1 → "20"; shift is 0, 1 or 2. */
function shiftPoint(mantissa: string, shift: number): string {
  const negative = mantissa.startsWith('-');
  const unsigned = negative ? mantissa.slice(1) : mantissa;
  let digits = unsigned.replace('.', '');
  while (digits.length < shift + 1) digits += '0';
  const whole = digits.slice(0, shift + 1);
  const fraction = digits.slice(shift + 1);
  const text = trimZeros(fraction === '' ? whole : `${whole}.${fraction}`);
  return negative ? `-${text}` : text;
}

function trimZeros(text: string): string {
  return text.includes('.') && !text.includes('e') ? text.replace(/\.?0+$/, '') : text;
}
