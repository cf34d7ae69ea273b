import { z } from 'zod';
import { deviceListSchema } from './device.js';
import { polaritySchema } from './process.js';
import { editedVersionSchema } from './projects.js';
import { sizeRequestSchema } from './size.js';
import { modelSchema, quantity } from './request-fields.js';
import { label, text } from './text-fields.js';
import { warningSchema } from './warning.js';

/**
 * Sizing sheets and their devices: request and response schemas of /api/projects/:id/sheets and
 * /api/sheets/*. A sheet belongs to a project and to one process profile version; a device holds its
 * sizing targets and the result the engine computed for them, stored with the engine version and the
 * process version that made it. Numbers in SI units (A, V, m, m², W), temperatures in °C; voltages
 * polarity-normalised as in the compute API (PMOS: VSG, VSD, VBS).
 *
 * Results on create and edit: targets the schema refuses answer 400 naming the field; so do a
 * corner or flavour the sheet's process does not have (UNKNOWN_CORNER, UNKNOWN_FLAVOUR,
 * FLAVOUR_POLARITY_MISMATCH). Targets the engine cannot meet (ID not reachable, gm/ID above the
 * weak-inversion limit, L below lmin …) are stored with `result: null` and the engine's `error`,
 * so the designer sees why on the sheet.
 */

const size = sizeRequestSchema.shape;
const sheetName = label('name', 100);
const sheetDescription = text('description', 2000);

const sheetTemperature = size.temperature.unwrap().describe('Default temperature of the devices, °C; the process tnom when null');
const sheetCorner = size.corner.unwrap().describe('Default corner of the devices; a corner of the process');
const processVersionNumber = size.processVersion.unwrap();

/** The sheet's off-state leakage budget: the total at the worst corner at `temperature` must stay at or below `current`. */
export const leakageBudgetSchema = z
  .strictObject({
    current: quantity('leakageBudget.current', 'A', { gt: 0, max: 1 }).describe('Budget for the total off-state leakage, A'),
    temperature: quantity('leakageBudget.temperature', '°C', { min: -200, max: 300 }).describe('At this temperature, °C (e.g. the hottest of the range)'),
  })
  .describe('e.g. 50 nA at 125 °C');
export type LeakageBudget = z.infer<typeof leakageBudgetSchema>;

/** A match group's offset budget: the input-referred σ(VOS) of its worst pair must stay at or below `sigmaVos`. */
export const offsetBudgetSchema = z.strictObject({
  group: label('group', 50),
  sigmaVos: quantity('sigmaVos', 'V', { gt: 0, max: 1 }).describe('1-sigma input-referred offset budget of the group\'s worst pair, V'),
});
export type OffsetBudget = z.infer<typeof offsetBudgetSchema>;
const offsetBudgets = z
  .array(offsetBudgetSchema, { error: 'offsetBudgets must be a list' })
  .max(100, 'offsetBudgets may list at most 100 groups')
  .refine((list) => new Set(list.map((b) => b.group)).size === list.length, 'offsetBudgets lists a group twice');

export const createSheetRequestSchema = z.strictObject({
  name: sheetName,
  description: sheetDescription.default(''),
  processId: size.processId.unwrap().describe('A process profile'),
  processVersion: processVersionNumber.optional().describe('Its version; the latest when absent'),
  temperature: sheetTemperature.nullable().default(null),
  corner: sheetCorner.default('TT'),
  model: modelSchema.default('all-region'),
  leakageBudget: leakageBudgetSchema.nullable().default(null),
  offsetBudgets: offsetBudgets.default([]),
});
export type CreateSheetRequest = z.infer<typeof createSheetRequestSchema>;
export type CreateSheetRequestInput = z.input<typeof createSheetRequestSchema>;

/**
 * PATCH /api/sheets/:id. Moving the sheet to another process version (processVersion of the same
 * profile, or processId of another, latest unless processVersion) keeps every stored result and marks
 * it stale until POST /api/sheets/:id/recompute.
 */
export const updateSheetRequestSchema = z
  .strictObject({
    version: editedVersionSchema,
    name: sheetName.optional(),
    description: sheetDescription.optional(),
    processId: size.processId.unwrap().optional().describe('Move to another profile (its latest version unless processVersion)'),
    processVersion: processVersionNumber.optional().describe('Move to this version (of processId, or of the sheet\'s profile)'),
    temperature: sheetTemperature.nullable().optional(),
    corner: sheetCorner.optional(),
    model: modelSchema.optional(),
    leakageBudget: leakageBudgetSchema.nullable().optional(),
    offsetBudgets: offsetBudgets.optional(),
  })
  .refine((value) => Object.keys(value).some((key) => key !== 'version'), { path: ['name'], message: 'Give at least one field to change besides version' });
export type UpdateSheetRequest = z.infer<typeof updateSheetRequestSchema>;
export type UpdateSheetRequestInput = z.input<typeof updateSheetRequestSchema>;

/** ?version= on DELETE: when given, a stale delete answers 409 STALE_EDIT. */
export const deleteQuerySchema = z.object({
  version: z.coerce.number({ error: 'version must be a whole number' }).int('version must be a whole number').positive('version must be at least 1').optional(),
});
export type DeleteQuery = z.infer<typeof deleteQuerySchema>;

export const EXPORT_FORMATS = ['csv', 'csv-metadata', 'spice'] as const;

/**
 * ?format= on GET /api/sheets/:id/export: csv (the device table, with its metadata in `#` comment lines
 * unless metadata=none), csv-metadata (the metadata alone as key,value rows: the second file of a plain
 * table), spice (one instance line per device). lengths=um writes W, L and finger widths in µm with "(um)" in
 * the header; fingers=omit leaves nf= off the SPICE lines (level 1–3 models have no such parameter).
 */
export const exportQuerySchema = z.object({
  format: z.enum(EXPORT_FORMATS, { error: 'format must be "csv", "csv-metadata" or "spice"' }).default('csv'),
  metadata: z.enum(['comments', 'none'], { error: 'metadata must be "comments" or "none"' }).default('comments'),
  lengths: z.enum(['m', 'um'], { error: 'lengths must be "m" or "um"' }).default('m'),
  fingers: z.enum(['nf', 'omit'], { error: 'fingers must be "nf" or "omit"' }).default('nf'),
});
export type ExportQuery = z.infer<typeof exportQuerySchema>;

/** The sheet's process profile version. */
export const sheetProcessSchema = z.object({
  profileId: z.string(),
  name: z.string(),
  versionId: z.string(),
  version: z.number().int(),
  latestVersion: z.number().int().describe('The profile\'s newest version: newer than `version` means an update is available'),
  deprecated: z.boolean(),
  vdd: z.number(),
  tnom: z.number(),
  corners: z.array(z.string()).describe('Corner names of this version, TT first'),
  flavours: z.array(z.object({ name: z.string(), polarity: polaritySchema })),
});
export type SheetProcess = z.infer<typeof sheetProcessSchema>;

export const sheetSummarySchema = z.object({
  id: z.string(),
  projectId: z.string(),
  name: z.string(),
  description: z.string(),
  process: sheetProcessSchema,
  temperature: z.number().nullable(),
  corner: z.string(),
  model: modelSchema,
  leakageBudget: leakageBudgetSchema.nullable(),
  offsetBudgets: z.array(offsetBudgetSchema),
  version: z.number().int().describe('Raised by every change of the sheet\'s own fields (not of its devices)'),
  deviceCount: z.number().int(),
  staleCount: z.number().int().describe('Devices whose stored result is stale'),
  stale: z.boolean().describe('Some device needs a recompute'),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type SheetSummary = z.infer<typeof sheetSummarySchema>;

export const sheetListSchema = z.array(sheetSummarySchema).describe('The project\'s sheets, by name');
export type SheetList = z.infer<typeof sheetListSchema>;

const leakageAtCornerSchema = z.object({
  corner: z.string(),
  temperature: z.number().describe('°C: the hottest of the process range (tnom when it has none)'),
  current: z.number().describe('Σ ioff·multiplier of the devices with a result, A'),
});

export const matchGroupTotalsSchema = z.object({
  name: z.string(),
  deviceIds: z.array(z.string()),
  sigmaVos: z.number().nullable().describe('Gate-referred σ(VOS) of the worst pair of the group, V (Pelgrom 1989); null with fewer than two results'),
  sigmaVt: z.number().nullable(),
  sigmaId: z.number().nullable(),
  worstPair: z.tuple([z.string(), z.string()]).nullable().describe('Device ids of that pair'),
  sigmaBeta: z.number().nullable().describe('σ(Δβ/β) of that pair'),
  gmId: z.number().nullable().describe('Mean gm/ID of that pair, 1/V'),
  budget: z.number().nullable().describe('The group\'s σ(VOS) budget, V (offsetBudgets); null without one'),
  meetsBudget: z.boolean().nullable(),
  requiredArea: z.number().nullable().describe('W·L (× multiplier) per device of an equal pair that meets the budget at this gm/ID (Kinget 2005), m²'),
});
export type MatchGroupTotals = z.infer<typeof matchGroupTotalsSchema>;

export const sheetTotalsSchema = z.object({
  vdd: z.number().describe('The process supply, V'),
  supplyCurrent: z.number().describe('Σ ID·multiplier of the supply-branch devices with a result, A'),
  supplyPower: z.number().describe('supplyCurrent·vdd, W'),
  gateArea: z.number().describe('Σ W·L·multiplier of the devices with a result, m²'),
  leakage: z.object({
    slowest: leakageAtCornerSchema.describe('At the slowest corner (highest VT shift)'),
    fastest: leakageAtCornerSchema.describe('At the fastest corner (lowest VT shift)'),
    conductingDeviceIds: z.array(z.string()).describe('Depletion-mode devices: they conduct at VGS = 0, which is not leakage, and are left out'),
  }),
  warningDeviceIds: z.array(z.string()).describe('Devices whose result carries warnings'),
  warningCount: z.number().int(),
  failedDeviceIds: z.array(z.string()).describe('Devices the engine gave no result for'),
  matchGroups: z.array(matchGroupTotalsSchema),
});
export type SheetTotals = z.infer<typeof sheetTotalsSchema>;

/** GET /api/sheets/:id and every sheet write: the sheet with its devices and totals. */
export const sheetSchema = sheetSummarySchema.extend({
  devices: deviceListSchema,
  totals: sheetTotalsSchema,
});
export type Sheet = z.infer<typeof sheetSchema>;

/** The warnings of one device, as the totals and the export list them. */
export const deviceWarningsSchema = z.array(warningSchema);
