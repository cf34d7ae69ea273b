import { describe, expect, it } from 'vitest';
import {
  BF180G,
  computeCorners,
  computeSize,
  computeSweep,
  designChart,
  EngineError,
  isEngineError,
  prepareTable,
  type TableChoice,
  type TableGrid,
  type TableSource,
} from '../src/device/index.js';
import { smoothDevice, synthesiseTable, thermalVoltageAt } from './synthetic-table.js';
import type { SweepRequestInput } from '../src/schemas/index.js';

// The table model through the compute API's three calls, on a table synthesised from a smooth all-region device (the
// EKV interpolation of Enz, Krummenacher & Vittoz, 1995; see synthetic-table.ts), so that every figure has a known truth.
const GRID: TableGrid = {
  polarity: 'nmos',
  modelName: 'synthetic',
  referenceWidth: 10e-6,
  lengths: [0.18, 0.21, 0.25, 0.3, 0.36, 0.5, 0.7, 1, 1.4, 2].map((l) => l * 1e-6),
  vgs: { start: 0, step: 0.02, count: 91 },
  vds: [0.05, 0.2, 0.35, 0.6, 0.9, 1.3, 1.8],
  vsb: [0, 0.3, 0.6, 0.9],
  corners: ['TT', 'SS'],
  temperatures: [27, 125],
};
const choice: TableChoice = { prepared: prepareTable(synthesiseTable(GRID, smoothDevice)), ref: { id: 't-1', sha256: 'ab'.repeat(32), characterisationId: 'c-1', model: 'synthetic' } };
const tables: TableSource = ({ polarity, flavour }) => {
  if (polarity === 'nmos' && flavour === undefined) return choice;
  throw new EngineError('TABLE_NOT_CHARACTERISED', 'no table', 'polarity');
};
const request = { process: BF180G, polarity: 'nmos' as const, model: 'table' as const, id: 20e-6, l: 0.5e-6, vds: 0.6, vsb: 0, gmId: 12 };
const relative = (a: number, b: number) => Math.abs(a / b - 1);

function errorOf(run: () => unknown): { code: string; field?: string } {
  try {
    run();
  } catch (error) {
    if (isEngineError(error)) return { code: error.code, field: error.field };
    throw error;
  }
  throw new Error('no error');
}

describe('computeSize with model "table"', () => {
  it('carries ID at the drawn width: the width snapped like every model\'s, then VGS solved again from the table', () => {
    const result = computeSize(request, undefined, tables);
    expect(result.w).toBeCloseTo(result.fingers * result.fingerWidth, 15);
    expect(Math.abs(result.fingerWidth / BF180G.nmos.wgrid - Math.round(result.fingerWidth / BF180G.nmos.wgrid))).toBeLessThan(1e-6);
    expect(relative(result.id, 20e-6)).toBeLessThan(1e-6);
    // The truth: the smooth device the table was made from, at the reached W, L, VGS.
    const truth = smoothDevice(0, 27, 0.5e-6, result.vgs, 0.6, 0);
    expect(relative(result.id, (truth.id * result.w) / 10e-6)).toBeLessThan(0.005);
    expect(relative(result.gmId, truth.gm / truth.id)).toBeLessThan(0.005);
    expect(relative(result.wRequired, result.w)).toBeLessThan(0.01);
  });

  it('records the table it used and the figures it took from the all-region model, and never says short-channel effects are not modelled', () => {
    const result = computeSize({ ...request, l: 0.21e-6 }, undefined, tables);
    expect(result).toMatchObject({ model: 'table', table: choice.ref });
    expect(result.analyticFigures).toEqual(expect.arrayContaining(['sigmaVt', 'cdb', 'beta']));
    expect(result.analyticFigures).not.toContain('gm');
    expect(result.warnings.map((w) => w.code)).not.toContain('L_NEAR_LMIN');
  });

  it('derives n from the weak-inversion gm/ID limit 1/(n·UT) and takes fT as gm/(2π·Cgg) (the smooth device has n = 1.3)', () => {
    const result = computeSize(request, undefined, tables);
    expect(result.n).toBeCloseTo(1.3, 2);
    expect(result.ut).toBeCloseTo(thermalVoltageAt(27), 12);
    const truth = smoothDevice(0, 27, 0.5e-6, result.vgs, 0.6, 0);
    expect(relative(result.ft, truth.gm / (2 * Math.PI * truth.cgg))).toBeLessThan(0.01);
  });

  it('places a device within 5 % of the gm/ID maximum in weak inversion (IC < 0.1, Binkley 2008) and one at low gm/ID in strong inversion', () => {
    const weak = computeSize({ ...request, l: 1e-6, gmId: 28.5, id: 0.1e-6 }, undefined, tables);
    const strong = computeSize({ ...request, gmId: 4 }, undefined, tables);
    expect(weak.region).toBe('weak');
    expect(strong.region).toBe('strong');
    expect(strong.ic).toBeGreaterThan(weak.ic);
  });

  it('takes the off current from the table at VGS = 0 and VDS = VDD when the axes reach them', () => {
    const result = computeSize(request, undefined, tables);
    const truth = smoothDevice(0, 27, 0.5e-6, 0, 1.8, 0);
    expect(relative(result.leakage.idAtZeroVgs, (truth.id * result.w) / 10e-6)).toBeLessThan(0.01);
    expect(result.analyticFigures).not.toContain('ioff');
  });

  it('answers a comparison: the same targets with the all-region model beside it, with the differences', () => {
    const result = computeSize({ ...request, compare: 'all-region' }, undefined, tables);
    const analytic = computeSize({ ...request, model: 'all-region' });
    expect(result.comparison?.model).toBe('all-region');
    expect(result.comparison?.result?.w).toBe(analytic.w);
    expect(result.comparison?.differences.w).toEqual({ value: result.w, other: analytic.w, relative: (result.w - analytic.w) / analytic.w });
  });

  it('refuses a length outside the grid (never an extrapolation), a corner it lacks, and a process without tables', () => {
    expect(errorOf(() => computeSize({ ...request, l: 3e-6 }, undefined, tables))).toEqual({ code: 'L_OUTSIDE_TABLE', field: 'l' });
    expect(errorOf(() => computeSize({ ...request, corner: 'FF' }, undefined, tables))).toEqual({ code: 'CORNER_NOT_IN_TABLE', field: 'corner' });
    expect(errorOf(() => computeSize(request))).toEqual({ code: 'TABLE_NOT_CHARACTERISED', field: 'model' });
    expect(errorOf(() => computeSize({ ...request, polarity: 'pmos' }, undefined, tables))).toEqual({ code: 'TABLE_NOT_CHARACTERISED', field: 'polarity' });
  });

  it('warns between characterised temperatures', () => {
    const result = computeSize({ ...request, temperature: 85 }, undefined, tables);
    expect(result.warnings.map((w) => w.code)).toContain('TEMPERATURE_INTERPOLATED');
  });
});

describe('computeSweep and computeCorners with model "table"', () => {
  it('re-sizes for ID at every point of a gm/ID sweep and leaves points beyond the table without an answer', () => {
    const result = computeSweep({ ...request, hold: 'id', sweep: { param: 'gmId', from: 5, to: 40, points: 8 }, fields: ['id', 'gmId', 'w'] }, undefined, tables);
    const [series] = result.series;
    expect(result.model).toBe('table');
    const answered = series.points.filter((p) => p.id !== null);
    expect(answered.length).toBeGreaterThan(3);
    for (const point of answered) expect(relative(point.id as number, 20e-6)).toBeLessThan(1e-6);
    // Higher gm/ID means lower current density, so a wider device for the same ID.
    for (let i = 1; i < answered.length; i++) expect(answered[i].w as number).toBeGreaterThan(answered[i - 1].w as number);
    expect(series.points.at(-1)?.id).toBeNull();
    expect(series.warnings.map((w) => w.code)).toContain('POINTS_WITHOUT_ANSWER');
  });

  it('answers the columns layout as the points transposed', () => {
    const ask: SweepRequestInput = { ...request, hold: 'id', sweep: { param: 'gmId', from: 5, to: 40, points: 8 }, fields: ['id', 'gmId', 'w'] };
    const points = computeSweep(ask, undefined, tables);
    const columns = computeSweep({ ...ask, layout: 'columns' as const }, undefined, tables);
    expect(columns.series[0].columns.id).toEqual(points.series[0].points.map((p) => p.id));
    expect(columns.series[0].columns.gmId).toEqual(points.series[0].points.map((p) => p.gmId));
    expect(columns.series[0].length).toBe(8);
    expect(columns.series[0].columns.id?.at(-1)).toBeNull();
  });

  it('holds the width and VGS in an L sweep, the current following the table', () => {
    const result = computeSweep({ ...request, hold: 'w', sweep: { param: 'l', from: 0.25e-6, to: 1e-6, points: 4, scale: 'log' }, fields: ['id', 'w', 'vgs'] }, undefined, tables);
    const points = result.series[0].points;
    expect(new Set(points.map((p) => p.w)).size).toBe(1);
    expect(new Set(points.map((p) => p.vgs)).size).toBe(1);
    for (let i = 1; i < points.length; i++) expect(points[i].id as number).toBeLessThan(points[i - 1].id as number);
  });

  it('biases a device by current at every characterised corner and temperature, ID the same everywhere', () => {
    const sized = computeSize(request, undefined, tables);
    const result = computeCorners({ process: BF180G, polarity: 'nmos', model: 'table', w: sized.w, l: 0.5e-6, vds: 0.6, bias: 'current', id: 20e-6 }, undefined, tables);
    expect(result.points.map((p) => `${p.corner} ${p.temperature}`)).toEqual(['TT 27', 'TT 125', 'SS 27', 'SS 125']);
    for (const point of result.points) expect(relative(point.op?.id as number, 20e-6)).toBeLessThan(1e-6);
    const at = (corner: string) => result.points.find((p) => p.corner === corner && p.temperature === 27)?.op?.vgs as number;
    // The synthetic SS corner has a 40 mV higher VT.
    expect(at('SS') - at('TT')).toBeGreaterThan(0.03);
    expect(result.worst.vgs?.corner).toBe('SS');
  });
});

describe('designChart', () => {
  const chart = designChart(choice.prepared, { corner: 'TT', temperature: 27, vds: 0.9, vsb: 0 });

  it('has one curve per characterised length, each with gm/ID falling from its maximum', () => {
    expect(chart.curves.map((c) => c.l)).toEqual(GRID.lengths);
    for (const curve of chart.curves) {
      for (let i = 1; i < curve.gmId.length; i++) expect(curve.gmId[i]).toBeLessThan(curve.gmId[i - 1]);
    }
  });

  it('gives ID/W, gm/gds, fT and VDSsat of the device the table was made from at its nodes', () => {
    const curve = chart.curves[5];
    const k = 20;
    const truth = smoothDevice(0, 27, curve.l, curve.vgs[k], 0.9, 0);
    expect(relative(curve.idW[k], truth.id / 10e-6)).toBeLessThan(1e-9);
    expect(relative(curve.gmId[k], truth.gm / truth.id)).toBeLessThan(1e-9);
    expect(relative(curve.gain[k], truth.gm / truth.gds)).toBeLessThan(1e-9);
    expect(relative(curve.ft[k], truth.gm / (2 * Math.PI * truth.cgg))).toBeLessThan(1e-9);
    expect(curve.vdsat[k]).toBeCloseTo(truth.vdsat, 9);
  });

  it('gives VT against L, rolling off at the shortest lengths as the device does', () => {
    expect(chart.vt.l).toEqual(GRID.lengths);
    chart.vt.l.forEach((l, i) => expect(chart.vt.vt[i]).toBeCloseTo(smoothDevice(0, 27, l, 0.5, 0.9, 0).vt, 6));
    expect(chart.vt.vt[0]).toBeLessThan(chart.vt.vt.at(-1) as number);
  });

  it('refuses conditions outside the grid, naming the field', () => {
    expect(errorOf(() => designChart(choice.prepared, { corner: 'TT', temperature: 27, vds: 2.5, vsb: 0 }))).toEqual({ code: 'VDS_OUTSIDE_TABLE', field: 'vds' });
  });
});
