import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import {
  checkTableGrid,
  decodeTable,
  defaultTableGrid,
  encodeTable,
  isEngineError,
  MonotoneCubic,
  monotoneCubicAt,
  type LookupTable,
  prepareTable,
  TABLE_FIELDS,
  type TableGrid,
  tableLine,
  tableOperatingPoint,
  tablePointCount,
} from '../src/device/index.js';
import { logLinearDevice, smoothDevice, synthesiseTable } from './synthetic-table.js';

const GRID: TableGrid = {
  polarity: 'nmos',
  modelName: 'synthetic',
  referenceWidth: 10e-6,
  lengths: [0.18e-6, 0.25e-6, 0.35e-6, 0.5e-6, 1e-6, 2e-6],
  vgs: { start: 0, step: 0.025, count: 73 },
  vds: [0.05, 0.3, 0.6, 0.9, 1.2, 1.8],
  vsb: [0, 0.3, 0.6, 0.9],
  corners: ['tt', 'ss'],
  temperatures: [-40, 27, 125],
};

const exact = prepareTable(synthesiseTable(GRID, logLinearDevice));
const relative = (a: number, b: number) => Math.abs(a / b - 1);

function errorOf(run: () => unknown): { code: string; field?: string; message: string } {
  try {
    run();
  } catch (error) {
    if (isEngineError(error)) return { code: error.code, field: error.field, message: error.message };
    throw error;
  }
  throw new Error('no error');
}

describe('table lookups', () => {
  it('returns the stored values at grid points', () => {
    const table = synthesiseTable(GRID, smoothDevice);
    const prepared = prepareTable(table);
    const op = tableOperatingPoint(prepared, { corner: 'ss', temperature: 125, l: 0.35e-6, vds: 0.6, vsb: 0.3, w: 10e-6, vgs: 0.75 });
    const expected = smoothDevice(1, 125, 0.35e-6, 0.75, 0.6, 0.3);
    for (const field of TABLE_FIELDS) expect(relative(op[field], expected[field]), field).toBeLessThan(1e-12);
  });

  it('is exact between grid points in every axis for a device whose interpolated fields are linear in each', () => {
    fc.assert(
      fc.property(
        fc.double({ min: Math.log(0.18e-6), max: Math.log(2e-6), noNaN: true }),
        fc.double({ min: 0, max: 1.8, noNaN: true }),
        fc.double({ min: 0.05, max: 1.8, noNaN: true }),
        fc.double({ min: 0, max: 0.9, noNaN: true }),
        fc.double({ min: -40, max: 125, noNaN: true }),
        fc.constantFrom(0, 1),
        (lnL, vgs, vds, vsb, temperature, corner) => {
          const l = Math.exp(lnL);
          const op = tableOperatingPoint(exact, { corner: GRID.corners[corner], temperature, l, vds, vsb, w: 10e-6, vgs });
          const expected = logLinearDevice(corner, temperature, l, vgs, vds, vsb);
          // Exact up to rounding (and to the snapping of a value within 1e-12 of a grid value onto it).
          for (const field of ['id', 'gm', 'gds', 'gmb', 'cgg'] as const) expect(relative(op[field], expected[field]), field).toBeLessThan(1e-9);
          for (const field of ['vt', 'vdsat', 'cgs', 'cgd', 'cgb'] as const) expect(Math.abs(op[field] - expected[field]), field).toBeLessThan(1e-9 * Math.abs(expected[field]) + 1e-24);
        },
      ),
    );
  });

  it('scales currents, conductances and capacitances with W / reference width, not voltages', () => {
    const at = { corner: 'tt', temperature: 27, l: 0.5e-6, vds: 0.9, vsb: 0, vgs: 0.7 };
    const reference = tableOperatingPoint(exact, { ...at, w: 10e-6 });
    const wide = tableOperatingPoint(exact, { ...at, w: 35e-6 });
    for (const field of ['id', 'gm', 'gds', 'gmb', 'cgg', 'cgs', 'cgd', 'cgb'] as const) expect(wide[field] / reference[field]).toBeCloseTo(3.5, 12);
    for (const field of ['vt', 'vdsat', 'gmId', 'gain', 'ft', 'idW'] as const) expect(relative(wide[field], reference[field])).toBeLessThan(1e-12);
  });

  it('derives ro, gain, gm/ID, ID/W, VOV and fT = gm/(2π·Cgg) from the tabulated fields', () => {
    const op = tableOperatingPoint(exact, { corner: 'tt', temperature: 27, l: 0.5e-6, vds: 0.9, vsb: 0.3, w: 4e-6, vgs: 0.6 });
    expect(op.ro).toBeCloseTo(1 / op.gds, 6);
    expect(op.gain).toBeCloseTo(op.gm / op.gds, 9);
    expect(op.gmId).toBeCloseTo(op.gm / op.id, 9);
    expect(op.idW).toBeCloseTo(op.id / 4e-6, 9);
    expect(op.vov).toBeCloseTo(op.vgs - op.vt, 12);
    expect(op.ft / (op.gm / (2 * Math.PI * op.cgg))).toBeCloseTo(1, 12);
  });

  it('stays within 0.7 % in ID, 0.3 % in gm/ID and 0.3 mV in VT of a smooth all-region device anywhere between grid points', () => {
    // Lengths closer than ×1.4 near lmin, where the threshold rolls off; VDS from 0.35 V (saturation) up.
    const dense: TableGrid = { ...GRID, lengths: [0.18, 0.21, 0.25, 0.3, 0.36, 0.5, 0.7, 1, 1.4, 2].map((l) => l * 1e-6), vds: [0.05, 0.1, 0.2, 0.35, 0.6, 0.9, 1.3, 1.8], vsb: [0, 0.225, 0.45, 0.675, 0.9], temperatures: [27], corners: ['tt'] };
    const prepared = prepareTable(synthesiseTable(dense, smoothDevice));
    const worst = { id: 0, gmId: 0, vt: 0 };
    const points = fc.sample(
      fc.tuple(fc.double({ min: Math.log(0.18e-6), max: Math.log(2e-6), noNaN: true }), fc.double({ min: 0.3, max: 1.8, noNaN: true }), fc.double({ min: 0.35, max: 1.8, noNaN: true }), fc.double({ min: 0, max: 0.9, noNaN: true })),
      { numRuns: 1000, seed: 42 },
    );
    for (const [lnL, vgs, vds, vsb] of points) {
      const l = Math.exp(lnL);
      const op = tableOperatingPoint(prepared, { corner: 'tt', temperature: 27, l, vds, vsb, w: 10e-6, vgs });
      const expected = smoothDevice(0, 27, l, vgs, vds, vsb);
      worst.id = Math.max(worst.id, relative(op.id, expected.id));
      worst.gmId = Math.max(worst.gmId, relative(op.gmId, expected.gm / expected.id));
      worst.vt = Math.max(worst.vt, Math.abs(op.vt - expected.vt));
    }
    expect(worst.id).toBeLessThan(7e-3);
    expect(worst.gmId).toBeLessThan(3e-3);
    expect(worst.vt).toBeLessThan(0.3e-3);
  });

  it('never lets ID fall between VGS nodes when the stored ID rises (monotone cubic: Fritsch & Carlson, 1980)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ min: 1e-3, max: 10, noNaN: true }), { minLength: 8, maxLength: 8 }), (steps) => {
        const grid: TableGrid = { ...GRID, lengths: [1e-6], vds: [0.9], vsb: [0], corners: ['tt'], temperatures: [27], vgs: { start: 0, step: 0.1, count: 9 } };
        let current = 1e-9;
        const ids = [current, ...steps.map((s) => (current *= 1 + s))];
        const table = synthesiseTable(grid, (_c, _t, _l, vgs) => ({ ...logLinearDevice(0, 27, 1e-6, vgs, 0.9, 0), id: ids[Math.round(vgs / 0.1)] }));
        const line = tableLine(prepareTable(table), { corner: 'tt', temperature: 27, l: 1e-6, vds: 0.9, vsb: 0 });
        let previous = 0;
        for (let vgs = 0; vgs <= 0.8; vgs += 0.0037) {
          const id = line.valueAt('id', vgs);
          expect(id).toBeGreaterThanOrEqual(previous * (1 - 1e-12));
          previous = id;
        }
      }),
    );
  });

  it('interpolates linearly between two characterised temperatures and says so', () => {
    const at = { corner: 'tt', l: 1e-6, vds: 0.9, vsb: 0, w: 10e-6, vgs: 0.8 };
    const op = tableOperatingPoint(exact, { ...at, temperature: 60 });
    expect(op.warnings.map((w) => w.code)).toEqual(['TEMPERATURE_INTERPOLATED']);
    expect(relative(op.id, logLinearDevice(0, 60, 1e-6, 0.8, 0.9, 0).id)).toBeLessThan(1e-9);
    expect(tableOperatingPoint(exact, { ...at, temperature: 27 }).warnings).toEqual([]);
  });
});

describe('table lookups outside the grid', () => {
  const at = { corner: 'tt', temperature: 27, l: 1e-6, vds: 0.9, vsb: 0.3, w: 10e-6, vgs: 0.8 };
  const cases: [string, Partial<typeof at>, string, string][] = [
    ['L below the shortest length', { l: 0.17e-6 }, 'L_OUTSIDE_TABLE', 'l'],
    ['L above the longest length', { l: 2.1e-6 }, 'L_OUTSIDE_TABLE', 'l'],
    ['VDS below the lowest VDS', { vds: 0.04 }, 'VDS_OUTSIDE_TABLE', 'vds'],
    ['VDS above the highest VDS', { vds: 1.81 }, 'VDS_OUTSIDE_TABLE', 'vds'],
    ['VSB below 0', { vsb: -0.1 }, 'VSB_OUTSIDE_TABLE', 'vsb'],
    ['VSB above the highest VSB', { vsb: 1 }, 'VSB_OUTSIDE_TABLE', 'vsb'],
    ['a temperature below the coldest', { temperature: -41 }, 'TEMPERATURE_OUTSIDE_TABLE', 'temperature'],
    ['a temperature above the hottest', { temperature: 126 }, 'TEMPERATURE_OUTSIDE_TABLE', 'temperature'],
    ['a corner not characterised', { corner: 'ff' }, 'CORNER_NOT_IN_TABLE', 'corner'],
    ['VGS above the axis', { vgs: 1.81 }, 'VGS_OUTSIDE_TABLE', 'vgs'],
    ['VGS below the axis', { vgs: -0.01 }, 'VGS_OUTSIDE_TABLE', 'vgs'],
  ];
  for (const [what, change, code, field] of cases) {
    it(`refuses ${what} with ${code} naming ${field}`, () => {
      const error = errorOf(() => tableOperatingPoint(exact, { ...at, ...change }));
      expect(error).toMatchObject({ code, field });
      expect(error.message).toMatch(/outside the table|not in the table/);
    });
  }

  it('accepts the ends of every axis', () => {
    for (const change of [{ l: 0.18e-6 }, { l: 2e-6 }, { vds: 0.05 }, { vds: 1.8 }, { vsb: 0 }, { vsb: 0.9 }, { temperature: -40 }, { temperature: 125 }, { vgs: 0 }, { vgs: 1.8 }]) {
      expect(tableOperatingPoint(exact, { ...at, ...change }).id).toBeGreaterThan(0);
    }
  });
});

describe('table encoding', () => {
  const small: TableGrid = { ...GRID, lengths: [0.18e-6, 1e-6], vds: [0.1, 0.9], vsb: [0, 0.5], temperatures: [27], corners: ['tt', 'Ff-µ'] };

  it('decodes what it encodes, bit for bit, in Float64 and Float32', () => {
    for (const type of ['float64', 'float32'] as const) {
      const table = synthesiseTable(small, smoothDevice, type);
      const decoded: LookupTable = decodeTable(encodeTable(table));
      expect(decoded.grid).toEqual(table.grid);
      for (const field of TABLE_FIELDS) {
        expect(decoded.columns[field].constructor).toBe(table.columns[field].constructor);
        expect(Array.from(decoded.columns[field])).toEqual(Array.from(table.columns[field]));
      }
    }
  });

  it('stores 4 or 8 bytes per value and field plus a short header', () => {
    const table = synthesiseTable(small, smoothDevice, 'float32');
    const points = 2 * 2 * 2 * 2 * 73;
    const bytes = encodeTable(table).length;
    expect(bytes - 10 * 4 * points).toBeGreaterThan(0);
    expect(bytes - 10 * 4 * points).toBeLessThan(1024);
  });

  it('refuses bytes that are not a table, cut short or of another format version', () => {
    const bytes = encodeTable(synthesiseTable(small, smoothDevice));
    expect(errorOf(() => decodeTable(new Uint8Array([1, 2, 3, 4, 5, 6, 7, 8, 9]))).code).toBe('TABLE_INVALID');
    expect(errorOf(() => decodeTable(bytes.subarray(0, bytes.length - 8))).code).toBe('TABLE_INVALID');
    const other = bytes.slice();
    const header = String.fromCharCode(...other.subarray(8, 40));
    expect(header).toMatch(/^\{"version":1,/);
    other[19] = '7'.charCodeAt(0);
    expect(errorOf(() => decodeTable(other)).message).toMatch(/version 7/);
  });

  it('refuses a table whose columns do not match its grid', () => {
    const table = synthesiseTable(small, smoothDevice);
    expect(errorOf(() => encodeTable({ ...table, columns: { ...table.columns, gm: new Float64Array(3) } }))).toMatchObject({ code: 'TABLE_INVALID', field: 'gm' });
    expect(errorOf(() => encodeTable({ ...table, grid: { ...small, lengths: [1e-6, 0.18e-6] } }))).toMatchObject({ code: 'TABLE_INVALID', field: 'lengths' });
  });
});

describe('defaultTableGrid', () => {
  it('spans lmin to 20·lmin in ten lengths (closest near lmin), VGS 0 to vdd in 10 mV, eight VDS from 50 mV to vdd and VSB 0 to vdd/2', () => {
    const grid = defaultTableGrid({ polarity: 'nmos', modelName: 'bfn18', vdd: 1.8, lmin: 0.18e-6, corners: ['tt', 'ff', 'ss', 'fs', 'sf'], temperatures: [125, -40, 27] });
    expect(() => checkTableGrid(grid)).not.toThrow();
    expect(grid.lengths.map((l) => Number((l / 0.18e-6).toPrecision(6)))).toEqual([1, 1.15, 1.33, 1.6, 2, 3, 5, 8, 12, 20]);
    expect(grid.lengths[0]).toBe(0.18e-6);
    expect(grid.vgs).toEqual({ start: 0, step: 0.01, count: 181 });
    expect(grid.vds).toEqual([0.05, 0.1, 0.2, 0.35, 0.6, 0.9, 1.3, 1.8]);
    expect(grid.vsb).toEqual([0, 0.225, 0.45, 0.675, 0.9]);
    expect(grid.temperatures).toEqual([-40, 27, 125]);
    expect(tablePointCount(grid)).toBe(10 * 181 * 8 * 5 * 5 * 3);
  });

  it('can start VGS below 0 for a depletion-mode device', () => {
    const grid = defaultTableGrid({ polarity: 'nmos', modelName: 'na', vdd: 1.2, lmin: 0.5e-6, corners: ['tt'], temperatures: [27], vgsFrom: -0.4, vgsStep: 0.02 });
    expect(grid.vgs).toEqual({ start: -0.4, step: 0.02, count: 81 });
  });
});

describe('MonotoneCubic', () => {
  it('gives what monotoneCubicAt gives, for every stencil size, interval and fraction (Fritsch & Carlson, 1980)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0.01, max: 2, noNaN: true }), { minLength: 3, maxLength: 3 }),
        fc.array(fc.double({ min: -5, max: 5, noNaN: true }), { minLength: 4, maxLength: 4 }),
        fc.integer({ min: 1, max: 4 }),
        fc.double({ min: 0, max: 1, noNaN: true }),
        fc.integer({ min: 0, max: 2 }),
        (widths, y, n, t, interval) => {
          const x = [0, widths[0], widths[0] + widths[1], widths[0] + widths[1] + widths[2]];
          const i = n === 1 ? 0 : Math.min(interval, n - 2);
          const expected = monotoneCubicAt(x, y, n, i, n === 1 ? 0 : t);
          expect(new MonotoneCubic(x, n, i, n === 1 ? 0 : t).at(y)).toBeCloseTo(expected, 10);
        },
      ),
    );
  });
});
