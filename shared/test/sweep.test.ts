import { describe, expect, it } from 'vitest';
import { BF180G, channelCurrentAt, computeSize, computeSweep, operatingPoint, prepareDevice, solveSize, sweepValues, thresholdAt } from '../src/device/index.js';
import { type SweepRequestInput, pointsOfColumns, sweepColumnsResponseSchema } from '../src/schemas/index.js';

const device = { processId: 'bf180g', polarity: 'nmos', l: 0.5e-6, vds: 0.6, id: 20e-6, vov: 0.2 } as const;
const run = (request: Partial<SweepRequestInput> & Pick<SweepRequestInput, 'sweep' | 'hold'>) => computeSweep({ ...device, ...request } as SweepRequestInput, BF180G);
const close = (a: number | null | undefined, b: number, digits = 12) => expect(a as number).toBeCloseTo(b, digits);
const relative = (a: number | null | undefined, b: number) => Math.abs((a as number) - b) / Math.abs(b);

describe('sweepValues', () => {
  it('spaces points evenly (lin) or in a constant ratio (log), ending exactly on from and to', () => {
    expect([...sweepValues({ from: 0, to: 1, points: 5, scale: 'lin' })]).toEqual([0, 0.25, 0.5, 0.75, 1]);
    const log = sweepValues({ from: 1e-3, to: 1, points: 4, scale: 'log' });
    expect(log[0]).toBe(1e-3);
    expect(log[3]).toBe(1);
    expect(log[2] / log[1]).toBeCloseTo(10, 12);
    expect([...sweepValues({ from: 0.3, to: 2, points: 1, scale: 'lin' })]).toEqual([0.3]);
  });
});

describe('sweep, hold "w"', () => {
  it('keeps the sized width and gives at each VGS the operating point of that device', () => {
    const answer = run({ sweep: { param: 'vgs', from: 0, to: 1.8, points: 37 }, hold: 'w', fields: ['id', 'gm', 'gds', 'gmId', 'vdsat', 'ic', 'w'] });
    const sized = computeSize(device, BF180G);
    const prepared = prepareDevice(BF180G, 'nmos');
    expect(answer.base.w).toBe(sized.w);
    for (const point of answer.series[0].points) {
      const op = operatingPoint(prepared, 'all-region', sized.w, device.l, { vgs: point.vgs as number, vds: device.vds, vsb: 0 });
      expect(point.w).toBe(sized.w);
      for (const field of ['id', 'gm', 'gds', 'gmId', 'vdsat', 'ic'] as const) expect(relative(point[field], op[field]), field).toBeLessThan(1e-12);
    }
  });

  it('agrees with the scalar model for the square law too', () => {
    const answer = run({ model: 'square-law', sweep: { param: 'vgs', from: 0.2, to: 1.8, points: 17 }, hold: 'w', fields: ['id', 'gm', 'gds'] });
    const prepared = prepareDevice(BF180G, 'nmos');
    for (const point of answer.series[0].points) {
      const op = operatingPoint(prepared, 'square-law', answer.base.w, device.l, { vgs: point.vgs as number, vds: device.vds, vsb: 0 });
      for (const field of ['id', 'gm', 'gds'] as const) expect(relative(point[field], op[field]), field).toBeLessThan(1e-12);
    }
  });

  it('sweeps temperature at the fixed VGS of the sized device, VT falling and ID following', () => {
    const answer = run({ sweep: { param: 'temperature', from: -40, to: 125, points: 12 }, hold: 'w', fields: ['id', 'vt', 'vgs', 'ioff'] });
    expect(answer.series).toHaveLength(1);
    expect(answer.series[0].temperature).toBeNull();
    let previousIoff = 0;
    for (const point of answer.series[0].points) {
      const prepared = prepareDevice(BF180G, 'nmos', { temperature: point.temperature as number });
      close(point.vgs, answer.base.vgs);
      close(point.vt, thresholdAt(prepared, 0));
      expect(relative(point.id, channelCurrentAt(prepared, 'all-region', answer.base.w, device.l, answer.base.vgs, device.vds, 0))).toBeLessThan(1e-12);
      expect(point.ioff as number).toBeGreaterThan(previousIoff);
      previousIoff = point.ioff as number;
    }
  });

  it('sweeps VSB (VT rising with body effect) and VDS (the device leaving triode)', () => {
    const vsb = run({ sweep: { param: 'vsb', from: 0, to: 1, points: 6 }, hold: 'w', fields: ['vt', 'id'] }).series[0].points;
    for (let i = 1; i < vsb.length; i++) expect(vsb[i].vt as number).toBeGreaterThan(vsb[i - 1].vt as number);
    const vds = run({ sweep: { param: 'vds', from: 0.01, to: 1.8, points: 50 }, hold: 'w', fields: ['id', 'saturated'] }).series[0].points;
    expect(vds[0].saturated).toBe(false);
    expect(vds[49].saturated).toBe(true);
  });

  it('leaves points below lmin without an answer (null) and says so in the series warnings', () => {
    const answer = run({ sweep: { param: 'l', from: 0.1e-6, to: 1e-6, points: 10 }, hold: 'w', fields: ['id', 'wOverL'] });
    const points = answer.series[0].points;
    expect(points[0].id).toBeNull();
    expect(points[0].l).toBeCloseTo(0.1e-6, 20);
    expect(points[9].id).not.toBeNull();
    expect(answer.series[0].warnings.find((w) => w.code === 'POINTS_WITHOUT_ANSWER')?.message).toContain('L_BELOW_LMIN');
  });
});

describe('sweep, hold "id"', () => {
  it('re-sizes at each overdrive: W/L is what the sizing solver needs before snapping, and ID stays at the target', () => {
    const answer = run({ sweep: { param: 'vov', from: 0.05, to: 0.6, points: 12 }, hold: 'id', fields: ['w', 'wOverL', 'id', 'gmId', 'ft', 'intrinsicGain'] });
    const prepared = prepareDevice(BF180G, 'nmos');
    for (const point of answer.series[0].points) {
      const sized = solveSize(prepared, 'all-region', { id: device.id, l: device.l, vds: device.vds, vsb: 0, vov: point.vov as number });
      expect(relative(point.w, sized.wRequired)).toBeLessThan(1e-12);
      close(point.id, device.id, 18);
    }
  });

  it('re-sizes at each gm/ID, and leaves gm/ID above 1/(n·UT) without an answer', () => {
    const answer = run({ sweep: { param: 'gmId', from: 5, to: 35, points: 7 }, hold: 'id', fields: ['gmId', 'w', 'vov'] });
    const points = answer.series[0].points;
    expect(points[0].w as number).toBeLessThan(points[4].w as number);
    expect(points[6].w).toBeNull();
    expect(answer.series[0].warnings.map((w) => w.code)).toContain('POINTS_WITHOUT_ANSWER');
  });

  it('with a width constraint solves VGS for the current at each temperature', () => {
    const answer = run({ vov: undefined, w: 4e-6, sweep: { param: 'temperature', from: -40, to: 125, points: 5 }, hold: 'id', fields: ['vgs', 'id'] });
    for (const point of answer.series[0].points) {
      const sized = solveSize(prepareDevice(BF180G, 'nmos', { temperature: point.temperature as number }), 'all-region', { id: device.id, l: device.l, vds: device.vds, vsb: 0, w: 4e-6 });
      close(point.vgs, sized.vgs, 9);
      expect(relative(point.id, device.id)).toBeLessThan(1e-9);
    }
  });
});

describe('sweep series and fields', () => {
  it('gives one series per corner × temperature, in that order', () => {
    const answer = run({ sweep: { param: 'vgs', from: 0, to: 1.8, points: 5 }, hold: 'w', corners: ['TT', 'FF', 'SS', 'FS', 'SF'], temperatures: [-40, 27, 125], fields: ['id'] });
    expect(answer.series.map((s) => `${s.corner}@${s.temperature}`)).toEqual(['TT', 'FF', 'SS', 'FS', 'SF'].flatMap((c) => [-40, 27, 125].map((t) => `${c}@${t}`)));
    const at = (corner: string, temperature: number) => answer.series.find((s) => s.corner === corner && s.temperature === temperature)?.points[4].id as number;
    expect(at('FF', 27)).toBeGreaterThan(at('TT', 27));
    expect(at('SS', 27)).toBeLessThan(at('TT', 27));
  });

  it('returns only the fields asked for plus the swept value, with regions as words and saturation as true/false', () => {
    const point = run({ sweep: { param: 'vgs', from: 0.7, to: 0.7, points: 1 }, hold: 'w', fields: ['region', 'saturated'] }).series[0].points[0];
    expect(point).toEqual({ vgs: 0.7, region: 'strong', saturated: true });
  });

  it('returns every field when none is asked for, as finite numbers or null, never NaN or an infinity', () => {
    // From deep below threshold to VDD: the answer itself, not a JSON copy (JSON would already have turned
    // NaN and infinities into null and hidden them).
    const answer = run({ sweep: { param: 'vgs', from: -1, to: 1.8, points: 200 }, hold: 'w' });
    expect(Object.keys(answer.series[0].points[0]).length).toBe(answer.fields.length);
    for (const point of answer.series[0].points) {
      for (const [field, value] of Object.entries(point)) {
        if (typeof value === 'number') expect(Number.isFinite(value), `${field} = ${value}`).toBe(true);
        else expect(value === null || typeof value === 'string' || typeof value === 'boolean', field).toBe(true);
      }
    }
  });

  it('answers 10,000 points per series', () => {
    const answer = run({ sweep: { param: 'vgs', from: 0, to: 1.8, points: 10_000 }, hold: 'w', fields: ['id'] });
    expect(answer.series[0].points).toHaveLength(10_000);
  });
});

describe('sweep, layout "columns"', () => {
  // The same engine run answered two ways: an array per field must hold exactly what the objects per point hold
  // (a transposition, nothing recomputed), over corners, temperatures, regions, saturation and null points.
  const request = { sweep: { param: 'vgs' as const, from: -1, to: 1.8, points: 57 }, hold: 'w' as const, corners: ['TT', 'SS'], temperatures: [-40, 125] };

  it('holds the same values as the points layout, one array per field and the swept value, nulls where a point has no answer', () => {
    const points = run(request);
    const columns = computeSweep({ ...device, ...request, layout: 'columns' as const }, BF180G);
    expect(columns.layout).toBe('columns');
    expect(sweepColumnsResponseSchema.safeParse(columns).success).toBe(true);
    expect(columns.series).toHaveLength(4);
    columns.series.forEach((series, k) => {
      expect(series.length).toBe(57);
      expect(Object.keys(series.columns).sort()).toEqual(Object.keys(points.series[k].points[0]).sort());
      for (const column of Object.values(series.columns)) expect(column).toHaveLength(57);
    });
    expect(pointsOfColumns(columns).series).toEqual(points.series);
    expect(columns.series[0].columns.region).toContain('weak');
    expect(columns.series[0].columns.saturated).toContain(true);
  });

  it('answers, and the schema the client reads it with accepts, only the fields asked for', () => {
    const columns = computeSweep({ ...device, ...request, layout: 'columns' as const, fields: ['w', 'vov'] }, BF180G);
    expect(Object.keys(columns.series[0].columns).sort()).toEqual(['vgs', 'vov', 'w']);
    expect(sweepColumnsResponseSchema.safeParse(JSON.parse(JSON.stringify(columns))).success).toBe(true);
  });

  it('is smaller as JSON: about half the bytes of the points layout for every field', () => {
    const points = JSON.stringify(run(request)).length;
    const columns = JSON.stringify(computeSweep({ ...device, ...request, layout: 'columns' as const }, BF180G)).length;
    expect(columns / points).toBeLessThan(0.75);
  });

  it('refuses a layout it does not know, naming the field', () => {
    expect(() => computeSweep({ ...device, ...request, layout: 'rows' } as unknown as SweepRequestInput, BF180G)).toThrow(/layout must be "points"/);
  });
});
