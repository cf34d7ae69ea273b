import { randomUUID } from 'node:crypto';
import { Logger } from '@nestjs/common';
import PgBoss from 'pg-boss';
import type { AppConfigService } from '../../config/app-config.service.js';
import type { CharacterisationJobStore } from './characterisation-job-store.js';
import type { JobHandler, JobQueue, StopReason } from './job-queue.js';

/** The pg-boss queue whose jobs hand out characterisation ids. */
export const CHARACTERISATION_QUEUE = 'characterisation';

/** What a pg-boss job carries: the id of a characterisation row. */
interface HandOut {
  jobId: string;
}

/**
 * How long pg-boss lets a worker hold a hand-out: just under its cap of 24 h. pg-boss 10 has no heartbeat, and at
 * this expiry it fails the hand-out while the run goes on; an expiry as short as the lease would cut every run longer
 * than the lease. The row's lease is what finds a dead server (see the class).
 */
const HAND_OUT_EXPIRY_SECONDS = 23 * 3600;

/**
 * The queue of several server processes sharing one PostgreSQL database (DATABASE_URL), through pg-boss 10. The
 * characterisation row stays the truth (status, progress, owner, heartbeat); pg-boss only hands its id to a worker.
 *
 * - `enqueue` sends a hand-out, one waiting per job (the queue's `short` policy keys it by the job id).
 * - `start` starts pg-boss in every process (the API's enqueue sends through it); with JOB_WORKER it also runs
 *   CHARACTERISATION_CONCURRENCY workers, each fetching one hand-out at a time and holding it while its run lasts.
 *   A worker claims the row (conditional on it being queued, so a run never starts twice) and runs the handler.
 * - A process that dies stops the heartbeat of its runs. Each worker process sweeps every half lease (at most 2 s),
 *   as the embedded queue does: runs silent for the lease are queued again (or failed after
 *   CHARACTERISATION_MAX_ATTEMPTS runs) and handed out again, so another process resumes them. The sweep also hands
 *   out, at start and once a lease, every row that is queued: rows queued before the switch to pg-boss, or whose
 *   send failed.
 * - `cancel` aborts a run of this process; the row's cancel flag stops it in another at its next report.
 * - `stop` stops fetching, aborts the runs here with "shutdown" (their rows stay running, resumed after the lease)
 *   and stops pg-boss once they return, waiting a lease at most.
 */
export class PgBossJobQueue implements JobQueue {
  private readonly logger = new Logger('Characterisation');
  readonly owner = `pg-boss-${randomUUID()}`;
  private readonly boss: PgBoss;
  private readonly running = new Map<string, { controller: AbortController; done: Promise<void> }>();
  private readonly workerIds: string[] = [];
  private opening: Promise<void> | null = null;
  private sweeper: NodeJS.Timeout | null = null;
  private sweeping: Promise<void> | null = null;
  private lastFullHandOut = 0;
  private stopped = false;

  constructor(
    private readonly store: CharacterisationJobStore,
    private readonly config: AppConfigService,
  ) {
    const { databaseUrl } = config;
    if (databaseUrl === undefined) throw new Error('The pg-boss job queue needs DATABASE_URL (a postgres:// URL)');
    // A pool of its own: each worker's fetch, the sends and pg-boss's maintenance take a connection for a moment.
    this.boss = new PgBoss({ connectionString: databaseUrl, application_name: 'channelwright-jobs', max: 4, schedule: false });
    this.boss.on('error', (error) => this.logger.error(`Characterisation queue (pg-boss): ${error.message}`));
  }

  start(handler: JobHandler): void {
    this.opening = this.open(handler);
    this.opening.catch((error: unknown) => this.logger.error(`Characterisation queue (pg-boss) did not start: ${messageOf(error)}`));
  }

  async enqueue(jobId: string): Promise<void> {
    try {
      if (!this.opening) throw new Error('the queue is not started');
      await this.opening;
      await this.handOut(jobId);
    } catch (error) {
      // The row is stored queued: a worker's sweep hands it out within a lease.
      this.logger.warn(`Characterisation ${jobId}: not handed out now (${messageOf(error)}); a worker's sweep will`);
    }
  }

  async cancel(jobId: string): Promise<void> {
    const run = this.running.get(jobId);
    if (!run) return;
    run.controller.abort('cancel' satisfies StopReason);
    await run.done;
  }

  async stop(): Promise<void> {
    if (this.stopped) return;
    this.stopped = true;
    if (this.sweeper) clearInterval(this.sweeper);
    if (!this.opening) return;
    await this.opening.catch(() => undefined);
    await this.sweeping;
    await this.boss.offWork(CHARACTERISATION_QUEUE).catch(() => undefined);
    for (const run of this.running.values()) run.controller.abort('shutdown' satisfies StopReason);
    // Waits for the runs to return (pg-boss then marks their hand-outs done); a run stuck past the lease is left
    // behind as a crash would leave it, and resumed elsewhere.
    await this.boss.stop({ graceful: true, wait: true, timeout: this.config.characterisation.leaseSeconds * 1000 });
  }

  private async open(handler: JobHandler): Promise<void> {
    await this.boss.start();
    await this.boss.createQueue(CHARACTERISATION_QUEUE, { name: CHARACTERISATION_QUEUE, policy: 'short', retryLimit: 0, expireInSeconds: HAND_OUT_EXPIRY_SECONDS });
    if (!this.config.jobWorker || this.stopped) return;
    const { concurrency, leaseSeconds } = this.config.characterisation;
    await this.sweep();
    const pollingIntervalSeconds = Math.max(0.5, Math.min(2, leaseSeconds / 2));
    for (let slot = 0; slot < concurrency; slot++) {
      const id = await this.boss.work<HandOut>(CHARACTERISATION_QUEUE, { batchSize: 1, pollingIntervalSeconds }, async ([job]) => {
        if (job) await this.take(handler, job.data.jobId);
      });
      this.workerIds.push(id);
    }
    this.sweeper = setInterval(() => void this.sweep(), Math.min(2000, (leaseSeconds * 1000) / 2));
    this.sweeper.unref();
  }

  private async handOut(jobId: string): Promise<void> {
    await this.boss.send(CHARACTERISATION_QUEUE, { jobId } satisfies HandOut, { singletonKey: jobId });
    // A worker of this process waiting for its next poll fetches now.
    for (const id of this.workerIds) this.boss.notifyWorker(id);
  }

  /** One worker's hand-out: claims the row and runs it, or lets the hand-out go when the row is not queued. */
  private async take(handler: JobHandler, jobId: string): Promise<void> {
    // Stopping (the row stays queued for the next sweep), or the job runs, ran or ended (a second hand-out).
    if (this.stopped || !(await this.store.claim(jobId, this.owner))) return;
    const controller = new AbortController();
    const done = handler(jobId, this.owner, controller.signal).catch((error: unknown) =>
      this.logger.error(`Characterisation ${jobId}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`),
    );
    this.running.set(jobId, { controller, done });
    try {
      await done;
    } finally {
      this.running.delete(jobId);
    }
  }

  /** Takes over the runs whose server went silent, and hands out what waits; one sweep at a time. */
  private sweep(): Promise<void> {
    if (this.sweeping || this.stopped) return this.sweeping ?? Promise.resolve();
    this.sweeping = this.recover()
      .catch((error: unknown) => this.logger.error(`Characterisation queue: ${messageOf(error)}`))
      .finally(() => {
        this.sweeping = null;
      });
    return this.sweeping;
  }

  private async recover(): Promise<void> {
    const { leaseSeconds, maxAttempts } = this.config.characterisation;
    const recovered = await this.store.recoverAbandoned(leaseSeconds, maxAttempts);
    for (const id of recovered.failed) this.logger.warn(`Characterisation ${id}: its server stopped too often; failed`);
    for (const id of recovered.resumed) {
      this.logger.log(`Characterisation ${id}: its server stopped; resumed`);
      await this.handOut(id);
    }
    if (Date.now() - this.lastFullHandOut < leaseSeconds * 1000) return;
    this.lastFullHandOut = Date.now();
    for (const id of await this.store.queuedIds()) await this.handOut(id);
  }
}

function messageOf(error: unknown): string {
  return error instanceof Error ? error.message : String(error);
}
