import { describe, expect, it } from 'vitest';
import { BF180G, computeSize } from '../src/device/index.js';

// docs/model.md, section 20: the worked example by hand with the invented demo process BF180-G.
const target = { processId: 'bf180g', polarity: 'nmos', corner: 'TT', temperature: 27, id: 20e-6, l: 0.5e-6, vov: 0.2, vds: 0.6, vsb: 0.3 } as const;
const digits = (value: number | null, expected: number, significant = 4) => {
  expect(value).not.toBeNull();
  expect(Math.abs((value as number) / expected - 1)).toBeLessThan(0.5 * 10 ** (1 - significant));
};

describe('the worked example of docs/model.md', () => {
  it('step 1–4: UT = 25.865 mV, VT = 0.51669 V, n = 1.20713, λ = 0.08 /V', () => {
    const result = computeSize(target, BF180G);
    digits(result.ut, 0.025865, 5);
    digits(result.vt, 0.51669, 5);
    digits(result.n, 1.20713, 6);
    digits(result.lambda, 0.08, 6);
  });

  it('square law: W = 1.645 µm, VGS = 0.71670 V, gm = 199.99 µS, gds = 1.5267 µS, ro = 655.0 kΩ, gain 131.0, gmb = 41.42 µS', () => {
    const result = computeSize({ ...target, model: 'square-law' }, BF180G);
    digits(result.wRequired, 1.6452e-6, 5);
    expect(result.w).toBe(1.645e-6);
    expect(result.fingers).toBe(1);
    digits(result.vgs, 0.7167, 5);
    digits(result.gm, 199.99e-6, 5);
    digits(result.gds, 1.5267e-6, 5);
    digits(result.ro, 655.0e3, 4);
    digits(result.intrinsicGain, 131.0, 4);
    digits(result.gmb, 41.42e-6, 4);
    expect(result.warnings).toEqual([]);
  });

  it('all-region: W = 2.030 µm, VGS = 0.71683 V, gm/ID = 8.640 /V, gm = 172.79 µS, IC = 10.52 (strong), VDSsat = 0.1679 V', () => {
    const result = computeSize(target, BF180G);
    digits(result.wRequired, 2.0324e-6, 5);
    expect(result.w).toBe(2.03e-6);
    digits(result.vgs, 0.71683, 5);
    digits(result.gmId, 8.640, 4);
    digits(result.gm, 172.79e-6, 5);
    digits(result.ic, 10.52, 4);
    expect(result.region).toBe('strong');
    digits(result.vdsat, 0.1679, 4);
    digits(result.gds, 1.5267e-6, 4);
    digits(result.gmb, 35.79e-6, 4);
  });

  it('all-region: Cgs = 5.434 fF, Cgd = 0.7105 fF, Cgb = 0.6564 fF, fT = 4.044 GHz, pair σ(ΔVT) = 4.467 mV, Ioff ≈ 1.799 pA', () => {
    const result = computeSize(target, BF180G);
    digits(result.cgs, 5.434e-15, 4);
    digits(result.cgd, 0.7105e-15, 4);
    digits(result.cgb as number, 0.6564e-15, 4);
    digits(result.cgg as number, 6.800e-15, 4);
    digits(result.ft, 4.044e9, 4);
    digits(result.sigmaVt, 4.467e-3, 4);
    digits(result.sigmaVtSingle, 3.158e-3, 4);
    digits(result.ioff, 1.799e-12, 4);
    digits(result.leakage.gate, 8.44e-20, 3);
    digits(result.leakage.junction, 4.872e-16, 4);
  });
});
