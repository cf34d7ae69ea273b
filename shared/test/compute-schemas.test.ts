import { describe, expect, it } from 'vitest';
import { z } from 'zod';
import { BF180G, checkRequestAgainstProcess, computeCorners, computeSize, computeSweep } from '../src/device/index.js';
import {
  cornersRequestSchema,
  cornersResponseSchema,
  sizeRequestSchema,
  sizeResponseSchema,
  sweepRequestSchema,
  sweepResponseSchema,
} from '../src/schemas/index.js';

const size = { processId: 'bf180g', polarity: 'nmos', l: 0.5e-6, vds: 0.6, id: 20e-6, vov: 0.2 } as const;
const refused = (body: unknown, schema: z.ZodType = sizeRequestSchema) => {
  const result = schema.safeParse(body);
  if (result.success) throw new Error('accepted');
  return { field: result.error.issues[0].path.join('.'), message: result.error.issues[0].message };
};

describe('sizeRequestSchema', () => {
  it('accepts an inline process or a processId (with an optional processVersion), and fills the defaults', () => {
    expect(sizeRequestSchema.parse(size)).toMatchObject({ corner: 'TT', model: 'all-region', vsb: 0 });
    expect(sizeRequestSchema.parse({ ...size, processId: undefined, process: BF180G }).process?.name).toBe('BF180-G');
    expect(sizeRequestSchema.parse({ ...size, processVersion: 3 }).processVersion).toBe(3);
  });

  it('refuses NaN, strings, a zero or negative current and a negative W or L, naming the field', () => {
    expect(refused({ ...size, id: Number.NaN }).field).toBe('id');
    expect(refused({ ...size, id: '20u' })).toEqual({ field: 'id', message: 'ID must be a number in A (prefixed text such as "20u" is read by the client, not here)' });
    expect(refused({ ...size, id: 0 })).toEqual({ field: 'id', message: 'ID must be above 0 A' });
    expect(refused({ ...size, id: -1e-6 }).field).toBe('id');
    expect(refused({ ...size, l: -1e-6 }).field).toBe('l');
    expect(refused({ ...size, vov: undefined, w: -1e-6 }).field).toBe('w');
    expect(refused({ ...size, vds: Number.POSITIVE_INFINITY }).field).toBe('vds');
  });

  it('refuses two of vov, gmId, w, vgs at once, and none', () => {
    expect(refused({ ...size, gmId: 10 })).toEqual({ field: 'gmId', message: 'Give exactly one of vov, gmId, w, vgs (vov and gmId were given)' });
    expect(refused({ ...size, vov: undefined })).toEqual({ field: 'vov', message: 'Give exactly one of vov, gmId, w, vgs (none was given)' });
  });

  it('refuses both an inline process and a processId, neither, unknown fields and an unknown model', () => {
    expect(refused({ ...size, process: BF180G }).field).toBe('processId');
    expect(refused({ ...size, processId: undefined }).field).toBe('processId');
    expect(refused({ ...size, gmid: 3 }).message).toContain('gmid');
    expect(refused({ ...size, model: 'bsim4' }).field).toBe('model');
  });
});

describe('sweepRequestSchema', () => {
  const sweep = { ...size, sweep: { param: 'vgs', from: 0, to: 1.8, points: 200 }, hold: 'w' };

  it('accepts up to 10,000 points per series and refuses 100,000 on field sweep.points', () => {
    expect(sweepRequestSchema.parse({ ...sweep, sweep: { ...sweep.sweep, points: 10_000 } }).sweep.scale).toBe('lin');
    expect(refused({ ...sweep, sweep: { ...sweep.sweep, points: 100_000 } }, sweepRequestSchema)).toEqual({ field: 'sweep.points', message: 'sweep.points must be at most 10,000 per series' });
  });

  it('refuses a log sweep through zero, a temperatures list with a temperature sweep, and repeated corners', () => {
    expect(refused({ ...sweep, sweep: { ...sweep.sweep, scale: 'log' } }, sweepRequestSchema).field).toBe('sweep.from');
    expect(refused({ ...sweep, sweep: { param: 'temperature', from: -40, to: 125, points: 10 }, temperatures: [27] }, sweepRequestSchema).field).toBe('temperatures');
    expect(refused({ ...sweep, corners: ['TT', 'TT'] }, sweepRequestSchema).field).toBe('corners');
    expect(refused({ ...sweep, hold: 'vgs' }, sweepRequestSchema).field).toBe('hold');
    expect(refused({ ...sweep, fields: ['id', 'power'] }, sweepRequestSchema).field).toBe('fields.1');
  });
});

describe('cornersRequestSchema', () => {
  const corners = { processId: 'bf180g', polarity: 'pmos', l: 1e-6, w: 10e-6, vds: 0.6, bias: 'current', id: 10e-6 };

  it('needs id for bias "current" and vgs for bias "voltage", not both', () => {
    expect(cornersRequestSchema.parse(corners).bias).toBe('current');
    expect(refused({ ...corners, id: undefined }, cornersRequestSchema).field).toBe('id');
    expect(refused({ ...corners, bias: 'voltage' }, cornersRequestSchema).field).toBe('vgs');
    expect(refused({ ...corners, vgs: 0.9 }, cornersRequestSchema).field).toBe('vgs');
  });
});

describe('checkRequestAgainstProcess', () => {
  it('refuses an unknown corner with UNKNOWN_CORNER on the field, in a size request and in a corners list', () => {
    expect(() => checkRequestAgainstProcess(sizeRequestSchema.parse({ ...size, corner: 'XX' }), BF180G)).toThrow(expect.objectContaining({ code: 'UNKNOWN_CORNER', field: 'corner' }));
    const sweep = sweepRequestSchema.parse({ ...size, sweep: { param: 'vgs', from: 0, to: 1, points: 3 }, hold: 'w', corners: ['TT', 'ZZ'] });
    expect(() => checkRequestAgainstProcess(sweep, BF180G)).toThrow(expect.objectContaining({ code: 'UNKNOWN_CORNER', field: 'corners.1' }));
  });

  it('accepts TT for any process, listed or not', () => {
    expect(() => checkRequestAgainstProcess(sizeRequestSchema.parse(size), { ...BF180G, corners: [] })).not.toThrow();
  });

  it('refuses an unknown flavour, a flavour of the other polarity, L below lmin and VSB at −2φF', () => {
    expect(() => checkRequestAgainstProcess(sizeRequestSchema.parse({ ...size, flavour: 'lvt' }), BF180G)).toThrow(expect.objectContaining({ code: 'UNKNOWN_FLAVOUR', field: 'flavour' }));
    expect(() => checkRequestAgainstProcess(sizeRequestSchema.parse({ ...size, polarity: 'pmos', flavour: 'native' }), BF180G)).toThrow(expect.objectContaining({ code: 'FLAVOUR_POLARITY_MISMATCH' }));
    expect(() => checkRequestAgainstProcess(sizeRequestSchema.parse({ ...size, l: 0.1e-6 }), BF180G)).toThrow(expect.objectContaining({ code: 'L_BELOW_LMIN', field: 'l' }));
    expect(() => checkRequestAgainstProcess(sizeRequestSchema.parse({ ...size, vsb: -0.9 }), BF180G)).toThrow(expect.objectContaining({ code: 'VSB_BEYOND_FORWARD_LIMIT', field: 'vsb' }));
  });
});

describe('responses', () => {
  it('the answers of computeSize, computeSweep and computeCorners match their response schemas', () => {
    expect(() => sizeResponseSchema.parse(computeSize(size, BF180G))).not.toThrow();
    const sweep = computeSweep({ ...size, sweep: { param: 'gmId', from: 5, to: 40, points: 8 }, hold: 'id', corners: ['TT', 'SS'], temperatures: [-40, 125] }, BF180G);
    expect(() => sweepResponseSchema.parse(sweep)).not.toThrow();
    const corners = computeCorners({ processId: 'bf180g', polarity: 'nmos', l: 0.5e-6, w: 1.6e-6, vds: 0.6, bias: 'voltage', vgs: 0.7 }, BF180G);
    expect(() => cornersResponseSchema.parse(corners)).not.toThrow();
  });

  it('the request schemas can be turned into JSON Schema for the API docs', () => {
    for (const schema of [sizeRequestSchema, sweepRequestSchema, cornersRequestSchema, sizeResponseSchema, sweepResponseSchema, cornersResponseSchema]) {
      expect(() => z.toJSONSchema(schema, { io: 'input', unrepresentable: 'any' })).not.toThrow();
    }
  });

  it('the compute functions raise the schema error with its field (the server answers it as 400)', () => {
    expect(() => computeSize({ ...size, id: -1 }, BF180G)).toThrow(expect.objectContaining({ code: 'VALIDATION_FAILED', field: 'id' }));
    expect(() => computeSize(size)).toThrow(expect.objectContaining({ code: 'PROCESS_REQUIRED', field: 'processId' }));
    expect(() => computeSize(size, { ...BF180G, vdd: -1 })).toThrow(expect.objectContaining({ code: 'PROCESS_INVALID', field: 'process.vdd' }));
  });
});
