import { describe, expect, it } from 'vitest';
import { thermalVoltage } from '../src/device/index.js';
import { celsiusToKelvin, epsilon0, epsilonRSi, epsilonRSiO2, k, q } from '../src/units/index.js';

// Reference values: k = 1.380649e-23 J/K and q = 1.602176634e-19 C are exact defining constants,
// BIPM, The International System of Units (SI Brochure), 9th ed., 2019, table 1. UT = kT/q follows exactly.
describe('constants', () => {
  it('k and q are the exact SI 2019 values (SI Brochure, 9th ed., 2019)', () => {
    expect(k).toBe(1.380649e-23);
    expect(q).toBe(1.602176634e-19);
  });

  it('ε0 is the CODATA 2018 value 8.8541878128e-12 F/m (Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021)', () => {
    expect(epsilon0).toBe(8.8541878128e-12);
  });

  it('εr is 3.9 for SiO2 (Sze & Ng 2007) and 11.7 for Si (SPICE; Tsividis & McAndrew 2011)', () => {
    expect(epsilonRSiO2).toBe(3.9);
    expect(epsilonRSi).toBe(11.7);
  });
});

describe('thermalVoltage', () => {
  it('kT/q is 25.851999786 mV at 300 K (exact SI k and q, SI Brochure 2019)', () => {
    expect(thermalVoltage(300)).toBeCloseTo(0.025851999786, 12);
  });

  it('kT/q is 25.864925786 mV at 300.15 K = 27 °C, 0.05 % above 300 K', () => {
    expect(thermalVoltage(celsiusToKelvin(27))).toBeCloseTo(0.025864925786, 12);
    expect(thermalVoltage(300.15) / thermalVoltage(300)).toBeCloseTo(1.0005, 12);
  });

  it('the ideal subthreshold swing ln(10)·kT/q is 59.53 mV/decade at 300 K (SI Brochure 2019 constants)', () => {
    expect(Math.LN10 * thermalVoltage(300) * 1e3).toBeCloseTo(59.5264, 4);
  });

  it('the swing with slope factor n is n times the ideal one (1.3 → 77.38 mV/dec at 300 K)', () => {
    for (const [n, swing] of [[1.1, 65.479], [1.2, 71.432], [1.3, 77.384], [1.5, 89.29], [2, 119.053]]) {
      expect(n * Math.LN10 * thermalVoltage(300) * 1e3).toBeCloseTo(swing, 2);
    }
  });

  it('°C become kelvin by adding 273.15 (SI Brochure 2019, 2.3.1)', () => {
    expect(celsiusToKelvin(-40)).toBeCloseTo(233.15, 12);
    expect(thermalVoltage(celsiusToKelvin(125)) * 1e3).toBeCloseTo(34.309912383, 8);
  });

  it('refuses temperatures at or below 0 K with a code instead of NaN', () => {
    expect(() => thermalVoltage(0)).toThrow(expect.objectContaining({ code: 'TEMPERATURE_BELOW_ABSOLUTE_ZERO' }));
  });
});
