/** SPICE scale suffixes as powers of ten (case-insensitive; "m" is milli, "meg" mega); "mil" (25.4 µm) is apart. */
const DECADES: Record<string, number> = { t: 12, g: 9, meg: 6, k: 3, m: -3, u: -6, n: -9, p: -12, f: -15, a: -18 };
const MIL = 25.4e-6;

const NUMBER = /^([+-]?(?:\d+\.?\d*|\.\d+))(?:e([+-]?\d+))?(meg|mil|[tgkmunpfa])?([a-z]*)$/i;

/**
 * A SPICE number ("1.2n", "3meg", "10u", "2.5e17", "0.45V") as a plain number, or undefined when the text is
 * not one. As in SPICE, letters after the scale suffix are a unit and ignored ("10uF" = 10e-6).
 */
export function parseSpiceNumber(text: string): number | undefined {
  const match = NUMBER.exec(text);
  if (!match) return undefined;
  const [, mantissa, exponent, suffix] = match;
  const scale = suffix?.toLowerCase();
  // "4.1n" is read as 4.1e-9, the decimal it means, not 4.1 × 1e-9 (which is 4.0999999999999995e-9).
  const decades = Number(exponent ?? 0) + (scale && scale !== 'mil' ? DECADES[scale] : 0);
  const value = Number(`${mantissa}e${decades}`) * (scale === 'mil' ? MIL : 1);
  // Adding 0 turns −0 into 0, so that equal cards compare equal.
  return Number.isFinite(value) ? value + 0 : undefined;
}
