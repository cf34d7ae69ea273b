import { auditRangeEnd, auditRangeStart, type AuditEvent, type AuditQuery } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectDataSource } from '@nestjs/typeorm';
import type { DataSource, EntityManager } from 'typeorm';
import { currentActor } from './audit-actor.js';
import { AuditEventEntity } from './audit-event.entity.js';
import type { AuditRecord } from './audit-record.js';

/**
 * The append-only audit trail. `record` writes on the manager of the caller's transaction, so an
 * event is stored exactly when the change it describes is; nothing ever updates or deletes a row
 * (the database refuses it too).
 */
@Injectable()
export class AuditService {
  constructor(@InjectDataSource() private readonly dataSource: DataSource) {}

  async record(manager: EntityManager, event: AuditRecord): Promise<void> {
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

  /** A project's events, newest first, filtered. */
  async listForProject(projectId: string, query: Omit<AuditQuery, 'format'>): Promise<AuditEvent[]> {
    const builder = this.dataSource
      .getRepository(AuditEventEntity)
      .createQueryBuilder('event')
      .leftJoinAndSelect('event.actor', 'actor')
      .where('event.projectId = :projectId', { projectId });
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
