import { z } from 'zod';
import { bias, checkOneConstraint, checkProcessSource, corner, deviceSelection, quantity, sizing, uniqueList } from './request-fields.js';
import { regionSchema, resultContext } from './operating-point.js';
import { sizeResponseSchema } from './size.js';
import { type Warning, warningSchema } from './warning.js';

/** POST /api/compute/sweep: the device of a size request swept in one parameter, per corner × temperature. */

export const SWEEP_PARAMS = ['vov', 'vgs', 'gmId', 'temperature', 'vsb', 'l', 'vds'] as const;
export type SweepParam = (typeof SWEEP_PARAMS)[number];

/** Operating-point fields a sweep can return (the swept value always comes back under its own name). */
export const SWEEP_FIELDS = [
  'w', 'l', 'wOverL', 'vgs', 'vds', 'vsb', 'temperature', 'vt', 'vov', 'n', 'vdsat', 'saturated',
  'id', 'gm', 'gmb', 'gds', 'ro', 'gmId', 'intrinsicGain', 'ic', 'region', 'cgs', 'cgd', 'cgg', 'ft', 'sigmaVt', 'ioff',
] as const;
export type SweepField = (typeof SWEEP_FIELDS)[number];

/** How a sweep's series hold their values: an object per point, or an array per field. */
export const SWEEP_LAYOUTS = ['points', 'columns'] as const;
export type SweepLayout = (typeof SWEEP_LAYOUTS)[number];

export const MAX_SWEEP_POINTS = 10_000;
export const MAX_SWEEP_SERIES = 50;
/**
 * Points over all series of one sweep (series × points): bounds an answer's size and the server's memory
 * (10,000 points × 50 series answered 302 MB of JSON); a 2,000-point sweep over 5 corners × 3 temperatures
 * (30,000 points) fits three times over.
 */
export const MAX_SWEEP_TOTAL_POINTS = 100_000;
/** Model "table" answers point by point (about 30 µs each): at most this many points over all series. */
export const MAX_TABLE_SWEEP_POINTS = 20_000;

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
    layout: z
      .enum(SWEEP_LAYOUTS, { error: 'layout must be "points" (an object per point) or "columns" (an array per field)' })
      .default('points')
      .describe('"columns": each series answers one array per field instead of one object per point (about half the bytes, and faster to read)'),
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
    if (series * value.sweep.points > MAX_SWEEP_TOTAL_POINTS) {
      ctx.addIssue({ code: 'custom', path: ['sweep', 'points'], message: `A sweep answers at most ${MAX_SWEEP_TOTAL_POINTS.toLocaleString('en')} points over all series (corners × temperatures × sweep.points), got ${(series * value.sweep.points).toLocaleString('en')}: fewer points or fewer series` });
    } else if (value.model === 'table' && series * value.sweep.points > MAX_TABLE_SWEEP_POINTS) {
      ctx.addIssue({ code: 'custom', path: ['sweep', 'points'], message: `The table model sweeps at most ${MAX_TABLE_SWEEP_POINTS.toLocaleString('en')} points over all series (corners × temperatures × points), got ${(series * value.sweep.points).toLocaleString('en')}` });
    }
  })
  .describe('POST /api/compute/sweep: the device of a size request swept in one parameter, per corner × temperature');
export type SweepRequest = z.infer<typeof sweepRequestSchema>;
export type SweepRequestInput = z.input<typeof sweepRequestSchema>;

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
  layout: z.literal('points').optional().describe('The layout asked for; absent means "points"'),
  base: sizeResponseSchema.describe('The device as the size request alone sizes it (the chosen point)'),
  series: z.array(sweepSeriesSchema),
});
export type SweepResponse = Omit<z.infer<typeof sweepResponseSchema>, 'series'> & {
  series: { corner: string; temperature: number | null; points: SweepPoint[]; warnings: Warning[] }[];
};

/** One field of a series in the columns layout: a value per point, null where the point has no answer. */
export type SweepColumn = (number | null)[] | ('weak' | 'moderate' | 'strong' | null)[] | (boolean | null)[];

const sweepColumnSchema = z.union([z.array(z.number().nullable()), z.array(regionSchema.nullable()), z.array(z.boolean().nullable())]);

export const sweepColumnsSeriesSchema = z.object({
  corner: z.string(),
  temperature: z.number().nullable().describe('°C; null in a temperature sweep'),
  length: z.number().int().describe('Points in the series: the length of every column'),
  columns: z.partialRecord(z.enum(SWEEP_FIELDS), sweepColumnSchema).describe('The swept value under its own name and each field asked for, one array each'),
  warnings: z.array(warningSchema),
});

/** The answer of a sweep asked for with layout "columns". */
export const sweepColumnsResponseSchema = sweepResponseSchema.omit({ series: true }).extend({
  layout: z.literal('columns'),
  series: z.array(sweepColumnsSeriesSchema),
});
export type SweepColumnsResponse = Omit<z.infer<typeof sweepColumnsResponseSchema>, 'series'> & {
  series: { corner: string; temperature: number | null; length: number; columns: Partial<Record<SweepField, SweepColumn>>; warnings: Warning[] }[];
};

/** Either answer, as the API documents it. */
export const sweepAnyResponseSchema = z.union([sweepResponseSchema, sweepColumnsResponseSchema]);

/** A columns answer turned back into points (for a reader that wants an object per point). */
export function pointsOfColumns(response: SweepColumnsResponse): SweepResponse {
  const { layout: _layout, series, ...head } = response;
  return {
    ...head,
    series: series.map(({ columns, length, ...rest }) => {
      const entries = Object.entries(columns) as [SweepField, SweepColumn][];
      const points: SweepPoint[] = new Array(length);
      for (let i = 0; i < length; i++) {
        const point: Record<string, number | string | boolean | null> = {};
        for (const [field, column] of entries) point[field] = column[i] ?? null;
        points[i] = point as SweepPoint;
      }
      return { ...rest, points };
    }),
  };
}
