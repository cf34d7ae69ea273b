import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import nodemailer, { type Transporter } from 'nodemailer';
import { AppConfigService } from '../config/app-config.service.js';
import type { MailMessage } from './mail-message.js';
import { MailSinkService } from './mail-sink.service.js';

const TIMEOUTS = { connectionTimeout: 10_000, greetingTimeout: 10_000, socketTimeout: 30_000 };

/** nodemailer over SMTP: to SMTP_URL when set, otherwise to the local sink. Created on first use. */
@Injectable()
export class MailTransportService implements OnModuleDestroy {
  private transporter: Transporter | undefined;

  constructor(
    private readonly config: AppConfigService,
    private readonly sink: MailSinkService,
  ) {}

  /** Our sender address, on the host of APP_URL. */
  get from(): string {
    return `Channelwright <no-reply@${new URL(this.config.appUrl).hostname}>`;
  }

  /** Hands one message to the SMTP server; rejects when the server cannot be reached or refuses it. */
  async deliver(message: MailMessage): Promise<void> {
    await this.transport().sendMail({ from: this.from, to: message.to, subject: message.subject, text: message.text, html: message.html });
  }

  onModuleDestroy(): void {
    this.transporter?.close();
    this.transporter = undefined;
  }

  private transport(): Transporter {
    this.transporter ??= this.config.smtpUrl
      ? nodemailer.createTransport({ url: this.config.smtpUrl, ...TIMEOUTS })
      : nodemailer.createTransport({ host: this.sink.host, port: this.sink.port, secure: false, ignoreTLS: true, ...TIMEOUTS });
    return this.transporter;
  }
}
