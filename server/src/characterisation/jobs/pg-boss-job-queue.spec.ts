import { randomUUID } from 'node:crypto';
import { DataSource, getMetadataArgsStorage } from 'typeorm';
import { createTestDatabase, describeWithPostgres, type TestDatabase } from '../../../test/helpers/postgres.js';
import { AppConfigService } from '../../config/app-config.service.js';
import { loadConfig } from '../../config/load-config.js';
import { UnitOfWork } from '../../database/unit-of-work.js';
import { CharacterisationTableChunkEntity } from '../tables/characterisation-table-chunk.entity.js';
import { CharacterisationTableEntity } from '../tables/characterisation-table.entity.js';
import { CharacterisationJobEntity } from './characterisation-job.entity.js';
import { CharacterisationJobStore } from './characterisation-job-store.js';
import type { JobHandler } from './job-queue.js';
import { PgBossJobQueue } from './pg-boss-job-queue.js';

const ENTITIES = [CharacterisationJobEntity, CharacterisationTableEntity, CharacterisationTableChunkEntity];
/** A short lease, so that a dead process's job is taken over within seconds. */
const LEASE_SECONDS = 2;
const CONCURRENCY = 2;
/** Reports a test run makes before it finishes, one every REPORT_MS. */
const REPORTS = 8;
const REPORT_MS = 150;

/** The runs of dead processes, let go at the end of their test (their pg-boss is closed by then). */
const afterDeath: (() => void)[] = [];

const sleep = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Waits for `ready` (checked every 100 ms), failing after `timeoutMs` with `what`. */
async function until(what: string, ready: () => boolean | Promise<boolean>, timeoutMs = 30_000): Promise<void> {
  const deadline = Date.now() + timeoutMs;
  while (!(await ready())) {
    if (Date.now() > deadline) throw new Error(`timed out waiting until ${what}`);
    await sleep(100);
  }
}

/** What the runs of both "processes" did: who started each job, how many ran at once, per job and per process. */
class RunLog {
  readonly starts: { jobId: string; process: string; at: number }[] = [];
  /** When each process last reported on each job (before the store wrote the heartbeat). */
  readonly lastReport = new Map<string, number>();
  readonly finishedBy = new Map<string, string>();
  private readonly runningJobs = new Map<string, number>();
  private readonly runningIn = new Map<string, number>();
  maxAtOnceOfAJob = 0;
  readonly maxAtOnceIn = new Map<string, number>();

  begin(jobId: string, process: string): void {
    this.starts.push({ jobId, process, at: Date.now() });
    const ofJob = (this.runningJobs.get(jobId) ?? 0) + 1;
    this.runningJobs.set(jobId, ofJob);
    this.maxAtOnceOfAJob = Math.max(this.maxAtOnceOfAJob, ofJob);
    const inProcess = (this.runningIn.get(process) ?? 0) + 1;
    this.runningIn.set(process, inProcess);
    this.maxAtOnceIn.set(process, Math.max(this.maxAtOnceIn.get(process) ?? 0, inProcess));
  }

  end(jobId: string, process: string): void {
    this.runningJobs.set(jobId, (this.runningJobs.get(jobId) ?? 1) - 1);
    this.runningIn.set(process, (this.runningIn.get(process) ?? 1) - 1);
  }

  startsOf(jobId: string): string[] {
    return this.starts.filter((start) => start.jobId === jobId).map((start) => start.process);
  }
}

/**
 * A run with the runner's contract (CharacterisationRunner): it reports progress and a heartbeat through the store,
 * ends the job cancelled when the store or its signal says cancel, stops silently on lost or shutdown, and finishes. A process in `dead` stops
 * in the middle of a run and never goes on, as a killed process does.
 */
function reportingRun(store: CharacterisationJobStore, process: string, log: RunLog, dead: Set<string>): JobHandler {
  return async (jobId, owner, signal) => {
    log.begin(jobId, process);
    try {
      for (let report = 0; report < REPORTS; report++) {
        if (dead.has(process)) return new Promise<void>((resolve) => afterDeath.push(resolve));
        log.lastReport.set(`${process}/${jobId}`, Date.now());
        const answer = signal.aborted ? signal.reason : await store.report(jobId, owner, { done: report, etaSeconds: null });
        if (answer === 'cancel') {
          await store.end(jobId, owner, { status: 'cancelled', code: 'CHARACTERISATION_CANCELLED', message: 'cancelled' });
          return;
        }
        if (answer !== 'go-on') return;
        await sleep(REPORT_MS);
      }
      if (await store.finish(jobId, owner)) log.finishedBy.set(jobId, process);
    } finally {
      log.end(jobId, process);
    }
  };
}

/**
 * This suite creates the characterisation tables alone on PostgreSQL: with PostgreSQL's names for SQLite's column types
 * (the same choice as the PostgreSQL migrations, until the entities make it themselves), and without their foreign keys
 * (to process versions and users, owned by other modules, and between themselves), which the queue does not rely on.
 */
function characterisationTablesAlone(): void {
  const storage = getMetadataArgsStorage();
  const ours = (target: unknown) => ENTITIES.includes(target as (typeof ENTITIES)[number]);
  const postgresType: Record<string, string> = { datetime: 'timestamptz', blob: 'bytea', real: 'double precision' };
  for (const column of storage.columns) {
    const type = column.options.type;
    if (ours(column.target) && typeof type === 'string' && type in postgresType) column.options.type = postgresType[type] as typeof type;
  }
  const kept = storage.foreignKeys.filter((key) => !ours(key.target));
  storage.foreignKeys.splice(0, storage.foreignKeys.length, ...kept);
}

describeWithPostgres('PgBossJobQueue: two server processes sharing one PostgreSQL database (pg-boss 10)', () => {
  let database: TestDatabase;
  let dataSource: DataSource;
  let store: CharacterisationJobStore;
  const processVersionId = randomUUID();
  const queues: PgBossJobQueue[] = [];

  beforeAll(async () => {
    database = await createTestDatabase();
    characterisationTablesAlone();
    dataSource = new DataSource({ type: 'postgres', url: database.url, entities: ENTITIES, synchronize: true });
    await dataSource.initialize();
    store = new CharacterisationJobStore(
      dataSource.getRepository(CharacterisationJobEntity),
      dataSource.getRepository(CharacterisationTableEntity),
      dataSource.getRepository(CharacterisationTableChunkEntity),
      new UnitOfWork(dataSource),
    );
  });

  afterEach(async () => {
    await Promise.all(queues.splice(0).map((queue) => queue.stop()));
    for (const release of afterDeath.splice(0)) release();
    await dataSource.query('DELETE FROM characterisation_jobs');
  });

  afterAll(async () => {
    // pg-boss looks once a second whether the workers it stopped have ended.
    await sleep(1500);
    try {
      if (dataSource?.isInitialized) await dataSource.destroy();
    } finally {
      await database?.drop();
    }
  });

  /** A server process: its own pg-boss on the shared database, taking jobs unless `worker` is false. */
  function serverProcess(options: { worker: boolean; databaseUrl?: string }): PgBossJobQueue {
    const config = loadConfig({
      NODE_ENV: 'test',
      DATABASE_URL: options.databaseUrl ?? database.url,
      JOB_WORKER: String(options.worker),
      CHARACTERISATION_LEASE_SECONDS: String(LEASE_SECONDS),
      CHARACTERISATION_CONCURRENCY: String(CONCURRENCY),
      CHARACTERISATION_MAX_ATTEMPTS: '3',
    });
    const queue = new PgBossJobQueue(store, new AppConfigService(config));
    queues.push(queue);
    return queue;
  }

  async function queuedJob(): Promise<string> {
    const plan = [{ polarity: 'nmos', model: 'tn25', points: REPORTS, grid: { lengths: [Math.random()] } }];
    const { job } = await store.insertQueued({ processVersionId, gridHash: randomUUID().replace(/-/g, ''), plan: plan as never, requestedById: null });
    return job.id;
  }

  const statusOf = async (id: string) => (await store.get(id))?.status;

  it('runs a job sent by a process that takes no jobs (JOB_WORKER=false) in the process that does', async () => {
    const log = new RunLog();
    const web = serverProcess({ worker: false });
    const worker = serverProcess({ worker: true });
    web.start(reportingRun(store, 'web', log, new Set()));
    worker.start(reportingRun(store, 'worker', log, new Set()));
    const id = await queuedJob();
    await web.enqueue(id);

    await until('the job is done', async () => (await statusOf(id)) === 'done');
    expect(log.startsOf(id)).toEqual(['worker']);
    expect(log.finishedBy.get(id)).toBe('worker');
    expect((await store.get(id))?.attempts).toBe(1);
  });

  it('resumes in the other process, after the lease, a job whose process died while running it', async () => {
    const log = new RunLog();
    const dead = new Set<string>();
    // A starts first and alone, so the job is A's; B joins before A dies.
    const a = serverProcess({ worker: true });
    a.start(reportingRun(store, 'A', log, dead));
    const id = await queuedJob();
    await a.enqueue(id);
    await until('A runs the job', () => log.startsOf(id).length === 1);
    const b = serverProcess({ worker: true });
    b.start(reportingRun(store, 'B', log, dead));

    dead.add('A');
    await a.stop();
    await until('the job is done', async () => (await statusOf(id)) === 'done');

    expect(log.startsOf(id)).toEqual(['A', 'B']);
    expect(log.finishedBy.get(id)).toBe('B');
    expect((await store.get(id))?.attempts).toBe(2);
    // B took the job over only once A had been silent for the lease, never beside A's run.
    const takenOver = log.starts.find((start) => start.process === 'B')?.at ?? 0;
    expect(takenOver - (log.lastReport.get(`A/${id}`) ?? Infinity)).toBeGreaterThan(LEASE_SECONDS * 1000);
    expect(log.maxAtOnceOfAJob).toBe(1);
  });

  it('runs every job exactly once, never twice at once, at most CHARACTERISATION_CONCURRENCY per process, when both send each job', async () => {
    const log = new RunLog();
    const a = serverProcess({ worker: true });
    const b = serverProcess({ worker: true });
    a.start(reportingRun(store, 'A', log, new Set()));
    b.start(reportingRun(store, 'B', log, new Set()));
    const ids: string[] = [];
    for (let n = 0; n < 8; n++) ids.push(await queuedJob());
    await Promise.all(ids.flatMap((id) => [a.enqueue(id), b.enqueue(id)]));

    await until('every job is done', async () => (await Promise.all(ids.map(statusOf))).every((status) => status === 'done'));
    for (const id of ids) expect(log.startsOf(id)).toHaveLength(1);
    expect(log.maxAtOnceOfAJob).toBe(1);
    expect(Math.max(...log.maxAtOnceIn.values())).toBeLessThanOrEqual(CONCURRENCY);
    // Both processes took work.
    expect(new Set(log.starts.map((start) => start.process))).toEqual(new Set(['A', 'B']));
  });

  it('hands out at start the jobs the table holds queued that pg-boss never heard of', async () => {
    const log = new RunLog();
    const id = await queuedJob();
    const worker = serverProcess({ worker: true });
    worker.start(reportingRun(store, 'worker', log, new Set()));

    await until('the job is done', async () => (await statusOf(id)) === 'done');
    expect(log.startsOf(id)).toEqual(['worker']);
  });

  it('keeps a job queued, and starts and stops without throwing, when pg-boss cannot reach its database', async () => {
    const unreachable = new URL(database.url);
    unreachable.pathname = '/cw_no_such_database';
    const log = new RunLog();
    const lost = serverProcess({ worker: true, databaseUrl: unreachable.toString() });
    lost.start(reportingRun(store, 'lost', log, new Set()));
    const id = await queuedJob();
    await expect(lost.enqueue(id)).resolves.toBeUndefined();
    await expect(lost.stop()).resolves.toBeUndefined();
    expect(await statusOf(id)).toBe('queued');
    expect(log.starts).toHaveLength(0);
  });

  it('cancels a job through the process running it, and through its row from a process that does not run it', async () => {
    const log = new RunLog();
    const worker = serverProcess({ worker: true });
    const web = serverProcess({ worker: false });
    worker.start(reportingRun(store, 'worker', log, new Set()));
    web.start(reportingRun(store, 'web', log, new Set()));
    const here = await queuedJob();
    const elsewhere = await queuedJob();
    await web.enqueue(here);
    await web.enqueue(elsewhere);
    await until('the worker runs both jobs', () => log.startsOf(here).length === 1 && log.startsOf(elsewhere).length === 1);

    await worker.cancel(here);
    expect(await statusOf(here)).toBe('cancelled');
    // As CharacterisationService does: the flag on the row, then the queue of the process that got the request.
    await store.requestCancel(elsewhere);
    await web.cancel(elsewhere);
    await until('the other job is cancelled', async () => (await statusOf(elsewhere)) === 'cancelled');
    expect(log.finishedBy.size).toBe(0);
  });
});
