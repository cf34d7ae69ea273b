import { describe, expect, it } from 'vitest';
import { BF180G, channelCurrentAt, kpAtTemperature, prepareDevice, zeroTemperatureCoefficientVgs } from '../src/device/index.js';
import type { Process } from '../src/schemas/index.js';
import { celsiusToKelvin } from '../src/units/index.js';

const geometry = { w: 10e-6, l: 1e-6 };
const at = (temperature: number, vgs: number, model: 'all-region' | 'square-law' = 'all-region') =>
  channelCurrentAt(prepareDevice(BF180G, 'nmos', { temperature }), model, geometry.w, geometry.l, vgs, 1.2, 0);

describe('temperature', () => {
  it('kp(T) = kp·(T/Tnom)^−1.5: ×1.46068 at −40 °C, ×0.76720 at 85 °C, ×0.65454 at 125 °C (lattice scattering; SPICE level 1, ngspice mos1temp.c)', () => {
    const tnom = celsiusToKelvin(27);
    for (const [celsius, ratio] of [[-40, 1.46068], [0, 1.15188], [85, 0.7672], [125, 0.65454], [150, 0.5974]]) {
      expect(kpAtTemperature(1, celsiusToKelvin(celsius), tnom, -1.5)).toBeCloseTo(ratio, 5);
    }
  });

  it('VT falls when hotter (common practice, no source)', () => {
    expect(prepareDevice(BF180G, 'nmos', { temperature: 125 }).vtZeroBias).toBeLessThan(prepareDevice(BF180G, 'nmos', { temperature: 27 }).vtZeroBias);
    expect(prepareDevice(BF180G, 'pmos', { temperature: 125 }).vtZeroBias).toBeLessThan(prepareDevice(BF180G, 'pmos', { temperature: 27 }).vtZeroBias);
  });

  it('subthreshold current rises when hotter (common practice, no source)', () => {
    expect(at(85, 0.2)).toBeGreaterThan(10 * at(27, 0.2));
  });

  it('saturation current at large overdrive falls when hotter (common practice, no source)', () => {
    expect(at(125, 1.8)).toBeLessThan(at(27, 1.8));
    expect(at(27, 1.8)).toBeLessThan(at(-40, 1.8));
  });

  it('finds the zero-temperature-coefficient VGS: ID is flat in temperature there, rising below and falling above', () => {
    const ztc = zeroTemperatureCoefficientVgs(BF180G, { polarity: 'nmos', ...geometry, vds: 1.2, vsb: 0 });
    expect(Math.abs(at(28, ztc.vgs) - at(26, ztc.vgs)) / ztc.id).toBeLessThan(1e-5);
    expect(at(28, ztc.vgs - 0.1)).toBeGreaterThan(at(26, ztc.vgs - 0.1));
    expect(at(28, ztc.vgs + 0.1)).toBeLessThan(at(26, ztc.vgs + 0.1));
  });

  it('puts the square-law ZTC at VOV = 2·vtTc·T/muExp (from ID ∝ T^muExp·(VGS − VT(T))²): 0.4002 V for −1 mV/K, −1.5, 300.15 K', () => {
    const flat: Process = { ...BF180G, nmos: { ...BF180G.nmos, lRef: undefined, lambda: 0 } };
    const ztc = zeroTemperatureCoefficientVgs(flat, { polarity: 'nmos', model: 'square-law', ...geometry, vds: 1.5, vsb: 0 });
    expect(ztc.vov).toBeCloseTo((2 * -1e-3 * 300.15) / -1.5, 5);
  });
});
