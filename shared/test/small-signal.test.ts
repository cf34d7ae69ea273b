import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { drainCurrent, gmbRatioOf, inversionCoefficient, regionOf, saturationVoltage, slopeFactor, smallSignal, thermalVoltage } from '../src/device/index.js';

const ut = thermalVoltage(300);
const beta = 1e-3;
const n = 1.3;

describe('gm/ID', () => {
  it('tends to 1/(n·UT) in weak inversion: 29.755 /V at n = 1.3, 300 K (exponential law; Enz & Vittoz, Charge-Based MOS Transistor Modeling, Wiley, 2006)', () => {
    for (const model of ['all-region', 'square-law'] as const) {
      expect(smallSignal(model, beta, n, ut, 0, -1, 1, 0).gmId).toBeCloseTo(29.755, 2);
    }
    expect(smallSignal('all-region', beta, 1, ut, 0, -1, 1, 0).gmId).toBeCloseTo(38.682, 2);
  });

  it('is 2/VOV for the square law (Shichman & Hodges 1968) and tends to it for the all-region model in strong inversion', () => {
    expect(smallSignal('square-law', beta, n, ut, 0, 0.25, 5, 0).gmId).toBe(8);
    const ratio = (vov: number) => smallSignal('all-region', beta, n, ut, 0, vov, 10, 0).gmId / (2 / vov);
    expect(Math.abs(ratio(1) - 1)).toBeLessThan(0.05);
    expect(Math.abs(ratio(3) - 1)).toBeLessThan(Math.abs(ratio(1) - 1));
  });

  it('follows the charge-based relation gm·nUT/ID = 1/(1 + q) = 1/(0.5 + √(0.25 + IC)) in saturation (Enz & Vittoz 2006)', () => {
    for (const vov of [-0.2, 0, 0.1, 0.3, 0.8]) {
      const s = smallSignal('all-region', beta, n, ut, 0, vov, 5, 0);
      expect(s.gmId * n * ut).toBeCloseTo(1 / (0.5 + Math.sqrt(0.25 + s.ic)), 9);
    }
    // At VOV = 0: 2q + ln q = 0, q = W(2)/2 = 0.426302751 (Lambert W of 2, 0.852605502; from memory), gm·nUT/ID = 1/(1 + q).
    expect(smallSignal('all-region', beta, n, ut, 0, 0, 5, 0).gmId * n * ut).toBeCloseTo(1 / 1.426302751, 8);
  });
});

describe('inversion coefficient', () => {
  it('is ID/(2nβUT²): I_spec = 1.737647 µA for β = 1 mA/V², n = 1.3, 300 K (EKV normalisation, Enz & Vittoz 2006)', () => {
    expect(inversionCoefficient(1.737647e-6, beta, n, ut)).toBeCloseTo(1, 6);
  });

  it('names the region: weak below 0.1, moderate 0.1 … 10, strong above 10 (Binkley, Tradeoffs and Optimization in Analog CMOS Design, 2008)', () => {
    expect(regionOf(0.099)).toBe('weak');
    expect(regionOf(0.1)).toBe('moderate');
    expect(regionOf(10)).toBe('moderate');
    expect(regionOf(10.01)).toBe('strong');
    expect(smallSignal('all-region', beta, n, ut, 0, -0.2, 1, 0).region).toBe('weak');
    expect(smallSignal('all-region', beta, n, ut, 0, 0.6, 1, 0).region).toBe('strong');
  });
});

describe('analytic derivatives', () => {
  // Central differences of the model's own ID; gmb is exact when n does not depend on VSB (n given).
  it('gm and gds equal the derivatives of ID for both models (fast-check against central differences)', () => {
    fc.assert(
      fc.property(fc.constantFrom('all-region', 'square-law' as const), fc.double({ min: -0.3, max: 1, noNaN: true }), fc.double({ min: 0.05, max: 1.8, noNaN: true }), fc.double({ min: 0, max: 0.3, noNaN: true }), (model, vov, vds, lambda) => {
        const a = 2 * n * ut;
        // Stay off the square law's branch points (triode/saturation edge and tail join), where a one-sided kink lives.
        if (model === 'square-law' && (Math.abs(vov - vds) < 1e-3 || Math.abs(vov - a) < 1e-3)) return;
        if (model === 'all-region' && vds < 0.02) return;
        const h = 1e-6;
        const s = smallSignal(model, beta, n, ut, lambda, vov, vds, 0);
        const gm = (drainCurrent(model, beta, n, ut, lambda, vov + h, vds) - drainCurrent(model, beta, n, ut, lambda, vov - h, vds)) / (2 * h);
        const gds = (drainCurrent(model, beta, n, ut, lambda, vov, vds + h) - drainCurrent(model, beta, n, ut, lambda, vov, vds - h)) / (2 * h);
        // The difference quotient carries a rounding noise of about 1e-16·ID/h, which matters where gds is tiny.
        const noise = 1e-8 * s.id;
        expect(Math.abs(s.gm - gm)).toBeLessThanOrEqual(1e-5 * Math.abs(gm) + noise);
        expect(Math.abs(s.gds - gds)).toBeLessThanOrEqual(1e-4 * Math.abs(gds) + noise);
        expect(s.gmId).toBeCloseTo(s.gm / s.id, 6);
      }),
    );
  });

  it('gmb = gm·γ/(2√(2φF + VSB)), the derivative of ID with respect to VBS', () => {
    const gamma = 0.45;
    const twoPhiF = 0.88;
    const vsb = 0.4;
    const ratio = gamma / (2 * Math.sqrt(twoPhiF + vsb));
    const s = smallSignal('all-region', beta, n, ut, 0.05, 0.2, 1, ratio);
    expect(s.gmb).toBeCloseTo(s.gm * ratio, 15);
    const vt = (v: number) => gamma * (Math.sqrt(twoPhiF + v) - Math.sqrt(twoPhiF));
    const h = 1e-6;
    const byVsb = -(drainCurrent('all-region', beta, n, ut, 0.05, 0.2 - (vt(vsb + h) - vt(vsb)), 1) - drainCurrent('all-region', beta, n, ut, 0.05, 0.2 - (vt(vsb - h) - vt(vsb)), 1)) / (2 * h);
    expect(s.gmb / byVsb).toBeCloseTo(1, 5);
  });

  it('ro is 1/gds and the intrinsic gain gm/gds; with λ = 0 in deep saturation of the square law both are infinite (null)', () => {
    const s = smallSignal('all-region', beta, n, ut, 0.1, 0.3, 1, 0);
    expect(s.ro).toBeCloseTo(1 / s.gds, 6);
    expect(s.intrinsicGain).toBeCloseTo(s.gm / s.gds, 10);
    const ideal = smallSignal('square-law', beta, n, ut, 0, 0.3, 1, 0);
    expect(ideal.ro).toBeNull();
    expect(ideal.intrinsicGain).toBeNull();
  });
});

describe('saturationVoltage', () => {
  it('is V_P/n = 2UT·q in strong inversion (the pinch-off voltage over n, → VOV/n; Tsividis & McAndrew 2011, ch. 4) and 4UT in weak inversion, smoothly between', () => {
    const strong = saturationVoltage('all-region', 3, n, ut);
    expect(strong / (3 / n)).toBeGreaterThan(0.95);
    expect(strong).toBeLessThan(3 / n);
    expect(saturationVoltage('all-region', -1, n, ut)).toBeCloseTo(4 * ut, 6);
    expect(saturationVoltage('square-law', 0.3, n, ut)).toBe(0.3);
    expect(saturationVoltage('square-law', -0.3, n, ut)).toBeCloseTo(4 * ut, 15);
    let previous = saturationVoltage('all-region', -0.5, n, ut);
    for (let vov = -0.49; vov < 1; vov += 0.01) {
      const next = saturationVoltage('all-region', vov, n, ut);
      expect(Math.abs(next - previous)).toBeLessThan(0.011);
      previous = next;
    }
  });

  it('marks a device saturated when VDS ≥ VDSsat', () => {
    expect(smallSignal('all-region', beta, n, ut, 0, 0.3, 0.5, 0).saturated).toBe(true);
    expect(smallSignal('all-region', beta, n, ut, 0, 0.3, 0.2, 0).saturated).toBe(false);
  });
});

describe('consistency of the all-region model (Enz & Vittoz, Charge-Based MOS Transistor Modeling, Wiley, 2006)', () => {
  it('has IC = 1 at the specific current: ID = I_spec = 2nβUT² where q² + q = 1, q = (√5 − 1)/2, VOV = nUT·(2q + ln q)', () => {
    const q = (Math.sqrt(5) - 1) / 2;
    const vov = n * ut * (2 * q + Math.log(q));
    const s = smallSignal('all-region', beta, n, ut, 0, vov, 2, 0);
    expect(s.id / (2 * n * beta * ut * ut)).toBeCloseTo(1, 10);
    expect(s.ic).toBeCloseTo(1, 10);
    expect(s.region).toBe('moderate');
  });

  it('puts gm/ID = 10 /V in moderate inversion at n = 1.3, 300 K: IC ≈ 5.9 by the charge-based relation gm·nUT/ID = 1/(0.5 + √(0.25 + IC))', () => {
    // Solve VOV for gm/ID = 10 by bisection on the model itself.
    let lo = -0.5;
    let hi = 1;
    for (let k = 0; k < 80; k++) {
      const mid = (lo + hi) / 2;
      if (smallSignal('all-region', beta, n, ut, 0, mid, 2, 0).gmId > 10) lo = mid;
      else hi = mid;
    }
    const s = smallSignal('all-region', beta, n, ut, 0, lo, 2, 0);
    const charge = 1 / (10 * n * ut) - 0.5;
    const chargeBased = charge * charge - 0.25;
    expect(chargeBased).toBeCloseTo(5.88, 1);
    expect(s.ic / chargeBased).toBeCloseTo(1, 6);
    expect(s.region).toBe('moderate');
  });

  it('gives gmb/gm = n − 1 at every VSB, also when the process states n', () => {
    const derived = { gamma: 0.45, twoPhiF: 0.88 };
    const given = { ...derived, n: 1.35 };
    for (const vsb of [0, 0.4, 1.2]) {
      expect(gmbRatioOf('all-region', derived, vsb)).toBeCloseTo(slopeFactor(derived, vsb) - 1, 15);
      expect(gmbRatioOf('all-region', given, vsb)).toBeCloseTo(slopeFactor(given, vsb) - 1, 15);
    }
    // A given n falls with VSB as Cdep ∝ 1/√(2φF + VSB): at VSB = 1.2 V, n − 1 = 0.35·√(0.88/2.08).
    expect(slopeFactor(given, 1.2) - 1).toBeCloseTo(0.35 * Math.sqrt(0.88 / 2.08), 12);
    // The square law keeps SPICE level 1's dVT/dVSB.
    expect(gmbRatioOf('square-law', given, 0.4)).toBeCloseTo(0.45 / (2 * Math.sqrt(1.28)), 15);
  });
});
