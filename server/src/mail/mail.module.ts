import { Module } from '@nestjs/common';
import { TypeOrmModule } from '@nestjs/typeorm';
import { AdminMailController } from './admin-mail.controller.js';
import { MailDeliveryService } from './mail-delivery.service.js';
import { DEFAULT_MAIL_RETRY_POLICY, MAIL_RETRY_POLICY } from './mail-retry-policy.js';
import { MailSinkService } from './mail-sink.service.js';
import { MailTransportService } from './mail-transport.service.js';
import { MailService } from './mail.service.js';
import { MailboxService } from './mailbox.service.js';
import { MyMailController } from './my-mail.controller.js';
import { OutboxMessageEntity } from './outbox-message.entity.js';
import { ReceivedMailEntity } from './received-mail.entity.js';

/** Outgoing mail (outbox + nodemailer over SMTP) and the local SMTP sink. Exports MailService only. */
@Module({
  imports: [TypeOrmModule.forFeature([OutboxMessageEntity, ReceivedMailEntity])],
  controllers: [AdminMailController, MyMailController],
  providers: [
    MailService,
    MailDeliveryService,
    MailTransportService,
    MailSinkService,
    MailboxService,
    { provide: MAIL_RETRY_POLICY, useValue: DEFAULT_MAIL_RETRY_POLICY },
  ],
  exports: [MailService],
})
export class MailModule {}
