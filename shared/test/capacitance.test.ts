import { describe, expect, it } from 'vitest';
import { gateCapacitances, junctionCapacitance, oxideCapacitance, transitFrequency } from '../src/device/index.js';

// Cox = εr(SiO2)·ε0/tox with εr = 3.9 (Sze & Ng, Physics of Semiconductor Devices, 3rd ed., 2007) and
// ε0 = 8.8541878128e-12 F/m (CODATA 2018, Tiesinga et al., Rev. Mod. Phys. 93, 025010, 2021).
describe('oxideCapacitance', () => {
  it('is 3.4531 fF/µm² (3.453133e-3 F/m²) for 10 nm of SiO2', () => {
    expect(oxideCapacitance(10e-9)).toBeCloseTo(3.453133e-3, 8);
  });

  it('is 8.6328 fF/µm² (8.632833e-3 F/m²) for 4 nm of SiO2', () => {
    expect(oxideCapacitance(4e-9)).toBeCloseTo(8.632833e-3, 8);
  });
});

describe('gate capacitances (Meyer, saturation; Tsividis & McAndrew 2011, ch. 8)', () => {
  it('Cgs = (2/3)·W·L·Cox + W·cgdo and Cgd = W·cgdo', () => {
    const cox = oxideCapacitance(4e-9);
    const { cgs, cgd } = gateCapacitances(10e-6, 1e-6, cox, 0.3e-9);
    expect(cgs).toBeCloseTo((2 / 3) * 10e-12 * cox + 3e-15, 25);
    expect(cgd).toBeCloseTo(3e-15, 25);
  });

  it('fT = gm/(2π(Cgs + Cgd))', () => {
    expect(transitFrequency(1e-3, 80e-15, 20e-15)).toBeCloseTo(1e-3 / (2 * Math.PI * 100e-15), 0);
    expect(transitFrequency(0, 0, 0)).toBe(0);
  });
});

describe('junctionCapacitance', () => {
  it('is cj·W·ldiff + cjsw·(W + 2·ldiff) at zero bias', () => {
    expect(junctionCapacitance(10e-6, 0.5e-6, 1e-3, 0.2e-9)).toBeCloseTo(5e-15 + 0.2e-9 * 11e-6, 25);
  });
});
