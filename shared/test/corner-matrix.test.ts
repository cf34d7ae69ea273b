import { describe, expect, it } from 'vitest';
import { BF180G, computeCorners, computeSize, cornerMatrixRow, limitStatus, matrixColumns, worstCells, type MatrixDevice } from '../src/device/index.js';
import type { MatrixCell } from '../src/schemas/index.js';

const sized = computeSize({ processId: 'bf180g', polarity: 'pmos', l: 0.5e-6, vds: 0.6, id: 10e-6, gmId: 16 }, BF180G);
const device: MatrixDevice = {
  polarity: 'pmos',
  model: 'all-region',
  w: sized.w,
  l: sized.l,
  vds: sized.vds,
  vsb: 0,
  reference: { id: sized.id, vgs: sized.vgs },
  limits: [{ figure: 'headroom', min: 0.05 }],
};

describe('matrixColumns', () => {
  it('crosses every corner with the range minimum, nominal and maximum and the temperatures added, corner-major', () => {
    const columns = matrixColumns(BF180G, { temperatures: [85, 27] });
    expect(columns.map((c) => `${c.corner}@${c.temperature}`)).toEqual(['TT', 'FF', 'SS', 'FS', 'SF'].flatMap((c) => [-40, 27, 85, 125].map((t) => `${c}@${t}`)));
    expect(new Set(columns.map((c) => c.vdd))).toEqual(new Set([1.8]));
  });

  it('adds the supply at VDD·(1 ± tolerance) to each corner and temperature', () => {
    const columns = matrixColumns(BF180G, { corners: ['TT'], vddTolerance: 0.1 });
    expect(columns.map((c) => c.vdd)).toEqual([1.62, 1.8, 1.98, 1.62, 1.8, 1.98, 1.62, 1.8, 1.98].map((v) => expect.closeTo(v, 12)));
  });
});

describe('cornerMatrixRow', () => {
  it('gives in every cell what a single corners call gives for that corner and temperature', () => {
    const columns = matrixColumns(BF180G, {});
    const row = cornerMatrixRow(BF180G, 'bf180g', device, 'current', columns);
    columns.forEach((column, index) => {
      const single = computeCorners(
        { processId: 'bf180g', polarity: 'pmos', w: sized.w, l: sized.l, vds: 0.6, bias: 'current', id: sized.id, corners: [column.corner], temperatures: [column.temperature] },
        BF180G,
      ).points[0].op!;
      const cell = row.cells[index];
      expect(cell.values.vgs).toBe(single.vgs);
      expect(cell.values.gm).toBe(single.gm);
      expect(cell.values.ft).toBe(single.ft);
      expect(cell.values.headroom).toBe(single.vds - single.vdsat);
    });
  });

  it('holds VGS when voltage-biased and reports the change of ID from the stored result', () => {
    const row = cornerMatrixRow(BF180G, 'bf180g', device, 'voltage', matrixColumns(BF180G, { corners: ['TT', 'FF', 'SS'], temperatures: [] }));
    const tt = row.cells[1];
    expect(tt.values.idChange as number).toBeCloseTo(0, 9);
    expect(row.cells[4].values.idChange as number).toBeGreaterThan(0);
    expect(row.cells[7].values.idChange as number).toBeLessThan(0);
  });

  it('carries the supply into the gate-drive ceiling: a current the device reaches at VDD fails at VDD − 30 %', () => {
    const narrow = { ...device, w: 0.5e-6, l: 0.5e-6, reference: { id: 30e-6, vgs: 1.5 }, limits: [] };
    const row = cornerMatrixRow(BF180G, 'bf180g', narrow, 'current', matrixColumns(BF180G, { corners: ['SS'], vddTolerance: 0.3 }));
    const low = row.cells.filter((_, i) => i % 3 === 0);
    const high = row.cells.filter((_, i) => i % 3 === 2);
    expect(low.some((cell) => cell.error?.code === 'ID_NOT_REACHABLE_BELOW_VDD')).toBe(true);
    expect(high.every((cell) => cell.error === undefined)).toBe(true);
  });
});

describe('worst cell of a row', () => {
  const cell = (values: Partial<MatrixCell['values']>, error?: boolean): MatrixCell =>
    ({ values: { vgs: null, vov: null, vdsat: null, headroom: null, gm: null, gmId: null, ft: null, intrinsicGain: null, id: null, idChange: null, ...values }, status: {}, warnings: [], ...(error ? { error: { code: 'X', message: 'x' } } : {}) }) as unknown as MatrixCell;

  it('is the highest VGS without a limit, the lowest gm, and the largest ID change either way', () => {
    const cells = [cell({ vgs: 0.6, gm: 3e-4, idChange: 0.1 }), cell({ vgs: 0.7, gm: 2e-4, idChange: -0.3 }), cell({ vgs: 0.65, gm: 4e-4, idChange: 0.2 })];
    const worst = worstCells(cells, []);
    expect(worst.vgs?.column).toBe(1);
    expect(worst.gm?.column).toBe(1);
    expect(worst.idChange?.column).toBe(1);
  });

  it('is the least margin to the limit when there is one, and a cell without an answer before any other', () => {
    const limits = [{ figure: 'headroom' as const, min: 0.05 }];
    const cells = [cell({ headroom: 0.2 }), cell({ headroom: 0.04 }), cell({ headroom: 0.06 })];
    expect(worstCells(cells, limits).headroom).toEqual({ column: 1, value: 0.04, status: 'fail' });
    expect(worstCells([...cells, cell({}, true)], limits).headroom?.column).toBe(3);
  });

  it('marks a value outside its limit as failing, one inside by less than a tenth of the limit as tight', () => {
    expect(limitStatus(0.04, { figure: 'headroom', min: 0.05 })).toBe('fail');
    expect(limitStatus(0.054, { figure: 'headroom', min: 0.05 })).toBe('tight');
    expect(limitStatus(0.2, { figure: 'headroom', min: 0.05 })).toBe('ok');
    expect(limitStatus(0.25, { figure: 'idChange', min: -0.2, max: 0.2 })).toBe('fail');
    expect(limitStatus(0.19, { figure: 'idChange', min: -0.2, max: 0.2 })).toBe('tight');
    expect(limitStatus(null, { figure: 'idChange', min: -0.2, max: 0.2 })).toBe('fail');
    expect(limitStatus(0.3, undefined)).toBe('none');
  });
});
