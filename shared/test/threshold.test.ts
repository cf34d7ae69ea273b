import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BF180G, bodyEffect, prepareDevice, thresholdAt, thresholdVoltage } from '../src/device/index.js';

const params = { vt0: 0.45, gamma: 0.45, twoPhiF: 0.88, vtTc: -1e-3 };
const tnomK = 300.15;

// The body-effect law VT = VT0 + γ(√(2φF + VSB) − √(2φF)): Tsividis & McAndrew, Operation and Modeling of the
// MOS Transistor, 3rd ed., 2011, ch. 4; the same as SPICE level 1 for VSB ≥ 0
// (ngspice-39 source, src/spicelib/devices/mos1/mos1load.c, 2023).
describe('thresholdVoltage', () => {
  it('VSB = 0 at tnom gives vt0 exactly (common practice, no source)', () => {
    expect(thresholdVoltage(params, 0, tnomK, tnomK)).toBe(0.45);
    expect(thresholdAt(prepareDevice(BF180G, 'nmos'), 0)).toBe(BF180G.nmos.vt0);
    expect(thresholdAt(prepareDevice(BF180G, 'pmos'), 0)).toBe(BF180G.pmos.vt0);
  });

  it('VT rises with VSB as γ(√(2φF + VSB) − √(2φF)): +0.1065 V at VSB = 0.5 V for γ = 0.45 √V, 2φF = 0.88 V', () => {
    expect(thresholdVoltage(params, 0.5, tnomK, tnomK) - 0.45).toBeCloseTo(0.45 * (Math.sqrt(1.38) - Math.sqrt(0.88)), 14);
    expect(bodyEffect(0.45, 0.88, 0.5)).toBeCloseTo(0.106493, 6);
  });

  it('VT rises with VSB for every γ > 0 and 2φF (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 1.5, noNaN: true }), fc.double({ min: 0.3, max: 1.2, noNaN: true }), fc.double({ min: -0.29, max: 5, noNaN: true }), fc.double({ min: 1e-3, max: 3, noNaN: true }), (gamma, twoPhiF, vsb, step) => {
        const p = { ...params, gamma, twoPhiF };
        expect(thresholdVoltage(p, vsb + step, tnomK, tnomK)).toBeGreaterThan(thresholdVoltage(p, vsb, tnomK, tnomK));
      }),
    );
  });

  it('a corner shift adds dvt to VT', () => {
    expect(thresholdVoltage(params, 0.3, tnomK, tnomK, 0.04) - thresholdVoltage(params, 0.3, tnomK, tnomK)).toBeCloseTo(0.04, 15);
    expect(prepareDevice(BF180G, 'nmos', { corner: 'SS' }).vtZeroBias).toBeCloseTo(0.49, 15);
    expect(prepareDevice(BF180G, 'nmos', { corner: 'FF' }).vtZeroBias).toBeCloseTo(0.41, 15);
  });

  it('VT falls with temperature by vtTc per kelvin (VT falls when hotter: common practice, no source)', () => {
    expect(thresholdVoltage(params, 0, tnomK + 100, tnomK)).toBeCloseTo(0.35, 14);
    expect(prepareDevice(BF180G, 'nmos', { temperature: 125 }).vtZeroBias).toBeLessThan(prepareDevice(BF180G, 'nmos', { temperature: -40 }).vtZeroBias);
  });

  it('a forward source–body bias lowers VT, and VSB ≤ −2φF is refused with VSB_BEYOND_FORWARD_LIMIT on field vsb', () => {
    expect(thresholdVoltage(params, -0.2, tnomK, tnomK)).toBeLessThan(0.45);
    expect(() => thresholdVoltage(params, -0.88, tnomK, tnomK)).toThrow(expect.objectContaining({ code: 'VSB_BEYOND_FORWARD_LIMIT', field: 'vsb' }));
  });

  it('PMOS thresholds are polarity-normalised: an enhancement PMOS has vt > 0, and VBS > 0 raises it like VSB for NMOS', () => {
    const pmos = prepareDevice(BF180G, 'pmos');
    expect(pmos.vtZeroBias).toBeGreaterThan(0);
    expect(thresholdAt(pmos, 0.5)).toBeGreaterThan(thresholdAt(pmos, 0));
  });
});
