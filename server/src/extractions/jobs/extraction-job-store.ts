import type { ExtractionResultResponse } from '@channelwright/shared/schemas';
import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { rowLock } from '../../database/database-engine.js';
import { UnitOfWork } from '../../database/unit-of-work.js';
import { ExtractionEntity } from '../extraction.entity.js';

/** Why a fit ended without a result. */
export interface JobEnd {
  status: 'failed' | 'cancelled';
  code: string;
  message: string;
}

/**
 * The state changes of extraction jobs in the database: the one place they are written. Each is one conditional
 * UPDATE (on the status it expects), so a cancel and the end of a run cannot both win.
 */
@Injectable()
export class ExtractionJobStore {
  constructor(
    @InjectRepository(ExtractionEntity) private readonly rows: Repository<ExtractionEntity>,
    private readonly unitOfWork: UnitOfWork,
  ) {}

  /**
   * Takes the oldest queued job: running, one more attempt; its id, or null when none waits. On PostgreSQL the row is
   * locked as it is read and rows being claimed by another connection are passed over (FOR UPDATE SKIP LOCKED).
   */
  claimNext(): Promise<string | null> {
    return this.unitOfWork.run(async (manager) => {
      const rows = manager.getRepository(ExtractionEntity);
      const next = await rows.findOne({ select: { id: true, attempts: true, startedAt: true }, where: { status: 'queued' }, order: { createdAt: 'ASC' }, lock: rowLock(manager, { skipLocked: true }) });
      if (!next) return null;
      const now = new Date();
      const claimed = await rows.update({ id: next.id, status: 'queued' }, { status: 'running', attempts: next.attempts + 1, startedAt: next.startedAt ?? now, iterations: 0 });
      return claimed.affected === 1 ? next.id : null;
    });
  }

  async report(id: string, iterations: number, maxIterations: number): Promise<void> {
    await this.rows.update({ id, status: 'running' }, { iterations, maxIterations });
  }

  async finish(id: string, result: ExtractionResultResponse, curves: string): Promise<boolean> {
    const done = await this.rows.update(
      { id, status: 'running' },
      { status: 'done', result: JSON.stringify(result), curves, iterations: result.iterations, finishedAt: new Date(), cancelRequested: false },
    );
    return done.affected === 1;
  }

  /** Ends a queued or running job without a result. */
  async end(id: string, from: 'queued' | 'running', end: JobEnd): Promise<boolean> {
    const ended = await this.rows.update({ id, status: from }, { status: end.status, error: JSON.stringify({ code: end.code, message: end.message }), finishedAt: new Date() });
    return ended.affected === 1;
  }

  async requestCancel(id: string): Promise<void> {
    await this.rows.update({ id, status: 'running' }, { cancelRequested: true });
  }

  /**
   * Jobs left running by a server that stopped (this is the only server: at start every running job is such a one):
   * queued again to run from the start (a fit is a pure function of its points and options), or failed once they
   * have had `maxAttempts` runs.
   */
  async recoverInterrupted(maxAttempts: number): Promise<{ resumed: string[]; failed: string[] }> {
    const interrupted = await this.rows.find({ select: { id: true, attempts: true, cancelRequested: true }, where: { status: 'running' } });
    const resumed: string[] = [];
    const failed: string[] = [];
    for (const job of interrupted) {
      if (job.cancelRequested) {
        await this.end(job.id, 'running', { status: 'cancelled', code: 'EXTRACTION_CANCELLED', message: 'Cancelled; nothing was kept' });
      } else if (job.attempts >= maxAttempts) {
        const times = job.attempts === 1 ? 'once' : `${job.attempts} times`;
        const ended = await this.end(job.id, 'running', { status: 'failed', code: 'EXTRACTION_INTERRUPTED', message: `The server stopped ${times} while this fit ran; nothing was kept. Run it again.` });
        if (ended) failed.push(job.id);
      } else {
        const queued = await this.rows.update({ id: job.id, status: 'running' }, { status: 'queued', iterations: 0 });
        if (queued.affected === 1) resumed.push(job.id);
      }
    }
    return { resumed, failed };
  }
}
