import { z } from 'zod';
import { CONSTRAINTS, bias, checkOneConstraint, checkProcessSource, deviceSelection, sizing } from './request-fields.js';
import { operatingPointSchema, resultContext } from './operating-point.js';
import { warningSchema } from './warning.js';

/** POST /api/compute/size: one device sized for ID and one of VOV, gm/ID, W, VGS. */

export const sizeRequestSchema = z
  .strictObject({ ...deviceSelection, ...sizing, ...bias })
  .superRefine((value, ctx) => {
    checkProcessSource(value, ctx);
    checkOneConstraint(value, ctx);
  })
  .describe('POST /api/compute/size: size one device for ID and one of vov, gmId, w, vgs');
export type SizeRequest = z.infer<typeof sizeRequestSchema>;
export type SizeRequestInput = z.input<typeof sizeRequestSchema>;

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
