import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { MessageChannel } from 'node:worker_threads';
import type { CurveFileOptions, CurveFileReading } from '@channelwright/shared/curve-file';
import type { ExtractionInput } from '@channelwright/shared/extraction';
import type { ExtractionResultResponse } from '@channelwright/shared/schemas';
import { type BeforeApplicationShutdown, Injectable } from '@nestjs/common';
import { Piscina } from 'piscina';

/** What a fit gives back: its report, or the engine's refusal. */
export type FitOutcome = { result: ExtractionResultResponse; curves: string } | { failed: { code: string; message: string } };

/** The fit's input without its points (the worker reads them from the file). */
export type FitSettings = Omit<ExtractionInput, 'points'>;

export interface FitProgress {
  iterations: number;
  maxIterations: number;
}

/**
 * The worker file, plain JavaScript beside this module's source (a worker thread needs a real file, and jest and the
 * built server must find the same one; tsc does not copy .mjs files, so dist/ has one only if a build step puts it there).
 */
function workerFile(): string {
  const beside = join(import.meta.dirname, 'extraction-worker.mjs');
  if (existsSync(beside)) return beside;
  return resolve(import.meta.dirname, '..', '..', '..', 'src', 'extractions', 'jobs', 'extraction-worker.mjs');
}

/**
 * The worker threads that read curve files and fit (piscina): fits on one fewer than the machine's cores (at least
 * one), at a lower priority than the server's own thread, so that requests keep being answered while a fit runs;
 * uploads are read on a thread of their own, so that an upload is answered at once even while every fit thread is
 * busy. Stopped with the server.
 */
@Injectable()
export class ExtractionWorkers implements BeforeApplicationShutdown {
  readonly threads = Math.max(1, availableParallelism() - 1);
  private readonly pool = new Piscina({ filename: workerFile(), minThreads: 0, maxThreads: this.threads, idleTimeout: 30_000, niceIncrement: 10 });
  private readonly readers = new Piscina({ filename: workerFile(), minThreads: 0, maxThreads: 1, idleTimeout: 30_000 });

  /** Reads a curve file (a 5 MB file takes a few hundred milliseconds: not on the event loop). */
  read(text: string, options: CurveFileOptions): Promise<CurveFileReading> {
    return this.readers.run({ text, options }, { name: 'read' }) as Promise<CurveFileReading>;
  }

  /** Reads the file and fits, reporting progress; an abort of `signal` stops the worker thread at once. */
  async fit(text: string, options: CurveFileOptions, settings: FitSettings, onProgress: (progress: FitProgress) => void, signal: AbortSignal): Promise<FitOutcome> {
    const { port1, port2 } = new MessageChannel();
    port1.on('message', (progress: FitProgress) => onProgress(progress));
    try {
      return (await this.pool.run({ text, options, fit: settings, port: port2 }, { name: 'fit', transferList: [port2], signal })) as FitOutcome;
    } finally {
      port1.close();
    }
  }

  /** After every module's onModuleDestroy, so that the runner has stopped its fits first. */
  async beforeApplicationShutdown(): Promise<void> {
    await Promise.all([this.pool.destroy(), this.readers.destroy()]);
  }
}
