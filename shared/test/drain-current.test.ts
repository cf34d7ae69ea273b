import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BF180G, channelCurrentAt, drainCurrent, drainCurrentInto, KERNEL_OUTPUTS, prepareDevice, thermalVoltage } from '../src/device/index.js';

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

// Worked numbers recomputed from the EKV long-channel current ID = I_spec·ln²(1 + e^(VOV/(2nUT))), I_spec = 2nβUT²
// (Enz, Krummenacher & Vittoz, Analog Integrated Circuits and Signal Processing 8, 83–114, 1995, eqs. for the
// forward current in saturation) for β = 1 mA/V², n = 1.3, T = 300 K, in saturation (VDS = 5 V, λ = 0).
describe('all-region model, long channel', () => {
  const beta = 1e-3;
  const n = 1.3;
  const id = (vov: number) => drainCurrent('all-region', beta, n, ut300, 0, vov, 5);

  it('reproduces ID at VOV = −0.3 … 1 V from its equation', () => {
    const table: [number, number][] = [[-0.3, 2.28154e-10], [-0.2, 4.302877e-9], [-0.1, 7.207139e-8], [0, 8.348579e-7], [0.1, 4.971216e-6], [0.2, 1.59035e-5], [0.5, 9.616904e-5], [1, 3.846154e-4]];
    for (const [vov, expected] of table) expect(id(vov) / expected).toBeCloseTo(1, 5);
  });

  it('tends to (β/2n)·VOV² in strong inversion: the bulk-charge factor 1/n of the EKV model (Tsividis & McAndrew 2011, ch. 4)', () => {
    expect(id(1) / ((0.5 * beta) / n)).toBeCloseTo(1, 6);
    expect(id(0.5) / ((0.5 * beta * 0.25) / n)).toBeCloseTo(1.00016, 5);
  });

  it('tends to the exponential 2nβUT²·e^(VOV/(nUT)) in weak inversion', () => {
    const weak = (vov: number) => 2 * n * beta * ut300 * ut300 * Math.exp(vov / (n * ut300));
    expect(id(-0.3) / weak(-0.3)).toBeCloseTo(0.98860, 4);
    expect(id(-1) / weak(-1)).toBeCloseTo(1, 6);
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
  const long = { theta: 0, esat: Infinity, clm: 0, eta: 0 };

  it('divides the current by 1 + θ·VOV in strong inversion (Sodini, Ko & Moll, IEEE TED 31(10), 1984)', () => {
    const theta = 0.8;
    const ratio = drainCurrent('all-region', beta, n, ut300, 0, 0.6, 1.8, { ...long, theta }) / drainCurrent('all-region', beta, n, ut300, 0, 0.6, 1.8, long);
    expect(ratio).toBeCloseTo(1 / (1 + theta * 0.6), 3);
  });

  it('leaves weak inversion alone: θ acts on the smooth overdrive, which vanishes below threshold', () => {
    const ratio = drainCurrent('all-region', beta, n, ut300, 0, -0.3, 1, { ...long, theta: 2 }) / drainCurrent('all-region', beta, n, ut300, 0, -0.3, 1, long);
    expect(ratio).toBeGreaterThan(0.998);
  });

  it('lowers VDSsat by velocity saturation to Esat·L·(√(1 + 2VOV/(n·Esat·L)) − 1) (Sodini, Ko & Moll 1984)', () => {
    const esat = 0.5;
    drainCurrentInto('all-region', beta, n, ut300, 0, 1, 1.8, out, { ...long, esat });
    expect(out[4]).toBeCloseTo(esat * (Math.sqrt(1 + 2 / (n * esat)) - 1), 3);
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
          const terms = { theta, esat, clm, eta };
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
