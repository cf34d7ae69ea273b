import { formatQuantity } from '@channelwright/shared/units';

/** Units whose numbers are written plainly: ratios and quantities that take no SI prefix. */
const PLAIN_UNITS = new Set(['', 'V/V', '1/V', '°C', '%']);

/** Axis ticks in engineering notation with the unit left to the axis label: 1e-6 A → "1 µ", 1000 → "1000". */
export function formatTick(value: number, unit: string): string {
  if (PLAIN_UNITS.has(unit)) return plainTick(value);
  const text = formatQuantity(value, unit, { digits: 3 });
  return text.endsWith(unit) ? text.slice(0, -unit.length).replace(/\s+$/, '') : text;
}

/** Plain numbers for ratios, 1/V and °C: whole numbers as they are, others to three digits, large ones as 1e5. */
function plainTick(value: number): string {
  const magnitude = Math.abs(value);
  if (value === 0) return '0';
  if (magnitude >= 1e5 || magnitude < 1e-3) {
    const [mantissa, exponent] = value.toExponential(2).split('e');
    return `${Number(mantissa)}e${Number(exponent)}`;
  }
  return String(Number(value.toPrecision(3)));
}
