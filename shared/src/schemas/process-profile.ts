import { z } from 'zod';
import { processSchema } from './process.js';

/**
 * The process-profile library: request and response schemas of /api/processes. A profile is a named,
 * versioned process; every edit adds an immutable version holding the full process definition
 * (`processSchema`). Numbers in SI units, temperatures in °C, dates as ISO 8601 text.
 */

/** Largest file POST /api/processes/import accepts; a bigger one answers 413 PAYLOAD_TOO_LARGE. */
export const PROCESS_IMPORT_MAX_BYTES = 1024 * 1024;

/** A version number in a JSON body. */
const versionNumber = (field: string) =>
  z.number({ error: `${field} must be a whole number` }).int(`${field} must be a whole number`).positive(`${field} must be at least 1`);

/** A version number in a query string or a multipart text field, where everything arrives as text. */
const versionNumberText = (field: string) =>
  z.coerce.number({ error: `${field} must be a whole number` }).int(`${field} must be a whole number`).positive(`${field} must be at least 1`);

const nodeClassSchema = z
  .string({ error: 'nodeClass must be text' })
  .trim()
  .max(50, 'nodeClass must have at most 50 characters')
  .describe('The class of process, e.g. "180 nm"; free text');

const messageSchema = z
  .string({ error: 'message must be text' })
  .trim()
  .max(500, 'message must have at most 500 characters')
  .describe('What this version changes, for the history');

// ── queries ────────────────────────────────────────────────────────────────────────────────────────

export const listProcessesQuerySchema = z.object({
  search: z.string().trim().max(100, 'search must have at most 100 characters').optional().describe('Part of the name, node class or description'),
  includeDeprecated: z.stringbool({ error: 'includeDeprecated must be true or false' }).default(false),
});
export type ListProcessesQuery = z.infer<typeof listProcessesQuerySchema>;

export const processVersionQuerySchema = z.object({
  version: versionNumberText('version').optional().describe('A version number; the latest when absent'),
});
export type ProcessVersionQuery = z.infer<typeof processVersionQuerySchema>;

export const processDiffQuerySchema = z.object({
  from: versionNumberText('from').optional().describe('The older version; the one before `to` when absent'),
  to: versionNumberText('to').optional().describe('The newer version; the latest when absent'),
});
export type ProcessDiffQuery = z.infer<typeof processDiffQuerySchema>;

// ── responses ──────────────────────────────────────────────────────────────────────────────────────

/** Who did something; null when the account is gone or it was the system. */
export const userRefSchema = z.object({ id: z.string(), displayName: z.string() });
export type UserRef = z.infer<typeof userRefSchema>;

/** One row of the library: the profile with a digest of its latest version. */
export const processProfileSummarySchema = z.object({
  id: z.string(),
  name: z.string(),
  description: z.string(),
  nodeClass: z.string(),
  deprecated: z.boolean(),
  /** Seeded invented demo data, not any foundry's process. */
  demoData: z.boolean(),
  latestVersion: z.number().int(),
  vdd: z.number().describe('Of the latest version, V'),
  tnom: z.number().describe('Of the latest version, °C'),
  corners: z.array(z.string()).describe('Corner names of the latest version, TT first'),
  createdAt: z.string(),
  updatedAt: z.string(),
  updatedBy: userRefSchema.nullable(),
});
export type ProcessProfileSummary = z.infer<typeof processProfileSummarySchema>;

export const processVersionSummarySchema = z.object({
  id: z.string(),
  number: z.number().int(),
  message: z.string(),
  author: userRefSchema.nullable(),
  createdAt: z.string(),
});
export type ProcessVersionSummary = z.infer<typeof processVersionSummarySchema>;

export const processVersionSchema = processVersionSummarySchema.extend({ definition: processSchema });
export type ProcessVersion = z.infer<typeof processVersionSchema>;

/** A profile with one of its versions in full (the latest unless another was asked for). */
export const processProfileSchema = processProfileSummarySchema.extend({ version: processVersionSchema });
export type ProcessProfile = z.infer<typeof processProfileSchema>;

/** One difference between two versions, by dotted path: "nmos.kp", "corners.FF.pmos.dvt", "flavours.native.params.vt0". */
export const parameterChangeSchema = z.object({
  path: z.string(),
  group: z.enum(['process', 'nmos', 'pmos', 'corners', 'flavours']),
  kind: z.enum(['changed', 'added', 'removed']),
  /** SI unit of the values ('' for plain numbers and text). */
  unit: z.string(),
  from: z.union([z.number(), z.string(), z.boolean()]).nullable(),
  to: z.union([z.number(), z.string(), z.boolean()]).nullable(),
});
export type ParameterChange = z.infer<typeof parameterChangeSchema>;

export const processDiffSchema = z.object({
  profileId: z.string(),
  from: z.number().int(),
  to: z.number().int(),
  changes: z.array(parameterChangeSchema),
});
export type ProcessDiff = z.infer<typeof processDiffSchema>;

// ── writes ─────────────────────────────────────────────────────────────────────────────────────────

export const createProcessRequestSchema = z.strictObject({
  nodeClass: nodeClassSchema.default(''),
  message: messageSchema.default(''),
  definition: processSchema,
});
export type CreateProcessRequest = z.infer<typeof createProcessRequestSchema>;
export type CreateProcessRequestInput = z.input<typeof createProcessRequestSchema>;

export const updateProcessRequestSchema = z.strictObject({
  baseVersion: versionNumber('baseVersion').describe('The version the edit started from; 409 STALE_EDIT when a newer one exists'),
  nodeClass: nodeClassSchema.optional().describe('Unchanged when absent'),
  message: messageSchema.default(''),
  definition: processSchema,
});
export type UpdateProcessRequest = z.infer<typeof updateProcessRequestSchema>;
export type UpdateProcessRequestInput = z.input<typeof updateProcessRequestSchema>;

export const deprecateProcessRequestSchema = z.strictObject({
  deprecated: z.boolean({ error: 'deprecated must be true or false' }).default(true).describe('false restores a deprecated profile'),
});
export type DeprecateProcessRequest = z.infer<typeof deprecateProcessRequestSchema>;

/**
 * The text fields of POST /api/processes/import (multipart, beside the `file`). With profileId and
 * baseVersion the file becomes a new version of that profile; without, a new profile.
 */
export const importProcessFieldsSchema = z
  .strictObject({
    nodeClass: nodeClassSchema.optional(),
    message: messageSchema.optional(),
    profileId: z.string().trim().min(1, 'profileId must not be empty').optional(),
    baseVersion: versionNumberText('baseVersion').optional(),
  })
  .superRefine((fields, ctx) => {
    if ((fields.profileId === undefined) !== (fields.baseVersion === undefined)) {
      ctx.addIssue({ code: 'custom', path: ['baseVersion'], message: 'profileId and baseVersion go together: give both to import a new version, neither for a new profile' });
    }
  });
export type ImportProcessFields = z.infer<typeof importProcessFieldsSchema>;

// ── the exchange file ──────────────────────────────────────────────────────────────────────────────

export const PROCESS_FILE_FORMAT = 'channelwright-process';
export const PROCESS_FILE_SCHEMA_VERSION = 1;

/** Our own JSON file of one process version: what export writes and import reads. */
export const processFileSchema = z
  .strictObject({
    format: z.literal(PROCESS_FILE_FORMAT, { error: `format must be "${PROCESS_FILE_FORMAT}"` }),
    schemaVersion: z.literal(PROCESS_FILE_SCHEMA_VERSION, { error: `schemaVersion must be ${PROCESS_FILE_SCHEMA_VERSION}` }),
    nodeClass: nodeClassSchema.optional(),
    exportedAt: z.string().optional().describe('ISO 8601; informative'),
    source: z.object({ profileId: z.string(), version: z.number().int() }).optional().describe('Where it was exported from; informative'),
    process: processSchema,
  })
  .describe('A Channelwright process file (schemaVersion 1)');
export type ProcessFile = z.infer<typeof processFileSchema>;

/** The header of the CSV import, in this order. */
export const PROCESS_CSV_COLUMNS = ['parameter', 'polarity', 'value', 'unit'] as const;

// ── the physics helper ─────────────────────────────────────────────────────────────────────────────

export const deriveProcessRequestSchema = z.strictObject({
  tox: z.number({ error: 'tox must be a number in m' }).gt(0, 'tox must be above 0 m').max(1e-6, 'tox must be at most 1 µm').describe('Oxide thickness, m'),
  substrateDoping: z
    .number({ error: 'substrateDoping must be a number in m⁻³' })
    .min(1e19, 'substrateDoping must be at least 1e19 m⁻³ (1e13 cm⁻³)')
    .max(1e27, 'substrateDoping must be at most 1e27 m⁻³ (1e21 cm⁻³)')
    .describe('Body doping NA (NMOS) or ND (PMOS) in m⁻³ — SI: 1e17 cm⁻³ is 1e23 m⁻³'),
  flatBand: z.number({ error: 'flatBand must be a number in V' }).min(-3).max(3).optional().describe('Flat-band voltage, V, polarity-normalised; VT0 is derived only when given'),
  mobility: z.number({ error: 'mobility must be a number in m²/(V·s)' }).gt(0).max(1).optional().describe('Channel mobility, m²/(V·s); kp = µ·Cox when given'),
  temperature: z.number({ error: 'temperature must be a number in °C' }).min(-200).max(300).default(27).describe('°C'),
});
export type DeriveProcessRequest = z.infer<typeof deriveProcessRequestSchema>;
export type DeriveProcessRequestInput = z.input<typeof deriveProcessRequestSchema>;

export const physicalConstantSchema = z.object({
  symbol: z.string(),
  name: z.string(),
  value: z.number(),
  unit: z.string(),
  source: z.string(),
});
export type PhysicalConstant = z.infer<typeof physicalConstantSchema>;

export const deriveProcessResponseSchema = z.object({
  cox: z.number().describe('F/m²'),
  gamma: z.number().describe('√V'),
  phiF: z.number().describe('V'),
  twoPhiF: z.number().describe('V'),
  n: z.number().describe('Slope factor at VSB = 0'),
  depletionWidth: z.number().describe('m, at 2φF'),
  ni: z.number().describe('m⁻³, at the temperature asked'),
  vt0: z.number().optional().describe('V, only when flatBand was given'),
  vtTc: z.number().optional().describe('V/K, only when flatBand was given'),
  kp: z.number().optional().describe('A/V², only when mobility was given'),
  temperature: z.number().describe('°C'),
  equations: z.array(z.string()),
  constants: z.array(physicalConstantSchema),
});
export type DeriveProcessResponse = z.infer<typeof deriveProcessResponseSchema>;
