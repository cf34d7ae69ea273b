import { z } from 'zod';
import { modelSchema } from './request-fields.js';
import { userRefSchema } from './process-profile.js';
import { deviceComputeErrorSchema, deviceResultSchema } from './device.js';
import { deviceTargetsSchema } from './device-targets.js';

/**
 * Revisions: immutable, numbered snapshots of a sheet (r1, r2 …) with a content hash, as
 * POST /api/sheets/:id/revisions freezes them and /api/revisions/* shows, verifies and compares them.
 * A revision never changes; its review state comes from its review requests (see reviews.ts).
 */

/** draft: frozen, not (or no longer) in review; in-review: a request is open; signed-off: approved (final). */
export const REVISION_STATES = ['draft', 'in-review', 'changes-requested', 'signed-off'] as const;
export const revisionStateSchema = z.enum(REVISION_STATES);
export type RevisionState = z.infer<typeof revisionStateSchema>;

export const REVISION_HASH_ALGORITHM = 'sha-256';

export const createRevisionRequestSchema = z.strictObject({
  message: z
    .string({ error: 'message must be text' })
    .trim()
    .min(1, 'message must not be empty: say what this revision is')
    .max(500, 'message must have at most 500 characters'),
});
export type CreateRevisionRequest = z.infer<typeof createRevisionRequestSchema>;

export const revisionDiffQuerySchema = z.object({
  against: z.string().trim().min(1, 'against must be a revision id').max(200).optional().describe('The revision to compare with; the last signed-off one of the sheet when absent'),
});
export type RevisionDiffQuery = z.infer<typeof revisionDiffQuerySchema>;

/** The sheet's own fields as they were frozen. */
export const revisionSheetSchema = z.object({
  id: z.string(),
  projectId: z.string(),
  name: z.string(),
  description: z.string(),
  temperature: z.number().nullable(),
  corner: z.string(),
  model: modelSchema,
});
export type RevisionSheet = z.infer<typeof revisionSheetSchema>;

export const revisionProcessSchema = z.object({
  profileId: z.string(),
  name: z.string(),
  versionId: z.string(),
  version: z.number().int(),
});
export type RevisionProcess = z.infer<typeof revisionProcessSchema>;

/** One device as frozen: `id` is the sheet device's id, the same in every revision of the sheet. */
export const revisionDeviceSchema = z.object({
  id: z.string(),
  position: z.number().int(),
  name: z.string(),
  targets: deviceTargetsSchema,
  result: deviceResultSchema.nullable(),
  error: deviceComputeErrorSchema.nullable(),
  engineVersion: z.string(),
  processVersionId: z.string(),
  computedAt: z.string(),
});
export type RevisionDevice = z.infer<typeof revisionDeviceSchema>;

/** The sign-off of a revision: who approved it, when, and the hash they approved. */
export const signOffSchema = z.object({
  reviewRequestId: z.string(),
  by: userRefSchema.nullable(),
  at: z.string(),
  hash: z.string(),
});
export type SignOff = z.infer<typeof signOffSchema>;

export const revisionSummarySchema = z.object({
  id: z.string(),
  sheetId: z.string(),
  projectId: z.string(),
  number: z.number().int(),
  label: z.string().describe('"r1", "r2" …'),
  message: z.string(),
  author: userRefSchema.nullable(),
  createdAt: z.string(),
  process: revisionProcessSchema,
  engineVersion: z.string(),
  deviceCount: z.number().int(),
  hash: z.string().describe('SHA-256 (hex) of the canonical JSON of the revision'),
  state: revisionStateSchema,
  signOff: signOffSchema.nullable(),
});
export type RevisionSummary = z.infer<typeof revisionSummarySchema>;

export const revisionSchema = revisionSummarySchema.extend({
  sheet: revisionSheetSchema,
  devices: z.array(revisionDeviceSchema),
});
export type Revision = z.infer<typeof revisionSchema>;

export const revisionListSchema = z.array(revisionSummarySchema).describe('Newest first');

/**
 * One sign-off checked: the hash the reviewer approved, as the decision stored it and as the audit trail
 * recorded it when they signed; `matches` when both equal the hash recomputed from the stored rows.
 */
export const signatureCheckSchema = z.object({
  reviewRequestId: z.string(),
  signedHash: z.string().nullable(),
  auditedHash: z.string().nullable().describe('The hash in the audit row written with the decision; null when the trail holds none'),
  matches: z.boolean(),
});
export type SignatureCheck = z.infer<typeof signatureCheckSchema>;

/**
 * A revision verified: the hash recomputed from the stored rows against the stored hash and against every
 * sign-off's hash (decision and audit trail), so rows rewritten together with a re-computed stored hash are
 * still caught. `valid` only when all agree.
 */
export const revisionVerificationSchema = z.object({
  valid: z.boolean(),
  algorithm: z.literal(REVISION_HASH_ALGORITHM),
  storedHash: z.string(),
  computedHash: z.string(),
  signatures: z.array(signatureCheckSchema),
  problems: z.array(z.string()).describe('Each disagreement in words; empty when valid'),
});
export type RevisionVerification = z.infer<typeof revisionVerificationSchema>;

/** One value that differs: `path` like "targets.l" or "result.w", from → to (absent: null). */
export const valueChangeSchema = z.object({
  path: z.string(),
  from: z.unknown(),
  to: z.unknown(),
});
export type ValueChange = z.infer<typeof valueChangeSchema>;

export const deviceRefSchema = z.object({ id: z.string(), name: z.string() });

export const revisionDiffSchema = z.object({
  revisionId: z.string(),
  againstId: z.string().nullable().describe('null when the sheet has no signed-off revision to compare with'),
  againstLabel: z.string().nullable(),
  added: z.array(deviceRefSchema),
  removed: z.array(deviceRefSchema),
  changed: z.array(deviceRefSchema.extend({ changes: z.array(valueChangeSchema) })),
  sheetChanges: z.array(valueChangeSchema).describe('Changes of the sheet fields, process version and engine version'),
});
export type RevisionDiff = z.infer<typeof revisionDiffSchema>;
