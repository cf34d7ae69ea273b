import type { AuditAction, AuditEntityType } from '@channelwright/shared/schemas';

/** One thing that happened, as a service reports it to AuditService.record. */
export interface AuditRecord {
  /** Who did it; null for the system; absent: the signed-in user of the current request (currentActor). */
  actor?: { id: string } | null;
  /** The project it belongs to; null or absent for installation-wide things. */
  projectId?: string | null;
  entityType: AuditEntityType;
  entityId: string;
  action: AuditAction;
  /** The state before and after, as plain JSON (absent when there is none, e.g. before a creation). */
  before?: unknown;
  after?: unknown;
  /** One sentence for people: "Requested a review of r2 from Brackenfold Reviewer". */
  summary: string;
}
