import { describe, expect, it } from 'vitest';
import { BF180G, dennardRatios, drainCurrent, gateCapacitances, lambdaAtLength, oxideCapacitance, prepareDevice, scaleConstantField, slopeFactor, thresholdAt } from '../src/device/index.js';

// R. H. Dennard, F. H. Gaensslen, H.-N. Yu, V. L. Rideout, E. Bassous, A. R. LeBlanc, "Design of ion-implanted
// MOSFET's with very small physical dimensions", IEEE JSSC SC-9(5), 256–268, 1974, table I: scaling by κ
// divides dimensions, voltage, current, capacitance and delay by κ, power per circuit by κ², and keeps the power density.
describe('constant-field scaling', () => {
  it('lists the ratios of Dennard et al. (1974), table I', () => {
    expect(dennardRatios(2)).toEqual({ dimension: 0.5, doping: 2, voltage: 0.5, current: 0.5, capacitance: 0.5, delay: 0.5, powerPerCircuit: 0.25, powerDensity: 1 });
  });

  it('a device scaled by κ = 2 computes 1/κ the current, 1/κ the capacitance and delay, 1/κ² the power, the same power density', () => {
    const kappa = 2;
    const original = { params: { ...BF180G.nmos, tox: 10e-9, lmin: 0.5e-6 }, w: 20e-6, l: 1e-6, vgs: 2.5, vds: 4, vsb: 1, vdd: 5 };
    const scaled = scaleConstantField(original, kappa);
    const figures = (d: typeof original) => {
      const device = prepareDevice({ ...BF180G, vdd: d.vdd, nmos: d.params }, 'nmos');
      const vt = thresholdAt(device, d.vsb);
      // Square law, far above threshold, where nothing but the scaled quantities enters.
      const current = drainCurrent('square-law', (device.kp * d.w) / d.l, slopeFactor(d.params, d.vsb), device.ut, lambdaAtLength(d.params, d.l), d.vgs - vt, d.vds);
      // Charge-based Cgs: at these overdrives within about 2 % of Meyer's (2/3)·W·L·Cox + W·cgdo.
      const { cgs } = gateCapacitances(d.w, d.l, oxideCapacitance(d.params.tox), d.params.cgdo, { vov: d.vgs - vt, vds: d.vds, n: slopeFactor(d.params, d.vsb), ut: device.ut });
      return { vt, current, cgs, delay: (cgs * d.vdd) / current, power: d.vdd * current, density: (d.vdd * current) / (d.w * d.l), kp: device.kp };
    };
    const before = figures(original);
    const after = figures(scaled);
    const ratios = dennardRatios(kappa);
    expect(after.vt / before.vt).toBeCloseTo(ratios.voltage, 10);
    expect(after.current / before.current).toBeCloseTo(ratios.current, 10);
    // Within 2 %: the thermal voltage does not scale, so the normalised channel charge moves a little.
    expect(Math.abs(after.cgs / before.cgs / ratios.capacitance - 1)).toBeLessThan(0.02);
    expect(Math.abs(after.delay / before.delay / ratios.delay - 1)).toBeLessThan(0.02);
    expect(after.power / before.power).toBeCloseTo(ratios.powerPerCircuit, 10);
    expect(after.density / before.density).toBeCloseTo(ratios.powerDensity, 10);
    expect(after.kp / before.kp).toBeCloseTo(kappa, 10);
  });

  it('scales doping by κ and the body-effect coefficient by 1/√κ (γ ∝ √NA/Cox)', () => {
    const scaled = scaleConstantField({ params: BF180G.nmos, w: 1e-6, l: 1e-6, vgs: 1, vds: 1, vsb: 0, vdd: 1.8, substrateDoping: 1e23 }, 4);
    expect(scaled.substrateDoping).toBe(4e23);
    expect(scaled.params.gamma).toBeCloseTo(BF180G.nmos.gamma / 2, 15);
  });
});
