import { describe, expect, it } from 'vitest';
import { isEngineError, prepareTable, sizeFromTable, type TableGrid, type TableSizeTarget, tableOperatingPoint } from '../src/device/index.js';
import { smoothDevice, synthesiseTable } from './synthetic-table.js';

const GRID: TableGrid = {
  polarity: 'nmos',
  modelName: 'synthetic',
  referenceWidth: 10e-6,
  lengths: [0.18, 0.21, 0.25, 0.3, 0.36, 0.5, 0.7, 1, 1.4, 2].map((l) => l * 1e-6),
  vgs: { start: 0, step: 0.02, count: 91 },
  vds: [0.05, 0.2, 0.35, 0.6, 0.9, 1.3, 1.8],
  vsb: [0, 0.3, 0.6, 0.9],
  corners: ['tt', 'ss'],
  temperatures: [27, 125],
};
const prepared = prepareTable(synthesiseTable(GRID, smoothDevice));
const base: TableSizeTarget = { corner: 'tt', temperature: 27, id: 20e-6, l: 0.42e-6, vds: 0.75, vsb: 0.2 };
const relative = (a: number, b: number) => Math.abs(a / b - 1);

function errorOf(target: TableSizeTarget): { code: string; field?: string; message: string } {
  try {
    sizeFromTable(prepared, target);
  } catch (error) {
    if (isEngineError(error)) return { code: error.code, field: error.field, message: error.message };
    throw error;
  }
  throw new Error('no error');
}

/** The VGS at which the smooth device's gm/ID is the target, by bisection on the device itself. */
function trueVgsForGmId(gmId: number, corner: number, temperature: number, l: number, vds: number, vsb: number): number {
  let low = 0;
  let high = 1.8;
  for (let i = 0; i < 80; i++) {
    const middle = (low + high) / 2;
    const point = smoothDevice(corner, temperature, l, middle, vds, vsb);
    if (point.gm / point.id > gmId) low = middle;
    else high = middle;
  }
  return (low + high) / 2;
}

describe('sizeFromTable', () => {
  it('for gm/ID, reaches the target gm/ID and ID on the table exactly', () => {
    for (const gmId of [5, 10, 15, 20, 25]) {
      const sized = sizeFromTable(prepared, { ...base, gmId });
      expect(sized.constraint).toBe('gmId');
      expect(relative(sized.gmId, gmId)).toBeLessThan(1e-8);
      expect(relative(sized.id, base.id)).toBeLessThan(1e-12);
      expect(sized.w).toBeCloseTo((base.id / sized.idW) as number, 18);
    }
  });

  it('for gm/ID, gives the width and VGS of the device the table was made from, within 0.5 % and 0.3 mV (W = ID / (ID/W); Silveira, Flandre & Jespers, 1996)', () => {
    for (const [gmId, l, vds, vsb, corner, temperature] of [
      [5, 0.18e-6, 0.9, 0, 'tt', 27],
      [12, 0.27e-6, 0.6, 0.3, 'ss', 125],
      [18, 0.8e-6, 1.3, 0.45, 'tt', 125],
      [25, 1.7e-6, 0.35, 0.9, 'ss', 27],
    ] as const) {
      const sized = sizeFromTable(prepared, { ...base, gmId, l, vds, vsb, corner, temperature });
      const c = corner === 'tt' ? 0 : 1;
      const vgs = trueVgsForGmId(gmId, c, temperature, l, vds, vsb);
      const w = (base.id / smoothDevice(c, temperature, l, vgs, vds, vsb).id) * GRID.referenceWidth;
      expect(Math.abs(sized.vgs - vgs)).toBeLessThan(0.3e-3);
      expect(relative(sized.w, w)).toBeLessThan(5e-3);
    }
  });

  it('for an overdrive, sets VGS = VT + VOV with the table VT at that VGS', () => {
    const sized = sizeFromTable(prepared, { ...base, vov: 0.15 });
    expect(sized.vgs - sized.vt).toBeCloseTo(0.15, 9);
    expect(relative(sized.id, base.id)).toBeLessThan(1e-12);
  });

  it('for a width, solves VGS so that the device carries ID', () => {
    const sized = sizeFromTable(prepared, { ...base, w: 3e-6 });
    expect(sized.w).toBe(3e-6);
    expect(relative(sized.id, base.id)).toBeLessThan(1e-8);
  });

  it('for a VGS, gives W = ID / (ID/W at that VGS) and keeps VGS', () => {
    const sized = sizeFromTable(prepared, { ...base, vgs: 0.72 });
    expect(sized.vgs).toBe(0.72);
    const reference = tableOperatingPoint(prepared, { ...base, w: GRID.referenceWidth, vgs: 0.72 });
    expect(relative(sized.w, (base.id / reference.id) * GRID.referenceWidth)).toBeLessThan(1e-12);
  });

  it('the four constraints agree: sizing by the VGS another constraint found gives back its width', () => {
    const byGmId = sizeFromTable(prepared, { ...base, gmId: 14 });
    expect(relative(sizeFromTable(prepared, { ...base, vgs: byGmId.vgs }).w, byGmId.w)).toBeLessThan(1e-12);
    expect(relative(sizeFromTable(prepared, { ...base, w: byGmId.w }).vgs, byGmId.vgs)).toBeLessThan(1e-8);
    expect(relative(sizeFromTable(prepared, { ...base, vov: byGmId.vov }).w, byGmId.w)).toBeLessThan(1e-6);
  });

  it('refuses a gm/ID above the highest in the table at that point, naming gmId', () => {
    const error = errorOf({ ...base, gmId: 40 });
    expect(error).toMatchObject({ code: 'GM_ID_ABOVE_TABLE', field: 'gmId' });
    expect(error.message).toMatch(/highest gm\/ID in the table/);
  });

  it('refuses a gm/ID so low that it needs VGS above the table, naming gmId', () => {
    expect(errorOf({ ...base, gmId: 0.5 })).toMatchObject({ code: 'GM_ID_BELOW_TABLE', field: 'gmId' });
  });

  it('refuses an overdrive that needs VGS beyond the table, naming vov', () => {
    expect(errorOf({ ...base, vov: 1.6 })).toMatchObject({ code: 'VGS_OUTSIDE_TABLE', field: 'vov' });
    expect(errorOf({ ...base, vgs: 1.9 })).toMatchObject({ code: 'VGS_OUTSIDE_TABLE', field: 'vgs' });
  });

  it('refuses a width that cannot carry ID within the table, naming w', () => {
    expect(errorOf({ ...base, id: 1e-2, w: 1e-6 })).toMatchObject({ code: 'ID_OUTSIDE_TABLE', field: 'w' });
  });

  it('refuses L, VDS, VSB, temperature or corner outside the grid before sizing', () => {
    expect(errorOf({ ...base, gmId: 10, l: 3e-6 })).toMatchObject({ code: 'L_OUTSIDE_TABLE', field: 'l' });
    expect(errorOf({ ...base, gmId: 10, vds: 2 })).toMatchObject({ code: 'VDS_OUTSIDE_TABLE', field: 'vds' });
    expect(errorOf({ ...base, gmId: 10, vsb: 1.2 })).toMatchObject({ code: 'VSB_OUTSIDE_TABLE', field: 'vsb' });
    expect(errorOf({ ...base, gmId: 10, temperature: 150 })).toMatchObject({ code: 'TEMPERATURE_OUTSIDE_TABLE', field: 'temperature' });
    expect(errorOf({ ...base, gmId: 10, corner: 'fs' })).toMatchObject({ code: 'CORNER_NOT_IN_TABLE', field: 'corner' });
  });

  it('refuses a target without exactly one constraint, or with no positive ID', () => {
    expect(errorOf({ ...base })).toMatchObject({ code: 'VALIDATION_FAILED' });
    expect(errorOf({ ...base, gmId: 10, vov: 0.2 })).toMatchObject({ code: 'VALIDATION_FAILED' });
    expect(errorOf({ ...base, gmId: 10, id: 0 })).toMatchObject({ code: 'VALIDATION_FAILED', field: 'id' });
    expect(errorOf({ ...base, gmId: -3 })).toMatchObject({ code: 'VALIDATION_FAILED', field: 'gmId' });
  });

  it('refuses a width above 10 cm', () => {
    expect(errorOf({ ...base, id: 1, gmId: 25 })).toMatchObject({ code: 'W_TOO_LARGE', field: 'gmId' });
  });
});
