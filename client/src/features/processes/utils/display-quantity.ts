import { parameterInfo, type ParameterInfo } from '@channelwright/shared/schemas';
import { formatQuantity, readUnit } from '@channelwright/shared/units';

/** The power of ten the display unit stands for: "µA/V²" is 1e-6 A/V², "fF/µm²" 1e-3 F/m². */
function displayExponent(info: ParameterInfo): number {
  const reading = readUnit(info.displayUnit);
  return reading.ok ? reading.unit.scaleExponent : 0;
}

/** value × 10^−shift through the decimal digits, so 290e-6 in µA/V² is exactly 290. */
function shifted(value: number, shift: number): number {
  if (shift === 0 || value === 0 || !Number.isFinite(value)) return value;
  const [mantissa, exponent] = value.toExponential(15).split('e');
  return Number(`${mantissa}e${Number(exponent) - shift}`);
}

function withUnit(number: string, unit: string): string {
  return unit === '' ? number : `${number} ${unit}`;
}

/** A stored SI value written in the parameter's display unit, to `digits` significant digits: "290 µA/V²", "4.1 nm". */
export function displayQuantity(value: number, info: ParameterInfo, digits = 4): string {
  return withUnit(formatQuantity(shifted(value, displayExponent(info)), '', { digits }), info.displayUnit);
}

/** The text an editor field starts with: every digit kept, so saving without touching the field changes nothing. */
export function editableQuantity(value: number | undefined, info: ParameterInfo): string {
  if (value === undefined) return '';
  const number = shifted(value, displayExponent(info));
  return withUnit(String(Number(number.toPrecision(15))), info.displayUnit);
}

/** "10 µA/V² … 2000 µA/V²": the plausible range, in the unit the field shows. */
export function rangeText(info: ParameterInfo): string {
  return `${displayQuantity(info.plausible.min, info)} … ${displayQuantity(info.plausible.max, info)}`;
}

/** True when the value lies in the parameter's plausible range (the server refuses the rest). */
export function inRange(value: number, info: ParameterInfo): boolean {
  const { min, max, exclusiveMin } = info.plausible;
  return (exclusiveMin ? value > min : value >= min) && value <= max;
}

/** A value of a diff or a table by its dotted path ("nmos.kp", "corners.FF.pmos.dvt"), in engineering notation. */
export function displayByPath(path: string, value: number | string | boolean | null): string {
  if (value === null) return '—';
  if (typeof value !== 'number') return String(value);
  const info = path.startsWith('tempRange.') ? parameterInfo(path) : parameterInfo(path.split('.').at(-1)!);
  return info ? displayQuantity(value, info) : formatQuantity(value);
}
