import { describe, expect, it } from 'vitest';
import { BF180G, computeSize, mismatchBetween, offsetArea, resizeMatchGroup, type ResizeMember } from '../src/device/index.js';

describe('offsetArea', () => {
  it('is the W·L at which a pair has the σ(VOS) asked for: Pelgrom (1989) σ(ΔVT), σ(Δβ/β) combined as Kinget (2005)', () => {
    // By hand, from σ²(VOS) = (AVT² + (Aβ/(gm/ID))²)/(W·L) (Kinget, IEEE JSSC 40(6), 2005): AVT = 4.5 mV·µm,
    // Aβ = 1 %·µm, gm/ID = 16 /V, W·L = 1 µm² → σ(VOS) = √(4.5² + 0.625²) mV = 4.5432 mV.
    expect(offsetArea(4.5e-9, 1e-8, 16, 4.54320e-3)).toBeCloseTo(1e-12, 16);
    const area = offsetArea(5.5e-9, 1.2e-8, 12, 2e-3);
    const pair = mismatchBetween(...([0, 1].map(() => ({ avt: 5.5e-9, abeta: 1.2e-8, w: area / 1e-6, l: 1e-6, gmId: 12 })) as [never, never]));
    expect(pair.sigmaVos).toBeCloseTo(2e-3, 12);
  });

  it('falls as 1/σ² and grows with the β term when gm/ID is low (strong inversion)', () => {
    expect(offsetArea(5e-9, 0, 10, 1e-3) / offsetArea(5e-9, 0, 10, 2e-3)).toBeCloseTo(4, 12);
    expect(offsetArea(5e-9, 2e-8, 4, 1e-3)).toBeGreaterThan(offsetArea(5e-9, 2e-8, 20, 1e-3));
  });
});

describe('resizeMatchGroup', () => {
  // The invented amplifier's PMOS input pair: 10 µA, gm/ID = 16 /V, L = 0.5 µm, VSD = 0.6 V.
  const target = { processId: 'bf180g', polarity: 'pmos' as const, id: 10e-6, vds: 0.6, gmId: 16 };
  const { avt, abeta, lmin, wgrid } = BF180G.pmos;
  const start = computeSize({ ...target, l: 0.5e-6 }, BF180G);
  const member = (multiplier = 1): ResizeMember => ({ w: start.w, l: start.l, multiplier, gmId: start.gmId, vov: start.vov, fingers: start.fingers, avt, abeta, lmin, grid: wgrid });
  const sizer = (_index: number, l: number) => {
    const sized = computeSize({ ...target, l }, BF180G);
    return { w: sized.w, l: sized.l, gmId: sized.gmId, vov: sized.vov, fingers: sized.fingers };
  };

  it('meets a tighter offset with the engine\'s own sizes, within 1 % under the target, at the same gm/ID', () => {
    // The 2.0 model sizes this pair wider than the budget's 2 mV needs (1.63 mV), so ask for 1.2 mV.
    const plan = resizeMatchGroup([member(), member()], 1.2e-3, sizer);
    expect(plan.before.sigmaVos).toBeGreaterThan(1.2e-3);
    expect(plan.meetsTarget).toBe(true);
    expect(plan.after.sigmaVos).toBeLessThanOrEqual(1.2e-3);
    expect(plan.after.sigmaVos).toBeGreaterThan(0.99 * 1.2e-3);
    for (const size of plan.sizes) expect(size.gmId).toBeCloseTo(16, 2);
    // The area the closed form asks for, within the width grid and the change of λ with L.
    expect(plan.sizes[0].w * plan.sizes[0].l).toBeGreaterThan(0.97 * plan.requiredArea);
    expect(plan.sizes[0].w * plan.sizes[0].l).toBeLessThan(1.06 * plan.requiredArea);
  });

  it('keeps the ratio of a 4:1 group and shrinks a group whose offset is far below the target', () => {
    const plan = resizeMatchGroup([member(), member(4)], 10e-3, sizer);
    expect(plan.after.area).toBeLessThan(plan.before.area);
    expect(plan.sizes[0].w).toBeCloseTo(plan.sizes[1].w, 12);
    expect(plan.after.sigmaVos).toBeLessThanOrEqual(10e-3);
  });

  it('says what stopped it when the engine refuses a size', () => {
    const plan = resizeMatchGroup([member(), member()], 0.01e-3, () => 'W would be above 10 cm');
    expect(plan.meetsTarget).toBe(false);
    expect(plan.limitedBy).toBe('W would be above 10 cm');
  });
});
