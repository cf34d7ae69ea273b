import { cornerMatrixRows, sheetLeakage, type CornersCall, type LeakageDevice, type MatrixDevice, type MatrixRowCells } from '@channelwright/shared/device';
import type { LeakageBudget, MatrixColumn, Process, SheetLeakage } from '@channelwright/shared/schemas';
import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { Piscina } from 'piscina';

/** Up to this many operating points an analysis runs on the server's thread (a few milliseconds); more go to the workers. */
export const INLINE_POINTS = 300;

export interface MatrixJob {
  process: Process;
  processId: string;
  devices: MatrixDevice[];
  bias: 'current' | 'voltage';
  columns: MatrixColumn[];
  /** The engine call with the devices' stored tables bound (table model); such a job runs inline, as a function cannot go to a worker. */
  corners?: CornersCall;
}

export interface LeakageJob {
  process: Process;
  processId: string;
  devices: LeakageDevice[];
  budget: LeakageBudget | null;
  engineVersion: string;
  /** As MatrixJob.corners. */
  corners?: CornersCall;
}

/** About this many operating points per device of a leakage budget (the temperatures at the fast corner, every corner at the budget's). */
const LEAKAGE_POINTS_PER_DEVICE = 25;

/**
 * The worker file, kept beside this module's source: tsc does not copy .mjs files, so the built server (dist/)
 * finds it in src/ unless a build step put a copy beside the compiled module.
 */
function workerFile(): string {
  const beside = join(import.meta.dirname, 'analysis-worker.mjs');
  if (existsSync(beside)) return beside;
  return resolve(import.meta.dirname, '..', '..', '..', 'src', 'sheets', 'analyses', 'analysis-worker.mjs');
}

/**
 * Runs the sheet analyses off the event loop when they are large: the devices are split into one chunk per
 * core and handed to a piscina pool of worker threads running the same pure engine calls as inline, so a
 * 200-device sheet never holds up other requests. Small analyses run inline, where a hand-off costs more.
 */
@Injectable()
export class AnalysisPool implements OnModuleDestroy {
  private readonly threads = Math.max(1, availableParallelism());
  private pool: Piscina | null = null;

  async matrixRows(job: MatrixJob): Promise<MatrixRowCells[]> {
    if (job.corners || job.devices.length * job.columns.length <= INLINE_POINTS) return cornerMatrixRows(job.process, job.processId, job.devices, job.bias, job.columns, job.corners);
    const answers = await Promise.all(this.chunks(job.devices).map((devices) => this.run<MatrixRowCells[]>('matrixRows', { ...job, devices })));
    return answers.flat();
  }

  async leakage(job: LeakageJob): Promise<SheetLeakage> {
    if (job.corners || job.devices.length * LEAKAGE_POINTS_PER_DEVICE <= INLINE_POINTS) return sheetLeakage(job.process, job.processId, job.devices, job.budget, job.engineVersion, job.corners);
    return this.run<SheetLeakage>('leakage', job);
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool?.destroy();
    this.pool = null;
  }

  private run<T>(name: string, payload: unknown): Promise<T> {
    this.pool ??= new Piscina({ filename: workerFile(), minThreads: 1, maxThreads: this.threads, idleTimeout: 60_000 });
    return this.pool.run(payload, { name }) as Promise<T>;
  }

  private chunks<T>(items: readonly T[]): T[][] {
    const size = Math.ceil(items.length / this.threads);
    return Array.from({ length: Math.ceil(items.length / size) }, (_, i) => items.slice(i * size, (i + 1) * size));
  }
}
