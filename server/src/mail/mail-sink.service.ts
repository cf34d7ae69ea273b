import type { AddressInfo } from 'node:net';
import type { Readable } from 'node:stream';
import { Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import PostalMime from 'postal-mime';
import { SMTPServer, type SMTPServerDataStream, type SMTPServerSession } from 'smtp-server';
import { AppConfigService } from '../config/app-config.service.js';
import { UnitOfWork } from '../database/unit-of-work.js';
import { formatAddress } from './format-address.js';
import { ReceivedMailEntity } from './received-mail.entity.js';

const SINK_HOST = '127.0.0.1';
const MAX_MESSAGE_BYTES = 10 * 1024 * 1024;

/**
 * The local mail sink: when SMTP_URL is unset the server listens for SMTP itself on 127.0.0.1 (a free
 * port chosen at start) and stores every message it receives, parsed, in `received_mail`. The outbox
 * delivers to it over real SMTP, so development and tests exercise the same path as production.
 */
@Injectable()
export class MailSinkService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('MailSink');
  private server: SMTPServer | undefined;
  private listeningPort: number | undefined;

  constructor(
    private readonly config: AppConfigService,
    private readonly unitOfWork: UnitOfWork,
  ) {}

  /** Whether this server runs its own sink (SMTP_URL unset). */
  get enabled(): boolean {
    return this.config.smtpUrl === undefined;
  }

  /** The port the sink listens on; throws before start-up or when the sink is off. */
  get port(): number {
    if (this.listeningPort === undefined) throw new Error('The local mail sink is not listening');
    return this.listeningPort;
  }

  get host(): string {
    return SINK_HOST;
  }

  async onModuleInit(): Promise<void> {
    if (!this.enabled) return;
    const server = new SMTPServer({
      authOptional: true,
      disabledCommands: ['AUTH', 'STARTTLS'],
      banner: 'Channelwright local mail sink',
      size: MAX_MESSAGE_BYTES,
      rejectOversized: true,
      logger: false,
      closeTimeout: 1000,
      onData: (stream, session, callback) => {
        this.receive(stream, session).then(
          () => callback(),
          (error: unknown) => {
            this.logger.error(`Could not store a received message: ${error instanceof Error ? error.message : String(error)}`);
            callback(Object.assign(new Error('The sink could not store the message'), { responseCode: 451 }));
          },
        );
      },
    });
    server.on('error', (error) => this.logger.error(`Mail sink error: ${error.message}`));
    await new Promise<void>((resolve, reject) => {
      server.server.once('error', reject);
      server.listen(0, SINK_HOST, () => {
        server.server.off('error', reject);
        resolve();
      });
    });
    this.server = server;
    this.listeningPort = (server.server.address() as AddressInfo).port;
    this.logger.log(`No SMTP_URL: mail goes to the local sink on ${SINK_HOST}:${this.listeningPort} (admins read it at /admin/mail)`);
  }

  async onModuleDestroy(): Promise<void> {
    const server = this.server;
    this.server = undefined;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private async receive(stream: SMTPServerDataStream, session: SMTPServerSession): Promise<void> {
    const raw = await readAll(stream);
    if (stream.sizeExceeded) return; // rejectOversized answers 552 whatever we say
    const parsed = await PostalMime.parse(raw);
    const envelopeFrom = session.envelope.mailFrom ? session.envelope.mailFrom.address : '';
    await this.unitOfWork.run((manager) =>
      manager.getRepository(ReceivedMailEntity).insert({
        receivedAt: new Date(),
        sender: (parsed.from ? formatAddress(parsed.from) : envelopeFrom).slice(0, 500),
        recipients: session.envelope.rcptTo.map((address) => address.address.toLowerCase()),
        subject: (parsed.subject ?? '').slice(0, 1000),
        text: parsed.text ?? '',
        html: parsed.html ?? '',
        messageId: parsed.messageId?.slice(0, 500) ?? null,
      }),
    );
  }
}

async function readAll(stream: Readable): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream) chunks.push(chunk as Buffer);
  return Buffer.concat(chunks);
}
