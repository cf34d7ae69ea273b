import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { matchGroupMismatch, mismatchBetween, pairMismatch } from '../src/device/index.js';

// M. J. M. Pelgrom, A. C. J. Duinmaijer, A. P. G. Welbers, "Matching properties of MOS transistors",
// IEEE JSSC 24(5), 1433–1440, 1989: σ(ΔVT) = AVT/√(W·L) for the difference of a pair.
const mVum = 1e-9; // 1 mV·µm in V·m
const device = (avt: number, w: number, l: number, gmId = 10, abeta = 0) => ({ avt: avt * mVum, abeta, w: w * 1e-6, l: l * 1e-6, gmId });

describe('pairMismatch', () => {
  it('σ(ΔVT) of a pair is AVT/√(WL): 5 mV·µm over 1×1, 10×1, 10×10, 2×0.5 µm gives 5, 1.581, 0.5, 5 mV', () => {
    const table: [number, number, number, number][] = [[5, 1, 1, 5], [5, 10, 1, 1.5811], [5, 10, 10, 0.5], [5, 2, 0.5, 5], [3, 10, 1, 0.9487], [10, 10, 1, 3.1623]];
    for (const [avt, w, l, sigma] of table) expect(pairMismatch(device(avt, w, l)).sigmaVt * 1e3).toBeCloseTo(sigma, 4);
  });

  it('scales as 1/√(W·L): four times the area halves σ (fast-check)', () => {
    fc.assert(
      fc.property(fc.double({ min: 0.2, max: 100, noNaN: true }), fc.double({ min: 0.1, max: 20, noNaN: true }), (w, l) => {
        expect(pairMismatch(device(5, 2 * w, 2 * l)).sigmaVt / pairMismatch(device(5, w, l)).sigmaVt).toBeCloseTo(0.5, 12);
      }),
    );
  });

  it('reports pair σ(ΔVT) as sigmaVt and one device’s σ(VT) as sigmaVtSingle = sigmaVt/√2', () => {
    const m = pairMismatch(device(5, 1, 1));
    expect(m.sigmaVtSingle).toBeCloseTo(m.sigmaVt / Math.SQRT2, 15);
  });

  it('combines σ(ΔID/ID) = √((gm/ID)²σ(ΔVT)² + σ(Δβ/β)²) and the gate-referred σ(VOS) = σ(ΔID/ID)/(gm/ID)', () => {
    const m = pairMismatch(device(5, 10, 1, 10, 1e-8));
    const sigmaBeta = 1e-8 / Math.sqrt(10e-12);
    expect(m.sigmaBeta).toBeCloseTo(sigmaBeta, 15);
    expect(m.sigmaId).toBeCloseTo(Math.hypot(10 * m.sigmaVt, sigmaBeta), 15);
    expect(m.sigmaVos).toBeCloseTo(Math.hypot(m.sigmaVt, sigmaBeta / 10), 15);
  });
});

describe('matchGroupMismatch', () => {
  it('gives the worst pair of a group, adding the single-device variances of unequal devices', () => {
    const big = device(5, 20, 2);
    const small = device(5, 2, 2);
    const worst = matchGroupMismatch([big, big, small]);
    expect(worst).not.toBeNull();
    expect(worst?.b).toBe(2);
    const expected = Math.sqrt((5 * mVum) ** 2 / (2 * 40e-12) + (5 * mVum) ** 2 / (2 * 4e-12));
    expect(worst?.sigmaVt).toBeCloseTo(expected, 15);
    expect(mismatchBetween(big, big).sigmaVt).toBeCloseTo(pairMismatch(big).sigmaVt, 15);
  });

  it('is null for fewer than two devices', () => {
    expect(matchGroupMismatch([device(5, 1, 1)])).toBeNull();
  });
});
