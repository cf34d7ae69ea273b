import { z } from 'zod';
import { leakageBudgetSchema } from './sheets.js';

/**
 * GET /api/sheets/:id/leakage: the off-state leakage of every sized device (VGS = 0, VDS = VDD, VSB = 0:
 * subthreshold, gate, junction and GIDL where the engine gives it) at every temperature of the process range
 * at the fast corner, the sheet's total there, and the total at the worst corner against the sheet's budget.
 * A depletion-mode device conducts at VGS = 0 by design: it is listed apart, not counted as leakage.
 * Currents in A (× multiplier), temperatures in °C.
 */

const termsSchema = z.object({
  subthreshold: z.number(),
  gate: z.number(),
  junction: z.number(),
  gidl: z.number().nullable().describe('null where the engine gives no GIDL term'),
  total: z.number(),
});
export type LeakageTerms = z.infer<typeof termsSchema>;

export const deviceLeakageSchema = z.object({
  deviceId: z.string(),
  name: z.string(),
  multiplier: z.number().int(),
  /** One per temperature of `temperatures`; null where the engine had no answer. */
  atFastCorner: z.array(termsSchema.nullable()).describe('Per temperature of the list, × multiplier, at the fast corner'),
  atBudget: z.array(z.object({ corner: z.string(), total: z.number().nullable() })).describe('Every corner at the budget temperature, × multiplier'),
  estimates: z.array(z.string()).describe('Terms the engine computed from first-order laws rather than from the current model'),
});
export type DeviceLeakage = z.infer<typeof deviceLeakageSchema>;

export const sheetLeakageSchema = z.object({
  engineVersion: z.string(),
  fastCorner: z.string().describe('The corner with the lowest thresholds, where off currents are highest'),
  temperatures: z.array(z.number()).describe('The process range in steps, with its nominal and the budget temperature, °C'),
  devices: z.array(deviceLeakageSchema),
  totals: z.array(z.number()).describe('Σ of the devices at the fast corner, per temperature, A'),
  budget: leakageBudgetSchema.nullable(),
  budgetTemperature: z.number().describe('The budget\'s temperature, or the hottest of the range without a budget, °C'),
  byCorner: z.array(z.object({ corner: z.string(), total: z.number() })).describe('The total at each corner at the budget temperature, A'),
  worst: z.object({ corner: z.string(), total: z.number() }).describe('The corner with the highest total at the budget temperature'),
  withinBudget: z.boolean().nullable().describe('worst.total ≤ budget.current; null without a budget'),
  conducting: z.array(z.object({ deviceId: z.string(), name: z.string(), current: z.number().describe('Its channel current at VGS = 0 at the fast corner, hottest, × multiplier, A') })).describe('Depletion-mode devices: they conduct at VGS = 0, which is their job, not leakage'),
  skipped: z.array(z.object({ deviceId: z.string(), name: z.string(), reason: z.string() })).describe('Devices without a stored result'),
});
export type SheetLeakage = z.infer<typeof sheetLeakageSchema>;
