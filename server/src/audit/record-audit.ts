import type { EntityManager } from 'typeorm';
import { currentActor } from './audit-actor.js';
import { AuditEventEntity } from './audit-event.entity.js';
import type { AuditRecord } from './audit-record.js';

/**
 * Appends one event on the manager of the caller's transaction, so it is stored exactly when the
 * change it describes is. For code outside Nest's injection (plain write functions); services use
 * AuditService.record, which is this.
 */
export async function recordAudit(manager: EntityManager, event: AuditRecord): Promise<void> {
  await manager.getRepository(AuditEventEntity).insert({
    at: new Date(),
    actorId: (event.actor === undefined ? currentActor() : event.actor)?.id ?? null,
    projectId: event.projectId ?? null,
    entityType: event.entityType,
    entityId: event.entityId,
    action: event.action,
    before: event.before === undefined ? null : JSON.stringify(event.before),
    after: event.after === undefined ? null : JSON.stringify(event.after),
    summary: event.summary.slice(0, 500),
  });
}
