import { processProfileSummarySchema } from '@channelwright/shared/schemas';
import { z } from 'zod';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { newSheet, processByName, wrenmoss } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const names = (body: unknown) => z.array(processProfileSummarySchema).parse(body).map((p) => p.name);
const sizeBody = (processId: string) => ({ processId, polarity: 'nmos', model: 'all-region', id: 20e-6, l: 0.5e-6, vds: 0.6, vsb: 0, vov: 0.2 });

describe('who reads the process library', () => {
  let t: TestApp;
  let newcomer: { token: string; id: string };
  let admin: string;
  let designer: string;
  let bf180: string;
  let bf130: string;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
    bf180 = (await processByName(t, admin, 'BF180-G')).id;
    bf130 = (await processByName(t, admin, 'BF130-G')).id;
    const registered = await t.register({ email: 'newcomer@marsh.example', displayName: 'New Comer', password: 'new-comer-pass-1' });
    newcomer = { token: registered.accessToken, id: registered.user.id };
  });
  afterAll(() => t.close());

  it('shows a fresh self-registered account no process profile, and answers every read by id as for a profile that does not exist', async () => {
    expect(names((await t.http().get('/api/processes?includeDeprecated=true').set(bearer(newcomer.token)).expect(200)).body)).toEqual([]);
    for (const path of [`/api/processes/${bf180}`, `/api/processes/${bf180}/versions`, `/api/processes/${bf180}/diff`, `/api/processes/${bf180}/export`]) {
      const hidden = await t.http().get(path).set(bearer(newcomer.token)).expect(404);
      const missing = await t.http().get(path.replace(bf180, '00000000-0000-4000-8000-000000000000')).set(bearer(newcomer.token)).expect(404);
      expect(hidden.body).toEqual(missing.body);
    }
    const computed = await t.http().post('/api/compute/size').set(bearer(newcomer.token)).send(sizeBody(bf180)).expect(404);
    expect(computed.body).toMatchObject({ code: 'PROCESS_NOT_FOUND', field: 'processId' });
  });

  it('does not let a sheet of the newcomer\'s own project reach a profile of the library', async () => {
    const project = (await t.http().post('/api/projects').set(bearer(newcomer.token)).send({ name: 'Side project' }).expect(201)).body;
    const refused = await t.http().post(`/api/projects/${project.id}/sheets`).set(bearer(newcomer.token)).send({ name: 'Probe', processId: bf180 }).expect(404);
    expect(refused.body).toMatchObject({ code: 'PROCESS_NOT_FOUND', field: 'processId' });
    expect(names((await t.http().get('/api/processes').set(bearer(newcomer.token)).expect(200)).body)).toEqual([]);
  });

  it('shows a member the profiles the project\'s sheets use, and only those', async () => {
    const project = await wrenmoss(t, designer);
    await t.http().post(`/api/projects/${project.id}/members`).set(bearer(designer)).send({ email: 'newcomer@marsh.example', role: 'viewer' }).expect(201);
    expect(names((await t.http().get('/api/processes').set(bearer(newcomer.token)).expect(200)).body)).toEqual(['BF180-G']);
    await t.http().get(`/api/processes/${bf180}/export`).set(bearer(newcomer.token)).expect(200);
    await t.http().post('/api/compute/size').set(bearer(newcomer.token)).send(sizeBody(bf180)).expect(200);
    await t.http().get(`/api/processes/${bf130}`).set(bearer(newcomer.token)).expect(404);

    // A sheet on BF130-G in that project opens BF130-G to its members too.
    await t.http().patch(`/api/projects/${project.id}/members/${newcomer.id}`).set(bearer(designer)).send({ role: 'designer' }).expect(200);
    await newSheet(t, designer, project.id, bf130, 'Level shifter');
    expect(names((await t.http().get('/api/processes').set(bearer(newcomer.token)).expect(200)).body)).toEqual(['BF130-G', 'BF180-G']);
  });

  it('lets an admin grant library access on the users page, which opens every profile, and take it back', async () => {
    const other = await t.register({ email: 'granted@marsh.example', displayName: 'Granted', password: 'granted-pass-1' });
    expect(names((await t.http().get('/api/processes').set(bearer(other.accessToken)).expect(200)).body)).toEqual([]);
    const granted = await t.http().patch(`/api/users/${other.user.id}`).set(bearer(admin)).send({ libraryAccess: true }).expect(200);
    expect(granted.body).toMatchObject({ libraryAccess: true, role: 'member' });
    expect(names((await t.http().get('/api/processes').set(bearer(other.accessToken)).expect(200)).body)).toEqual(['BF130-G', 'BF180-G']);
    await t.http().patch(`/api/users/${other.user.id}`).set(bearer(admin)).send({ libraryAccess: false }).expect(200);
    await t.http().get(`/api/processes/${bf180}`).set(bearer(other.accessToken)).expect(404);
  });

  it('keeps the demo accounts as they were: designer and reviewer read the whole library, the viewer the demo project\'s process', async () => {
    for (const account of [DEMO_ACCOUNTS.designer, DEMO_ACCOUNTS.reviewer, DEMO_ACCOUNTS.admin]) {
      expect(names((await t.http().get('/api/processes').set(bearer(await t.loginAs(account.email))).expect(200)).body)).toEqual(['BF130-G', 'BF180-G']);
    }
    expect(names((await t.http().get('/api/processes').set(bearer(await t.loginAs(DEMO_ACCOUNTS.viewer.email))).expect(200)).body)).toContain('BF180-G');
  });
});
