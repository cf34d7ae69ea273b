import { z } from 'zod';
import { tableRefSchema } from './characterisation-table.js';
import { polaritySchema } from './process.js';
import { versionNumberText } from './process-profile.js';
import { warningSchema } from './warning.js';

/**
 * GET /api/processes/:id/design-chart: the gm/ID design charts of a characterised process (the method of Silveira,
 * Flandre & Jespers, IEEE JSSC 31(9), 1996): per characterised length, current density ID/W, intrinsic gain gm/gds,
 * transit frequency fT = gm/(2π·Cgg) and VDSsat against gm/ID, and VT against L, at one corner, temperature, VDS and
 * VSB. Columnar: curve k's i-th point is (gmId[i], idW[i], …). SI units, temperatures in °C, voltages
 * polarity-normalised (PMOS: VSG, VSD, VBS).
 */

const number = (field: string) => z.coerce.number({ error: `${field} must be a number` }).refine(Number.isFinite, `${field} must be a finite number`);

export const designChartQuerySchema = z.object({
  version: versionNumberText('version').optional().describe('The latest version when absent'),
  polarity: polaritySchema,
  flavour: z.string().trim().min(1, 'flavour must not be empty').max(50).optional(),
  corner: z.string().trim().min(1, 'corner must not be empty').max(50).optional().describe('TT (or the table\'s first corner) when absent'),
  temperature: number('temperature').optional().describe('°C; tnom (or the nearest characterised temperature) when absent'),
  vds: number('vds').optional().describe('V; the table\'s VDS nearest VDD/2 when absent'),
  vsb: number('vsb').optional().describe('V; 0 when absent'),
});
export type DesignChartQuery = z.infer<typeof designChartQuerySchema>;

/** One length's curves, on the strong-inversion side of the gm/ID maximum (gm/ID falls from point to point). */
export const designChartCurveSchema = z.object({
  l: z.number().describe('m'),
  vgs: z.array(z.number()).describe('V, the VGS nodes of the table'),
  gmId: z.array(z.number()).describe('gm/ID, S/A'),
  idW: z.array(z.number()).describe('Current density ID/W, A/m'),
  gain: z.array(z.number()).describe('Intrinsic gain gm/gds'),
  ft: z.array(z.number()).describe('Transit frequency gm/(2π·Cgg), Hz'),
  vdsat: z.array(z.number()).describe('VDSsat, V'),
});
export type DesignChartCurve = z.infer<typeof designChartCurveSchema>;

export const designChartSchema = z.object({
  processId: z.string(),
  version: z.number().int(),
  polarity: polaritySchema,
  flavour: z.string().nullable(),
  table: tableRefSchema,
  corner: z.string(),
  temperature: z.number(),
  vds: z.number(),
  vsb: z.number(),
  curves: z.array(designChartCurveSchema).describe('One per characterised length, shortest first'),
  vt: z.object({ l: z.array(z.number()), vt: z.array(z.number()) }).describe('The simulator\'s VT (at VGS = VT) against L, V'),
  axes: z.object({
    corners: z.array(z.string()),
    temperatures: z.array(z.number()),
    vds: z.array(z.number()),
    vsb: z.array(z.number()),
    lengths: z.array(z.number()),
  }).describe('What else the table was characterised at (the chart\'s pickers)'),
  warnings: z.array(warningSchema),
});
export type DesignChart = z.infer<typeof designChartSchema>;
