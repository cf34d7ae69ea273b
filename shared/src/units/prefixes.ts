/**
 * SI prefixes: The International System of Units (SI), BIPM SI Brochure, 9th ed., 2019, table 7.
 * The parser accepts y z a f p n µ m c k M G T P E Z Y, plus "u" and the Greek "μ" for micro and
 * SPICE's "meg" for mega; it refuses d, da and h (unused in electronics and easy to misread).
 * The formatter writes only the engineering prefixes a … T.
 */
export interface SiPrefix {
  readonly symbol: string;
  readonly name: string;
  /** The power of ten the prefix stands for. */
  readonly exponent: number;
}

/** U+00B5 MICRO SIGN, the micro the formatter writes; U+03BC (Greek small mu) and "u" are read as well. */
export const MICRO = '\u00b5';

export const SI_PREFIXES: readonly SiPrefix[] = [
  { symbol: 'y', name: 'yocto', exponent: -24 },
  { symbol: 'z', name: 'zepto', exponent: -21 },
  { symbol: 'a', name: 'atto', exponent: -18 },
  { symbol: 'f', name: 'femto', exponent: -15 },
  { symbol: 'p', name: 'pico', exponent: -12 },
  { symbol: 'n', name: 'nano', exponent: -9 },
  { symbol: MICRO, name: 'micro', exponent: -6 },
  { symbol: 'm', name: 'milli', exponent: -3 },
  { symbol: 'c', name: 'centi', exponent: -2 },
  { symbol: 'k', name: 'kilo', exponent: 3 },
  { symbol: 'M', name: 'mega', exponent: 6 },
  { symbol: 'G', name: 'giga', exponent: 9 },
  { symbol: 'T', name: 'tera', exponent: 12 },
  { symbol: 'P', name: 'peta', exponent: 15 },
  { symbol: 'E', name: 'exa', exponent: 18 },
  { symbol: 'Z', name: 'zetta', exponent: 21 },
  { symbol: 'Y', name: 'yotta', exponent: 24 },
];

/** Other spellings read as a prefix: "u" and Greek "μ" (micro), SPICE's "meg"/"Meg"/"MEG" (mega). */
const ALIASES: ReadonlyMap<string, number> = new Map([
  ['u', -6],
  ['\u03bc', -6],
  ['meg', 6],
  ['Meg', 6],
  ['MEG', 6],
]);

const BY_SYMBOL: ReadonlyMap<string, number> = new Map([
  ...SI_PREFIXES.map((p) => [p.symbol, p.exponent] as const),
  ...ALIASES,
]);

/** Longest spellings first, so "meg" is tried before "m". */
const SPELLINGS: readonly string[] = [...BY_SYMBOL.keys()].sort((a, b) => b.length - a.length);

/** The power of ten of a prefix spelling, or undefined when it is not one the parser accepts. */
export function prefixExponent(spelling: string): number | undefined {
  return BY_SYMBOL.get(spelling);
}

/** Every accepted prefix spelling, longest first. */
export function prefixSpellings(): readonly string[] {
  return SPELLINGS;
}

/** The symbol the formatter writes for an engineering power of ten (−18 … 12), '' for 0. */
export function engineeringPrefix(exponent: number): string | undefined {
  if (exponent === 0) return '';
  if (exponent < -18 || exponent > 12 || exponent % 3 !== 0) return undefined;
  return SI_PREFIXES.find((p) => p.exponent === exponent)?.symbol;
}
