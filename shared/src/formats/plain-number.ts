/**
 * A number for a file: the shortest decimal text that reads back to the value once the last bits of binary
 * noise are dropped (15 significant digits, the precision a double always keeps: IEEE 754-2019, 3.6), so a
 * width computed as 2.7700000000000005e-6 is written 2.77e-6 and a typed 0.5e-6 stays 5e-7. Readers get the
 * value to within one part in 10¹⁵ (ECMA-262 Number::toString gives the shortest round-trip text of what is
 * left). NaN and infinities have no plain text: they are written as an empty cell.
 */
export function plainNumber(value: number): string {
  if (!Number.isFinite(value)) return '';
  if (value === 0) return '0';
  return String(Number(value.toPrecision(15)));
}

/** plainNumber of value × 10^(−exponent): a length in µm (exponent −6) from metres. */
export function plainNumberIn(value: number, exponent: number): string {
  if (exponent === 0) return plainNumber(value);
  const [mantissa, own] = value.toExponential(16).split('e');
  return plainNumber(Number(`${mantissa}e${Number(own) - exponent}`));
}
