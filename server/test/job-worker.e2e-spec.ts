import { rmSync } from 'node:fs';
import { characterisationJobSchema, type Extraction, extractionSchema } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { createCardProfile, finished, followJob, SMALL_GRID } from './helpers/characterisation.js';
import { level1CurveFile } from './helpers/level1-curves.js';
import { describeWithNgspice, requireNativeNgspice } from './helpers/ngspice.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

// A "web" server (JOB_WORKER=false) and a "worker" server on one data directory (SQLite; on PostgreSQL the same
// split runs through pg-boss, src/characterisation/jobs/pg-boss-job-queue.spec.ts): the web server stores jobs and
// runs none, the worker runs them.

jest.setTimeout(240_000);

const WEB = { JOB_WORKER: 'false' };

/** Starts the web server, then the worker on its data directory; both are closed (and the data removed) after `test`. */
async function webAndWorker(test: (web: TestApp, startWorker: () => Promise<TestApp>) => Promise<void>): Promise<void> {
  const web = await createTestApp({ env: WEB });
  let worker: TestApp | undefined;
  try {
    await test(web, async () => {
      worker = await createTestApp({ dataDir: web.dataDir });
      return worker;
    });
  } finally {
    await worker?.close({ keepData: true });
    await web.close({ keepData: true });
    rmSync(web.dataDir, { recursive: true, force: true });
  }
}

describe('a server with JOB_WORKER=false beside a worker server', () => {
  it('stores a characterisation queued without running it; the worker runs it to done', async () => {
    await webAndWorker(async (web, startWorker) => {
      const admin = await web.loginAs(DEMO_ACCOUNTS.admin.email);
      const processId = (await createCardProfile(web, admin, 'T250-web')).id;
      const job = characterisationJobSchema.parse((await web.http().post('/api/characterisations').set(bearer(admin)).send({ processId, grid: SMALL_GRID }).expect(202)).body);
      // The web server's enqueue returned: a worker of its own would have claimed the job by now.
      const stored = characterisationJobSchema.parse((await web.http().get(`/api/characterisations/${job.id}`).set(bearer(admin)).expect(200)).body);
      expect(stored).toMatchObject({ status: 'queued', attempts: 0 });

      await startWorker();
      const last = (await followJob(web, admin, job.id, finished)).at(-1);
      expect(last).toMatchObject({ status: 'done', attempts: 1 });
    });
  });
});

describeWithNgspice('extraction fits beside a worker server', () => {
  it('are stored queued by the web server and run by the worker, also those stored after it started', async () => {
    requireNativeNgspice();
    const csv = level1CurveFile({ polarity: 'nmos', card: { vto: 0.6, kp: 120e-6, gamma: 0.5, phi: 0.75, lambda: 0.04 }, w: 10e-6, l: 2e-6, drains: [0.1, 1, 2], bodies: [0, 1], vgsMax: 3.3, step: 0.05 });
    await webAndWorker(async (web, startWorker) => {
      const admin = await web.loginAs(DEMO_ACCOUNTS.admin.email);
      const profiles = (await web.http().get('/api/processes').set(bearer(admin)).expect(200)).body as { id: string; name: string }[];
      const bf180 = profiles.find((p) => p.name === 'BF180-G')!.id;
      const upload = async () => {
        const request = web.http().post('/api/extractions').set(bearer(admin));
        for (const [key, value] of Object.entries({ processId: bf180, polarity: 'nmos', w: '10u', l: '2u', model: 'square-law' })) request.field(key, value);
        return extractionSchema.parse((await request.attach('file', Buffer.from(csv), 'level1.csv').expect(202)).body);
      };
      const ended = async (id: string): Promise<Extraction> => {
        for (;;) {
          const job = extractionSchema.parse((await web.http().get(`/api/extractions/${id}`).set(bearer(admin)).expect(200)).body);
          if (job.status !== 'queued' && job.status !== 'running') return job;
          await new Promise((resolve) => setTimeout(resolve, 100));
        }
      };

      const before = await upload();
      expect(before).toMatchObject({ status: 'queued', attempts: 0 });
      await startWorker();
      expect(await ended(before.id)).toMatchObject({ status: 'done', attempts: 1 });
      // Stored by the web server while the worker is up: the worker's poll finds it.
      const after = await upload();
      expect(await ended(after.id)).toMatchObject({ status: 'done', attempts: 1 });
    });
  });
});
