import { z } from 'zod';
import { tableGridSchema } from './characterisation-table.js';
import { polaritySchema } from './process.js';
import { userRefSchema, versionNumberText } from './process-profile.js';
import { corner, quantity, uniqueList } from './request-fields.js';

/**
 * Characterisation jobs: POST /api/characterisations simulates a process version's model card with ngspice over a
 * grid and stores one lookup table per device (polarity and flavour). Every grid field is optional; the defaults
 * (docs/characterisation.md) come from the version: lengths lmin × (1, 1.15, 1.33, 1.6, 2, 3, 5, 8, 12, 20), VGS from
 * 0 (below VT for a depletion-mode device) to VDD in 10 mV steps, eight VDS from 50 mV to VDD, VSB from 0 to VDD/2 in
 * four steps, every corner the card maps, tempRange.min, tnom and tempRange.max, a 10 µm reference width. SI units,
 * temperatures in °C, voltages polarity-normalised (PMOS: VSG, VSD, VBS).
 */

/** The VGS step a grid may use, V (finer costs points, coarser costs accuracy between nodes). */
export const VGS_STEP_RANGE = { min: 0.01, max: 0.025 } as const;
/** The default limit of one request's points (all devices together); the server's CHARACTERISATION_MAX_POINTS may set another. */
export const DEFAULT_MAX_CHARACTERISATION_POINTS = 5_000_000;

export const characterisationGridSchema = z
  .strictObject({
    lengths: uniqueList(quantity('grid.lengths', 'm', { gt: 0, max: 1e-3 }), 'grid.lengths', 40).optional().describe('Gate lengths, m; lmin × (1, 1.15, 1.33, 1.6, 2, 3, 5, 8, 12, 20) of each device when absent'),
    vgsStep: quantity('grid.vgsStep', 'V', VGS_STEP_RANGE).optional().describe(`VGS step, V (${VGS_STEP_RANGE.min}–${VGS_STEP_RANGE.max}); 0.01 when absent`),
    vgsFrom: quantity('grid.vgsFrom', 'V', { min: -5, max: 0 }).optional().describe('Where the VGS axis starts, V (it ends at VDD); 0, or 0.3 V below VT0 for a depletion-mode device, when absent'),
    vds: uniqueList(quantity('grid.vds', 'V', { gt: 0, max: 20 }), 'grid.vds', 20).optional().describe('VDS values, V, at most VDD; (0.05, 0.1, 0.2, 0.35, 0.6, 0.9, 1.3, 1.8) × VDD/1.8 when absent'),
    vsb: uniqueList(quantity('grid.vsb', 'V', { min: 0, max: 20 }), 'grid.vsb', 10).optional().describe('VSB values, V, at most VDD; 0 to VDD/2 in four steps when absent'),
    corners: uniqueList(corner, 'grid.corners', 20).optional().describe('Corners of the profile that the card maps; all of them when absent'),
    temperatures: uniqueList(quantity('grid.temperatures', '°C', { min: -200, max: 300 }), 'grid.temperatures', 10).optional().describe('°C; tempRange.min, tnom, tempRange.max when absent'),
    referenceWidth: quantity('grid.referenceWidth', 'm', { gt: 0, max: 1e-3 }).optional().describe('The width every point is simulated at, m; 10 µm when absent'),
  })
  .describe('The characterisation grid; every field optional');
export type CharacterisationGrid = z.infer<typeof characterisationGridSchema>;

export const characterisationDeviceSchema = z.strictObject({
  polarity: polaritySchema,
  flavour: z.string({ error: 'flavour must be text' }).trim().min(1, 'flavour must not be empty').max(50).optional(),
});
export type CharacterisationDevice = z.infer<typeof characterisationDeviceSchema>;

/** POST /api/characterisations (maintainers and admins). */
export const characterisationRequestSchema = z
  .strictObject({
    processId: z.string({ error: 'processId must be text' }).min(1, 'processId must not be empty').max(200),
    version: z.number({ error: 'version must be a whole number' }).int('version must be a whole number').positive('version must be at least 1').optional().describe('The latest version when absent'),
    devices: z.array(characterisationDeviceSchema).min(1, 'devices must not be empty').max(40).optional().describe('Every device the card maps when absent'),
    grid: characterisationGridSchema.default({}),
  })
  .superRefine((value, ctx) => {
    const seen = new Set<string>();
    value.devices?.forEach((device, index) => {
      const key = `${device.polarity}/${device.flavour ?? ''}`;
      if (seen.has(key)) ctx.addIssue({ code: 'custom', path: ['devices', index], message: 'devices lists a device twice' });
      seen.add(key);
    });
  })
  .describe('POST /api/characterisations: characterise a process version\'s model card over a grid');
export type CharacterisationRequest = z.infer<typeof characterisationRequestSchema>;
export type CharacterisationRequestInput = z.input<typeof characterisationRequestSchema>;

export const CHARACTERISATION_STATUSES = ['queued', 'running', 'done', 'failed', 'cancelled'] as const;
export const characterisationStatusSchema = z.enum(CHARACTERISATION_STATUSES);
export type CharacterisationStatus = z.infer<typeof characterisationStatusSchema>;

/** One device of a job: its card model, its resolved grid, and its table once done. */
export const characterisedDeviceSchema = z.object({
  polarity: polaritySchema,
  flavour: z.string().nullable(),
  model: z.string(),
  points: z.number().int(),
  grid: tableGridSchema,
  tableId: z.string().nullable().describe('Set once this device\'s table is stored'),
  sha256: z.string().nullable(),
});
export type CharacterisedDevice = z.infer<typeof characterisedDeviceSchema>;

/** A characterisation job: 202 from POST, GET /api/characterisations/:id, DELETE (cancel), and the lists. */
export const characterisationJobSchema = z.object({
  id: z.string(),
  processId: z.string(),
  processName: z.string(),
  version: z.number().int(),
  processVersionId: z.string(),
  status: characterisationStatusSchema,
  progress: z.object({ done: z.number().int(), total: z.number().int() }).describe('Grid points simulated and in all'),
  etaSeconds: z.number().nullable().describe('Estimated seconds to go while running; null when not known (queued, finished, or too early to tell)'),
  error: z.object({ code: z.string(), message: z.string() }).nullable().describe('Why a job failed, with the simulator\'s message; why it was cancelled'),
  cancelRequested: z.boolean().describe('A cancel was asked for and the server running the job has not stopped it yet'),
  engine: z.enum(['native', 'wasm']).nullable().describe('native: Debian\'s ngspice; wasm: ngspice compiled to WebAssembly; null until it runs'),
  gridHash: z.string().describe('SHA-256 of the resolved grids: the same version and grid are characterised once'),
  devices: z.array(characterisedDeviceSchema),
  attempts: z.number().int().describe('Runs started; above 1 when a server stop interrupted it and it was resumed'),
  requestedBy: userRefSchema.nullable(),
  createdAt: z.string(),
  startedAt: z.string().nullable(),
  finishedAt: z.string().nullable(),
});
export type CharacterisationJob = z.infer<typeof characterisationJobSchema>;

export const characterisationJobListSchema = z.array(characterisationJobSchema).describe('Newest first');

/** GET /api/processes/:id/characterisations and /tables: ?version= (the latest when absent). */
export const characterisationListQuerySchema = z.object({
  version: versionNumberText('version').optional().describe('A version number; the latest when absent'),
});
export type CharacterisationListQuery = z.infer<typeof characterisationListQuerySchema>;
