import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { SI_PREFIXES, formatQuantity, parseQuantity } from '../src/units/index.js';

// Prefixes and their powers of ten: The International System of Units (SI), BIPM SI Brochure, 9th ed., 2019, table 7.
const value = (text: string, unit?: string) => {
  const parsed = parseQuantity(text, unit);
  if (!parsed.ok) throw new Error(parsed.reason);
  return parsed.value;
};
const reason = (text: string, unit?: string) => {
  const parsed = parseQuantity(text, unit);
  if (parsed.ok) throw new Error(`"${text}" was accepted as ${parsed.value}`);
  return parsed.reason;
};

describe('parseQuantity', () => {
  it('reads a bare prefix after the number: "20u" is 20e-6 of the expected unit', () => {
    expect(value('20u', 'A')).toBe(20e-6);
    expect(value('20u')).toBe(20e-6);
  });

  it('reads a prefixed unit with or without a space: "20 µA", "0.5um", "0.5 µm", "1.2 V"', () => {
    expect(value('20 µA', 'A')).toBe(20e-6);
    expect(value('0.5um', 'm')).toBe(0.5e-6);
    expect(value('0.5 µm', 'm')).toBe(0.5e-6);
    expect(value('1.2 V', 'V')).toBe(1.2);
  });

  it('reads plain and exponent numbers: "3e-6", "-1.5", "+2", ".5", "1E3"', () => {
    expect(value('3e-6')).toBe(3e-6);
    expect(value('-1.5')).toBe(-1.5);
    expect(value('+2')).toBe(2);
    expect(value('.5')).toBe(0.5);
    expect(value('1E3')).toBe(1000);
  });

  it('knows every prefix from yocto to yotta of the SI Brochure (9th ed., 2019, table 7) except d, da, h', () => {
    for (const prefix of SI_PREFIXES) expect(value(`1 ${prefix.symbol}A`, 'A')).toBe(Number(`1e${prefix.exponent}`));
    expect(SI_PREFIXES.map((p) => p.exponent)).toEqual([-24, -21, -18, -15, -12, -9, -6, -3, -2, 3, 6, 9, 12, 15, 18, 21, 24]);
  });

  it('reads micro as µ (micro sign), μ (Greek mu) or u, and "meg" as mega as SPICE does', () => {
    expect(value('7 \u00b5A', 'A')).toBe(7e-6);
    expect(value('7 \u03bcA', 'A')).toBe(7e-6);
    expect(value('7uA', 'A')).toBe(7e-6);
    expect(value('2meg')).toBe(2e6);
    expect(value('2 MegΩ', 'Ω')).toBe(2e6);
  });

  it('keeps capital M for mega and small m for milli (SI Brochure 2019: prefix symbols are case-sensitive)', () => {
    expect(value('3 MHz', 'Hz')).toBe(3e6);
    expect(value('3 mHz', 'Hz')).toBe(3e-3);
  });

  it('takes a lone "m" as metre in a length field and as milli elsewhere', () => {
    expect(value('5m', 'm')).toBe(5);
    expect(value('5m', 'V')).toBe(5e-3);
    expect(value('5 mm', 'm')).toBe(5e-3);
  });

  it('applies an exponent to the prefixed unit: 1 µm² is 1e-12 m², 1 fF/µm² is 1e-3 F/m² (SI Brochure 2019, 3)', () => {
    expect(value('1 µm²', 'm²')).toBeCloseTo(1e-12, 25);
    expect(value('1 fF/µm²', 'F/m²')).toBeCloseTo(1e-3, 15);
    expect(value('1e17 cm^-3', 'm^-3')).toBe(1e23);
    expect(value('1e17 cm⁻³', 'm⁻³')).toBe(1e23);
  });

  it('reads compound units of the process parameters: A/V², √V, 1/V, V/K, V·m, %·µm', () => {
    expect(value('290 µA/V²', 'A/V²')).toBeCloseTo(290e-6, 18);
    expect(value('0.45 √V', '√V')).toBe(0.45);
    expect(value('0.45 V^0.5', '√V')).toBe(0.45);
    expect(value('0.08 1/V', '1/V')).toBe(0.08);
    expect(value('-1 mV/K', 'V/K')).toBe(-1e-3);
    expect(value('4.5 mV·µm', 'V·m')).toBeCloseTo(4.5e-9, 22);
    expect(value('1 %·µm', 'm')).toBeCloseTo(1e-8, 22);
  });

  it('reads temperatures in °C without prefixes', () => {
    expect(value('-40 °C', '°C')).toBe(-40);
    expect(value('125 ℃', '°C')).toBe(125);
  });

  it('refuses a value in the wrong unit and says which quantity each is', () => {
    expect(reason('1.2 V', 'A')).toBe('1.2 V is a voltage (V), but this field takes a current (A)');
    expect(reason('20 µA', 'm')).toContain('this field takes a length (m)');
    expect(reason('3 fF', 'F/m²')).toContain('a capacitance per area (F/m²)');
  });

  it('refuses what is not a quantity, with the reason, and never answers NaN', () => {
    expect(reason('')).toContain('Enter a number');
    expect(reason('abc', 'A')).toContain('does not start with a number');
    expect(reason('3 xyz', 'A')).toContain('not a unit');
    expect(reason('0,5', 'm')).toContain('decimal separator');
    expect(reason('1e400', 'A')).toContain('too large');
    expect(reason('1 A/V/s')).toContain('more than one "/"');
  });

  it('reads back what formatQuantity writes, to its significant digits', () => {
    fc.assert(
      fc.property(fc.double({ min: 1e-17, max: 1e11, noNaN: true }), fc.constantFrom('A', 'V', 'm', 'F', 'S', 'Hz', 'A/V²'), fc.boolean(), (magnitude, unit, negative) => {
        const x = negative ? -magnitude : magnitude;
        const back = parseQuantity(formatQuantity(x, unit, { digits: 6 }), unit);
        expect(back.ok).toBe(true);
        if (back.ok) expect(Math.abs(back.value - x) / Math.abs(x)).toBeLessThan(1e-5);
      }),
    );
  });
});

describe('gm/ID spellings', () => {
  it('reads 18 S/A (S = A/V, SI Brochure, 9th ed., 2019, table 4) and the shorthand 18 A/V as 18 /V in a 1/V field', () => {
    for (const text of ['18 S/A', '18 A/V', '18 1/V', '18 /V', '18']) expect(parseQuantity(text, '1/V')).toEqual({ ok: true, value: 18, unit: '1/V' });
  });

  it('still refuses A/V where a conductance is not what the field takes', () => {
    expect(parseQuantity('18 A/V', 'V').ok).toBe(false);
  });
});
