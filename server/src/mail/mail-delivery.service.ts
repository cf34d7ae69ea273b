import { Inject, Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { LessThanOrEqual } from 'typeorm';
import { UnitOfWork } from '../database/unit-of-work.js';
import { MAIL_RETRY_POLICY, retryDelayMs, type MailRetryPolicy } from './mail-retry-policy.js';
import { MailTransportService } from './mail-transport.service.js';
import { OutboxMessageEntity } from './outbox-message.entity.js';

const BATCH = 20;

/** How long a claimed message is left to the process that claimed it before another may try it. */
const CLAIM_MS = 5 * 60_000;

/**
 * Delivers the outbox. `kick()` starts a round; each round reads the due messages through
 * the unit of work, which on SQLite queues behind every transaction already open, so a message written inside
 * a caller's transaction is read only once that transaction has committed (and never if it rolled back).
 * A failure is logged and retried with exponential backoff up to the policy's attempts, then `failed`.
 */
@Injectable()
export class MailDeliveryService implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('MailDelivery');
  private round: Promise<void> | undefined;
  private again = false;
  private timer: NodeJS.Timeout | undefined;
  private stopped = false;

  constructor(
    private readonly unitOfWork: UnitOfWork,
    private readonly transport: MailTransportService,
    @Inject(MAIL_RETRY_POLICY) private readonly policy: MailRetryPolicy,
  ) {}

  /** Messages left queued by an earlier run of the server go out now. */
  onApplicationBootstrap(): void {
    this.kick();
  }

  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    clearTimeout(this.timer);
    await this.round;
  }

  /** Starts a delivery round (or asks the running one to look again when it ends). Never throws. */
  kick(): void {
    if (this.stopped) return;
    if (this.round) {
      this.again = true;
      return;
    }
    this.round = this.deliverDue()
      .catch((error: unknown) => this.logger.error(`Delivery round failed: ${describe(error)}`))
      .finally(() => {
        this.round = undefined;
        if (this.again) {
          this.again = false;
          this.kick();
        }
      });
  }

  /** Resolves when no delivery round is running (for tests and shutdown). */
  async idle(): Promise<void> {
    while (this.round) await this.round;
  }

  private async deliverDue(): Promise<void> {
    for (;;) {
      const due = await this.unitOfWork.run((manager) =>
        manager.getRepository(OutboxMessageEntity).find({
          where: { state: 'queued', nextAttemptAt: LessThanOrEqual(new Date()) },
          order: { nextAttemptAt: 'ASC' },
          take: BATCH,
        }),
      );
      if (due.length === 0) break;
      for (const message of due) {
        if (this.stopped) return;
        await this.attempt(message);
      }
    }
    await this.scheduleNextRetry();
  }

  private async attempt(message: OutboxMessageEntity): Promise<void> {
    // Several server processes may share the outbox (PostgreSQL): a message is first claimed by moving its next
    // attempt past now, on the condition that it is still due, so only one process sends it. A process that dies
    // after claiming leaves it to be tried again when the claim runs out.
    const claimed = await this.unitOfWork.run((manager) =>
      manager
        .getRepository(OutboxMessageEntity)
        .update({ id: message.id, state: 'queued', nextAttemptAt: LessThanOrEqual(new Date()) }, { nextAttemptAt: new Date(Date.now() + CLAIM_MS) }),
    );
    if (claimed.affected !== 1) return;
    const attempts = message.attempts + 1;
    try {
      await this.transport.deliver({ to: message.recipient, subject: message.subject, text: message.text, html: message.html, link: message.link });
      await this.update(message.id, { state: 'sent', attempts, sentAt: new Date(), lastError: null });
    } catch (error) {
      const lastError = describe(error).slice(0, 2000);
      if (attempts >= this.policy.maxAttempts) {
        this.logger.error(`Gave up on mail ${message.id} to ${message.recipient} after ${attempts} attempts: ${lastError}`);
        await this.update(message.id, { state: 'failed', attempts, lastError });
      } else {
        const delay = retryDelayMs(this.policy, attempts);
        this.logger.warn(`Mail ${message.id} to ${message.recipient} failed (attempt ${attempts}), retrying in ${delay} ms: ${lastError}`);
        await this.update(message.id, { attempts, lastError, nextAttemptAt: new Date(Date.now() + delay) });
      }
    }
  }

  private update(id: string, change: Partial<OutboxMessageEntity>): Promise<unknown> {
    return this.unitOfWork.run((manager) => manager.getRepository(OutboxMessageEntity).update({ id }, change));
  }

  /** One timer for the earliest queued retry. */
  private async scheduleNextRetry(): Promise<void> {
    if (this.stopped) return;
    const next = await this.unitOfWork.run((manager) =>
      manager.getRepository(OutboxMessageEntity).findOne({ where: { state: 'queued' }, order: { nextAttemptAt: 'ASC' } }),
    );
    clearTimeout(this.timer);
    if (!next) return;
    this.timer = setTimeout(() => this.kick(), Math.max(0, next.nextAttemptAt.getTime() - Date.now()));
    this.timer.unref();
  }
}

function describe(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
