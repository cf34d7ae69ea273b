import { apiErrorBodySchema, type CharacterisationJob, characterisationJobSchema, characterisationTableListSchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { createCardProfile, finished, followJob, MEDIUM_GRID, SMALL_GRID, test250Definition } from './helpers/characterisation.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

// The job lifecycle of characterisations on the invented 250 nm test card, with small grids (whichever ngspice the
// server finds: native when installed, else its WebAssembly build).

const LEASE = { CHARACTERISATION_LEASE_SECONDS: '1' };

describe('characterisation jobs', () => {
  let t: TestApp;
  let admin: string;
  let designer: string;
  let processId: string;

  beforeAll(async () => {
    t = await createTestApp({ env: LEASE });
    admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
    processId = (await createCardProfile(t, admin, 'T250-jobs')).id;
  });
  afterAll(() => t.close());

  const start = (body: object, token = admin) => t.http().post('/api/characterisations').set(bearer(token)).send(body);
  const rowsOf = async (jobId: string) => {
    const [tables] = await t.query('SELECT COUNT(*) AS n FROM characterisation_tables WHERE "jobId" = ?', [jobId]);
    const [chunks] = await t.query('SELECT COUNT(*) AS n FROM characterisation_table_chunks WHERE "jobId" = ?', [jobId]);
    return { tables: Number(tables.n), chunks: Number(chunks.n) };
  };

  it('answers 202 with the queued job, whose progress rises to its total as it runs to done, and stores one table per device', async () => {
    const response = await start({ processId, grid: { ...SMALL_GRID, vds: [0.6, 1.25, 2.5], lengths: [0.25e-6, 0.5e-6, 1e-6, 2e-6] } }).expect(202);
    const job = characterisationJobSchema.parse(response.body);
    expect(job).toMatchObject({ status: 'queued', progress: { done: 0 }, processName: 'T250-jobs', version: 1, error: null });
    expect(job.devices.map((d) => `${d.polarity} ${d.model}`)).toEqual(['nmos tn25', 'pmos tp25']);
    expect(job.progress.total).toBe(2 * 4 * 101 * 3);
    const seen = await followJob(t, admin, job.id, finished);
    const last = seen.at(-1) as CharacterisationJob;
    expect(last).toMatchObject({ status: 'done', progress: { done: job.progress.total, total: job.progress.total }, etaSeconds: null, attempts: 1 });
    expect(['native', 'wasm']).toContain(last.engine);
    for (let i = 1; i < seen.length; i++) expect(seen[i].progress.done).toBeGreaterThanOrEqual(seen[i - 1].progress.done);
    expect(last.devices.every((d) => d.tableId !== null && /^[0-9a-f]{64}$/.test(d.sha256 ?? ''))).toBe(true);
    const tables = characterisationTableListSchema.parse((await t.http().get(`/api/processes/${processId}/tables`).set(bearer(designer)).expect(200)).body);
    expect(tables.filter((table) => table.current).map((table) => table.sha256).sort()).toEqual(last.devices.map((d) => d.sha256).sort());
    const listed = (await t.http().get(`/api/processes/${processId}/characterisations`).set(bearer(designer)).expect(200)).body;
    expect(listed.map((j: CharacterisationJob) => j.id)).toContain(job.id);
  });

  it('never characterises the same version and grid twice: a second request (or two at once) gets the existing job', async () => {
    const body = { processId, devices: [{ polarity: 'nmos' }], grid: SMALL_GRID };
    const [a, b] = await Promise.all([start(body), start(body)]);
    expect([a.status, b.status].sort()).toEqual([200, 202]);
    expect(a.body.id).toBe(b.body.id);
    await followJob(t, admin, a.body.id, finished);
    const again = await start(body).expect(200);
    expect(again.body).toMatchObject({ id: a.body.id, status: 'done' });
  });

  it('cancels a running job: it stops, says so, and keeps none of its tables; the same grid can then start afresh', async () => {
    const body = { processId, grid: { ...MEDIUM_GRID, temperatures: [-40, 27, 85, 125] } };
    const job = characterisationJobSchema.parse((await start(body).expect(202)).body);
    await followJob(t, admin, job.id, (j) => j.status === 'running' && j.progress.done > 0);
    const cancelled = characterisationJobSchema.parse((await t.http().delete(`/api/characterisations/${job.id}`).set(bearer(admin)).expect(200)).body);
    expect(cancelled).toMatchObject({ status: 'cancelled', error: { code: 'CHARACTERISATION_CANCELLED' } });
    expect(cancelled.progress.done).toBeLessThan(cancelled.progress.total);
    expect(await rowsOf(job.id)).toEqual({ tables: 0, chunks: 0 });
    const finishedAlready = await t.http().delete(`/api/characterisations/${job.id}`).set(bearer(admin)).expect(409);
    expect(finishedAlready.body.code).toBe('CHARACTERISATION_FINISHED');
    const fresh = await start(body).expect(202);
    expect(fresh.body.id).not.toBe(job.id);
    await t.http().delete(`/api/characterisations/${fresh.body.id}`).set(bearer(admin)).expect(200);
  });

  it('fails a job whose simulation fails with the simulator\'s own message, keeping nothing', async () => {
    // An invented card whose lint leaves no channel at 0.3 µm: BSIM4 stops with a fatal error.
    const broken = await createCardProfile(t, admin, 'T250-broken', { text: '* invented\n.model bad nmos level=54 version=4.8.2 lint=0.2e-6\n', mapping: { corners: { TT: null }, devices: [{ model: 'bad', polarity: 'nmos' }] } });
    const job = characterisationJobSchema.parse((await start({ processId: broken.id, grid: { ...SMALL_GRID, lengths: [0.3e-6, 0.5e-6] } }).expect(202)).body);
    const last = (await followJob(t, admin, job.id, finished)).at(-1) as CharacterisationJob;
    expect(last).toMatchObject({ status: 'failed', error: { code: 'SIMULATION_FAILED' } });
    expect(last.error?.message).toMatch(/bad/);
    expect(last.error?.message).toMatch(/channel length|Leff|effective/i);
    expect(await rowsOf(job.id)).toEqual({ tables: 0, chunks: 0 });
  });

  it('refuses a grid beyond 5 million points with 400 GRID_TOO_LARGE naming the field given, and stores no job', async () => {
    const [before] = await t.query('SELECT COUNT(*) AS n FROM characterisation_jobs');
    const lengths = Array.from({ length: 40 }, (_, i) => 0.25e-6 * 1.1 ** i);
    const response = await start({ processId, grid: { lengths, vgsStep: 0.01, vds: Array.from({ length: 20 }, (_, i) => 0.1 * (i + 1)), temperatures: [-40, 0, 27, 85, 125] } }).expect(400);
    const body = apiErrorBodySchema.parse(response.body);
    expect(body).toMatchObject({ code: 'GRID_TOO_LARGE', field: 'grid.lengths' });
    expect(body.message).toMatch(/5,000,000/);
    const [after] = await t.query('SELECT COUNT(*) AS n FROM characterisation_jobs');
    expect(after.n).toBe(before.n);
  });

  it('refuses a grid or devices the version cannot give, naming the field', async () => {
    expect((await start({ processId, grid: { vds: [3] } }).expect(400)).body).toMatchObject({ code: 'GRID_INVALID', field: 'grid.vds.0' });
    expect((await start({ processId, grid: { corners: ['FS'] } }).expect(400)).body).toMatchObject({ code: 'GRID_INVALID', field: 'grid.corners.0' });
    expect((await start({ processId, grid: { lengths: [0.1e-6] } }).expect(400)).body).toMatchObject({ code: 'GRID_INVALID', field: 'grid.lengths' });
    expect((await start({ processId, grid: { vgsStep: 0.05 } }).expect(400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'grid.vgsStep' });
    expect((await start({ processId, devices: [{ polarity: 'nmos', flavour: 'native' }] }).expect(400)).body).toMatchObject({ code: 'DEVICE_NOT_IN_CARD', field: 'devices.0' });
    expect((await start({ processId, version: 9 }).expect(404)).body).toMatchObject({ code: 'PROCESS_VERSION_NOT_FOUND', field: 'version' });
    const bare = (await t.http().post('/api/processes').set(bearer(admin)).send({ definition: test250Definition('T250-bare') }).expect(201)).body;
    expect((await start({ processId: bare.id }).expect(409)).body).toMatchObject({ code: 'PROCESS_HAS_NO_MODEL_CARD', field: 'version' });
  });

  it('lets a characterised profile that no sheet uses be deleted, its jobs and tables with it', async () => {
    const doomed = await createCardProfile(t, admin, 'T250-deleted');
    const job = (await start({ processId: doomed.id, devices: [{ polarity: 'nmos' }], grid: SMALL_GRID }).expect(202)).body;
    expect((await followJob(t, admin, job.id, finished)).at(-1)?.status).toBe('done');
    await t.http().delete(`/api/processes/${doomed.id}`).set(bearer(admin)).expect(204);
    expect(await rowsOf(job.id)).toEqual({ tables: 0, chunks: 0 });
    expect((await t.http().get(`/api/characterisations/${job.id}`).set(bearer(admin)).expect(404)).body.code).toBe('CHARACTERISATION_NOT_FOUND');
  });

  it('lets maintainers start and cancel, readers of the process follow, and nobody else see a job', async () => {
    expect((await start({ processId, grid: SMALL_GRID }, designer).expect(403)).body.code).toBe('NOT_PROCESS_MAINTAINER');
    const job = (await start({ processId, devices: [{ polarity: 'nmos' }], grid: SMALL_GRID }).expect(200)).body;
    await t.http().get(`/api/characterisations/${job.id}`).set(bearer(designer)).expect(200);
    expect((await t.http().delete(`/api/characterisations/${job.id}`).set(bearer(designer)).expect(403)).body.code).toBe('NOT_PROCESS_MAINTAINER');
    const outsider = await t.register({ email: 'outsider@example.invalid', password: 'a long enough password', displayName: 'Outsider' });
    const hidden = await t.http().get(`/api/characterisations/${job.id}`).set(bearer(outsider.accessToken)).expect(404);
    expect(hidden.body.code).toBe('CHARACTERISATION_NOT_FOUND');
    expect((await t.http().get(`/api/processes/${processId}/tables`).set(bearer(outsider.accessToken)).expect(404)).body.code).toBe('PROCESS_NOT_FOUND');
  });
});

describe('a characterisation whose server stops', () => {
  it('is resumed by the next server on the same data from the tables it had stored, and finishes', async () => {
    const first = await createTestApp({ env: LEASE });
    const admin = await first.loginAs(DEMO_ACCOUNTS.admin.email);
    const processId = (await createCardProfile(first, admin, 'T250-resume')).id;
    const job = characterisationJobSchema.parse((await first.http().post('/api/characterisations').set(bearer(admin)).send({ processId, grid: MEDIUM_GRID }).expect(202)).body);
    // Stop the first server once its first device's table is stored (the second device takes six more runs): as a
    // crash would, the stop leaves the job running.
    const stored = (await followJob(first, admin, job.id, (j) => j.devices.some((d) => d.tableId !== null) || finished(j))).at(-1) as CharacterisationJob;
    await first.close({ keepData: true });
    expect(stored.status).toBe('running');
    const second = await createTestApp({ env: LEASE, dataDir: first.dataDir });
    try {
      const token = await second.loginAs(DEMO_ACCOUNTS.admin.email);
      const last = (await followJob(second, token, job.id, finished)).at(-1) as CharacterisationJob;
      expect(last).toMatchObject({ status: 'done', attempts: 2 });
      // The device stored before the stop was not simulated again.
      const kept = stored.devices.filter((d) => d.tableId !== null);
      expect(kept).toHaveLength(1);
      expect(last.devices.find((d) => d.polarity === kept[0].polarity)?.tableId).toBe(kept[0].tableId);
      expect(last.devices.every((d) => d.tableId !== null)).toBe(true);
    } finally {
      await second.close();
      (await import('node:fs')).rmSync(first.dataDir, { recursive: true, force: true });
    }
  });

  it('fails cleanly, keeping none of its tables, when it has had all the runs it may have', async () => {
    const first = await createTestApp({ env: LEASE });
    const admin = await first.loginAs(DEMO_ACCOUNTS.admin.email);
    const processId = (await createCardProfile(first, admin, 'T250-interrupted')).id;
    const job = characterisationJobSchema.parse((await first.http().post('/api/characterisations').set(bearer(admin)).send({ processId, grid: { ...MEDIUM_GRID, temperatures: [-40, 27, 85, 125] } }).expect(202)).body);
    await followJob(first, admin, job.id, (j) => (j.status === 'running' && j.progress.done > 0) || finished(j));
    await first.close({ keepData: true });
    const second = await createTestApp({ env: { ...LEASE, CHARACTERISATION_MAX_ATTEMPTS: '1' }, dataDir: first.dataDir });
    try {
      const token = await second.loginAs(DEMO_ACCOUNTS.admin.email);
      const last = (await followJob(second, token, job.id, finished)).at(-1) as CharacterisationJob;
      expect(last).toMatchObject({ status: 'failed', attempts: 1, error: { code: 'CHARACTERISATION_INTERRUPTED' } });
      const [tables] = await second.query('SELECT COUNT(*) AS n FROM characterisation_tables WHERE "jobId" = ?', [job.id]);
      const [chunks] = await second.query('SELECT COUNT(*) AS n FROM characterisation_table_chunks WHERE "jobId" = ?', [job.id]);
      expect([Number(tables.n), Number(chunks.n)]).toEqual([0, 0]);
    } finally {
      await second.close();
      (await import('node:fs')).rmSync(first.dataDir, { recursive: true, force: true });
    }
  });
});
