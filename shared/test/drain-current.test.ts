import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BF180G, channelCurrentAt, drainCurrent, drainCurrentInto, KERNEL_OUTPUTS, LONG_CHANNEL, prepareDevice, thermalVoltage } from '../src/device/index.js';

const ut300 = thermalVoltage(300);
const out = new Float64Array(KERNEL_OUTPUTS);

describe('square law (Shichman & Hodges, IEEE JSSC 3(3), 1968), as SPICE level 1 computes it', () => {
  const beta = 1e-3;
  const lambda = 0.1;

  it('in saturation ID = (β/2)·VOV²·(1 + λ·VDS)', () => {
    expect(drainCurrent('square-law', beta, 1.3, ut300, lambda, 0.3, 1)).toBeCloseTo(0.5e-3 * 0.09 * 1.1, 18);
  });

  it('in triode ID = β·(VOV·VDS − VDS²/2)·(1 + λ·VDS), equal to saturation at VDS = VOV', () => {
    expect(drainCurrent('square-law', beta, 1.3, ut300, lambda, 0.5, 0.2)).toBeCloseTo(1e-3 * (0.5 * 0.2 - 0.02) * 1.02, 18);
    const justBelow = drainCurrent('square-law', beta, 1.3, ut300, lambda, 0.5, 0.5 - 1e-12);
    expect(justBelow / drainCurrent('square-law', beta, 1.3, ut300, lambda, 0.5, 0.5)).toBeCloseTo(1, 10);
  });

  it('its exponential tail meets the saturated square law at VOV = 2nUT with the same ID and gm (to the factor 1 − e^(−VDS/UT))', () => {
    const n = 1.3;
    const join = 2 * n * ut300;
    const vds = 1;
    drainCurrentInto('square-law', beta, n, ut300, 0, join - 1e-12, vds, out);
    const [tailId, tailGm] = [out[0], out[1]];
    drainCurrentInto('square-law', beta, n, ut300, 0, join, vds, out);
    expect(tailId / out[0]).toBeCloseTo(1, 9);
    expect(tailGm / out[1]).toBeCloseTo(1, 9);
  });

  it('its tail falls by one decade per n·ln(10)·UT of overdrive', () => {
    const n = 1.3;
    const decade = n * Math.LN10 * ut300;
    const ratio = drainCurrent('square-law', beta, n, ut300, 0, -0.1, 1) / drainCurrent('square-law', beta, n, ut300, 0, -0.1 - decade, 1);
    expect(ratio).toBeCloseTo(10, 10);
  });
});

/** The normalised charge q of 2q + ln q = v, by bisection on ln q: an independent solution of the EKV charge relation. */
function chargeByBisection(v: number): number {
  let lo = -700;
  let hi = 20;
  for (let k = 0; k < 200; k++) {
    const mid = (lo + hi) / 2;
    if (2 * Math.exp(mid) + mid < v) lo = mid;
    else hi = mid;
  }
  return Math.exp((lo + hi) / 2);
}

// The charge-based EKV current ID = I_spec·[(q_f² + q_f) − (q_r² + q_r)], I_spec = 2nβUT², 2q + ln q = v,
// v_f = VOV/(nUT), v_r = (VOV − n·VDS)/(nUT) (C. C. Enz, E. A. Vittoz, Charge-Based MOS Transistor Modeling, Wiley,
// 2006, ch. 3), for β = 1 mA/V², n = 1.3, T = 300 K; worked numbers recomputed from it with a bisection of our own.
describe('all-region model, long channel', () => {
  const beta = 1e-3;
  const n = 1.3;
  const id = (vov: number, vds = 5) => drainCurrent('all-region', beta, n, ut300, 0, vov, vds);
  const byEquation = (vov: number, vds: number) => {
    const [qf, qr] = [chargeByBisection(vov / (n * ut300)), chargeByBisection((vov - n * vds) / (n * ut300))];
    return 2 * n * beta * ut300 * ut300 * (qf * qf + qf - qr * qr - qr);
  };

  it('reproduces ID at VOV = −0.3 … 1 V from its equation', () => {
    const table: [number, number][] = [[-0.3, 2.307552e-10], [-0.2, 4.511634e-9], [-0.1, 8.45405e-8], [0, 1.056553e-6], [0.1, 5.455201e-6], [0.2, 1.535578e-5], [0.5, 8.477566e-5], [1, 3.437312e-4]];
    for (const [vov, expected] of table) expect(id(vov, 20) / expected).toBeCloseTo(1, 5);
    for (const [vov, vds] of [[0.3, 0.05], [0.3, 0.2], [-0.1, 0.02], [0.8, 0.4]]) expect(id(vov, vds) / byEquation(vov, vds)).toBeCloseTo(1, 9);
  });

  it('approaches (β/2n)·VOV² in strong inversion, from below by the few UT of the charge\'s logarithm (Tsividis & McAndrew 2011, ch. 4)', () => {
    const ratio = (vov: number) => id(vov, 20) / ((0.5 * beta * vov * vov) / n);
    expect(ratio(1)).toBeCloseTo(0.8937, 4);
    expect(ratio(3)).toBeCloseTo(0.9391, 4);
    expect(ratio(3)).toBeGreaterThan(ratio(2));
  });

  it('tends to the exponential 2nβUT²·e^(VOV/(nUT)) in weak inversion', () => {
    const weak = (vov: number) => 2 * n * beta * ut300 * ut300 * Math.exp(vov / (n * ut300));
    expect(id(-0.3) / weak(-0.3)).toBeCloseTo(0.99987, 5);
    expect(id(-1) / weak(-1)).toBeCloseTo(1, 9);
  });

  it('keeps gm/ID finite at 1/(nUT) where ID underflows in deep weak inversion', () => {
    drainCurrentInto('all-region', beta, n, ut300, 0, -40, 1, out);
    expect(out[0]).toBe(0);
    expect(out[3]).toBeCloseTo(1 / (n * ut300), 10);
  });

  it('in weak inversion depends on VDS as 1 − e^(−VDS/UT), not e^(−VDS/(nUT)) (Tsividis & McAndrew 2011, ch. 5)', () => {
    const weakAt = (vds: number) => drainCurrent('all-region', beta, n, ut300, 0, -0.8, vds);
    // ln(1 + eˣ) = eˣ·(1 − eˣ/2 …): at VOV = −0.8 V the exponential law holds to about 1e-5.
    for (const vds of [0.5 * ut300, ut300, 2 * ut300, 4 * ut300]) expect(weakAt(vds) / weakAt(1) / -Math.expm1(-vds / ut300)).toBeCloseTo(1, 4);
  });

  it('is zero at VDS → 0 and in strong inversion saturates once VDS passes VOV/n, below VOV (Tsividis & McAndrew 2011, ch. 4)', () => {
    const vov = 0.4;
    const atVds = (vds: number) => drainCurrent('all-region', beta, n, ut300, 0, vov, vds);
    expect(atVds(1e-9)).toBeLessThan(1e-12);
    expect(atVds(0.15) / atVds(1.5)).toBeLessThan(0.95);
    expect(atVds(vov / n + 0.15) / atVds(1.5)).toBeGreaterThan(0.999);
    expect(atVds(vov) / atVds(1.5)).toBeGreaterThan(0.999);
    expect(drainCurrent('square-law', beta, n, ut300, 0, 0.4, 0.2)).toBeLessThan(drainCurrent('square-law', beta, n, ut300, 0, 0.4, 0.4));
  });
});

describe('all-region model, short-channel terms', () => {
  const beta = 1e-3;
  const n = 1.3;
  const long = LONG_CHANNEL;

  it('divides the current by 1 + θ·V_P + θ2·V_P², V_P = 2nUT·q_f the smooth overdrive (Sodini, Ko & Moll, IEEE TED 31(10), 1984)', () => {
    const [theta, theta2] = [0.8, 0.3];
    const vp = 2 * n * ut300 * chargeByBisection(0.6 / (n * ut300));
    expect(vp).toBeGreaterThan(0.5);
    expect(vp).toBeLessThan(0.6);
    const ratio = drainCurrent('all-region', beta, n, ut300, 0, 0.6, 1.8, { ...long, theta, theta2 }) / drainCurrent('all-region', beta, n, ut300, 0, 0.6, 1.8, long);
    expect(ratio).toBeCloseTo(1 / (1 + theta * vp + theta2 * vp * vp), 9);
  });

  it('leaves weak inversion alone: θ acts on the smooth overdrive, which vanishes below threshold', () => {
    const ratio = drainCurrent('all-region', beta, n, ut300, 0, -0.3, 1, { ...long, theta: 2 }) / drainCurrent('all-region', beta, n, ut300, 0, -0.3, 1, long);
    expect(ratio).toBeGreaterThan(0.998);
  });

  it('lowers VDSsat by velocity saturation to Esat·L·(√(1 + 2V_P/(n·Esat·L)) − 1) (Sodini, Ko & Moll 1984)', () => {
    const esat = 0.5;
    const q = chargeByBisection(1 / (n * ut300));
    const vp = 2 * n * ut300 * q;
    drainCurrentInto('all-region', beta, n, ut300, 0, 1, 1.8, out, { ...long, esat });
    expect(out[4]).toBeCloseTo(esat * (Math.sqrt(1 + (2 * vp) / (n * esat)) - 1) + (4 * ut300) / (1 + q), 9);
  });

  it('adds η·gm to gds for DIBL', () => {
    const eta = 0.05;
    drainCurrentInto('all-region', beta, n, ut300, 0, 0.3, 1.2, out, long);
    const [gm, gds] = [out[1], out[2]];
    drainCurrentInto('all-region', beta, n, ut300, 0, 0.3, 1.2, out, { ...long, eta });
    expect(out[2] - gds).toBeCloseTo(eta * gm, 12);
  });

  it('gives an output conductance that falls with VDS and with length through channel-length modulation', () => {
    const gdsAt = (vds: number, clm: number) => (drainCurrentInto('all-region', beta, n, ut300, 0, 0.3, vds, out, { ...long, clm }), out[2] / out[0]);
    expect(gdsAt(1.5, 0.1)).toBeLessThan(gdsAt(0.6, 0.1));
    expect(gdsAt(1.0, 0.05)).toBeLessThan(gdsAt(1.0, 0.1));
  });

  it('gm and gds are the derivatives of its own ID (central differences, fast-check)', () => {
    fc.assert(
      fc.property(
        fc.double({ min: -0.3, max: 1, noNaN: true }),
        fc.double({ min: 0.05, max: 1.8, noNaN: true }),
        fc.double({ min: 0, max: 1.5, noNaN: true }),
        fc.double({ min: 0.2, max: 20, noNaN: true }),
        fc.double({ min: 0, max: 0.3, noNaN: true }),
        fc.double({ min: 0, max: 0.1, noNaN: true }),
        (vov, vds, theta, esat, clm, eta) => {
          const terms = { ...LONG_CHANNEL, theta, theta2: theta / 2, esat, clm, eta };
          const h = 1e-6;
          const at = (o: number, d: number) => drainCurrent('all-region', beta, n, ut300, 0.05, o, d, terms);
          drainCurrentInto('all-region', beta, n, ut300, 0.05, vov, vds, out, terms);
          const gm = (at(vov + h, vds) - at(vov - h, vds)) / (2 * h);
          // gds at fixed VGS: VOV rises by η per volt of VDS (DIBL).
          const gds = (at(vov + eta * h, vds + h) - at(vov - eta * h, vds - h)) / (2 * h);
          expect(Math.abs(out[1] - gm)).toBeLessThan(1e-5 * Math.abs(gm) + 1e-15);
          expect(Math.abs(out[2] - gds)).toBeLessThan(1e-4 * Math.abs(gds) + 1e-13);
          expect(out[3] * out[0]).toBeCloseTo(out[1], 12);
        },
      ),
    );
  });
});

describe('both models', () => {
  const device = prepareDevice(BF180G, 'nmos');
  const models = ['all-region', 'square-law'] as const;

  it('ID rises with VGS (fast-check; square law where it is continuous, VDS ≥ 0.3 V)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...models), fc.double({ min: -0.5, max: 1.8, noNaN: true }), fc.double({ min: 1e-4, max: 0.5, noNaN: true }), fc.double({ min: 0.3, max: 1.8, noNaN: true }), (model, vgs, step, vds) => {
        expect(channelCurrentAt(device, model, 2e-6, 0.5e-6, vgs + step, vds, 0)).toBeGreaterThan(channelCurrentAt(device, model, 2e-6, 0.5e-6, vgs, vds, 0));
      }),
    );
  });

  it('ID rises with W/L (fast-check)', () => {
    fc.assert(
      fc.property(fc.constantFrom(...models), fc.double({ min: 0, max: 1.8, noNaN: true }), fc.double({ min: 0.3e-6, max: 50e-6, noNaN: true }), fc.double({ min: 1.01, max: 10, noNaN: true }), (model, vgs, w, factor) => {
        expect(channelCurrentAt(device, model, w * factor, 1e-6, vgs, 0.9, 0)).toBeGreaterThan(channelCurrentAt(device, model, w, 1e-6, vgs, 0.9, 0));
      }),
    );
  });

  it('never returns NaN for any valid input (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...models),
        fc.double({ min: 1e-9, max: 1, noNaN: true }),
        fc.double({ min: 1, max: 3, noNaN: true }),
        fc.double({ min: 0.005, max: 0.05, noNaN: true }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.double({ min: -30, max: 30, noNaN: true }),
        fc.double({ min: 1e-9, max: 20, noNaN: true }),
        (model, beta, n, ut, lambda, vov, vds) => {
          drainCurrentInto(model, beta, n, ut, lambda, vov, vds, out);
          for (const value of out) expect(Number.isNaN(value)).toBe(false);
          expect(out[0]).toBeGreaterThanOrEqual(0);
        },
      ),
    );
  });

  it('a negative-VT (depletion-mode) NMOS conducts at VGS = 0 (common practice, no source)', () => {
    const native = prepareDevice(BF180G, 'nmos', { flavour: 'native' });
    expect(native.vtZeroBias).toBeLessThan(0);
    expect(channelCurrentAt(native, 'all-region', 2e-6, 1e-6, 0, 0.6, 0)).toBeGreaterThan(1e-6);
    expect(channelCurrentAt(native, 'all-region', 2e-6, 1e-6, 0, 0.6, 0)).toBeGreaterThan(1e4 * channelCurrentAt(device, 'all-region', 2e-6, 1e-6, 0, 0.6, 0));
  });
});
