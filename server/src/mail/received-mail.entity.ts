import { Column, Entity, PrimaryGeneratedColumn } from 'typeorm';
import { COLUMN_TYPES } from '../database/column-types.js';

/** A message the local SMTP sink received (only when SMTP_URL is unset), parsed into its parts. */
@Entity('received_mail')
export class ReceivedMailEntity {
  @PrimaryGeneratedColumn('uuid')
  id: string;

  @Column({ type: COLUMN_TYPES.timestamp })
  receivedAt: Date;

  /** The From header as sent ("Name <address>"). */
  @Column({ type: 'varchar', length: 500 })
  sender: string;

  /** The envelope recipients (RCPT TO), lower-case, as a JSON array of text. */
  @Column({ type: 'simple-json' })
  recipients: string[];

  @Column({ type: 'varchar', length: 1000 })
  subject: string;

  @Column({ type: 'text' })
  text: string;

  @Column({ type: 'text' })
  html: string;

  @Column({ type: 'varchar', length: 500, nullable: true })
  messageId: string | null;
}
