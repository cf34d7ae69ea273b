import { z } from 'zod';
import { bias, checkProcessSource, corner, deviceSelection, quantity, uniqueList } from './request-fields.js';
import { operatingPointSchema, resultContext } from './operating-point.js';
import { warningSchema } from './warning.js';

/** POST /api/compute/corners: a sized device over corners × temperatures, with the extremes of each figure. */

export const cornersRequestSchema = z
  .strictObject({
    ...deviceSelection,
    ...bias,
    w: quantity('w', 'm', { gt: 0, max: 0.1 }).describe('Drawn width W of the sized device (all fingers), m'),
    fingers: z.number({ error: 'fingers must be a whole number' }).int('fingers must be a whole number').min(1, 'fingers must be at least 1').max(100_000, 'fingers must be at most 100000').optional().describe('Fingers of the drawn width; 1 when absent (each finger loses ΔW)'),
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
