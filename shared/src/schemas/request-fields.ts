import { z } from 'zod';
import { formatQuantity } from '../units/format-quantity.js';
import { polaritySchema, processSchema } from './process.js';

/**
 * The building blocks of the compute requests (size, sweep, corners) and of the sheet device targets:
 * SI number fields whose messages name the field, the device selection, the bias, the sizing targets.
 */

export const MODELS = ['all-region', 'square-law', 'table'] as const;
export type Model = (typeof MODELS)[number];
/** The two analytic models: long-channel, first-order estimates. */
export const ANALYTIC_MODELS = ['all-region', 'square-law'] as const;
export const modelSchema = z
  .enum(MODELS, { error: 'model must be "all-region", "square-law" or "table"' })
  .describe(
    'all-region: long-channel analytic estimate, a smooth ln²(1+eˣ) interpolation from weak to strong inversion; square-law: long-channel first-order estimate, SPICE level 1 plus an exponential tail; table: interpolated in the tables characterised with ngspice from the process version\'s model card (short-channel effects included as far as the card models them)',
  );
/** How each model is named where a designer reads it: the analytic ones say they are long-channel estimates. */
export const MODEL_LABELS: Record<Model, string> = {
  'all-region': 'All-region (long-channel estimate)',
  'square-law': 'Square law (first-order estimate)',
  table: 'Tables from the model card',
};

/**
 * What a designer calls each number field, for messages: "L must be above 0 m", not "l must be above 0".
 * PMOS voltages keep the NMOS-like symbol here (the schema does not know the polarity); the engine's own
 * messages, which do, use VSG, VSD, VBS.
 */
export const FIELD_LABELS: Readonly<Record<string, string>> = {
  id: 'ID',
  l: 'L',
  w: 'W',
  vds: 'VDS',
  vsb: 'VSB',
  vgs: 'VGS',
  vov: 'VOV',
  gmId: 'gm/ID',
  temperature: 'Temperature',
  temperatures: 'Each temperature',
  maxFingerWidth: 'The finger-width limit',
  vddTolerance: 'The supply tolerance',
  sigmaVos: 'The offset budget σ(VOS)',
  'leakageBudget.current': 'The leakage budget',
  'leakageBudget.temperature': 'The temperature of the leakage budget',
};

/** A limit of a field for a message, in engineering notation with its unit ("1 mm", "20 V", "0.1"). */
function limitText(value: number, unit: string): string {
  if (unit === '1/V') return `${formatQuantity(value, '', { digits: 6 })} /V`;
  return formatQuantity(value, unit, { digits: 6 });
}

/** A number field in SI units with a range; its messages name the field by its label and give limits in engineering notation. */
export function quantity(field: string, unit: string, range: { gt?: number; min?: number; max: number }) {
  const name = FIELD_LABELS[field] ?? field;
  const inUnit = unit === '' ? '' : ` in ${unit}`;
  let schema = z.number({ error: `${name} must be a number${inUnit} (prefixed text such as "20u" is read by the client, not here)` });
  if (range.gt !== undefined) schema = schema.gt(range.gt, { error: `${name} must be above ${limitText(range.gt, unit)}` });
  if (range.min !== undefined) schema = schema.min(range.min, { error: `${name} must be at least ${limitText(range.min, unit)}` });
  return schema.max(range.max, { error: `${name} must be at most ${limitText(range.max, unit)}` });
}

/** A non-empty list without repeats, at most `max` long; its messages name the field. */
export function uniqueList<T extends z.ZodType>(item: T, field: string, max: number) {
  return z
    .array(item, { error: `${field} must be a list` })
    .min(1, `${field} must not be empty`)
    .max(max, `${field} may list at most ${max}`)
    .refine((list) => new Set(list as unknown[]).size === list.length, `${field} lists an entry twice`);
}

export const corner = z.string({ error: 'corner must be a corner name such as "TT"' }).trim().min(1, 'corner must not be empty').max(50);

/** The fields every compute request shares: where the process comes from and which device. */
export const deviceSelection = {
  process: processSchema.optional().describe('The process inline; or give processId'),
  processId: z.string({ error: 'processId must be text' }).min(1, 'processId must not be empty').max(200).optional().describe('A stored process profile; the server resolves it'),
  processVersion: z.number({ error: 'processVersion must be a whole number' }).int('processVersion must be a whole number').positive('processVersion must be at least 1').optional().describe('Version of the stored process; latest when absent'),
  polarity: polaritySchema,
  flavour: z.string({ error: 'flavour must be text' }).trim().min(1).max(50).optional().describe('A flavour of the process (e.g. "native"); its polarity must match'),
  model: modelSchema.default('all-region'),
};

export const bias = {
  l: quantity('l', 'm', { gt: 0, max: 1e-3 }).describe('Drawn gate length L, m'),
  vds: quantity('vds', 'V', { gt: 0, max: 20 }).describe('VDS (PMOS: VSD) > 0, V'),
  vsb: quantity('vsb', 'V', { min: -20, max: 20 }).default(0).describe('VSB (PMOS: VBS), V; < 0 forward-biases the source–body junction'),
};

export const sizing = {
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

export type Issues = z.core.$RefinementCtx;

export function checkProcessSource(value: { process?: unknown; processId?: string; processVersion?: number }, ctx: Issues): void {
  if (value.process !== undefined && value.processId !== undefined) {
    ctx.addIssue({ code: 'custom', path: ['processId'], message: 'Give either an inline process or a processId, not both' });
  } else if (value.process === undefined && value.processId === undefined) {
    ctx.addIssue({ code: 'custom', path: ['processId'], message: 'Give a processId or an inline process' });
  }
  if (value.processVersion !== undefined && value.processId === undefined) {
    ctx.addIssue({ code: 'custom', path: ['processVersion'], message: 'processVersion needs a processId' });
  }
}

export function checkOneConstraint(value: Partial<Record<(typeof CONSTRAINTS)[number], number>>, ctx: Issues): void {
  const given = CONSTRAINTS.filter((name) => value[name] !== undefined);
  if (given.length === 0) {
    ctx.addIssue({ code: 'custom', path: ['vov'], message: 'Give exactly one of vov, gmId, w, vgs (none was given)' });
  } else if (given.length > 1) {
    ctx.addIssue({ code: 'custom', path: [given[1]], message: `Give exactly one of vov, gmId, w, vgs (${given.join(' and ')} were given)` });
  }
}
