import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { BF130G, BF180G, computeSize, isEngineError, operatingPoint, prepareDevice, solveSize } from '../src/device/index.js';
import type { SizeRequestInput } from '../src/schemas/index.js';

const nmos = prepareDevice(BF180G, 'nmos');
const base = { id: 20e-6, l: 0.5e-6, vds: 0.6, vsb: 0 };
const onGrid = (w: number, grid: number) => Math.abs(w / grid - Math.round(w / grid)) < 1e-6;
const codes = (request: Partial<SizeRequestInput>) => computeSize({ processId: 'bf180g', polarity: 'nmos', ...base, vov: 0.2, ...request } as SizeRequestInput, BF180G).warnings.map((w) => w.code);
const error = (request: Partial<SizeRequestInput>) => {
  try {
    computeSize({ processId: 'bf180g', polarity: 'nmos', ...base, vov: 0.2, ...request } as SizeRequestInput, BF180G);
  } catch (e) {
    if (isEngineError(e)) return { code: e.code, field: e.field, message: e.message };
    throw e;
  }
  throw new Error('no error');
};

describe('solveSize', () => {
  it('sizes for an overdrive, snaps W to the grid and re-solves VGS so that ID stays at the target', () => {
    const sized = solveSize(nmos, 'all-region', { ...base, vov: 0.2 });
    expect(onGrid(sized.w, BF180G.nmos.wgrid)).toBe(true);
    expect(Math.abs(sized.w - sized.wRequired)).toBeLessThanOrEqual(BF180G.nmos.wgrid / 2 + 1e-18);
    expect(sized.id / base.id).toBeCloseTo(1, 12);
    // Snapping W by up to wgrid/2 moves VOV by about (ΔW/W)/(gm/ID) to keep ID.
    expect(Math.abs(sized.vov - 0.2)).toBeLessThanOrEqual((BF180G.nmos.wgrid / 2 / sized.w) / sized.gmId * 1.01);
    expect(sized.wOverL).toBeCloseTo(sized.w / sized.l, 12);
  });

  it('sizes for gm/ID: the reached gm/ID is the target up to the snapping of W', () => {
    const sized = solveSize(nmos, 'all-region', { ...base, gmId: 15 });
    expect(sized.gmId).toBeCloseTo(15, 2);
    expect(sized.id / base.id).toBeCloseTo(1, 12);
  });

  it('for a given W solves VGS for ID; for a given VGS keeps VGS and reports the ID reached', () => {
    const byW = solveSize(nmos, 'all-region', { ...base, w: 4e-6 });
    expect(byW.w).toBe(4e-6);
    expect(byW.id / base.id).toBeCloseTo(1, 12);
    const byVgs = solveSize(nmos, 'all-region', { ...base, vgs: 0.7 });
    expect(byVgs.vgs).toBe(0.7);
    expect(Math.abs(byVgs.id / base.id - 1)).toBeLessThan(BF180G.nmos.wgrid / byVgs.w);
  });

  it('splits a wide device into fingers no wider than the limit (10 µm unless given), each on the grid', () => {
    const wide = solveSize(nmos, 'all-region', { ...base, id: 2e-3, vov: 0.2 });
    expect(wide.fingers).toBe(Math.ceil(wide.wRequired / 10e-6 - 1e-9));
    expect(wide.fingerWidth).toBeLessThanOrEqual(10e-6);
    expect(onGrid(wide.fingerWidth, BF180G.nmos.wgrid)).toBe(true);
    expect(wide.w).toBeCloseTo(wide.fingers * wide.fingerWidth, 18);
    const narrow = solveSize(nmos, 'all-region', { ...base, id: 2e-3, vov: 0.2, maxFingerWidth: 2e-6 });
    expect(narrow.fingerWidth).toBeLessThanOrEqual(2e-6);
    expect(narrow.fingers).toBeGreaterThan(wide.fingers);
  });

  it('sizes a PMOS with polarity-normalised voltages (VSG, VSD, VBS)', () => {
    const pmos = solveSize(prepareDevice(BF180G, 'pmos'), 'all-region', { ...base, vsb: 0.3, vov: 0.2 });
    expect(pmos.vt).toBeGreaterThan(BF180G.pmos.vt0);
    expect(pmos.vgs).toBeCloseTo(pmos.vt + 0.2, 3);
    expect(pmos.w).toBeGreaterThan(solveSize(nmos, 'all-region', { ...base, vsb: 0.3, vov: 0.2 }).w);
  });
});

describe('sizing errors, each with a code and a sentence, never NaN', () => {
  it('refuses gm/ID above the weak-inversion limit 1/(n·UT) with GM_ID_ABOVE_WEAK_INVERSION_LIMIT', () => {
    expect(error({ vov: undefined, gmId: 33 })).toMatchObject({ code: 'GM_ID_ABOVE_WEAK_INVERSION_LIMIT', field: 'gmId' });
    expect(error({ vov: undefined, gmId: 33 }).message).toContain('31.18 /V');
    // The limit falls with temperature: 30 /V is reachable at 27 °C but not at 125 °C.
    expect(codes({ vov: undefined, gmId: 30 })).toContain('GM_ID_NEAR_WEAK_INVERSION_LIMIT');
    expect(error({ vov: undefined, gmId: 30, temperature: 125 }).code).toBe('GM_ID_ABOVE_WEAK_INVERSION_LIMIT');
  });

  it('refuses a current the given W cannot carry below vdd with ID_NOT_REACHABLE_BELOW_VDD', () => {
    expect(error({ vov: undefined, w: 1e-6, id: 5e-3 })).toMatchObject({ code: 'ID_NOT_REACHABLE_BELOW_VDD', field: 'id' });
  });

  it('refuses L below lmin with L_BELOW_LMIN, a given W below wmin with W_BELOW_WMIN, an absurd W with W_TOO_LARGE', () => {
    expect(error({ l: 0.1e-6 })).toMatchObject({ code: 'L_BELOW_LMIN', field: 'l' });
    expect(error({ vov: undefined, w: 0.1e-6 })).toMatchObject({ code: 'W_BELOW_WMIN', field: 'w' });
    expect(error({ vov: -1.5, id: 0.1 })).toMatchObject({ code: 'W_TOO_LARGE' });
  });
});

describe('sizing warnings', () => {
  it('warns about the square law near threshold (VOV < 4nUT), L near lmin (< 2·lmin) and VDS below VDSsat', () => {
    expect(codes({ model: 'square-law', vov: 0.1 })).toContain('SQUARE_LAW_NEAR_THRESHOLD');
    expect(codes({ model: 'all-region', vov: 0.1 })).not.toContain('SQUARE_LAW_NEAR_THRESHOLD');
    expect(codes({ l: 0.3e-6 })).toContain('L_NEAR_LMIN');
    expect(codes({ vov: 0.4, vds: 0.2 })).toContain('VDS_BELOW_VDSSAT');
    expect(codes({ vov: 0.2 })).toEqual([]);
  });

  it('warns about a forward-biased source–body junction, a depletion device conducting at VGS = 0, VGS above vdd', () => {
    expect(codes({ vsb: -0.2 })).toContain('SOURCE_BODY_FORWARD_BIASED');
    expect(codes({ flavour: 'native', l: 1e-6, vov: 0.2 })).toContain('DEPLETION_CONDUCTS_AT_VGS0');
    expect(codes({ vov: 1.5, id: 1e-3 })).toContain('VGS_ABOVE_VDD');
  });

  it('warns when the width needed is below wmin and widens the finger to wmin', () => {
    const result = computeSize({ processId: 'bf180g', polarity: 'nmos', ...base, id: 1e-6, vov: 0.4 }, BF180G);
    expect(result.warnings.map((w) => w.code)).toContain('W_BELOW_WMIN');
    expect(result.w).toBe(BF180G.nmos.wmin);
    expect(result.id / 1e-6).toBeCloseTo(1, 10);
  });

  it('warns when the temperature is outside the process range', () => {
    expect(codes({ temperature: 150 })).toContain('TEMPERATURE_OUTSIDE_PROCESS_RANGE');
  });
});

describe('solve then evaluate', () => {
  const processes = [BF180G, BF130G];

  it('the operating point of the sized device at the reported VGS carries the target current (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom(...processes),
        fc.constantFrom('nmos', 'pmos' as const),
        fc.constantFrom('all-region', 'square-law' as const),
        fc.constantFrom('TT', 'FF', 'SS', 'FS', 'SF'),
        fc.double({ min: -40, max: 125, noNaN: true }),
        fc.double({ min: 1e-7, max: 1e-3, noNaN: true }),
        fc.double({ min: 1, max: 5, noNaN: true }),
        fc.double({ min: 0, max: 0.8, noNaN: true }),
        fc.oneof(fc.record({ vov: fc.double({ min: 0.15, max: 0.5, noNaN: true }) }), fc.record({ gmId: fc.double({ min: 4, max: 12, noNaN: true }) })),
        (process, polarity, model, corner, temperature, id, lOverLmin, vsb, constraint) => {
          const device = prepareDevice(process, polarity, { corner, temperature });
          const l = lOverLmin * process[polarity].lmin;
          const vds = 0.5 * process.vdd;
          const sized = solveSize(device, model, { id, l, vds, vsb, ...constraint });
          const op = operatingPoint(device, model, sized.w, l, { vgs: sized.vgs, vds, vsb });
          expect(op.id / id).toBeCloseTo(1, 9);
        },
      ),
    );
  });

  it('never answers NaN or an infinity: every valid request gives finite numbers (or null) or an EngineError (fast-check)', () => {
    fc.assert(
      fc.property(
        fc.constantFrom('nmos', 'pmos' as const),
        fc.constantFrom('all-region', 'square-law' as const),
        fc.double({ min: -200, max: 300, noNaN: true }),
        fc.double({ min: 1e-12, max: 1, noNaN: true }),
        fc.double({ min: 0.18e-6, max: 1e-3, noNaN: true }),
        fc.double({ min: 1e-6, max: 20, noNaN: true }),
        fc.double({ min: -0.84, max: 20, noNaN: true }),
        fc.oneof(
          fc.record({ vov: fc.double({ min: -2, max: 10, noNaN: true }) }),
          fc.record({ gmId: fc.double({ min: 1e-3, max: 100, noNaN: true }) }),
          fc.record({ w: fc.double({ min: 1e-8, max: 0.1, noNaN: true }) }),
          fc.record({ vgs: fc.double({ min: -20, max: 20, noNaN: true }) }),
        ),
        (polarity, model, temperature, id, l, vds, vsb, constraint) => {
          try {
            const result = computeSize({ processId: 'bf180g', polarity, model, temperature, id, l, vds, vsb, ...constraint }, BF180G);
            for (const [key, value] of Object.entries(result)) {
              if (typeof value === 'number') expect(Number.isFinite(value), `${key} = ${value}`).toBe(true);
            }
            for (const [key, value] of Object.entries(result.leakage)) if (typeof value === 'number') expect(Number.isFinite(value), `leakage.${key} = ${value}`).toBe(true);
          } catch (e) {
            expect(isEngineError(e), String(e)).toBe(true);
          }
        },
      ),
    );
  });
});
