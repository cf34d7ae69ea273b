/** SPICE scale suffixes (case-insensitive; "m" is milli, "meg" mega, "mil" a thousandth of an inch). */
const SCALE: Record<string, number> = { t: 1e12, g: 1e9, meg: 1e6, k: 1e3, mil: 25.4e-6, m: 1e-3, u: 1e-6, n: 1e-9, p: 1e-12, f: 1e-15, a: 1e-18 };

const NUMBER = /^([+-]?(?:\d+\.?\d*|\.\d+)(?:e[+-]?\d+)?)(meg|mil|[tgkmunpfa])?([a-z]*)$/i;

/**
 * A SPICE number ("1.2n", "3meg", "10u", "2.5e17", "0.45V") as a plain number, or undefined when the text is
 * not one. As in SPICE, letters after the scale suffix are a unit and ignored ("10uF" = 10e-6).
 */
export function parseSpiceNumber(text: string): number | undefined {
  const match = NUMBER.exec(text);
  if (!match) return undefined;
  const value = Number(match[1]) * (match[2] ? SCALE[match[2].toLowerCase()] : 1);
  // Adding 0 turns −0 into 0, so that equal cards compare equal.
  return Number.isFinite(value) ? value + 0 : undefined;
}
