import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { type EntityManager, In, LessThan, QueryFailedError, type Repository } from 'typeorm';
import { engineOf, rowLock } from '../../database/database-engine.js';
import { UnitOfWork } from '../../database/unit-of-work.js';
import type { PackedTable } from '../table-storage.js';
import { randomUUID } from 'node:crypto';
import { CharacterisationTableChunkEntity, TABLE_CHUNK_BYTES } from '../tables/characterisation-table-chunk.entity.js';
import { CharacterisationTableEntity } from '../tables/characterisation-table.entity.js';
import { CharacterisationJobEntity } from './characterisation-job.entity.js';
import type { PlannedDevice } from './characterisation-plan.js';

/** What the server running a job hears back when it reports: go on, stop (cancelled), or stop silently (another took it over). */
export type Report = 'go-on' | 'cancel' | 'lost';

/** Why a job ended without its tables. */
export interface JobEnd {
  status: 'failed' | 'cancelled';
  code: string;
  message: string;
}

const ACTIVE = ['queued', 'running', 'done'] as const;

/**
 * The characterisation jobs and their tables in the database: the one place their rows are written. Every change of a
 * running job is conditional on its owner, so that a server that lost its lease (another took the job over) writes
 * nothing; every end is one transaction (the status with its tables, or the status and the tables deleted).
 */
@Injectable()
export class CharacterisationJobStore {
  constructor(
    @InjectRepository(CharacterisationJobEntity) private readonly jobs: Repository<CharacterisationJobEntity>,
    @InjectRepository(CharacterisationTableEntity) private readonly tables: Repository<CharacterisationTableEntity>,
    @InjectRepository(CharacterisationTableChunkEntity) private readonly chunks: Repository<CharacterisationTableChunkEntity>,
    private readonly unitOfWork: UnitOfWork,
  ) {}

  get(id: string): Promise<CharacterisationJobEntity | null> {
    return this.jobs.findOneBy({ id });
  }

  /** The queued, running or finished job of this version and grid, if any. */
  findActive(processVersionId: string, gridHash: string): Promise<CharacterisationJobEntity | null> {
    return this.jobs.findOneBy({ processVersionId, gridHash, status: In([...ACTIVE]) });
  }

  /** Jobs of some versions, newest first. */
  listByVersions(processVersionIds: readonly string[]): Promise<CharacterisationJobEntity[]> {
    if (processVersionIds.length === 0) return Promise.resolve([]);
    return this.jobs.find({ where: { processVersionId: In([...processVersionIds]) }, order: { createdAt: 'DESC' } });
  }

  /** Stores a new queued job; when another request stored the same version and grid meanwhile, that job instead. */
  async insertQueued(
    job: { processVersionId: string; gridHash: string; plan: PlannedDevice[]; requestedById: string | null },
    manager: EntityManager = this.jobs.manager,
  ): Promise<{ job: CharacterisationJobEntity; created: boolean }> {
    const total = job.plan.reduce((sum, device) => sum + device.points, 0);
    const jobs = manager.getRepository(CharacterisationJobEntity);
    try {
      const row = jobs.create({ ...job, plan: JSON.stringify(job.plan), status: 'queued', done: 0, total, attempts: 0, cancelRequested: false });
      // On PostgreSQL a failed statement spoils the transaction it runs in: inside the caller's, the insert gets a savepoint.
      const inCallersTransaction = engineOf(manager) === 'postgres' && manager.queryRunner?.isTransactionActive === true;
      const saved = inCallersTransaction ? await manager.transaction((savepoint) => savepoint.getRepository(CharacterisationJobEntity).save(row)) : await jobs.save(row);
      return { job: saved, created: true };
    } catch (error) {
      if (!(error instanceof QueryFailedError && /UNIQUE/i.test(error.message))) throw error;
      const existing = await this.findActive(job.processVersionId, job.gridHash);
      if (!existing) throw error;
      return { job: existing, created: false };
    }
  }

  /**
   * Claims the oldest queued job for `owner`; its id, or null when none waits. The update is conditional on the job still
   * being queued, and on PostgreSQL the row is locked as it is read, passing over jobs another server is claiming
   * (FOR UPDATE SKIP LOCKED), so two servers never take the same job and neither waits for the other.
   */
  claimNext(owner: string): Promise<string | null> {
    return this.unitOfWork.run(async (manager) => {
      const jobs = manager.getRepository(CharacterisationJobEntity);
      const next = await jobs.findOne({ select: { id: true, attempts: true, startedAt: true }, where: { status: 'queued' }, order: { createdAt: 'ASC' }, lock: rowLock(manager, { skipLocked: true }) });
      if (!next) return null;
      const now = new Date();
      const claimed = await jobs.update({ id: next.id, status: 'queued' }, { status: 'running', owner, heartbeatAt: now, attempts: next.attempts + 1, startedAt: next.startedAt ?? now });
      return claimed.affected === 1 ? next.id : null;
    });
  }

  /**
   * Running jobs whose server has not reported for `leaseSeconds` (it stopped or died): queued again to be resumed,
   * or failed (their tables deleted) once they have had `maxAttempts` runs.
   */
  async recoverAbandoned(leaseSeconds: number, maxAttempts: number): Promise<{ resumed: string[]; failed: string[] }> {
    const silentSince = new Date(Date.now() - leaseSeconds * 1000);
    const abandoned = await this.jobs.find({ where: { status: 'running', heartbeatAt: LessThan(silentSince) } });
    const resumed: string[] = [];
    const failed: string[] = [];
    for (const job of abandoned) {
      if (job.attempts >= maxAttempts) {
        const ended = await this.end(job.id, job.owner, {
          status: 'failed',
          code: 'CHARACTERISATION_INTERRUPTED',
          message: `The server running this characterisation stopped ${job.attempts === 1 ? 'once' : `${job.attempts} times`} before it finished (at most ${maxAttempts} ${maxAttempts === 1 ? 'run is' : 'runs are'} allowed); nothing was kept. Start it again.`,
        });
        if (ended) failed.push(job.id);
      } else {
        const result = await this.jobs.update({ id: job.id, status: 'running', owner: job.owner ?? undefined }, { status: 'queued', owner: null, etaSeconds: null });
        if (result.affected === 1) resumed.push(job.id);
      }
    }
    return { resumed, failed };
  }

  /** Claims one queued job for `owner` (a queue handed out its id): running, one more attempt. False when it is not queued (any more). */
  async claim(id: string, owner: string): Promise<boolean> {
    const job = await this.jobs.findOne({ select: { id: true, attempts: true, startedAt: true }, where: { id, status: 'queued' } });
    if (!job) return false;
    const now = new Date();
    // Conditional on the job still being queued: of two servers claiming it at once, one updates it.
    const claimed = await this.jobs.update({ id, status: 'queued' }, { status: 'running', owner, heartbeatAt: now, attempts: job.attempts + 1, startedAt: job.startedAt ?? now });
    return claimed.affected === 1;
  }

  /** The ids of the queued jobs, oldest first. */
  async queuedIds(): Promise<string[]> {
    const queued = await this.jobs.find({ select: { id: true }, where: { status: 'queued' }, order: { createdAt: 'ASC' } });
    return queued.map((job) => job.id);
  }

  /** A running job's report: progress, estimate and a heartbeat, if it is still this owner's. */
  async report(id: string, owner: string, progress: { done: number; etaSeconds: number | null }): Promise<Report> {
    const job = await this.jobs.findOne({ select: { id: true, status: true, owner: true, cancelRequested: true }, where: { id } });
    if (!job || job.status !== 'running' || job.owner !== owner) return 'lost';
    if (job.cancelRequested) return 'cancel';
    const result = await this.jobs.update({ id, owner, status: 'running' }, { done: progress.done, etaSeconds: progress.etaSeconds, heartbeatAt: new Date() });
    return result.affected === 1 ? 'go-on' : 'lost';
  }

  setEngine(id: string, owner: string, engine: 'native' | 'wasm'): Promise<unknown> {
    return this.jobs.update({ id, owner }, { engine });
  }

  /** The devices whose tables a job has stored already (a resumed job skips them). */
  async storedDevices(jobId: string): Promise<CharacterisationTableEntity[]> {
    return this.tables.find({ where: { jobId }, order: { createdAt: 'ASC' } });
  }

  /** The tables some jobs have stored (no data). */
  tablesOfJobs(jobIds: readonly string[]): Promise<CharacterisationTableEntity[]> {
    if (jobIds.length === 0) return Promise.resolve([]);
    return this.tables.find({ where: { jobId: In([...jobIds]) } });
  }

  /**
   * Stores one device's table, if the job is still this owner's; false when it is not. Its bytes go first, a chunk per
   * turn of the event loop, then the table row in one transaction with the ownership check, so a table row always has all
   * its bytes; chunks left by a run that stopped half-way are removed (discardLooseChunks) before the device runs again.
   */
  async insertTable(jobId: string, owner: string, device: PlannedDevice, packed: PackedTable): Promise<boolean> {
    const tableId = randomUUID();
    const bytes = packed.compressed;
    for (let seq = 0; seq * TABLE_CHUNK_BYTES < bytes.length; seq++) {
      await this.chunks.insert({ tableId, seq, jobId, data: bytes.subarray(seq * TABLE_CHUNK_BYTES, (seq + 1) * TABLE_CHUNK_BYTES) });
      await new Promise((resolve) => setImmediate(resolve));
    }
    return this.unitOfWork.run(async (manager) => {
      // Locked until the table is stored: a take-over or an end of the job waits for it (on PostgreSQL; SQLite queues transactions).
      const job = await manager.getRepository(CharacterisationJobEntity).findOne({ where: { id: jobId, owner, status: 'running' }, lock: rowLock(manager) });
      if (!job) return false;
      const tables = manager.getRepository(CharacterisationTableEntity);
      await tables.insert(
        tables.create({
          id: tableId,
          jobId,
          processVersionId: job.processVersionId,
          polarity: device.polarity,
          flavour: device.flavour ?? '',
          modelName: device.model,
          sha256: packed.sha256,
          points: device.points,
          size: packed.size,
          storedBytes: bytes.length,
          grid: JSON.stringify(device.grid),
        }),
      );
      await manager.getRepository(CharacterisationJobEntity).update({ id: jobId }, { heartbeatAt: new Date() });
      return true;
    });
  }

  /** Removes the chunks of a job that belong to no stored table (a run stopped while writing them). */
  async discardLooseChunks(jobId: string): Promise<void> {
    const tables = await this.tables.find({ select: { id: true }, where: { jobId } });
    const kept = new Set(tables.map((table) => table.id));
    const loose = await this.chunks.find({ select: { tableId: true, seq: true }, where: { jobId } });
    const ids = [...new Set(loose.map((chunk) => chunk.tableId).filter((id) => !kept.has(id)))];
    if (ids.length > 0) await this.chunks.delete({ jobId, tableId: In(ids) });
  }

  /** A stored table's bytes, read a chunk per turn of the event loop. */
  async tableBytes(tableId: string): Promise<Buffer> {
    const seqs = await this.chunks.find({ select: { seq: true }, where: { tableId }, order: { seq: 'ASC' } });
    const parts: Buffer[] = [];
    for (const { seq } of seqs) {
      parts.push((await this.chunks.findOneByOrFail({ tableId, seq })).data);
      await new Promise((resolve) => setImmediate(resolve));
    }
    return Buffer.concat(parts);
  }

  /** Marks a job done (its tables are all stored), if it is still this owner's. */
  async finish(id: string, owner: string): Promise<boolean> {
    const job = await this.jobs.findOneBy({ id, owner, status: 'running' });
    if (!job) return false;
    const result = await this.jobs.update({ id, owner, status: 'running' }, { status: 'done', done: job.total, etaSeconds: null, owner: null, finishedAt: new Date(), cancelRequested: false });
    return result.affected === 1;
  }

  /** Ends a job without tables, in one transaction: its tables deleted, its status and reason written. `owner` null: a queued job. */
  async end(id: string, owner: string | null, end: JobEnd): Promise<boolean> {
    return this.unitOfWork.run(async (manager) => {
      const jobs = manager.getRepository(CharacterisationJobEntity);
      const job = await jobs.findOne({ where: { id }, lock: rowLock(manager) });
      const own = job && (owner === null ? job.status === 'queued' : job.status === 'running' && job.owner === owner);
      if (!job || !own) return false;
      await manager.getRepository(CharacterisationTableChunkEntity).delete({ jobId: id });
      await manager.getRepository(CharacterisationTableEntity).delete({ jobId: id });
      await jobs.update({ id }, { status: end.status, error: JSON.stringify({ code: end.code, message: end.message }), etaSeconds: null, owner: null, finishedAt: new Date() });
      return true;
    });
  }

  /** Asks the server running a job to stop it. */
  async requestCancel(id: string): Promise<void> {
    await this.jobs.update({ id, status: 'running' }, { cancelRequested: true });
  }
}
