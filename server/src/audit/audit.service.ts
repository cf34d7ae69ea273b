import { auditRangeEnd, auditRangeStart, type AuditEvent, type AuditQuery } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import { Brackets, type DataSource, type EntityManager } from 'typeorm';
import { AuditEventEntity } from './audit-event.entity.js';
import type { AuditRecord } from './audit-record.js';
import { recordAudit } from './record-audit.js';

/**
 * The append-only audit trail. `record` writes on the manager of the caller's transaction, so an
 * event is stored exactly when the change it describes is; nothing ever updates or deletes a row
 * (the database refuses it too).
 */
@Injectable()
export class AuditService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  record(manager: EntityManager, event: AuditRecord): Promise<void> {
    return recordAudit(manager, event);
  }

  /** A project's events, newest first, filtered. */
  async listForProject(projectId: string, query: Omit<AuditQuery, 'format'>): Promise<AuditEvent[]> {
    const builder = this.dataSource
      .getRepository(AuditEventEntity)
      .createQueryBuilder('event')
      .leftJoinAndSelect('event.actor', 'actor')
      .where(
        new Brackets((where) =>
          where
            .where('event.projectId = :projectId')
            // Installation-wide process-version events count for every project with a sheet on that profile.
            .orWhere(`event.entityType = 'process-profile' AND event.entityId IN (SELECT "version"."profileId" FROM "sheets" "sheet" INNER JOIN "process_versions" "version" ON "version"."id" = "sheet"."processVersionId" WHERE "sheet"."projectId" = :projectId)`),
        ),
      )
      .setParameter('projectId', projectId);
    if (query.action) builder.andWhere('event.action = :action', { action: query.action });
    if (query.entityType) builder.andWhere('event.entityType = :entityType', { entityType: query.entityType });
    if (query.actor) builder.andWhere('(event.actorId = :actor OR actor.email = :actorEmail)', { actor: query.actor, actorEmail: query.actor.toLowerCase() });
    if (query.from) builder.andWhere('event.at >= :from', { from: auditRangeStart(query.from) });
    if (query.to) builder.andWhere('event.at <= :to', { to: auditRangeEnd(query.to) });
    const rows = await builder.orderBy('event.id', 'DESC').take(query.limit).getMany();
    return rows.map(toAuditEvent);
  }
}

export function toAuditEvent(row: AuditEventEntity): AuditEvent {
  return {
    id: row.id,
    at: row.at.toISOString(),
    actor: row.actor ? { id: row.actor.id, displayName: row.actor.displayName, email: row.actor.email } : null,
    projectId: row.projectId,
    entityType: row.entityType,
    entityId: row.entityId,
    action: row.action,
    before: row.before === null ? null : JSON.parse(row.before),
    after: row.after === null ? null : JSON.parse(row.after),
    summary: row.summary,
  };
}
