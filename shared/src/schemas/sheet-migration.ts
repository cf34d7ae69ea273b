import { z } from 'zod';
import { label } from './text-fields.js';
import { quantity } from './request-fields.js';
import { sheetSummarySchema } from './sheets.js';

/**
 * POST /api/sheets/:id/migrate: the sheet re-solved on another process profile, as a new sheet of the same
 * project (the source is never changed). Each device keeps its ID and its second constraint (VOV, gm/ID, or a
 * VGS and W scaled as the voltages and lengths are); its L is scaled by the ratio of the processes' lmin unless
 * the designer fixes it; VDS, VSB and a VGS constraint scale with the supply when scaleVoltages is true.
 * preview: true answers the comparison and writes nothing.
 */
export const migrateSheetRequestSchema = z.strictObject({
  processId: z.string({ error: 'processId must be text' }).min(1, 'processId must not be empty').max(200),
  processVersion: z.number({ error: 'processVersion must be a whole number' }).int('processVersion must be a whole number').positive('processVersion must be at least 1').optional(),
  name: label('name', 100).optional().describe('Name of the new sheet; "<sheet> on <process>" when absent'),
  fixedLengths: z.array(z.string().min(1)).max(2000).default([]).describe('Ids of devices whose L is kept as drawn'),
  scaleVoltages: z.boolean({ error: 'scaleVoltages must be true or false' }).default(true),
  currentScale: quantity('currentScale', '', { gt: 0, max: 100 }).default(1).describe('Factor on every ID (1: the same currents; 1/κ: constant-field scaling)'),
  preview: z.boolean({ error: 'preview must be true or false' }).default(false),
});
export type MigrateSheetRequest = z.infer<typeof migrateSheetRequestSchema>;
export type MigrateSheetRequestInput = z.input<typeof migrateSheetRequestSchema>;

export const migrationFiguresSchema = z.object({
  w: z.number(),
  l: z.number(),
  area: z.number().describe('W·L·multiplier, m²'),
  vgs: z.number(),
  gmId: z.number(),
  intrinsicGain: z.number().nullable(),
  ft: z.number(),
  ioff: z.number().nullable().describe('Off current at the device\'s corner and temperature, × multiplier, A'),
});
export type MigrationFigures = z.infer<typeof migrationFiguresSchema>;

export const sheetMigrationSchema = z.object({
  sheet: sheetSummarySchema.nullable().describe('The new sheet; null for a preview'),
  from: z.object({ processName: z.string(), version: z.number().int(), vdd: z.number() }),
  to: z.object({ processName: z.string(), version: z.number().int(), vdd: z.number() }),
  voltageScale: z.number().describe('Factor on VDS, VSB and VGS targets (the ratio of the supplies, or 1)'),
  devices: z.array(
    z.object({
      sourceDeviceId: z.string(),
      name: z.string(),
      lengthScale: z.number().describe('Factor on L: the ratio of the processes\' lmin for the device\'s type, or 1 when fixed'),
      notes: z.array(z.string()).describe('What the migration had to change beyond the scaling (a flavour or corner the new process lacks …)'),
      old: migrationFiguresSchema.nullable(),
      new: migrationFiguresSchema.nullable(),
      error: z.object({ code: z.string(), message: z.string() }).nullable().describe('Why the new process could not size it'),
    }),
  ),
});
export type SheetMigration = z.infer<typeof sheetMigrationSchema>;
