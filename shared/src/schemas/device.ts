import { z } from 'zod';
import { deviceTargetsSchema } from './device-targets.js';
import { CONSTRAINTS } from './request-fields.js';
import { sizeRequestSchema, sizeResponseSchema } from './size.js';

/**
 * A device as the API answers it: its targets and the result the engine computed for them, stored with
 * the engine version and the process version that made it. Targets the engine cannot meet (ID not
 * reachable, gm/ID above the weak-inversion limit, L below lmin …) are stored with `result: null` and the
 * engine's `error`, so the designer sees why on the sheet.
 */

/** Which numbers made a stored result (or a stored refusal). */
export const computedWithSchema = z.object({
  engineVersion: z.string(),
  processVersionId: z.string(),
  processVersion: z.number().int().describe('The version number of the process profile the result was computed on'),
  processName: z.string().describe('The name of that process profile (another than the sheet\'s after a move)'),
  computedAt: z.string(),
  tableSha256: z.string().nullable().optional().describe('Model table: the SHA-256 of the table the result was made from'),
});
export type ComputedWith = z.infer<typeof computedWithSchema>;

/** A stored result: the compute API's size response plus the process version that made it. */
export const deviceResultSchema = sizeResponseSchema.extend({
  processVersionId: z.string(),
  processVersion: z.number().int(),
});
export type DeviceResult = z.infer<typeof deviceResultSchema>;

/** Why the engine gave no result for the targets (an EngineError). */
export const deviceComputeErrorSchema = z.object({
  code: z.string(),
  message: z.string(),
  field: z.string().optional(),
});
export type DeviceComputeError = z.infer<typeof deviceComputeErrorSchema>;

export const STALE_REASONS = ['engine', 'process', 'table'] as const;
export const staleReasonSchema = z
  .enum(STALE_REASONS)
  .describe('engine: made by another ENGINE_VERSION; process: made on another process version than the sheet\'s; table: model table, made from another table than the version\'s current one for the device (or waiting for a table that now exists)');
export type StaleReason = z.infer<typeof staleReasonSchema>;

export const deviceSchema = z.object({
  id: z.string(),
  sheetId: z.string(),
  position: z.number().int().describe('Order in the sheet, 0 first'),
  version: z.number().int(),
  targets: deviceTargetsSchema,
  constraint: z.enum(CONSTRAINTS).describe('Which of vov, gmId, w, vgs the targets give'),
  sizeRequest: sizeRequestSchema.describe('The request POST /api/compute/size answers with this device\'s result (sheet defaults applied)'),
  result: deviceResultSchema.nullable().describe('null when the engine refused the targets (see error)'),
  error: deviceComputeErrorSchema.nullable(),
  computedWith: computedWithSchema,
  stale: z.boolean(),
  staleReasons: z.array(staleReasonSchema),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type Device = z.infer<typeof deviceSchema>;

export const deviceListSchema = z.array(deviceSchema).describe('Devices by position');
export type DeviceList = z.infer<typeof deviceListSchema>;
