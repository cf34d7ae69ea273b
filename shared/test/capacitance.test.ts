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

describe('gate capacitances, charge-based (Enz & Vittoz, Charge-Based MOS Transistor Modeling, Wiley, 2006)', () => {
  const cox = oxideCapacitance(4e-9);
  const [w, l, cgdo, n, ut] = [10e-6, 1e-6, 0.3e-9, 1.3, 0.025852];
  const area = w * l * cox;
  const overlap = w * cgdo;

  it("reach the saturation values of Meyer's model in strong inversion: Cgs = (2/3)·W·L·Cox + W·cgdo, Cgd = W·cgdo, Cgb = (n − 1)/(3n)·W·L·Cox (Tsividis & McAndrew 2011, ch. 8)", () => {
    const { cgs, cgd, cgb } = gateCapacitances(w, l, cox, cgdo, { vov: 3, vds: 5, n, ut });
    expect((cgs - overlap) / area).toBeCloseTo(2 / 3, 1);
    expect((cgd - overlap) / area).toBeLessThan(1e-6);
    expect(cgb / area).toBeCloseTo((n - 1) / (3 * n), 1);
  });

  it('split the channel evenly between source and drain in triode at VDS → 0: Cgs = Cgd = W·L·Cox/2 + W·cgdo', () => {
    const { cgs, cgd, cgb } = gateCapacitances(w, l, cox, cgdo, { vov: 3, vds: 1e-9, n, ut });
    expect((cgs - overlap) / area).toBeCloseTo(0.5, 1);
    expect(cgd).toBeCloseTo(cgs, 20);
    expect(cgb / area).toBeLessThan(0.01);
  });

  it('leave only the depletion capacitance (n − 1)/n·W·L·Cox in weak inversion, so Cgg falls well below its strong-inversion value', () => {
    const weak = gateCapacitances(w, l, cox, cgdo, { vov: -0.4, vds: 1, n, ut });
    const strong = gateCapacitances(w, l, cox, cgdo, { vov: 1, vds: 1, n, ut });
    expect((weak.cgs - overlap) / area).toBeLessThan(1e-3);
    expect(weak.cgb / area).toBeCloseTo((n - 1) / n, 2);
    expect(weak.cgg).toBeCloseTo(weak.cgs + weak.cgd + weak.cgb, 25);
    expect(weak.cgg / strong.cgg).toBeLessThan(0.5);
  });

  it('fT = gm/(2π·Cgg)', () => {
    expect(transitFrequency(1e-3, 100e-15)).toBeCloseTo(1e-3 / (2 * Math.PI * 100e-15), 0);
    expect(transitFrequency(0, 0)).toBe(0);
  });
});

describe('junctionCapacitance', () => {
  it('is cj·W·ldiff + cjsw·(W + 2·ldiff) at zero bias', () => {
    expect(junctionCapacitance(10e-6, 0.5e-6, 1e-3, 0.2e-9)).toBeCloseTo(5e-15 + 0.2e-9 * 11e-6, 25);
  });

  it('falls with reverse bias as C0/(1 + VR/PB)^M (depletion capacitance; Sze & Ng 2007, ch. 2)', () => {
    const bias = { reverse: 0.9, pb: 0.8, mj: 0.5, mjsw: 0.33 };
    const expected = 5e-15 / Math.sqrt(1 + 0.9 / 0.8) + (0.2e-9 * 11e-6) / (1 + 0.9 / 0.8) ** 0.33;
    expect(junctionCapacitance(10e-6, 0.5e-6, 1e-3, 0.2e-9, bias)).toBeCloseTo(expected, 25);
    expect(junctionCapacitance(10e-6, 0.5e-6, 1e-3, 0.2e-9, bias)).toBeLessThan(junctionCapacitance(10e-6, 0.5e-6, 1e-3, 0.2e-9));
  });
});
