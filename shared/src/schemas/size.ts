import { z } from 'zod';
import { CONSTRAINTS, bias, checkOneConstraint, checkProcessSource, deviceSelection, modelSchema, sizing } from './request-fields.js';
import { operatingPointSchema, resultContext } from './operating-point.js';
import { warningSchema } from './warning.js';

/** POST /api/compute/size: one device sized for ID and one of VOV, gm/ID, W, VGS. */

export const sizeRequestSchema = z
  .strictObject({
    ...deviceSelection,
    ...sizing,
    ...bias,
    compare: modelSchema.optional().describe('Also size with this model and answer both with their differences (e.g. model "table", compare "all-region")'),
  })
  .superRefine((value, ctx) => {
    checkProcessSource(value, ctx);
    checkOneConstraint(value, ctx);
    if (value.compare !== undefined && value.compare === value.model) ctx.addIssue({ code: 'custom', path: ['compare'], message: 'compare must name another model than model' });
  })
  .describe('POST /api/compute/size: size one device for ID and one of vov, gmId, w, vgs');
export type SizeRequest = z.infer<typeof sizeRequestSchema>;
export type SizeRequestInput = z.input<typeof sizeRequestSchema>;

const sizedDeviceSchema = operatingPointSchema.extend({
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

/** The figures a comparison sets side by side. */
export const COMPARED_FIGURES = ['w', 'vgs', 'vov', 'vt', 'id', 'gm', 'gmId', 'gds', 'intrinsicGain', 'vdsat', 'cgs', 'cgd', 'ft'] as const;
export type ComparedFigure = (typeof COMPARED_FIGURES)[number];

export const comparisonSchema = z.object({
  model: modelSchema,
  result: sizedDeviceSchema.nullable().describe('The same targets sized with the other model; null when it refused them (see error)'),
  error: z.object({ code: z.string(), message: z.string(), field: z.string().optional() }).nullable(),
  differences: z
    .partialRecord(z.enum(COMPARED_FIGURES), z.object({ value: z.number(), other: z.number(), relative: z.number().nullable().describe('(value − other)/|other|; null when other is 0') }))
    .describe('Each compared figure of this result (value) and of the other model\'s (other)'),
});
export type Comparison = z.infer<typeof comparisonSchema>;

export const sizeResponseSchema = sizedDeviceSchema.extend({
  comparison: comparisonSchema.optional().describe('With compare: the other model\'s result for the same targets'),
});
export type SizeResponse = z.infer<typeof sizeResponseSchema>;
