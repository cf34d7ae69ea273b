import type { ListMailQuery, ListOutboxQuery, OutboxMessage, ReceivedMail } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { engineOf } from '../database/database-engine.js';
import { OutboxMessageEntity } from './outbox-message.entity.js';
import { ReceivedMailEntity } from './received-mail.entity.js';

/** Reading mail back: what the local sink received, and the outbox with its delivery states. Newest first. */
@Injectable()
export class MailboxService {
  constructor(
    @InjectRepository(ReceivedMailEntity) private readonly receivedMail: Repository<ReceivedMailEntity>,
    @InjectRepository(OutboxMessageEntity) private readonly outboxMessages: Repository<OutboxMessageEntity>,
  ) {}

  /** Received messages; `to` matches part of an envelope recipient, `exactTo` the whole address. */
  async received(query: ListMailQuery & { exactTo?: string }): Promise<ReceivedMail[]> {
    const builder = this.receivedMail.createQueryBuilder('mail');
    const { like, recipients } = this.dialect();
    if (query.to) builder.andWhere(`EXISTS (SELECT 1 FROM ${recipients} WHERE value ${like} :pattern ESCAPE '\\')`, { pattern: `%${likeEscape(query.to)}%` });
    if (query.exactTo) builder.andWhere(`EXISTS (SELECT 1 FROM ${recipients} WHERE value = :exact)`, { exact: query.exactTo.toLowerCase() });
    const rows = await builder.orderBy('mail.receivedAt', 'DESC').addOrderBy('mail.id').take(query.limit).getMany();
    return rows.map(toReceivedMail);
  }

  async outbox(query: ListOutboxQuery): Promise<OutboxMessage[]> {
    const builder = this.outboxMessages.createQueryBuilder('message');
    if (query.to) builder.andWhere(`"message"."recipient" ${this.dialect().like} :pattern ESCAPE '\\'`, { pattern: `%${likeEscape(query.to)}%` });
    if (query.state) builder.andWhere('message.state = :state', { state: query.state });
    const rows = await builder.orderBy('message.createdAt', 'DESC').addOrderBy('message.id').take(query.limit).getMany();
    return rows.map(toOutboxMessage);
  }

  /**
   * SQLite's LIKE ignores the case of (ASCII) letters, PostgreSQL's ILIKE does; the recipients (a JSON list in text) are
   * read one per row by json_each or json_array_elements_text, each row's `value`.
   */
  private dialect(): { like: string; recipients: string } {
    return engineOf(this.receivedMail.manager) === 'postgres'
      ? { like: 'ILIKE', recipients: `json_array_elements_text("mail"."recipients"::json)` }
      : { like: 'LIKE', recipients: `json_each("mail"."recipients")` };
  }
}

function likeEscape(text: string): string {
  return text.replace(/[\\%_]/g, (character) => `\\${character}`);
}

function toReceivedMail(row: ReceivedMailEntity): ReceivedMail {
  return {
    id: row.id,
    receivedAt: row.receivedAt.toISOString(),
    from: row.sender,
    to: row.recipients,
    subject: row.subject,
    text: row.text,
    html: row.html,
    messageId: row.messageId,
  };
}

function toOutboxMessage(row: OutboxMessageEntity): OutboxMessage {
  return {
    id: row.id,
    createdAt: row.createdAt.toISOString(),
    to: row.recipient,
    subject: row.subject,
    link: row.link,
    state: row.state,
    attempts: row.attempts,
    lastError: row.lastError,
    sentAt: row.sentAt?.toISOString() ?? null,
  };
}
