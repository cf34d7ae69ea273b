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

// Worked numbers recomputed from the interpolation ID = (β/2)(2nUT)²·ln²(1 + e^(VOV/(2nUT))) (the model family of
// Enz, Krummenacher & Vittoz, Analog Integrated Circuits and Signal Processing 8, 83–114, 1995) for
// β = 1 mA/V², n = 1.3, T = 300 K, in saturation (VDS = 5 V, λ = 0: the reverse term is below 1e-60).
describe('all-region interpolation', () => {
  const beta = 1e-3;
  const n = 1.3;
  const id = (vov: number) => drainCurrent('all-region', beta, n, ut300, 0, vov, 5);

  it('reproduces ID at VOV = −0.3 … 1 V from its equation', () => {
    const table: [number, number][] = [[-0.3, 2.966001e-10], [-0.2, 5.593741e-9], [-0.1, 9.36928e-8], [0, 1.085315e-6], [0.1, 6.462581e-6], [0.2, 2.067455e-5], [0.5, 1.250198e-4], [1, 5e-4]];
    for (const [vov, expected] of table) expect(id(vov) / expected).toBeCloseTo(1, 5);
  });

  it('tends to the square law (β/2)·VOV² in strong inversion, with no 1/n', () => {
    expect(id(1) / (0.5 * beta)).toBeCloseTo(1, 6);
    expect(id(0.5) / (0.5 * beta * 0.25)).toBeCloseTo(1.0002, 4);
  });

  it('tends to the exponential 2n²βUT²·e^(VOV/(nUT)) in weak inversion', () => {
    const weak = (vov: number) => 2 * n * n * beta * ut300 * ut300 * Math.exp(vov / (n * ut300));
    expect(id(-0.3) / weak(-0.3)).toBeCloseTo(0.9886, 4);
    expect(id(-1) / weak(-1)).toBeCloseTo(1, 6);
  });

  it('keeps gm/ID finite at 1/(nUT) where ID underflows in deep weak inversion', () => {
    drainCurrentInto('all-region', beta, n, ut300, 0, -40, 1, out);
    expect(out[0]).toBe(0);
    expect(out[3]).toBeCloseTo(1 / (n * ut300), 10);
  });

  it('is zero at VDS → 0 and saturates once VDS passes VOV (saturation needs VDS > VOV: common practice, no source)', () => {
    const atVds = (vds: number) => drainCurrent('all-region', beta, n, ut300, 0, 0.4, vds);
    expect(atVds(1e-9)).toBeLessThan(1e-12);
    expect(atVds(0.2) / atVds(1.5)).toBeLessThan(0.8);
    expect(atVds(0.6) / atVds(1.5)).toBeGreaterThan(0.999);
    expect(drainCurrent('square-law', beta, n, ut300, 0, 0.4, 0.2)).toBeLessThan(drainCurrent('square-law', beta, n, ut300, 0, 0.4, 0.4));
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
