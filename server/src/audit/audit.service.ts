import { auditRangeEnd, auditRangeStart, type AuditAction, type AuditEvent, type AuditQuery } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, In, type EntityManager, type Repository } from 'typeorm';
import { UsersService, type UserCard } from '../users/users.service.js';
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
  constructor(
    @InjectRepository(AuditEventEntity) private readonly events: Repository<AuditEventEntity>,
    private readonly users: UsersService,
  ) {}

  record(manager: EntityManager, event: AuditRecord): Promise<void> {
    return recordAudit(manager, event);
  }

  /** What was recorded `after` an action on each of these entities (oldest first), for checks that trust the trail over the tables. */
  async recordedAfter(action: AuditAction, entityIds: readonly string[], manager: EntityManager = this.events.manager): Promise<Array<{ entityId: string; after: unknown }>> {
    if (entityIds.length === 0) return [];
    const rows = await manager.getRepository(AuditEventEntity).find({ where: { action, entityId: In([...entityIds]) }, order: { id: 'ASC' } });
    return rows.map((row) => ({ entityId: row.entityId, after: row.after === null ? null : JSON.parse(row.after) }));
  }

  /**
   * A project's events, newest first, filtered; with them the installation-wide events of the process
   * profiles `profileIds` (the profiles the project's sheets are on, which the caller knows).
   */
  async listForProject(projectId: string, profileIds: readonly string[], query: Omit<AuditQuery, 'format'>): Promise<AuditEvent[]> {
    const builder = this.events.createQueryBuilder('event').where(
      new Brackets((where) => {
        where.where('event.projectId = :projectId', { projectId });
        if (profileIds.length > 0) where.orWhere(`event.entityType = 'process-profile' AND event.entityId IN (:...profileIds)`, { profileIds });
      }),
    );
    if (query.action) builder.andWhere('event.action = :action', { action: query.action });
    if (query.entityType) builder.andWhere('event.entityType = :entityType', { entityType: query.entityType });
    if (query.actor) {
      const byEmail = await this.users.findByEmail(query.actor);
      builder.andWhere('event.actorId IN (:...actors)', { actors: [query.actor, ...(byEmail ? [byEmail.id] : [])] });
    }
    if (query.from) builder.andWhere('event.at >= :from', { from: auditRangeStart(query.from) });
    if (query.to) builder.andWhere('event.at <= :to', { to: auditRangeEnd(query.to) });
    const rows = await builder.orderBy('event.id', 'DESC').take(query.limit).getMany();
    const actors = await this.users.cards(rows.map((row) => row.actorId));
    return rows.map((row) => toAuditEvent(row, row.actorId === null ? undefined : actors.get(row.actorId)));
  }
}

export function toAuditEvent(row: AuditEventEntity, actor: UserCard | undefined): AuditEvent {
  return {
    id: row.id,
    at: row.at.toISOString(),
    actor: actor ? { id: actor.id, displayName: actor.displayName, email: actor.email } : null,
    projectId: row.projectId,
    entityType: row.entityType,
    entityId: row.entityId,
    action: row.action,
    before: row.before === null ? null : JSON.parse(row.before),
    after: row.after === null ? null : JSON.parse(row.after),
    summary: row.summary,
  };
}
