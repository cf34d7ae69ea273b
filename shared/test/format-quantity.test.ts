import { describe, expect, it } from 'vitest';
import { formatQuantity } from '../src/units/index.js';

// Engineering notation with the SI prefixes a … T of the BIPM SI Brochure, 9th ed., 2019, table 7.
describe('formatQuantity', () => {
  it('writes 2e-5 A as "20 µA" and 5e-7 m as "500 nm"', () => {
    expect(formatQuantity(2e-5, 'A')).toBe('20 µA');
    expect(formatQuantity(5e-7, 'm')).toBe('500 nm');
  });

  it('chooses the prefix that leaves 1 to 999 before it', () => {
    expect(formatQuantity(1.8, 'V')).toBe('1.8 V');
    expect(formatQuantity(0.45, 'V')).toBe('450 mV');
    expect(formatQuantity(5.3668e9, 'Hz')).toBe('5.367 GHz');
    expect(formatQuantity(1.2e-16, 'A')).toBe('120 aA');
    expect(formatQuantity(2.9e-4, 'A/V²')).toBe('290 µA/V²');
  });

  it('rounds to the significant digits asked for and moves to the next prefix when rounding reaches 1000', () => {
    expect(formatQuantity(999.96e-6, 'A')).toBe('1 mA');
    expect(formatQuantity(1.23456e-6, 'A', { digits: 3 })).toBe('1.23 µA');
    expect(formatQuantity(1.23456e-6, 'A', { digits: 6 })).toBe('1.23456 µA');
  });

  it('writes negative values with an ASCII minus', () => {
    expect(formatQuantity(-2e-5, 'A')).toBe('-20 µA');
  });

  it('puts no prefix on units that cannot take one (1/V, √V, °C, plain numbers) and uses exponents beyond a … T', () => {
    expect(formatQuantity(0.0034, '1/V')).toBe('0.0034 1/V');
    expect(formatQuantity(27, '°C')).toBe('27 °C');
    expect(formatQuantity(1234.5, '')).toBe('1235');
    expect(formatQuantity(1e-21, 'A')).toBe('1e-21 A');
    expect(formatQuantity(1e23, 'm⁻³')).toBe('1e23 m⁻³');
  });

  it('writes a plain number with more whole digits than asked for as the rounded number, not in exponent form', () => {
    expect(formatQuantity(12345, '')).toBe('12350');
    expect(formatQuantity(1000, '', { digits: 3 })).toBe('1000');
    expect(formatQuantity(-98765.4, '1/V')).toBe('-98770 1/V');
    expect(formatQuantity(126.6, 'V/V')).not.toContain('e');
  });

  it('writes zero as "0 A", NaN as "—" and infinities as "∞"', () => {
    expect(formatQuantity(0, 'A')).toBe('0 A');
    expect(formatQuantity(Number.NaN, 'A')).toBe('—');
    expect(formatQuantity(Number.POSITIVE_INFINITY, 'Ω')).toBe('∞ Ω');
  });
});
