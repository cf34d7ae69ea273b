import { spawn, type ChildProcess } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { characterisationJobSchema, processProfileSchema, reviewRequestSchema, revisionSchema } from '@channelwright/shared/schemas';
import request from 'supertest';
import { REPO_ROOT } from '../src/config/paths.js';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../src/seed/demo-accounts.js';
import { SMALL_GRID, TEST_CARD_250, TEST_CARD_250_MAPPING, test250Definition } from './helpers/characterisation.js';
import { createTestDatabase, describeWithPostgres, type TestDatabase } from './helpers/postgres.js';
import { TEST_JWT_SECRET } from './helpers/test-env.js';

// Two processes of the built server (as `npm start` runs it, one OS process each) on one PostgreSQL database: a
// "web" process that takes no jobs (JOB_WORKER=false) and a "worker". A characterisation queued through the web
// process must be run by the worker (through pg-boss), and a sign-off made through one process must be seen, and
// verify, through the other. Both share the signing key, as docs/deploy.md requires.
const MAIN_JS = join(REPO_ROOT, 'server/dist/main.js');

jest.setTimeout(300_000);

function freePort(): Promise<number> {
  return new Promise((resolve) => {
    const server = createServer();
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => resolve(typeof address === 'object' && address ? address.port : 0));
    });
  });
}

interface Server {
  base: string;
  process: ChildProcess;
  dataDir: string;
}

async function startServer(databaseUrl: string, env: Record<string, string>): Promise<Server> {
  const port = await freePort();
  const dataDir = mkdtempSync(join(tmpdir(), 'channelwright-two-'));
  const base = `http://127.0.0.1:${port}`;
  const child = spawn(process.execPath, [MAIN_JS], {
    env: {
      ...process.env,
      PORT: String(port),
      DATA_DIR: dataDir,
      DATABASE_URL: databaseUrl,
      NODE_ENV: 'test',
      JWT_SECRET: TEST_JWT_SECRET,
      DEMO_CHARACTERISATION: 'false',
      CHARACTERISATION_LEASE_SECONDS: '10',
      CLIENT_DIST: join(dataDir, 'no-client'),
      ...env,
    },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  for (let i = 0; i < 1200; i++) {
    if (child.exitCode !== null) throw new Error(`the server exited with ${child.exitCode} before answering`);
    try {
      if ((await fetch(`${base}/api/health`)).ok) return { base, process: child, dataDir };
    } catch {
      // not listening yet
    }
    await new Promise((resolve) => setTimeout(resolve, 100));
  }
  throw new Error('the server did not start');
}

async function stopServer(server: Server | undefined): Promise<void> {
  if (!server) return;
  if (server.process.exitCode === null) {
    const exited = new Promise((resolve) => server.process.once('exit', resolve));
    server.process.kill('SIGTERM');
    await exited;
  }
  rmSync(server.dataDir, { recursive: true, force: true });
}

const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

async function signIn(server: Server, email: string): Promise<string> {
  const response = await request(server.base).post('/api/auth/login').send({ email, password: DEMO_PASSWORD });
  if (response.status !== 200 && response.status !== 201) throw new Error(`signing in ${email} answered ${response.status}`);
  return response.body.accessToken as string;
}

describeWithPostgres('two server processes on one PostgreSQL database', () => {
  let database: TestDatabase;
  let web: Server | undefined;
  let worker: Server | undefined;

  beforeAll(async () => {
    database = await createTestDatabase();
    // The web process migrates and seeds the invented demo first; the worker then finds both done.
    web = await startServer(database.url, { JOB_WORKER: 'false', SEED_DEMO: 'true' });
    worker = await startServer(database.url, { JOB_WORKER: 'true', SEED_DEMO: 'false' });
  });

  afterAll(async () => {
    await stopServer(worker);
    await stopServer(web);
    await database?.drop();
  });

  it('accepts a token issued by one process at the other (the shared signing key)', async () => {
    const token = await signIn(web!, DEMO_ACCOUNTS.designer.email);
    const me = await request(worker!.base).get('/api/auth/me').set(bearer(token));
    expect(me.status).toBe(200);
    expect(me.body.email).toBe(DEMO_ACCOUNTS.designer.email);
  });

  it('runs on the worker a characterisation queued through the web process, which runs no jobs itself', async () => {
    const admin = await signIn(web!, DEMO_ACCOUNTS.admin.email);
    const created = await request(web!.base)
      .post('/api/processes')
      .set(bearer(admin))
      .send({ definition: test250Definition('T250-two'), modelCard: { text: TEST_CARD_250, mapping: TEST_CARD_250_MAPPING } });
    expect(created.status).toBe(201);
    const processId = processProfileSchema.parse(created.body).id;
    const queued = await request(web!.base).post('/api/characterisations').set(bearer(admin)).send({ processId, grid: SMALL_GRID });
    expect(queued.status).toBe(202);
    const job = characterisationJobSchema.parse(queued.body);

    let last = job;
    for (let i = 0; i < 2400 && (last.status === 'queued' || last.status === 'running'); i++) {
      await new Promise((resolve) => setTimeout(resolve, 100));
      // Asked of the web process: the job's row is shared, whoever runs it.
      last = characterisationJobSchema.parse((await request(web!.base).get(`/api/characterisations/${job.id}`).set(bearer(admin)).expect(200)).body);
    }
    expect(last).toMatchObject({ status: 'done', attempts: 1 });
    // The web process is still up and took no job: only the worker can have run it.
    expect(web!.process.exitCode).toBeNull();
    const tables = await request(worker!.base).get(`/api/processes/${processId}/tables`).set(bearer(admin));
    expect(tables.status).toBe(200);
    expect(JSON.stringify(tables.body)).toContain('nmos');
  });

  it('shows through the web process a sign-off made through the worker, and the revision verifies there', async () => {
    const designer = await signIn(web!, DEMO_ACCOUNTS.designer.email);
    const reviewer = await signIn(worker!, DEMO_ACCOUNTS.reviewer.email);
    const [project] = (await request(web!.base).get('/api/projects').set(bearer(designer)).expect(200)).body as { id: string }[];
    const [sheet] = (await request(web!.base).get(`/api/projects/${project.id}/sheets`).set(bearer(designer)).expect(200)).body as { id: string }[];

    const revision = revisionSchema.parse((await request(web!.base).post(`/api/sheets/${sheet.id}/revisions`).set(bearer(designer)).send({ message: 'For sign-off across processes' }).expect(201)).body);
    const asked = reviewRequestSchema.parse(
      (await request(web!.base).post(`/api/revisions/${revision.id}/review-requests`).set(bearer(designer)).send({ reviewerEmail: DEMO_ACCOUNTS.reviewer.email }).expect(201)).body,
    );
    // The worker process sees the request the web process stored, and its reviewer signs.
    const decided = reviewRequestSchema.parse(
      (await request(worker!.base).post(`/api/review-requests/${asked.id}/decision`).set(bearer(reviewer)).send({ decision: 'approve', comment: 'Signed through the other process' }).expect(200)).body,
    );
    expect(decided).toMatchObject({ state: 'approved', signedHash: revision.hash });

    const seen = revisionSchema.parse((await request(web!.base).get(`/api/revisions/${revision.id}`).set(bearer(designer)).expect(200)).body);
    expect(seen.state).toBe('signed-off');
    expect(seen.signOff).toMatchObject({ reviewRequestId: asked.id, hash: revision.hash });
    const verified = await request(web!.base).get(`/api/revisions/${revision.id}/verify`).set(bearer(designer)).expect(200);
    expect(verified.body).toMatchObject({ valid: true, storedHash: revision.hash, computedHash: revision.hash, problems: [] });
    expect(verified.body.signatures.length).toBeGreaterThan(0);
  });
});
