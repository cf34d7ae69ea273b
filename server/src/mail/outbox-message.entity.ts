import { OUTBOX_STATES, type OutboxState } from '@channelwright/shared/schemas';
import { Column, CreateDateColumn, Entity, Index, PrimaryGeneratedColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/**
 * A message the server means to send. Written first (in the transaction of the change it reports),
 * delivered after that transaction commits; the row keeps how delivery went, so a failed delivery
 * is visible and retried, and never undoes the change.
 */
@Entity('outbox_messages')
@Index('IDX_outbox_messages_state_next', ['state', 'nextAttemptAt'])
export class OutboxMessageEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @CreateDateColumn({ type: COLUMN_TYPES.timestamp })
  createdAt: Date;

  /** The one recipient's address, lower-case. */
  @Column({ type: 'varchar', length: 254 })
  recipient: string;

  @Column({ type: 'varchar', length: 300 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text' })
  html: string;

  /** The page of the app the message is about. */
  @Column({ type: 'varchar', length: 2000 })
  link: string;

  @Column({ type: 'simple-enum', enum: OUTBOX_STATES, default: 'queued' })
  state: OutboxState;

  @Column({ type: 'integer', default: 0 })
  attempts: number;

  @Column({ type: 'text', nullable: true })
  lastError: string | null;

  /** When a queued message is next due for an attempt. */
  @Column({ type: COLUMN_TYPES.timestamp })
  nextAttemptAt: Date;

  @Column({ type: COLUMN_TYPES.timestamp, nullable: true })
  sentAt: Date | null;
}
