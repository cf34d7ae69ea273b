import type { ListMailQuery, ListOutboxQuery, OutboxMessage, ReceivedMail } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
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
    if (query.to) builder.andWhere(`EXISTS (SELECT 1 FROM json_each("mail"."recipients") WHERE value LIKE :pattern ESCAPE '\\')`, { pattern: `%${likeEscape(query.to)}%` });
    if (query.exactTo) builder.andWhere(`EXISTS (SELECT 1 FROM json_each("mail"."recipients") WHERE value = :exact)`, { exact: query.exactTo.toLowerCase() });
    const rows = await builder.orderBy('mail.receivedAt', 'DESC').addOrderBy('mail.id').take(query.limit).getMany();
    return rows.map(toReceivedMail);
  }

  async outbox(query: ListOutboxQuery): Promise<OutboxMessage[]> {
    const builder = this.outboxMessages.createQueryBuilder('message');
    if (query.to) builder.andWhere(`"message"."recipient" LIKE :pattern ESCAPE '\\'`, { pattern: `%${likeEscape(query.to)}%` });
    if (query.state) builder.andWhere('message.state = :state', { state: query.state });
    const rows = await builder.orderBy('message.createdAt', 'DESC').addOrderBy('message.id').take(query.limit).getMany();
    return rows.map(toOutboxMessage);
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
