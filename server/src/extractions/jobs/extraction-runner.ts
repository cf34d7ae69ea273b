import type { CurveFileOptions } from '@channelwright/shared/curve-file';
import type { ExtractionOptions } from '@channelwright/shared/schemas';
import { Injectable, Logger, type OnApplicationBootstrap, type OnModuleDestroy } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { AppConfigService } from '../../config/app-config.service.js';
import { ProcessesService } from '../../processes/processes.service.js';
import { ExtractionEntity } from '../extraction.entity.js';
import { ExtractionJobStore } from './extraction-job-store.js';
import { ExtractionWorkers, type FitProgress, type FitSettings } from './extraction-workers.js';

/** Runs a job may have before a server stop fails it instead of running it again. */
export const MAX_ATTEMPTS = 3;
/** Progress is written to the job's row at most this often, ms. */
const REPORT_INTERVAL_MS = 250;
/** How often a worker looks for jobs that another server (one with JOB_WORKER=false) stored, ms. */
const POLL_INTERVAL_MS = 2000;

type StopReason = 'cancel' | 'shutdown';

/**
 * Runs the queued extractions of this server on its extraction workers, as many at once as there are worker threads.
 * The jobs table is the queue: a new job, a finished one, the start of the server and a poll every two seconds (for
 * jobs another server stored) look for the next. At start, jobs an earlier run of the server left running are queued
 * again (a fit is a pure function of its stored file and options, so running it again is resuming it) or, after
 * MAX_ATTEMPTS, failed. A server with JOB_WORKER=false runs no fits and leaves them to the worker. One worker per
 * database: a second one would need the leases of the characterisation jobs (docs/extraction.md, "Jobs").
 */
@Injectable()
export class ExtractionRunner implements OnApplicationBootstrap, OnModuleDestroy {
  private readonly logger = new Logger('Extraction');
  private readonly running = new Map<string, { controller: AbortController; done: Promise<void> }>();
  private polling: Promise<void> | null = null;
  private again = false;
  private stopped = false;
  private timer: NodeJS.Timeout | null = null;

  constructor(
    @InjectRepository(ExtractionEntity) private readonly rows: Repository<ExtractionEntity>,
    private readonly store: ExtractionJobStore,
    private readonly workers: ExtractionWorkers,
    private readonly processes: ProcessesService,
    private readonly config: AppConfigService,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.jobWorker) return;
    const recovered = await this.store.recoverInterrupted(MAX_ATTEMPTS);
    for (const id of recovered.resumed) this.logger.log(`Extraction ${id}: the server stopped while it ran; running it again`);
    for (const id of recovered.failed) this.logger.warn(`Extraction ${id}: the server stopped too often while it ran; failed`);
    void this.poll();
    this.timer = setInterval(() => void this.poll(), POLL_INTERVAL_MS);
    this.timer.unref();
  }

  /** Stops taking jobs and stops the running ones without ending them: the next start runs them again. */
  async onModuleDestroy(): Promise<void> {
    this.stopped = true;
    if (this.timer) clearInterval(this.timer);
    await this.polling;
    for (const run of this.running.values()) run.controller.abort('shutdown' satisfies StopReason);
    await Promise.all([...this.running.values()].map((run) => run.done));
  }

  /** A job was stored queued: have a worker take it (here, or within a poll in the worker server). */
  enqueue(): Promise<void> {
    return this.config.jobWorker ? this.poll() : Promise.resolve();
  }

  /** Stops a job running here; the run ends its row cancelled. False when it does not run here. */
  async cancel(id: string): Promise<boolean> {
    const run = this.running.get(id);
    if (!run) return false;
    run.controller.abort('cancel' satisfies StopReason);
    await run.done;
    return true;
  }

  /** Resolves once no job runs and none waits (for tests and the bench). */
  async idle(): Promise<void> {
    while (this.running.size > 0 || this.polling) {
      await Promise.all([this.polling, ...[...this.running.values()].map((run) => run.done)]);
    }
  }

  private poll(): Promise<void> {
    if (this.polling) {
      this.again = true;
      return this.polling;
    }
    this.polling = this.claim()
      .catch((error: unknown) => this.logger.error(`Extraction queue: ${error instanceof Error ? error.message : String(error)}`))
      .finally(() => {
        this.polling = null;
        if (this.again && !this.stopped) {
          this.again = false;
          void this.poll();
        }
      });
    return this.polling;
  }

  private async claim(): Promise<void> {
    while (!this.stopped && this.running.size < this.workers.threads) {
      const id = await this.store.claimNext();
      if (id === null) return;
      const controller = new AbortController();
      const done = this.run(id, controller.signal)
        .catch((error: unknown) => this.logger.error(`Extraction ${id}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`))
        .finally(() => {
          this.running.delete(id);
          if (!this.stopped) void this.poll();
        });
      this.running.set(id, { controller, done });
    }
  }

  private async run(id: string, signal: AbortSignal): Promise<void> {
    const job = await this.rows.findOneOrFail({ where: { id }, relations: { upload: true } });
    // Cancelled between its claim and this start (the cancel found no run to stop).
    if (job.cancelRequested) {
      await this.store.end(id, 'running', { status: 'cancelled', code: 'EXTRACTION_CANCELLED', message: 'Cancelled before it started; nothing was kept' });
      return;
    }
    const options = JSON.parse(job.options) as ExtractionOptions;
    const { definition } = await this.processes.resolveVersion(job.processVersionId);
    const settings: FitSettings = {
      polarity: job.polarity,
      base: { tnom: definition.tnom, vdd: definition.vdd, params: definition[job.polarity] },
      model: options.model,
      fixed: options.fixed,
      maxIterations: options.maxIterations,
      ...(options.noiseFloor !== null && { noiseFloor: options.noiseFloor }),
      ...(options.minGmId !== null && { minGmId: options.minGmId }),
    };
    const reports = this.reporter(id);
    try {
      const outcome = await this.workers.fit(job.upload.content.toString('utf8'), JSON.parse(job.upload.readOptions) as CurveFileOptions, settings, reports.progress, signal);
      await reports.flush();
      if ('failed' in outcome) await this.store.end(id, 'running', { status: 'failed', ...outcome.failed });
      else await this.store.finish(id, outcome.result, outcome.curves);
    } catch (error) {
      await reports.flush();
      const reason = signal.aborted ? (signal.reason as StopReason) : null;
      if (reason === 'shutdown') return;
      if (reason === 'cancel') {
        const at = await this.rows.findOneBy({ id });
        await this.store.end(id, 'running', { status: 'cancelled', code: 'EXTRACTION_CANCELLED', message: `Cancelled after ${at?.iterations ?? 0} iterations; nothing was kept` });
        return;
      }
      this.logger.error(`Extraction ${id}: ${error instanceof Error ? (error.stack ?? error.message) : String(error)}`);
      await this.store.end(id, 'running', { status: 'failed', code: 'EXTRACTION_FAILED', message: `The fit stopped unexpectedly (${error instanceof Error ? error.message : String(error)}); nothing was kept` });
    }
  }

  /** Progress of one run, written at most every REPORT_INTERVAL_MS, one write at a time. */
  private reporter(id: string) {
    let latest: FitProgress | null = null;
    let writing: Promise<void> = Promise.resolve();
    let last = 0;
    const write = () => {
      const progress = latest;
      latest = null;
      if (!progress) return writing;
      writing = writing.then(() => this.store.report(id, progress.iterations, progress.maxIterations)).catch((error: unknown) => this.logger.warn(`Extraction ${id}: progress not written (${String(error)})`));
      return writing;
    };
    return {
      progress: (progress: FitProgress) => {
        latest = progress;
        if (Date.now() - last >= REPORT_INTERVAL_MS) {
          last = Date.now();
          void write();
        }
      },
      flush: write,
    };
  }
}
