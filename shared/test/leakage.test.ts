import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BF180G, channelCurrentAt, junctionLeakageFactor, leakage, oxideCapacitance, prepareDevice } from '../src/device/index.js';

const w = 100e-6;
const l = 0.18e-6;

describe('leakage', () => {
  it('the subthreshold off current is the all-region channel current at VGS = 0, VDS = vdd, VSB = 0', () => {
    const device = prepareDevice(BF180G, 'nmos', { temperature: 125 });
    const leak = leakage(device, w, l);
    expect(leak.subthreshold).toBe(channelCurrentAt(device, 'all-region', w, l, 0, BF180G.vdd, 0));
  });

  it('adds off-state gate leakage jg·W·Lov through the drain overlap (Lov = cgdo/Cox) and junction leakage js·W·ldiff at tnom, and gives Ion/Ioff with Ion at VGS = VDS = vdd', () => {
    const device = prepareDevice(BF180G, 'nmos');
    const leak = leakage(device, w, l);
    const overlapLength = BF180G.nmos.cgdo / oxideCapacitance(BF180G.nmos.tox);
    expect(leak.gate).toBeCloseTo((BF180G.nmos.jg as number) * w * overlapLength, 25);
    expect(leak.junction).toBeCloseTo((BF180G.nmos.js as number) * w * BF180G.nmos.ldiff, 25);
    expect(leak.ioff).toBeCloseTo((leak.subthreshold as number) + leak.gate + leak.junction + leak.gidl, 25);
    expect(leak.estimates).toEqual(['gate', 'junction']);
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

  it('raises junction leakage from 27 to 125 °C as ni², about 1e5 times (Sze & Ng 2007, ch. 2; ni after Sproul & Green, J. Appl. Phys. 70, 1991)', () => {
    const at = (temperature: number) => leakage(prepareDevice(BF180G, 'nmos', { temperature }), w, l).junction;
    const ratio = at(125) / at(27);
    expect(ratio).toBeGreaterThan(3e4);
    expect(ratio).toBeLessThan(3e5);
    expect(ratio).toBeCloseTo(junctionLeakageFactor(398.15, 300.15), 0);
  });

  it('includes DIBL in the off current: a device with η = 50 mV/V leaks e^(η·vdd/(nUT)) times more', () => {
    const plain = prepareDevice(BF180G, 'nmos');
    const dibl = prepareDevice({ ...BF180G, nmos: { ...BF180G.nmos, dibl: 0.05, diblExp: 0 } }, 'nmos');
    const ratio = (leakage(dibl, w, l).subthreshold as number) / (leakage(plain, w, l).subthreshold as number);
    const n = 1 + BF180G.nmos.gamma / (2 * Math.sqrt(BF180G.nmos.twoPhiF));
    expect(ratio).toBeCloseTo(Math.exp((0.05 * BF180G.vdd) / (n * plain.ut)), -1);
  });

  it('adds GIDL = AGIDL·W·E·exp(−BGIDL/E), E = (vdd − EGIDL)/(3·tox), when the profile gives AGIDL (BSIM4 manual, UC Berkeley, 2009, from memory)', () => {
    const params = { ...BF180G.nmos, agidl: 1e-7 };
    const field = (BF180G.vdd - 0.8) / (3 * params.tox);
    const expected = 1e-7 * w * field * Math.exp(-2.3e9 / field);
    const leak = leakage(prepareDevice({ ...BF180G, nmos: params }, 'nmos'), w, l);
    expect(leak.gidl).toBeCloseTo(expected, 25);
    expect(leak.estimates).toContain('gidl');
  });

  it('says a depletion-mode device conducts at VGS = 0 instead of calling that current leakage', () => {
    const leak = leakage(prepareDevice(BF180G, 'nmos', { flavour: 'native' }), 2e-6, 1e-6);
    expect(leak.conductsAtZeroVgs).toBe(true);
    expect(leak.ioff).toBeNull();
    expect(leak.subthreshold).toBeNull();
    expect(leak.idAtZeroVgs).toBeGreaterThan(1e-6);
  });
});
