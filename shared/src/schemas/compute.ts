import { z } from 'zod';
import { polaritySchema, processSchema } from './process.js';

/**
 * Request and response schemas of the compute API: POST /api/compute/size, /sweep and /corners.
 * All numbers in SI units (A, V, m, F, S, Ω, Hz), temperatures in °C. Voltages are polarity-normalised:
 * for PMOS, vgs means VSG, vds means VSD, vsb means VBS and vt means −VTP, so an enhancement device of
 * either polarity has vt > 0 and a depletion-mode device vt < 0. Every error names its field (the zod
 * issue path joined with dots, e.g. "sweep.points").
 */

/** Codes of the cautions the engine attaches to a result; each comes with a plain sentence. */
export const WARNING_CODES = [
  'SQUARE_LAW_NEAR_THRESHOLD',
  'L_NEAR_LMIN',
  'VDS_BELOW_VDSSAT',
  'SOURCE_BODY_FORWARD_BIASED',
  'GM_ID_NEAR_WEAK_INVERSION_LIMIT',
  'DEPLETION_CONDUCTS_AT_VGS0',
  'W_BELOW_WMIN',
  'VGS_ABOVE_VDD',
  'VDS_ABOVE_VDD',
  'TEMPERATURE_OUTSIDE_PROCESS_RANGE',
  'POINTS_WITHOUT_ANSWER',
] as const;
export type WarningCode = (typeof WARNING_CODES)[number];

export const warningSchema = z.object({
  code: z.enum(WARNING_CODES),
  message: z.string(),
});
export type Warning = z.infer<typeof warningSchema>;

export const MODELS = ['all-region', 'square-law'] as const;
export const modelSchema = z
  .enum(MODELS, { error: 'model must be "all-region" or "square-law"' })
  .describe('all-region: smooth ln²(1+eˣ) interpolation, valid from weak to strong inversion; square-law: SPICE level 1 plus an exponential tail');

/** A number field in SI units with a range; its messages name the field. */
function quantity(field: string, unit: string, range: { gt?: number; min?: number; max: number }) {
  const inUnit = unit === '' ? '' : ` in ${unit}`;
  let schema = z.number({ error: `${field} must be a number${inUnit} (prefixed text such as "20u" is read by the client, not here)` });
  if (range.gt !== undefined) schema = schema.gt(range.gt, { error: `${field} must be above ${range.gt}${unit ? ` ${unit}` : ''}` });
  if (range.min !== undefined) schema = schema.min(range.min, { error: `${field} must be at least ${range.min}${unit ? ` ${unit}` : ''}` });
  return schema.max(range.max, { error: `${field} must be at most ${range.max}${unit ? ` ${unit}` : ''}` });
}

const corner = z.string({ error: 'corner must be a corner name such as "TT"' }).trim().min(1, 'corner must not be empty').max(50);

/** The fields every compute request shares: where the process comes from and which device. */
const deviceSelection = {
  process: processSchema.optional().describe('The process inline; or give processId'),
  processId: z.string({ error: 'processId must be text' }).min(1, 'processId must not be empty').max(200).optional().describe('A stored process profile; the server resolves it'),
  processVersion: z.number({ error: 'processVersion must be a whole number' }).int('processVersion must be a whole number').positive('processVersion must be at least 1').optional().describe('Version of the stored process; latest when absent'),
  polarity: polaritySchema,
  flavour: z.string({ error: 'flavour must be text' }).trim().min(1).max(50).optional().describe('A flavour of the process (e.g. "native"); its polarity must match'),
  model: modelSchema.default('all-region'),
};

const bias = {
  l: quantity('l', 'm', { gt: 0, max: 1e-3 }).describe('Drawn gate length L, m'),
  vds: quantity('vds', 'V', { gt: 0, max: 20 }).describe('VDS (PMOS: VSD) > 0, V'),
  vsb: quantity('vsb', 'V', { min: -20, max: 20 }).default(0).describe('VSB (PMOS: VBS), V; < 0 forward-biases the source–body junction'),
};

const sizing = {
  corner: corner.default('TT').describe('Corner name; TT is the nominal parameters'),
  temperature: quantity('temperature', '°C', { min: -200, max: 300 }).optional().describe('Temperature in °C; the process tnom when absent'),
  id: quantity('id', 'A', { gt: 0, max: 1 }).describe('Drain current target ID (PMOS: source-to-drain current) > 0, A'),
  vov: quantity('vov', 'V', { min: -2, max: 10 }).optional().describe('Target overdrive VGS − VT, V (negative: weak inversion)'),
  gmId: quantity('gmId', '1/V', { gt: 0, max: 100 }).optional().describe('Target gm/ID, 1/V; must be below 1/(n·UT)'),
  w: quantity('w', 'm', { gt: 0, max: 0.1 }).optional().describe('Given width W, m (snapped to the process grid)'),
  vgs: quantity('vgs', 'V', { min: -20, max: 20 }).optional().describe('Given gate voltage VGS (PMOS: VSG), V'),
  maxFingerWidth: quantity('maxFingerWidth', 'm', { gt: 0, max: 1e-3 }).optional().describe('Widest finger, m; 10 µm when absent'),
};

export const CONSTRAINTS = ['vov', 'gmId', 'w', 'vgs'] as const;

type Issues = z.core.$RefinementCtx;

function checkProcessSource(value: { process?: unknown; processId?: string; processVersion?: number }, ctx: Issues): void {
  if (value.process !== undefined && value.processId !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['processId'], message: 'Give either an inline process or a processId, not both' });
  } else if (value.process === undefined && value.processId === undefined) {
    ctx.addIssue({ code: 'custom', path: ['processId'], message: 'Give a processId or an inline process' });
  }
  if (value.processVersion !== undefined && value.processId === undefined) {
    ctx.addIssue({ code: 'custom', path: ['processVersion'], message: 'processVersion needs a processId' });
  }
}

function checkOneConstraint(value: Partial<Record<(typeof CONSTRAINTS)[number], number>>, ctx: Issues): void {
  const given = CONSTRAINTS.filter((name) => value[name] !== undefined);
  if (given.length === 0) {
    ctx.addIssue({ code: 'custom', path: ['vov'], message: 'Give exactly one of vov, gmId, w, vgs (none was given)' });
  } else if (given.length > 1) {
    ctx.addIssue({ code: 'custom', path: [given[1]], message: `Give exactly one of vov, gmId, w, vgs (${given.join(' and ')} were given)` });
  }
}

export const sizeRequestSchema = z
  .strictObject({ ...deviceSelection, ...sizing, ...bias })
  .superRefine((value, ctx) => {
    checkProcessSource(value, ctx);
    checkOneConstraint(value, ctx);
  })
  .describe('POST /api/compute/size: size one device for ID and one of vov, gmId, w, vgs');
export type SizeRequest = z.infer<typeof sizeRequestSchema>;
export type SizeRequestInput = z.input<typeof sizeRequestSchema>;

export const SWEEP_PARAMS = ['vov', 'vgs', 'gmId', 'temperature', 'vsb', 'l', 'vds'] as const;
export type SweepParam = (typeof SWEEP_PARAMS)[number];

/** Operating-point fields a sweep can return (the swept value always comes back under its own name). */
export const SWEEP_FIELDS = [
  'w', 'l', 'wOverL', 'vgs', 'vds', 'vsb', 'temperature', 'vt', 'vov', 'n', 'vdsat', 'saturated',
  'id', 'gm', 'gmb', 'gds', 'ro', 'gmId', 'intrinsicGain', 'ic', 'region', 'cgs', 'cgd', 'ft', 'sigmaVt', 'ioff',
] as const;
export type SweepField = (typeof SWEEP_FIELDS)[number];

export const MAX_SWEEP_POINTS = 10_000;
export const MAX_SWEEP_SERIES = 50;

const SWEEP_RANGES: Record<SweepParam, { unit: string; min: number; max: number; positive?: boolean }> = {
  vov: { unit: 'V', min: -2, max: 10 },
  vgs: { unit: 'V', min: -20, max: 20 },
  gmId: { unit: '1/V', min: 0, max: 100, positive: true },
  temperature: { unit: '°C', min: -200, max: 300 },
  vsb: { unit: 'V', min: -20, max: 20 },
  l: { unit: 'm', min: 0, max: 1e-3, positive: true },
  vds: { unit: 'V', min: 0, max: 20, positive: true },
};

export const sweepSpecSchema = z.strictObject({
  param: z.enum(SWEEP_PARAMS, { error: `sweep.param must be one of ${SWEEP_PARAMS.join(', ')}` }),
  from: quantity('sweep.from', '', { min: -1e3, max: 1e3 }),
  to: quantity('sweep.to', '', { min: -1e3, max: 1e3 }),
  points: z
    .number({ error: 'sweep.points must be a whole number' })
    .int('sweep.points must be a whole number')
    .min(1, 'sweep.points must be at least 1')
    .max(MAX_SWEEP_POINTS, `sweep.points must be at most ${MAX_SWEEP_POINTS.toLocaleString('en')} per series`),
  scale: z.enum(['lin', 'log'], { error: 'sweep.scale must be "lin" or "log"' }).default('lin'),
});
export type SweepSpec = z.infer<typeof sweepSpecSchema>;

function uniqueList<T extends z.ZodType>(item: T, field: string, max: number) {
  return z
    .array(item, { error: `${field} must be a list` })
    .min(1, `${field} must not be empty`)
    .max(max, `${field} may list at most ${max}`)
    .refine((list) => new Set(list as unknown[]).size === list.length, `${field} lists an entry twice`);
}

export const sweepRequestSchema = z
  .strictObject({
    ...deviceSelection,
    ...sizing,
    ...bias,
    sweep: sweepSpecSchema,
    hold: z.enum(['id', 'w'], { error: 'hold must be "id" (re-size at each point) or "w" (keep the width, compute the current)' }),
    corners: uniqueList(corner, 'corners', 20).optional().describe('One series per corner × temperature; the request corner when absent'),
    temperatures: uniqueList(quantity('temperatures', '°C', { min: -200, max: 300 }), 'temperatures', 20).optional(),
    fields: uniqueList(z.enum(SWEEP_FIELDS, { error: `fields may list ${SWEEP_FIELDS.join(', ')}` }), 'fields', SWEEP_FIELDS.length).optional().describe('Fields of each point; all when absent'),
  })
  .superRefine((value, ctx) => {
    checkProcessSource(value, ctx);
    checkOneConstraint(value, ctx);
    const { param, from, to, scale } = value.sweep;
    const range = SWEEP_RANGES[param];
    for (const [end, number] of [['from', from], ['to', to]] as const) {
      if (number < range.min || number > range.max || (range.positive && number <= 0)) {
        ctx.addIssue({ code: 'custom', path: ['sweep', end], message: `sweep.${end} for ${param} must be ${range.positive ? 'above' : 'at least'} ${range.min} and at most ${range.max}${range.unit ? ` ${range.unit}` : ''}` });
      }
      if (scale === 'log' && !(number > 0)) {
        ctx.addIssue({ code: 'custom', path: ['sweep', end], message: `A log sweep needs sweep.${end} above 0` });
      }
    }
    if (param === 'temperature' && value.temperatures) {
      ctx.addIssue({ code: 'custom', path: ['temperatures'], message: 'A temperature sweep takes no temperatures list' });
    }
    const series = (value.corners?.length ?? 1) * (value.temperatures?.length ?? 1);
    if (series > MAX_SWEEP_SERIES) {
      ctx.addIssue({ code: 'custom', path: ['corners'], message: `At most ${MAX_SWEEP_SERIES} series (corners × temperatures), got ${series}` });
    }
  })
  .describe('POST /api/compute/sweep: the device of a size request swept in one parameter, per corner × temperature');
export type SweepRequest = z.infer<typeof sweepRequestSchema>;
export type SweepRequestInput = z.input<typeof sweepRequestSchema>;

export const cornersRequestSchema = z
  .strictObject({
    ...deviceSelection,
    ...bias,
    w: quantity('w', 'm', { gt: 0, max: 0.1 }).describe('Drawn width W of the sized device, m'),
    bias: z.enum(['current', 'voltage'], { error: 'bias must be "current" (hold ID) or "voltage" (hold VGS)' }),
    id: quantity('id', 'A', { gt: 0, max: 1 }).optional().describe('ID held at every corner (bias "current"), A'),
    vgs: quantity('vgs', 'V', { min: -20, max: 20 }).optional().describe('VGS held at every corner (bias "voltage"), V'),
    corners: uniqueList(corner, 'corners', 20).optional().describe('TT and every corner of the process when absent'),
    temperatures: uniqueList(quantity('temperatures', '°C', { min: -200, max: 300 }), 'temperatures', 20).optional().describe('tempRange.min, tnom, tempRange.max when absent'),
  })
  .superRefine((value, ctx) => {
    checkProcessSource(value, ctx);
    if (value.bias === 'current') {
      if (value.id === undefined) ctx.addIssue({ code: 'custom', path: ['id'], message: 'bias "current" needs id' });
      if (value.vgs !== undefined) ctx.addIssue({ code: 'custom', path: ['vgs'], message: 'bias "current" holds ID: give id, not vgs' });
    } else {
      if (value.vgs === undefined) ctx.addIssue({ code: 'custom', path: ['vgs'], message: 'bias "voltage" needs vgs' });
      if (value.id !== undefined) ctx.addIssue({ code: 'custom', path: ['id'], message: 'bias "voltage" holds VGS: give vgs, not id' });
    }
  })
  .describe('POST /api/compute/corners: a sized device over corners × temperatures');
export type CornersRequest = z.infer<typeof cornersRequestSchema>;
export type CornersRequestInput = z.input<typeof cornersRequestSchema>;

export type ComputeRequest = SizeRequest | SweepRequest | CornersRequest;

/** The field of a zod issue as the API names it: its path joined with dots ("sweep.points"), or undefined for the whole body. */
export function fieldOfIssue(issue: { path: readonly PropertyKey[] }): string | undefined {
  return issue.path.length ? issue.path.map(String).join('.') : undefined;
}

// ---- responses ----

export const regionSchema = z.enum(['weak', 'moderate', 'strong']).describe('weak IC < 0.1 ≤ moderate ≤ 10 < strong (Binkley 2008)');

export const leakageSchema = z.object({
  conductsAtZeroVgs: z.boolean().describe('Depletion-mode device: conducts at VGS = 0, which is not leakage'),
  idAtZeroVgs: z.number(),
  subthreshold: z.number().nullable(),
  gate: z.number(),
  junction: z.number(),
  ioff: z.number().nullable(),
  ion: z.number(),
  ionIoff: z.number().nullable(),
});

export const operatingPointSchema = z.object({
  w: z.number().describe('Drawn width (all fingers), m'),
  l: z.number(),
  wOverL: z.number(),
  vgs: z.number().describe('VGS (PMOS: VSG) reached, V'),
  vds: z.number().describe('VDS (PMOS: VSD), V'),
  vsb: z.number().describe('VSB (PMOS: VBS), V'),
  vt: z.number().describe('Threshold with body effect, corner and temperature, polarity-normalised (PMOS: −VTP), V'),
  vov: z.number().describe('VGS − VT reached, V'),
  n: z.number(),
  ut: z.number().describe('kT/q, V'),
  beta: z.number().describe('kp(T)·W/L, A/V²'),
  lambda: z.number().describe('λ at this L, 1/V'),
  id: z.number(), gm: z.number(), gmb: z.number(), gds: z.number(),
  ro: z.number().nullable().describe('1/gds, Ω; null when gds = 0 (infinite)'),
  gmId: z.number(),
  intrinsicGain: z.number().nullable().describe('gm/gds; null when gds = 0'),
  ic: z.number().describe('Inversion coefficient ID/(2·n·β·UT²)'),
  region: regionSchema,
  vdsat: z.number(),
  saturated: z.boolean(),
  cgs: z.number(), cgd: z.number(), cdb: z.number(), csb: z.number(),
  ft: z.number(),
  sigmaVt: z.number().describe('Pelgrom σ(ΔVT) of a matched pair of this device, V (single device: sigmaVtSingle)'),
  sigmaVtSingle: z.number(),
  sigmaBeta: z.number().describe('σ(Δβ/β) of the pair'),
  sigmaId: z.number().describe('σ(ΔID/ID) of the pair at equal VGS'),
  sigmaVos: z.number().describe('Gate-referred σ(VOS) of the pair at equal ID, V'),
  ioff: z.number().nullable().describe('Off current at VGS = 0, VDS = vdd, VSB = 0 plus gate and junction leakage, A; null for a depletion-mode device'),
  ion: z.number(),
  ionIoff: z.number().nullable(),
  leakage: leakageSchema,
});
export type OperatingPointResponse = z.infer<typeof operatingPointSchema>;

const resultContext = {
  engineVersion: z.string(),
  polarity: polaritySchema,
  flavour: z.string().optional(),
  model: modelSchema,
};

export const sizeResponseSchema = operatingPointSchema.extend({
  ...resultContext,
  corner: z.string(),
  temperature: z.number(),
  fingers: z.number().int(),
  fingerWidth: z.number(),
  wRequired: z.number().describe('Width before snapping to the grid, m'),
  constraint: z.enum(CONSTRAINTS),
  ztcVgs: z.number().nullable().describe('Zero-temperature-coefficient VGS of this device at this VDS, VSB and temperature; null when there is none'),
  warnings: z.array(warningSchema),
});
export type SizeResponse = z.infer<typeof sizeResponseSchema>;

const pointValue = z.number().nullable();
export const sweepPointSchema = z
  .object(Object.fromEntries(SWEEP_FIELDS.map((f) => [f, f === 'region' ? regionSchema.nullable().optional() : f === 'saturated' ? z.boolean().nullable().optional() : pointValue.optional()])) as Record<SweepField, z.ZodOptional<z.ZodNullable<z.ZodNumber>>>)
  .describe('The swept value under its own name and the fields asked for; null where the point has no answer');
export type SweepPoint = Partial<Record<Exclude<SweepField, 'region' | 'saturated'>, number | null>> & { region?: 'weak' | 'moderate' | 'strong' | null; saturated?: boolean | null };

export const sweepSeriesSchema = z.object({
  corner: z.string(),
  temperature: z.number().nullable().describe('°C; null in a temperature sweep'),
  points: z.array(sweepPointSchema),
  warnings: z.array(warningSchema),
});

export const sweepResponseSchema = z.object({
  ...resultContext,
  param: z.enum(SWEEP_PARAMS),
  hold: z.enum(['id', 'w']),
  fields: z.array(z.enum(SWEEP_FIELDS)),
  base: sizeResponseSchema.describe('The device as the size request alone sizes it (the chosen point)'),
  series: z.array(sweepSeriesSchema),
});
export type SweepResponse = Omit<z.infer<typeof sweepResponseSchema>, 'series'> & {
  series: { corner: string; temperature: number | null; points: SweepPoint[]; warnings: Warning[] }[];
};

/** Figures compared over corners, and the direction in which each one is worse (absent: no single direction). */
export const CORNER_FIGURES = ['vt', 'vgs', 'vov', 'vdsat', 'id', 'gm', 'gmb', 'gds', 'ro', 'gmId', 'intrinsicGain', 'ic', 'cgs', 'ft', 'sigmaVos', 'ioff', 'ion'] as const;
export type CornerFigure = (typeof CORNER_FIGURES)[number];
export const WORSE_DIRECTION: Partial<Record<CornerFigure, 'min' | 'max'>> = {
  vgs: 'max', vdsat: 'max', id: 'min', gm: 'min', gds: 'max', ro: 'min', gmId: 'min', intrinsicGain: 'min', ft: 'min', sigmaVos: 'max', ioff: 'max', ion: 'min',
};

const extremeSchema = z.object({ value: z.number(), corner: z.string(), temperature: z.number() });

export const cornerPointSchema = z.object({
  corner: z.string(),
  temperature: z.number(),
  op: operatingPointSchema.nullable().describe('null when this corner has no answer (see error)'),
  warnings: z.array(warningSchema),
  error: z.object({ code: z.string(), message: z.string() }).optional(),
});

export const cornersResponseSchema = z.object({
  ...resultContext,
  bias: z.enum(['current', 'voltage']),
  points: z.array(cornerPointSchema),
  extremes: z.partialRecord(z.enum(CORNER_FIGURES), z.object({ min: extremeSchema, max: extremeSchema })).describe('Lowest and highest value of each figure and where'),
  worst: z.partialRecord(z.enum(CORNER_FIGURES), extremeSchema.extend({ direction: z.enum(['min', 'max']) })).describe('The worse extreme of each figure that has a worse direction'),
});
export type CornersResponse = z.infer<typeof cornersResponseSchema>;
