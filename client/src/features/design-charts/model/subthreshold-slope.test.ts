import { BF180G, computeSweep } from '@channelwright/shared/device';
import { describe, expect, it } from 'vitest';
import { subthresholdSlope } from './subthreshold-slope';

describe('the subthreshold slope read from an ID–VGS curve', () => {
  it('is the ΔVGS per decade of a purely exponential curve', () => {
    // ID = 1 pA · 10^(VGS / 80 mV): exactly 80 mV per decade everywhere.
    const points = Array.from({ length: 21 }, (_, i) => ({ vgs: i * 0.01, id: 1e-12 * 10 ** ((i * 0.01) / 0.08) }));
    expect(subthresholdSlope(points)).toBeCloseTo(80, 6);
  });

  it('takes the steepest stretch and skips points without a positive current', () => {
    const points = [
      { vgs: 0, id: null },
      { vgs: 0.1, id: 0 },
      { vgs: 0.2, id: 1e-9 },
      { vgs: 0.3, id: 1e-8 }, // 100 mV/decade
      { vgs: 0.35, id: 1e-7 }, // 50 mV/decade
      { vgs: 0.5, id: 2e-7 },
    ];
    expect(subthresholdSlope(points)).toBeCloseTo(50, 9);
    expect(subthresholdSlope([{ vgs: 0, id: 1e-9 }])).toBeNull();
  });

  it('reads n·(kT/q)·ln 10 from the all-region model in weak inversion', () => {
    // The ideal swing ln(10)·kT/q (59.6 mV/decade at 300.15 K) times the slope factor
    // n = 1 + γ/(2√(2φF)) (Tsividis, Operation and Modeling of the MOS Transistor, 2nd ed., 1999).
    // BF180-G NMOS (invented): γ = 0.45 √V, 2φF = 0.88 V → n = 1.2399.
    const response = computeSweep(
      { process: BF180G, polarity: 'nmos', id: 1e-6, l: 1e-6, vds: 0.9, vsb: 0, w: 10e-6, sweep: { param: 'vgs', from: 0, to: 0.3, points: 61, scale: 'lin' }, hold: 'w', fields: ['id'] },
    );
    const points = response.series[0].points.map((p) => ({ vgs: p.vgs as number, id: p.id ?? null }));
    // k and q are exact in the SI since 2019 (BIPM, SI Brochure, 9th ed., 2019).
    const k = 1.380649e-23;
    const q = 1.602176634e-19;
    const ut = (k * 300.15) / q;
    const n = 1 + BF180G.nmos.gamma / (2 * Math.sqrt(BF180G.nmos.twoPhiF));
    // By hand: 1.2399 · 25.87 mV · ln 10 = 73.84 mV/decade.
    const expected = n * ut * Math.LN10 * 1000;
    expect(subthresholdSlope(points)).toBeGreaterThan(expected * 0.99);
    expect(subthresholdSlope(points)).toBeLessThan(expected * 1.02);
  });
});
