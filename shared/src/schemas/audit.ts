import { z } from 'zod';
import { userRefSchema } from './process-profile.js';

/**
 * The append-only audit trail: who did what to which thing, when, with the state before and after.
 * GET /api/projects/:id/audit lists a project's events, newest first (JSON, or CSV with ?format=csv).
 */

/** The kinds of things events are about. */
export const AUDIT_ENTITY_TYPES = ['project', 'member', 'sheet', 'device', 'revision', 'review-request', 'comment', 'process-profile'] as const;
export type AuditEntityType = (typeof AUDIT_ENTITY_TYPES)[number];

/** Every action the product records, as `<thing>.<what happened>`. */
export const AUDIT_ACTIONS = [
  'project.created',
  'project.updated',
  'member.added',
  'member.role-changed',
  'member.removed',
  'sheet.created',
  'sheet.updated',
  'sheet.deleted',
  'sheet.recomputed',
  'sheet.imported',
  'sheet.migrated',
  'device.created',
  'device.updated',
  'device.deleted',
  'revision.created',
  'review.requested',
  'review.withdrawn',
  'review.approved',
  'review.changes-requested',
  'comment.added',
  'process.version-created',
  'extraction.saved',
] as const;
export type AuditAction = (typeof AUDIT_ACTIONS)[number];

export const AUDIT_EXPORT_FORMATS = ['json', 'csv'] as const;

/** The greatest number of events one request returns. */
export const AUDIT_MAX_LIMIT = 5000;

/** A calendar day (the whole day) or an instant with its offset. */
const dateOrInstant = (field: string) =>
  z.union([z.iso.date(), z.iso.datetime({ offset: true })], { error: `${field} must be a date (2026-03-01) or a date and time (2026-03-01T12:00:00Z)` });

export const auditQuerySchema = z
  .object({
    action: z.string().trim().min(1).max(60, 'action must have at most 60 characters').optional().describe('Only this action, e.g. review.approved'),
    entityType: z.enum(AUDIT_ENTITY_TYPES, { error: `entityType must be one of ${AUDIT_ENTITY_TYPES.join(', ')}` }).optional(),
    actor: z.string().trim().min(1).max(254, 'actor must have at most 254 characters').optional().describe("The actor's user id or e-mail"),
    from: dateOrInstant('from').optional().describe('Events at or after this day or instant'),
    to: dateOrInstant('to').optional().describe('Events up to the end of this day, or up to this instant'),
    format: z.enum(AUDIT_EXPORT_FORMATS, { error: 'format must be json or csv' }).default('json'),
    limit: z.coerce
      .number({ error: 'limit must be a whole number' })
      .int('limit must be a whole number')
      .min(1, 'limit must be at least 1')
      .max(AUDIT_MAX_LIMIT, `limit must be at most ${AUDIT_MAX_LIMIT}`)
      .default(500),
  })
  .refine((q) => q.from === undefined || q.to === undefined || auditRangeStart(q.from) <= auditRangeEnd(q.to), {
    message: 'to must not be before from',
    path: ['to'],
  });
export type AuditQuery = z.infer<typeof auditQuerySchema>;

/** The first instant a `from` filter lets through. */
export function auditRangeStart(from: string): Date {
  return new Date(/^\d{4}-\d{2}-\d{2}$/.test(from) ? `${from}T00:00:00.000Z` : from);
}

/** The last instant a `to` filter lets through: a bare day counts whole (UTC). */
export function auditRangeEnd(to: string): Date {
  return new Date(/^\d{4}-\d{2}-\d{2}$/.test(to) ? `${to}T23:59:59.999Z` : to);
}

export const auditEventSchema = z.object({
  id: z.number().int(),
  at: z.string(),
  /** Null for the system itself. */
  actor: userRefSchema.extend({ email: z.string() }).nullable(),
  projectId: z.string().nullable(),
  entityType: z.string(),
  entityId: z.string(),
  action: z.string(),
  before: z.unknown().nullable(),
  after: z.unknown().nullable(),
  summary: z.string(),
});
export type AuditEvent = z.infer<typeof auditEventSchema>;

/** The columns of the CSV export, in order. */
export const AUDIT_CSV_COLUMNS = ['id', 'at', 'actor', 'actorEmail', 'action', 'entityType', 'entityId', 'summary', 'before', 'after'] as const;
