import { z } from 'zod';
import { CONSTRAINTS, modelSchema, sizeRequestSchema, sizeResponseSchema, warningSchema } from './compute.js';
import { polaritySchema } from './process.js';
import { editedVersionSchema } from './projects.js';

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

const text = (field: string, max: number) =>
  z.string({ error: `${field} must be text` }).trim().max(max, `${field} must have at most ${max} characters`);
const label = (field: string, max: number) => text(field, max).min(1, `${field} must not be empty`);

const sheetName = label('name', 100);
const sheetDescription = text('description', 2000);
const deviceName = label('name', 50).describe('M1, M2 … or the designer\'s own; unique in the sheet');
const deviceFunction = text('function', 200).describe('Free text: input pair, tail source, mirror load, switch …');
const matchGroup = label('matchGroup', 50).describe('Devices with the same match group must match (offset estimate in the totals)');
const multiplier = z
  .number({ error: 'multiplier must be a whole number' })
  .int('multiplier must be a whole number')
  .min(1, 'multiplier must be at least 1')
  .max(100_000, 'multiplier must be at most 100000')
  .describe('Identical devices in parallel (m): current, area and leakage count m times');
const supplyBranch = z.boolean({ error: 'supplyBranch must be true or false' }).describe('Its ID is drawn from the supply: counted in the sheet\'s supply current and power');
const notes = text('notes', 5000);

/** The target fields of a device; each optional here, the full and the patch schemas below pick what is required. */
const targetFields = {
  name: deviceName,
  function: deviceFunction,
  polarity: polaritySchema,
  flavour: size.flavour.unwrap(),
  id: size.id,
  l: size.l,
  vds: size.vds,
  vsb: size.vsb.unwrap(),
  temperature: size.temperature.unwrap().describe('°C; the sheet\'s temperature when absent'),
  corner: size.corner.unwrap().describe('A corner of the sheet\'s process; the sheet\'s corner when absent'),
  model: size.model.unwrap().describe('The sheet\'s model when absent'),
  vov: size.vov.unwrap(),
  gmId: size.gmId.unwrap(),
  w: size.w.unwrap(),
  vgs: size.vgs.unwrap(),
  maxFingerWidth: size.maxFingerWidth.unwrap(),
  matchGroup,
  multiplier,
  supplyBranch,
  notes,
};

export const DEVICE_CONSTRAINTS = CONSTRAINTS;
export type DeviceConstraint = (typeof DEVICE_CONSTRAINTS)[number];

function checkOneConstraint(value: Partial<Record<DeviceConstraint, number | null>>, ctx: z.core.$RefinementCtx, atMost: boolean): void {
  const given = DEVICE_CONSTRAINTS.filter((name) => value[name] !== undefined && value[name] !== null);
  if (given.length === 0 && !atMost) {
    ctx.addIssue({ code: 'custom', path: ['vov'], message: 'Give exactly one of vov, gmId, w, vgs (none was given)' });
  } else if (given.length > 1) {
    ctx.addIssue({ code: 'custom', path: [given[1]], message: `Give exactly one of vov, gmId, w, vgs (${given.join(' and ')} were given)` });
  }
}

/** A device's sizing targets: POST /api/sheets/:id/devices, and `targets` of every device response. */
export const deviceTargetsSchema = z
  .strictObject({
    name: targetFields.name,
    function: targetFields.function.default(''),
    polarity: targetFields.polarity,
    flavour: targetFields.flavour.optional(),
    id: targetFields.id,
    l: targetFields.l,
    vds: targetFields.vds,
    vsb: targetFields.vsb.default(0),
    temperature: targetFields.temperature.optional(),
    corner: targetFields.corner.optional(),
    model: targetFields.model.optional(),
    vov: targetFields.vov.optional(),
    gmId: targetFields.gmId.optional(),
    w: targetFields.w.optional(),
    vgs: targetFields.vgs.optional(),
    maxFingerWidth: targetFields.maxFingerWidth.optional(),
    matchGroup: targetFields.matchGroup.optional(),
    multiplier: targetFields.multiplier.default(1),
    supplyBranch: targetFields.supplyBranch.default(false),
    notes: targetFields.notes.default(''),
  })
  .superRefine((value, ctx) => checkOneConstraint(value, ctx, false))
  .describe('Sizing targets: ID, L, VDS, VSB and exactly one of vov, gmId, w, vgs; corner, temperature and model default to the sheet\'s');
export type DeviceTargets = z.infer<typeof deviceTargetsSchema>;
export type DeviceTargetsInput = z.input<typeof deviceTargetsSchema>;
export const createDeviceRequestSchema = deviceTargetsSchema;
export type CreateDeviceRequest = DeviceTargets;
export type CreateDeviceRequestInput = DeviceTargetsInput;

/**
 * PATCH /api/sheets/:id/devices/:deviceId: `version` and the fields that change. A constraint given
 * (vov, gmId, w or vgs) replaces the stored one and keeps every other target; null clears an optional
 * target (back to the sheet's default). The merged targets must pass deviceTargetsSchema.
 */
export const updateDeviceRequestSchema = z
  .strictObject({
    version: editedVersionSchema,
    name: targetFields.name.optional(),
    function: targetFields.function.optional(),
    polarity: targetFields.polarity.optional(),
    flavour: targetFields.flavour.nullable().optional(),
    id: targetFields.id.optional(),
    l: targetFields.l.optional(),
    vds: targetFields.vds.optional(),
    vsb: targetFields.vsb.optional(),
    temperature: targetFields.temperature.nullable().optional(),
    corner: targetFields.corner.nullable().optional(),
    model: targetFields.model.nullable().optional(),
    vov: targetFields.vov.optional(),
    gmId: targetFields.gmId.optional(),
    w: targetFields.w.optional(),
    vgs: targetFields.vgs.optional(),
    maxFingerWidth: targetFields.maxFingerWidth.nullable().optional(),
    matchGroup: targetFields.matchGroup.nullable().optional(),
    multiplier: targetFields.multiplier.optional(),
    supplyBranch: targetFields.supplyBranch.optional(),
    notes: targetFields.notes.optional(),
  })
  .superRefine((value, ctx) => checkOneConstraint(value, ctx, true));
export type UpdateDeviceRequest = z.infer<typeof updateDeviceRequestSchema>;
export type UpdateDeviceRequestInput = z.input<typeof updateDeviceRequestSchema>;

/** Which numbers made a stored result (or a stored refusal). */
export const computedWithSchema = z.object({
  engineVersion: z.string(),
  processVersionId: z.string(),
  processVersion: z.number().int().describe('The version number of the sheet\'s process profile'),
  computedAt: z.string(),
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

export const STALE_REASONS = ['engine', 'process'] as const;
export const staleReasonSchema = z.enum(STALE_REASONS).describe('engine: made by another ENGINE_VERSION; process: made on another process version than the sheet\'s');

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

// ── sheets ─────────────────────────────────────────────────────────────────────────────────────────

const sheetTemperature = size.temperature.unwrap().describe('Default temperature of the devices, °C; the process tnom when null');
const sheetCorner = size.corner.unwrap().describe('Default corner of the devices; a corner of the process');
const processVersionNumber = size.processVersion.unwrap();

export const createSheetRequestSchema = z.strictObject({
  name: sheetName,
  description: sheetDescription.default(''),
  processId: size.processId.unwrap().describe('A process profile'),
  processVersion: processVersionNumber.optional().describe('Its version; the latest when absent'),
  temperature: sheetTemperature.nullable().default(null),
  corner: sheetCorner.default('TT'),
  model: modelSchema.default('all-region'),
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
  })
  .refine((value) => Object.keys(value).some((key) => key !== 'version'), { path: ['name'], message: 'Give at least one field to change besides version' });
export type UpdateSheetRequest = z.infer<typeof updateSheetRequestSchema>;
export type UpdateSheetRequestInput = z.input<typeof updateSheetRequestSchema>;

/** ?version= on DELETE: when given, a stale delete answers 409 STALE_EDIT. */
export const deleteQuerySchema = z.object({
  version: z.coerce.number({ error: 'version must be a whole number' }).int('version must be a whole number').positive('version must be at least 1').optional(),
});
export type DeleteQuery = z.infer<typeof deleteQuerySchema>;

export const exportQuerySchema = z.object({
  format: z.enum(['csv'], { error: 'format must be "csv"' }).default('csv'),
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

/**
 * GET /api/sheets/:id/export?format=csv, our own layout (formatVersion 1): UTF-8 without a byte-order
 * mark, CRLF, RFC 4180 quoting. First a `key,value` block of metadata (format, formatVersion, project,
 * sheet, process, processVersion, engineVersion, exportedAt, stale, devices and the totals with units
 * in their keys), then one empty line, then the device table: this header row, one row per device.
 * Numbers are plain SI written by String(number), so papaparse, Python's csv with float() and
 * spreadsheets read back the same double; an empty cell is a value the device does not have.
 * The columns, in order: field key and column title with its unit.
 */
export const SHEET_CSV_COLUMNS = [
  ['name', 'Name'],
  ['function', 'Function'],
  ['polarity', 'Polarity'],
  ['flavour', 'Flavour'],
  ['multiplier', 'Multiplier'],
  ['matchGroup', 'Match group'],
  ['supplyBranch', 'Supply branch'],
  ['constraint', 'Constraint'],
  ['corner', 'Corner'],
  ['temperature', 'Temperature (degC)'],
  ['model', 'Model'],
  ['w', 'W (m)'],
  ['l', 'L (m)'],
  ['wOverL', 'W/L'],
  ['fingers', 'Fingers'],
  ['fingerWidth', 'Finger width (m)'],
  ['id', 'ID (A)'],
  ['vgs', 'VGS (V)'],
  ['vds', 'VDS (V)'],
  ['vsb', 'VSB (V)'],
  ['vt', 'VT (V)'],
  ['vov', 'VOV (V)'],
  ['vdsat', 'VDSsat (V)'],
  ['gmId', 'gm/ID (1/V)'],
  ['gm', 'gm (S)'],
  ['gds', 'gds (S)'],
  ['ro', 'ro (Ohm)'],
  ['intrinsicGain', 'Intrinsic gain (V/V)'],
  ['ic', 'Inversion coefficient'],
  ['region', 'Region'],
  ['cgs', 'Cgs (F)'],
  ['cgd', 'Cgd (F)'],
  ['ft', 'fT (Hz)'],
  ['sigmaVos', 'Pair sigma VOS (V)'],
  ['ioff', 'Ioff (A)'],
  ['warnings', 'Warnings'],
  ['error', 'Error'],
  ['stale', 'Stale'],
] as const;
export type SheetCsvColumn = (typeof SHEET_CSV_COLUMNS)[number][0];
