import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BF180G, channelCurrentAt, leakage, prepareDevice } from '../src/device/index.js';

const w = 100e-6;
const l = 0.18e-6;

describe('leakage', () => {
  it('the subthreshold off current is the all-region channel current at VGS = 0, VDS = vdd, VSB = 0', () => {
    const device = prepareDevice(BF180G, 'nmos', { temperature: 125 });
    const leak = leakage(device, w, l);
    expect(leak.subthreshold).toBe(channelCurrentAt(device, 'all-region', w, l, 0, BF180G.vdd, 0));
  });

  it('adds gate leakage jg·W·L and junction leakage js·W·ldiff, and gives Ion/Ioff with Ion at VGS = VDS = vdd', () => {
    const device = prepareDevice(BF180G, 'nmos');
    const leak = leakage(device, w, l);
    expect(leak.gate).toBeCloseTo((BF180G.nmos.jg as number) * w * l, 25);
    expect(leak.junction).toBeCloseTo((BF180G.nmos.js as number) * w * BF180G.nmos.ldiff, 25);
    expect(leak.ioff).toBeCloseTo((leak.subthreshold as number) + leak.gate + leak.junction, 25);
    expect(leak.ion).toBe(channelCurrentAt(device, 'all-region', w, l, BF180G.vdd, BF180G.vdd, 0));
    expect(leak.ionIoff).toBeCloseTo(leak.ion / (leak.ioff as number), 6);
  });

  it('the off current rises with temperature (subthreshold current rises when hotter: common practice, no source) — fast-check', () => {
    fc.assert(
      fc.property(fc.constantFrom('nmos', 'pmos' as const), fc.constantFrom('TT', 'FF', 'SS', 'FS', 'SF'), fc.double({ min: -55, max: 150, noNaN: true }), fc.double({ min: 1, max: 50, noNaN: true }), (polarity, corner, temperature, step) => {
        const cold = leakage(prepareDevice(BF180G, polarity, { corner, temperature }), w, l).ioff as number;
        const hot = leakage(prepareDevice(BF180G, polarity, { corner, temperature: temperature + step }), w, l).ioff as number;
        expect(hot).toBeGreaterThan(cold);
      }),
    );
  });

  it('says a depletion-mode device conducts at VGS = 0 instead of calling that current leakage', () => {
    const leak = leakage(prepareDevice(BF180G, 'nmos', { flavour: 'native' }), 2e-6, 1e-6);
    expect(leak.conductsAtZeroVgs).toBe(true);
    expect(leak.ioff).toBeNull();
    expect(leak.subthreshold).toBeNull();
    expect(leak.idAtZeroVgs).toBeGreaterThan(1e-6);
  });
});
