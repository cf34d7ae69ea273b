import { randomUUID } from 'node:crypto';
import { Injectable, Logger } from '@nestjs/common';
import { AppConfigService } from '../../config/app-config.service.js';
import { CharacterisationJobStore } from './characterisation-job-store.js';
import type { JobHandler, JobQueue, StopReason } from './job-queue.js';

/**
 * The queue of a single server: the jobs table is the queue. A poll (and every enqueue) first takes over the running
 * jobs whose server went silent for the lease (resumed, or failed after too many runs), then claims queued jobs up to
 * CHARACTERISATION_CONCURRENCY. A second server on the same data directory shares the work safely: claims and reports
 * are conditional on the owner. With JOB_WORKER=false this server takes no jobs: another one on the data directory runs them.
 */
@Injectable()
export class EmbeddedJobQueue implements JobQueue {
  private readonly logger = new Logger('Characterisation');
  readonly owner = `embedded-${randomUUID()}`;
  private readonly running = new Map<string, { controller: AbortController; done: Promise<void> }>();
  private handler: JobHandler | null = null;
  private timer: NodeJS.Timeout | null = null;
  private ticking: Promise<void> | null = null;
  private again = false;
  private stopped = false;

  constructor(
    private readonly store: CharacterisationJobStore,
    private readonly config: AppConfigService,
  ) {}

  start(handler: JobHandler): void {
    if (!this.config.jobWorker) return;
    this.handler = handler;
    const { leaseSeconds } = this.config.characterisation;
    this.timer = setInterval(() => void this.poll(), Math.min(2000, (leaseSeconds * 1000) / 2));
    this.timer.unref();
    void this.poll();
  }

  async enqueue(): Promise<void> {
    await this.poll();
  }

  async cancel(jobId: string): Promise<void> {
    const run = this.running.get(jobId);
    if (!run) return;
    run.controller.abort('cancel' satisfies StopReason);
    await run.done;
  }

  async stop(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.ticking;
    for (const run of this.running.values()) run.controller.abort('shutdown' satisfies StopReason);
    await Promise.all([...this.running.values()].map((run) => run.done));
  }

  /** One look at the table; a poll asked for while one runs runs again after it. */
  private poll(): Promise<void> {
    if (this.ticking) {
      this.again = true;
      return this.ticking;
    }
    this.ticking = this.tick()
      .catch((error: unknown) => this.logger.error(`Characterisation queue: ${error instanceof Error ? error.message : String(error)}`))
      .finally(() => {
        this.ticking = null;
        if (this.again && !this.stopped) {
          this.again = false;
          void this.poll();
        }
      });
    return this.ticking;
  }

  private async tick(): Promise<void> {
    if (this.stopped || !this.handler) return;
    const { leaseSeconds, maxAttempts, concurrency } = this.config.characterisation;
    const recovered = await this.store.recoverAbandoned(leaseSeconds, maxAttempts);
    for (const id of recovered.resumed) this.logger.log(`Characterisation ${id}: its server stopped; resumed`);
    for (const id of recovered.failed) this.logger.warn(`Characterisation ${id}: its server stopped too often; failed`);
    while (!this.stopped && this.running.size < concurrency) {
      const id = await this.store.claimNext(this.owner);
      if (id === null) return;
      this.run(this.handler, id);
    }
  }

  private run(handler: JobHandler, id: string): void {
    const controller = new AbortController();
    const done = handler(id, this.owner, controller.signal)
      .catch((error: unknown) => this.logger.error(`Characterisation ${id}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`))
      .finally(() => {
        this.running.delete(id);
        if (!this.stopped) void this.poll();
      });
    this.running.set(id, { controller, done });
  }
}
