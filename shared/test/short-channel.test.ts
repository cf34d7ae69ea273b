import { describe, expect, it } from 'vitest';
import { BF180G, channelTermsAt, computeSize, computeSweep, effectiveLength, kpAtLength, LONG_CHANNEL, mobilityExponentAt, operatingPoint, prepareDevice } from '../src/device/index.js';
import type { DeviceParams, Process, SweepRequestInput } from '../src/schemas/index.js';

// The short-channel terms of the all-region model (docs/model.md §6.3) on an invented variant of the demo NMOS.
const shortNmos: DeviceParams = { ...BF180G.nmos, dl: 20e-9, dw: 10e-9, theta0: 0.1, theta1: 60e-9, dibl: 0.04, diblExp: 1.5, pclm: 30e-9, muExpL: 0.1e-6 };
const shortProcess: Process = { ...BF180G, nmos: shortNmos };
const target = { processId: 'bf180g', polarity: 'nmos', id: 20e-6, l: 0.36e-6, vds: 0.9, vsb: 0, gmId: 12 } as const;

describe('short-channel terms', () => {
  it('give exactly the long-channel model when a profile has none of them', () => {
    expect(channelTermsAt(BF180G.nmos, 0.5e-6)).toBe(LONG_CHANNEL);
    expect(effectiveLength(BF180G.nmos, 0.5e-6)).toBe(0.5e-6);
  });

  it('shorten L by ΔL and make θ = θ0 + θ1/Leff, η = dibl·((lmin − ΔL)/Leff)^diblExp, clm = Pclm/Leff', () => {
    const leff = effectiveLength(shortNmos, 0.36e-6);
    expect(leff).toBeCloseTo(0.34e-6, 15);
    const terms = channelTermsAt(shortNmos, leff);
    expect(terms.theta).toBeCloseTo(0.1 + 60e-9 / 0.34e-6, 12);
    expect(terms.esat).toBeCloseTo(0.34e-6 / 60e-9, 12);
    expect(terms.eta).toBeCloseTo(0.04 * (0.16 / 0.34) ** 1.5, 12);
    expect(terms.clm).toBeCloseTo(30e-9 / 0.34e-6, 12);
  });

  it('draw every finger ΔW wider than the channel the current needs: W = Weff + fingers·ΔW', () => {
    const result = computeSize({ ...target, maxFingerWidth: 1e-6 }, shortProcess);
    expect(result.fingers).toBeGreaterThan(1);
    expect(result.weff).toBeCloseTo(result.w - result.fingers * 10e-9, 15);
    // Snapping each finger to the 5 nm grid moves the drawn width by at most half a step per finger.
    expect(Math.abs(result.wRequired - result.fingers * 10e-9 - (result.weff as number))).toBeLessThanOrEqual(result.fingers * 2.5e-9 + 1e-15);
  });

  it('report VT lowered by η·VDS (DIBL), so VGS = VT + VOV still holds', () => {
    const result = computeSize(target, shortProcess);
    const plain = computeSize(target, { ...BF180G, nmos: { ...shortNmos, dibl: undefined } });
    expect(plain.vt - result.vt).toBeCloseTo((result.eta as number) * target.vds, 12);
    expect(result.vgs - result.vt).toBeCloseTo(result.vov, 12);
  });

  it('divide β by 1 + θB·VSB (body-bias mobility, Tsividis & McAndrew 2011, ch. 4): the same ID and gm/ID take 1 + θB·VSB times the width, none more at VSB = 0', () => {
    const plain: Process = { ...BF180G, nmos: { ...shortNmos, dw: undefined } };
    const degraded: Process = { ...BF180G, nmos: { ...shortNmos, dw: undefined, thetaB: 0.1 } };
    const biased = { ...target, vsb: 0.45 };
    expect(computeSize(biased, degraded).wRequired / computeSize(biased, plain).wRequired).toBeCloseTo(1 + 0.1 * 0.45, 10);
    expect(computeSize(biased, degraded).vt).toBe(computeSize(biased, plain).vt);
    expect(computeSize(target, degraded).wRequired).toBe(computeSize(target, plain).wRequired);
  });

  it('carry θB through a VSB sweep: each point is the operating point at its VSB', () => {
    const degraded: Process = { ...BF180G, nmos: { ...shortNmos, thetaB: 0.1 } };
    const request = { processId: 'bf180g', polarity: 'nmos', l: 0.36e-6, vds: 0.9, vsb: 0, id: 20e-6, vov: 0.15, sweep: { param: 'vsb', from: 0, to: 0.9, points: 4 }, hold: 'w', fields: ['id'] };
    const answer = computeSweep(request as SweepRequestInput, degraded);
    const prepared = prepareDevice(degraded, 'nmos');
    const vgs = answer.base.vgs as number;
    for (const point of answer.series[0].points) {
      const op = operatingPoint(prepared, 'all-region', answer.base.w, 0.36e-6, { vgs, vds: 0.9, vsb: point.vsb as number });
      expect(Math.abs((point.id as number) / op.id - 1)).toBeLessThan(1e-12);
    }
    const first = answer.series[0].points[0].id as number;
    const last = answer.series[0].points[3].id as number;
    expect(last).toBeLessThan(first);
  });

  it('need a wider device for the same ID and gm/ID when mobility degrades (θ > 0)', () => {
    const withTheta = computeSize(target, shortProcess);
    const withoutTheta = computeSize(target, { ...BF180G, nmos: { ...shortNmos, theta0: undefined, theta1: undefined } });
    expect(withTheta.wRequired).toBeGreaterThan(withoutTheta.wRequired);
  });

  it('raise the intrinsic gain with length, faster than λ ∝ 1/L would', () => {
    const gain = (l: number) => computeSize({ ...target, l }, shortProcess).intrinsicGain as number;
    expect(gain(1.44e-6)).toBeGreaterThan(2 * gain(0.36e-6));
  });

  it('weaken the mobility temperature law at short L: exponent muExp + muExpL/Leff', () => {
    const leff = effectiveLength(shortNmos, 0.2e-6);
    expect(mobilityExponentAt(shortNmos, leff)).toBeCloseTo(-1.5 + 0.1e-6 / 0.18e-6, 12);
    const hot = prepareDevice(shortProcess, 'nmos', { temperature: 125 });
    const nominal = prepareDevice(shortProcess, 'nmos');
    const shortRatio = kpAtLength(hot, leff) / kpAtLength(nominal, leff);
    const longRatio = kpAtLength(hot, 10e-6) / kpAtLength(nominal, 10e-6);
    expect(shortRatio).toBeGreaterThan(longRatio);
    expect(shortRatio).toBeCloseTo((398.15 / 300.15) ** (-1.5 + 0.1e-6 / 0.18e-6), 12);
  });

  it('refuse a ΔL that leaves no channel at the shortest length', () => {
    expect(() => effectiveLength({ dl: 0.2e-6 }, 0.18e-6)).toThrow(expect.objectContaining({ code: 'L_BELOW_LMIN' }));
  });
});
