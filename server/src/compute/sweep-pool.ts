import { EngineError } from '@channelwright/shared/device';
import type { ErrorCode, Process, SweepRequestInput } from '@channelwright/shared/schemas';
import { Injectable, type OnModuleDestroy } from '@nestjs/common';
import { existsSync } from 'node:fs';
import { availableParallelism } from 'node:os';
import { join, resolve } from 'node:path';
import { Piscina } from 'piscina';

/**
 * Up to this many points over all series a sweep runs on the server's thread (about a millisecond); above it the
 * engine and the JSON text go to a worker thread, so the largest sweep the API allows (100,000 points, every field:
 * about 60 MB of JSON) never holds up other requests.
 */
export const INLINE_SWEEP_POINTS = 4_000;

/** The points over all series a sweep request asks for, read before it is parsed (the engine names a wrong field). */
export function sweepPointsOf(request: SweepRequestInput): number {
  const points = typeof request?.sweep?.points === 'number' ? request.sweep.points : 0;
  const corners = Array.isArray(request?.corners) ? Math.max(1, request.corners.length) : 1;
  const temperatures = Array.isArray(request?.temperatures) && request?.sweep?.param !== 'temperature' ? Math.max(1, request.temperatures.length) : 1;
  return points * corners * temperatures;
}

/** The JSON bytes (moved from the worker), or the engine's refusal. */
type WorkerAnswer = Uint8Array | { error: { code: ErrorCode; message: string; field?: string } };

function workerFile(): string {
  const beside = join(import.meta.dirname, 'sweep-worker.mjs');
  if (existsSync(beside)) return beside;
  return resolve(import.meta.dirname, '..', '..', 'src', 'compute', 'sweep-worker.mjs');
}

/**
 * Runs large sweeps in worker threads (piscina), which answer the JSON bytes themselves. Threads are at most one
 * fewer than the cores, so a burst of large sweeps leaves a core to the server's own thread; the queue beyond them
 * bounds memory to a few answers in flight.
 */
@Injectable()
export class SweepPool implements OnModuleDestroy {
  private readonly threads = Math.max(1, availableParallelism() - 1);
  private pool: Piscina | null = null;

  /** The sweep's answer as JSON bytes; an EngineError as the engine threw it. */
  async sweepJson(request: SweepRequestInput, process: Process | undefined): Promise<Buffer> {
    this.pool ??= new Piscina({ filename: workerFile(), minThreads: 0, maxThreads: this.threads, idleTimeout: 30_000 });
    const answer = (await this.pool.run({ request, process }, { name: 'sweepJson' })) as WorkerAnswer;
    if (!(answer instanceof Uint8Array)) throw new EngineError(answer.error.code, answer.error.message, answer.error.field);
    return Buffer.from(answer.buffer, answer.byteOffset, answer.byteLength);
  }

  async onModuleDestroy(): Promise<void> {
    await this.pool?.destroy();
    this.pool = null;
  }
}
