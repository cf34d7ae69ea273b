import { Column, Entity, ForeignKey, Index, PrimaryGeneratedColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * One entry of the append-only audit trail: who did what to which thing, when, with the state before
 * and after. Rows are only ever inserted: triggers in the migration refuse UPDATE and DELETE. The
 * entity ids are not foreign keys on purpose, so the trail outlives what it describes.
 */
@Entity('audit_events')
@Index('IDX_audit_events_project', ['projectId', 'id'])
export class AuditEventEntity {
  /** Increasing: the order in which things happened. */
  @PrimaryGeneratedColumn()
  id: number;

  @Column({ type: COLUMN_TYPES.timestamp })
  at: Date;

  /** Null for the system itself (the demo seed, a start-up task). */
  @Column({ type: 'varchar', nullable: true })
  @ForeignKey('users', { name: 'FK_audit_events_actor' })
  actorId: string | null;

  /** The project the event belongs to; null for installation-wide things (process profiles). */
  @Column({ type: 'varchar', nullable: true })
  projectId: string | null;

  @Column({ type: 'varchar', length: 40 })
  entityType: string;

  @Column({ type: 'varchar' })
  entityId: string;

  @Column({ type: 'varchar', length: 60 })
  action: string;

  /** JSON text of the state before; null when there was none (a creation). */
  @Column({ type: 'text', nullable: true })
  before: string | null;

  /** JSON text of the state after; null when there is none (a deletion). */
  @Column({ type: 'text', nullable: true })
  after: string | null;

  @Column({ type: 'varchar', length: 500 })
  summary: string;
}
