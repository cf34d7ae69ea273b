import { Injectable } from '@nestjs/common';
import type { EntityManager } from 'typeorm';
import { AppConfigService } from '../config/app-config.service.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { composeMail, type MailNotice } from './compose-mail.js';
import { MailDeliveryService } from './mail-delivery.service.js';
import type { MailMessage } from './mail-message.js';
import { OutboxMessageEntity } from './outbox-message.entity.js';

/**
 * Sending mail, for every feature: `send` writes the message to the outbox (inside the caller's
 * transaction when given its manager, so a decision and its mail are committed together) and the
 * delivery worker sends it after commit. A failed delivery never undoes what the mail reports.
 */
@Injectable()
export class MailService {
  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly config: AppConfigService,
    private readonly delivery: MailDeliveryService,
  ) {}

  async send(message: MailMessage, manager?: EntityManager): Promise<OutboxMessageEntity> {
    const write = (m: EntityManager) =>
      m.getRepository(OutboxMessageEntity).save(
        m.getRepository(OutboxMessageEntity).create({
          recipient: message.to.trim().toLowerCase(),
          subject: message.subject.slice(0, 300),
          text: message.text,
          html: message.html,
          link: message.link,
          state: 'queued',
          attempts: 0,
          nextAttemptAt: new Date(),
        }),
      );
    const stored = manager ? await write(manager) : await this.unitOfWork.run(write);
    // Delivery reads the outbox on a connection of its own: it starts once the message is committed.
    this.unitOfWork.afterCommit(manager, () => this.delivery.kick());
    return stored;
  }

  /** `send` of a notice composed into text and HTML with its link on APP_URL. */
  notify(notice: MailNotice, manager?: EntityManager): Promise<OutboxMessageEntity> {
    return this.send(composeMail(notice, this.config.appUrl), manager);
  }
}
