import { prefixExponent, prefixSpellings } from './prefixes.js';

/**
 * A unit written as text ("A/V²", "fF/µm²", "mV·µm", "cm^-3", "√V", "1/V") read into the powers
 * of its symbols and the power of ten its prefixes stand for: "fF/µm²" is F¹·m⁻² × 10^(−15+12).
 * A prefix binds to its symbol before the exponent, as the SI Brochure (9th ed., 2019, 3) says:
 * µm² = (10⁻⁶ m)² = 10⁻¹² m².
 */
export interface UnitExpression {
  /** Symbol → power, in the order the symbols appear; "°C" stands alone. */
  readonly dimension: Readonly<Record<string, number>>;
  /** The value in these units times 10^scaleExponent is the value in the unprefixed symbols. */
  readonly scaleExponent: number;
}

export type UnitReading = { ok: true; unit: UnitExpression } | { ok: false; reason: string };

/** Unit symbols the parser knows, with the quantity each one measures. */
export const UNIT_SYMBOLS: Readonly<Record<string, string>> = {
  A: 'a current',
  V: 'a voltage',
  m: 'a length',
  F: 'a capacitance',
  S: 'a conductance',
  '\u03a9': 'a resistance',
  s: 'a time',
  Hz: 'a frequency',
  K: 'a temperature',
  W: 'a power',
  C: 'a charge',
  J: 'an energy',
  dec: 'decades',
};

const CELSIUS = '°C';
const SYMBOL_ALIASES: Readonly<Record<string, string>> = {
  ohm: '\u03a9',
  Ohm: '\u03a9',
  ohms: '\u03a9',
  '\u2126': '\u03a9',
  '℃': CELSIUS,
  degC: CELSIUS,
};

const SUPERSCRIPTS: Readonly<Record<string, string>> = {
  '⁻': '-', '⁺': '+', '⁰': '0', '¹': '1', '²': '2', '³': '3', '⁴': '4', '⁵': '5', '⁶': '6', '⁷': '7', '⁸': '8', '⁹': '9', '½': '0.5',
};
const SUPERSCRIPT_RUN = /[⁻⁺⁰¹²³⁴⁵⁶⁷⁸⁹½]+$/;
const DIGIT_RUN = /[-−+]?\d+$/;

/** Canonical spelling of a symbol ("ohm" → "Ω", "℃" → "°C"), or the text itself. */
export function canonicalSymbol(text: string): string {
  return SYMBOL_ALIASES[text] ?? text;
}

/** True when the text names a unit symbol on its own (no prefix). */
export function isUnitSymbol(text: string): boolean {
  const symbol = canonicalSymbol(text);
  return symbol in UNIT_SYMBOLS || symbol === CELSIUS;
}

/** Reads a unit expression; '' is the dimensionless unit. */
export function readUnit(text: string): UnitReading {
  const compact = text.trim().replace(/\s*([/·⋅*^])\s*/g, '$1');
  if (compact === '') return { ok: true, unit: { dimension: {}, scaleExponent: 0 } };
  if (canonicalSymbol(compact) === CELSIUS) return { ok: true, unit: { dimension: { [CELSIUS]: 1 }, scaleExponent: 0 } };
  const halves = splitSolidus(compact);
  if (!halves.ok) return halves;
  const dimension: Record<string, number> = {};
  let scaleExponent = 0;
  for (const [part, sign] of [[halves.numerator, 1], [halves.denominator, -1]] as const) {
    if (part === '') continue;
    for (const termText of part.split(/[·⋅* ]+|(?<!\d)\.(?!\d)/)) {
      if (termText === '1' && sign === 1) continue;
      const term = readTerm(termText);
      if (!term.ok) return term;
      if (term.symbol !== '') dimension[term.symbol] = (dimension[term.symbol] ?? 0) + sign * term.power;
      scaleExponent += sign * term.scaleExponent;
    }
  }
  for (const symbol of Object.keys(dimension)) if (Math.abs(dimension[symbol]) < 1e-12) delete dimension[symbol];
  return { ok: true, unit: { dimension, scaleExponent } };
}

function splitSolidus(text: string): { ok: true; numerator: string; denominator: string } | { ok: false; reason: string } {
  const parts = text.split('/');
  if (parts.length > 2) return { ok: false, reason: `"${text}" has more than one "/"; write the denominator in parentheses, e.g. A/(V·m)` };
  const denominator = (parts[1] ?? '').replace(/^\((.*)\)$/, '$1');
  if (parts.length === 2 && denominator === '') return { ok: false, reason: `"${text}" has nothing after "/"` };
  return { ok: true, numerator: parts[0], denominator };
}

type TermReading = { ok: true; symbol: string; power: number; scaleExponent: number } | { ok: false; reason: string };

function readTerm(text: string): TermReading {
  if (text === '%') return { ok: true, symbol: '', power: 0, scaleExponent: -2 };
  const root = /^(?:√|sqrt\()(.+?)\)?$/.exec(text);
  if (root) return readPoweredBase(root[1], 0.5, text);
  const caret = text.indexOf('^');
  if (caret >= 0) {
    const power = readPower(text.slice(caret + 1).replace(/^\((.*)\)$/, '$1'));
    if (power === undefined) return { ok: false, reason: `"${text}" has an exponent that is not a number` };
    return readPoweredBase(text.slice(0, caret), power, text);
  }
  const superscript = SUPERSCRIPT_RUN.exec(text);
  if (superscript) {
    const power = readPower([...superscript[0]].map((c) => SUPERSCRIPTS[c]).join(''));
    if (power === undefined) return { ok: false, reason: `"${text}" has an exponent that is not a number` };
    return readPoweredBase(text.slice(0, superscript.index), power, text);
  }
  const digits = DIGIT_RUN.exec(text);
  if (digits && digits.index > 0) return readPoweredBase(text.slice(0, digits.index), Number(digits[0].replace('−', '-')), text);
  return readPoweredBase(text, 1, text);
}

function readPower(text: string): number | undefined {
  const fraction = /^([-−+]?\d+)\/(\d+)$/.exec(text);
  if (fraction) return Number(fraction[1].replace('−', '-')) / Number(fraction[2]);
  if (!/^[-−+]?\d+(\.\d+)?$/.test(text)) return undefined;
  return Number(text.replace('−', '-'));
}

function readPoweredBase(base: string, power: number, whole: string): TermReading {
  const exact = canonicalSymbol(base);
  if (exact in UNIT_SYMBOLS) return { ok: true, symbol: exact, power, scaleExponent: 0 };
  if (exact === CELSIUS) return { ok: false, reason: '°C cannot be combined with other units or prefixes' };
  for (const spelling of prefixSpellings()) {
    if (!base.startsWith(spelling) || base.length === spelling.length) continue;
    const symbol = canonicalSymbol(base.slice(spelling.length));
    if (symbol in UNIT_SYMBOLS) return { ok: true, symbol, power, scaleExponent: (prefixExponent(spelling) ?? 0) * power };
  }
  return { ok: false, reason: `"${whole}" is not a unit Channelwright knows` };
}

/** True when two unit expressions measure the same quantity (same symbols, same powers). */
export function sameDimension(a: UnitExpression, b: UnitExpression): boolean {
  const keysA = Object.keys(a.dimension);
  if (keysA.length !== Object.keys(b.dimension).length) return false;
  return keysA.every((key) => Math.abs(a.dimension[key] - (b.dimension[key] ?? Number.NaN)) < 1e-12);
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

function powerSuffix(power: number): string {
  if (power === 1) return '';
  if (Number.isInteger(power)) return [...String(power)].map((c) => (c === '-' ? '⁻' : SUPERSCRIPT_DIGITS[Number(c)])).join('');
  return `^${power}`;
}

/** Writes a dimension canonically: "A/V²", "V·m", "1/V", "m⁻³" for a lone negative power, "√V" for a power of ½. */
export function formatDimension(dimension: Readonly<Record<string, number>>): string {
  const entries = Object.entries(dimension);
  const write = ([symbol, power]: [string, number]) => (power === 0.5 ? `√${symbol}` : `${symbol}${powerSuffix(power)}`);
  const numerator = entries.filter(([, p]) => p > 0).map(write);
  const denominator = entries.filter(([, p]) => p < 0).map(([s, p]) => write([s, -p]));
  if (denominator.length === 0) return numerator.join('·');
  if (numerator.length === 0 && denominator.length === 1 && Number.isInteger(dimension[entries[0][0]])) {
    return `${entries[0][0]}${powerSuffix(entries[0][1])}`;
  }
  const bottom = denominator.length > 1 ? `(${denominator.join('·')})` : denominator[0];
  return `${numerator.length ? numerator.join('·') : '1'}/${bottom}`;
}

/** "a current (A)", "a capacitance per area (F/m²)", or "a quantity in X" for the rest. */
export function describeDimension(dimension: Readonly<Record<string, number>>): string {
  const unit = formatDimension(dimension);
  if (unit === '') return 'a plain number';
  if (unit === CELSIUS) return 'a temperature (°C)';
  const named = QUANTITY_NAMES[unit];
  if (named) return `${named} (${unit})`;
  const keys = Object.keys(dimension);
  if (keys.length === 1 && dimension[keys[0]] === 1) return `${UNIT_SYMBOLS[keys[0]]} (${unit})`;
  return `a quantity in ${unit}`;
}

const QUANTITY_NAMES: Readonly<Record<string, string>> = {
  'A/V²': 'a transconductance parameter',
  '√V': 'a body-effect coefficient',
  '1/V': 'an inverse voltage',
  'V/K': 'a temperature coefficient',
  'F/m': 'a capacitance per length',
  'F/m²': 'a capacitance per area',
  'A/m²': 'a current density',
  'V·m': 'a mismatch coefficient',
  'm²': 'an area',
  'm⁻³': 'a density',
};
