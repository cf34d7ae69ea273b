import { z } from 'zod';
import { modelCardInputSchema, modelCardSummarySchema } from './model-card.js';
import { processSchema } from './process.js';

/**
 * The process-profile library: request and response schemas of /api/processes. A profile is a named,
 * versioned process; every edit adds an immutable version holding the full process definition
 * (`processSchema`). Numbers in SI units, temperatures in °C, dates as ISO 8601 text.
 */

/** A version number in a JSON body. */
const versionNumber = (field: string) =>
  z.number({ error: `${field} must be a whole number` }).int(`${field} must be a whole number`).positive(`${field} must be at least 1`);

/** A version number in a query string or a multipart text field, where everything arrives as text. */
export const versionNumberText = (field: string) =>
  z.coerce.number({ error: `${field} must be a whole number` }).int(`${field} must be a whole number`).positive(`${field} must be at least 1`);

export const nodeClassSchema = z
  .string({ error: 'nodeClass must be text' })
  .trim()
  .max(50, 'nodeClass must have at most 50 characters')
  .describe('The class of process, e.g. "180 nm"; free text');

export const messageSchema = z
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
  modelCardSha256: z.string().nullable().describe('SHA-256 of the version\'s model card; null when it has none'),
});
export type ProcessVersionSummary = z.infer<typeof processVersionSummarySchema>;

export const processVersionSchema = processVersionSummarySchema.extend({
  definition: processSchema,
  modelCard: modelCardSummarySchema.nullable().describe('The version\'s model card (its text: GET /api/processes/:id/model-card); null when it has none'),
});
export type ProcessVersion = z.infer<typeof processVersionSchema>;

/** A profile with one of its versions in full (the latest unless another was asked for). */
export const processProfileSchema = processProfileSummarySchema.extend({ version: processVersionSchema });
export type ProcessProfile = z.infer<typeof processProfileSchema>;

/** One difference between two versions, by dotted path: "nmos.kp", "corners.FF.pmos.dvt", "flavours.native.params.vt0", "modelCard.sha256", "modelCard.corners.TT", "modelCard.devices.bfn18". */
export const parameterChangeSchema = z.object({
  path: z.string(),
  group: z.enum(['process', 'nmos', 'pmos', 'corners', 'flavours', 'modelCard']),
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
  modelCard: modelCardInputSchema.optional().describe('A SPICE model card for version 1 (a card of up to 2 MB: upload it with POST /api/processes/import, whose body limit is larger)'),
});
export type CreateProcessRequest = z.infer<typeof createProcessRequestSchema>;
export type CreateProcessRequestInput = z.input<typeof createProcessRequestSchema>;

export const updateProcessRequestSchema = z.strictObject({
  baseVersion: versionNumber('baseVersion').describe('The version the edit started from; 409 STALE_EDIT when a newer one exists'),
  nodeClass: nodeClassSchema.optional().describe('Unchanged when absent'),
  message: messageSchema.default(''),
  definition: processSchema,
  modelCard: modelCardInputSchema.nullable().optional().describe('The new version\'s model card: absent keeps the base version\'s card (and mapping), null removes it'),
});
export type UpdateProcessRequest = z.infer<typeof updateProcessRequestSchema>;
export type UpdateProcessRequestInput = z.input<typeof updateProcessRequestSchema>;

export const deprecateProcessRequestSchema = z.strictObject({
  deprecated: z.boolean({ error: 'deprecated must be true or false' }).default(true).describe('false restores a deprecated profile'),
});
export type DeprecateProcessRequest = z.infer<typeof deprecateProcessRequestSchema>;
