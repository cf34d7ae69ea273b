import { BF130G, BF180G, DEMO_DATA_NOTICE } from '@channelwright/shared/device';
import {
  PARAMETER_CONVENTION,
  apiErrorBodySchema,
  processDiffSchema,
  processFileSchema,
  processProfileSchema,
  processProfileSummarySchema,
  processVersionSummarySchema,
} from '@channelwright/shared/schemas';
import { ProcessesService } from '../src/processes/processes.service.js';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { countLibraryRows, createRequest, testProcess } from './fixtures/processes/process-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('the process-profile library', () => {
  let t: TestApp;
  let admin: string;
  let designer: string;

  beforeAll(async () => {
    t = await createTestApp();
    admin = await t.loginAs(DEMO_ACCOUNTS.admin.email);
    designer = await t.loginAs(DEMO_ACCOUNTS.designer.email);
  });
  afterAll(() => t.close());

  const create = async (name: string, change?: Parameters<typeof createRequest>[1]) =>
    processProfileSchema.parse((await t.http().post('/api/processes').set(bearer(admin)).send(createRequest(name, change)).expect(201)).body);

  describe('the seeded demo profiles', () => {
    it('lists BF130-G and BF180-G, created by the demo admin, marked as invented demo data', async () => {
      const response = await t.http().get('/api/processes').set(bearer(designer)).expect(200);
      const list = response.body.map((row: unknown) => processProfileSummarySchema.parse(row));
      expect(list.filter((p: { demoData: boolean }) => p.demoData).map((p: { name: string }) => p.name)).toEqual(['BF130-G', 'BF180-G']);
      const bf180 = list.find((p: { name: string }) => p.name === 'BF180-G');
      expect(bf180).toMatchObject({
        nodeClass: '180 nm',
        vdd: BF180G.vdd,
        tnom: 27,
        corners: ['TT', 'FF', 'SS', 'FS', 'SF'],
        latestVersion: 1,
        deprecated: false,
        updatedBy: { displayName: DEMO_ACCOUNTS.admin.displayName },
      });
      expect(bf180.description).toContain(DEMO_DATA_NOTICE);
    });

    it('answers GET /api/processes/:id with the full definition, exactly as seeded', async () => {
      const [bf130] = (await t.http().get('/api/processes?search=BF130').set(bearer(designer)).expect(200)).body;
      const profile = processProfileSchema.parse((await t.http().get(`/api/processes/${bf130.id}`).set(bearer(designer)).expect(200)).body);
      expect(profile.version.definition).toEqual(BF130G);
      expect(profile.version).toMatchObject({ number: 1, message: DEMO_DATA_NOTICE, author: { displayName: DEMO_ACCOUNTS.admin.displayName } });
    });

    it('needs a signed-in user to read', async () => {
      await t.http().get('/api/processes').expect(401);
    });
  });

  describe('creating and versioning', () => {
    it('creates a profile with version 1, then each edit adds a version and the old ones stay readable', async () => {
      const created = await create('BF-CRUD-1');
      expect(created).toMatchObject({ name: 'BF-CRUD-1', nodeClass: '180 nm', latestVersion: 1, demoData: false, version: { number: 1, message: 'first cut', parameterConvention: PARAMETER_CONVENTION } });
      expect(created.updatedBy?.displayName).toBe(DEMO_ACCOUNTS.admin.displayName);

      const edited = testProcess('BF-CRUD-1', (p) => (p.nmos.kp = 300e-6));
      const v2 = await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, message: 'kp from the new lot', definition: edited }).expect(200);
      expect(processProfileSchema.parse(v2.body)).toMatchObject({ latestVersion: 2, version: { number: 2, message: 'kp from the new lot' } });
      expect(v2.body.version.definition.nmos.kp).toBe(300e-6);

      const old = await t.http().get(`/api/processes/${created.id}?version=1`).set(bearer(designer)).expect(200);
      expect(old.body.version.number).toBe(1);
      expect(old.body.version.definition.nmos.kp).toBe(BF180G.nmos.kp);
      expect(old.body.latestVersion).toBe(2);

      const versions = (await t.http().get(`/api/processes/${created.id}/versions`).set(bearer(designer)).expect(200)).body;
      expect(versions.map((v: unknown) => processVersionSummarySchema.parse(v).number)).toEqual([2, 1]);
      expect(versions[0].message).toBe('kp from the new lot');
    });

    it('tells which parameters changed between two versions, from what to what, with their units', async () => {
      const created = await create('BF-DIFF-1');
      const edited = testProcess('BF-DIFF-1', (p) => {
        p.nmos.kp = 300e-6;
        p.pmos.vt0 = 0.5;
        p.vdd = 1.9;
        p.corners = p.corners.filter((c) => c.name !== 'SF');
        // The demo corners share their shift objects: replace, do not mutate.
        p.corners[1] = { ...p.corners[1], nmos: { dvt: -0.05, kpScale: 1.1 } };
      });
      await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: edited }).expect(200);
      const diff = processDiffSchema.parse((await t.http().get(`/api/processes/${created.id}/diff?from=1&to=2`).set(bearer(designer)).expect(200)).body);
      const byPath = Object.fromEntries(diff.changes.map((c) => [c.path, c]));
      expect(byPath['nmos.kp']).toEqual({ path: 'nmos.kp', group: 'nmos', kind: 'changed', unit: 'A/V²', from: BF180G.nmos.kp, to: 300e-6 });
      expect(byPath['pmos.vt0']).toMatchObject({ kind: 'changed', unit: 'V', from: BF180G.pmos.vt0, to: 0.5 });
      expect(byPath.vdd).toMatchObject({ group: 'process', from: 1.8, to: 1.9, unit: 'V' });
      expect(byPath['corners.FF.nmos.dvt']).toMatchObject({ group: 'corners', from: -0.04, to: -0.05 });
      expect(byPath['corners.SF.pmos.kpScale']).toMatchObject({ kind: 'removed', from: 1.1, to: null });
      expect(diff.changes.filter((c) => c.kind === 'removed')).toHaveLength(4);
      expect(diff.changes).toHaveLength(8); // vdd, nmos.kp, pmos.vt0, FF nmos dvt, four SF values
      // Defaults: the latest against the one before.
      const defaults = (await t.http().get(`/api/processes/${created.id}/diff`).set(bearer(designer)).expect(200)).body;
      expect(defaults).toMatchObject({ from: 1, to: 2, changes: diff.changes });
      const reverse = (await t.http().get(`/api/processes/${created.id}/diff?from=2&to=1`).set(bearer(designer)).expect(200)).body;
      expect(reverse.changes.find((c: { path: string }) => c.path === 'corners.SF.pmos.kpScale')).toMatchObject({ kind: 'added', from: null, to: 1.1 });
    });

    it('refuses a stale edit with 409 STALE_EDIT naming who saved first, and writes nothing', async () => {
      const created = await create('BF-STALE-1');
      const mine = testProcess('BF-STALE-1', (p) => (p.nmos.vt0 = 0.5));
      const theirs = testProcess('BF-STALE-1', (p) => (p.nmos.vt0 = 0.4));
      await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: theirs }).expect(200);
      const before = await countLibraryRows(t.dataSource);
      const response = await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: mine }).expect(409);
      expect(apiErrorBodySchema.parse(response.body)).toMatchObject({ statusCode: 409, code: 'STALE_EDIT', field: 'baseVersion' });
      expect(response.body.message).toContain(`Version 2 was saved by ${DEMO_ACCOUNTS.admin.displayName}`);
      expect(await countLibraryRows(t.dataSource)).toEqual(before);
      const latest = (await t.http().get(`/api/processes/${created.id}`).set(bearer(admin)).expect(200)).body;
      expect(latest.version.definition.nmos.vt0).toBe(0.4);
    });

    it('lets only one of two edits of the same version through when they arrive together', async () => {
      const created = await create('BF-RACE-1');
      const edit = (vt0: number) =>
        t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: testProcess('BF-RACE-1', (p) => (p.nmos.vt0 = vt0)) });
      const statuses = (await Promise.all([edit(0.41), edit(0.43)])).map((r) => r.status).sort();
      expect(statuses).toEqual([200, 409]);
      expect((await t.http().get(`/api/processes/${created.id}/versions`).set(bearer(admin))).body).toHaveLength(2);
    });

    it('refuses an edit that changes nothing with 400 NO_CHANGES, and a baseVersion that does not exist', async () => {
      const created = await create('BF-SAME-1');
      const same = await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: testProcess('BF-SAME-1') }).expect(400);
      expect(same.body.code).toBe('NO_CHANGES');
      const future = await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 9, definition: testProcess('BF-SAME-1', (p) => (p.vdd = 2)) }).expect(400);
      expect(future.body).toMatchObject({ code: 'PROCESS_VERSION_NOT_FOUND', field: 'baseVersion' });
    });

    it('changes the node class without a new version when the numbers are the same', async () => {
      const created = await create('BF-NODE-1');
      const response = await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, nodeClass: '0.18 µm', definition: testProcess('BF-NODE-1') }).expect(200);
      expect(response.body).toMatchObject({ nodeClass: '0.18 µm', latestVersion: 1 });
    });

    it('keeps names unique regardless of case, on create and on rename', async () => {
      await create('BF-Unique');
      const before = await countLibraryRows(t.dataSource);
      const clash = await t.http().post('/api/processes').set(bearer(admin)).send(createRequest('bf-UNIQUE')).expect(409);
      expect(clash.body).toMatchObject({ code: 'PROCESS_NAME_TAKEN', field: 'definition.name' });
      const other = await create('BF-Other');
      const rename = await t.http().put(`/api/processes/${other.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: testProcess('BF-UNIQUE') }).expect(409);
      expect(rename.body.code).toBe('PROCESS_NAME_TAKEN');
      expect(await countLibraryRows(t.dataSource)).toEqual({ profiles: before.profiles + 1, versions: before.versions + 1 });
    });

    it('answers bad bodies with 400 naming the field, and unknown ids and versions with 404', async () => {
      const badKp = createRequest('BF-BAD-1', (p) => (p.nmos.kp = 5));
      const response = await t.http().post('/api/processes').set(bearer(admin)).send(badKp).expect(400);
      expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'definition.nmos.kp' });
      const missing = await t.http().put('/api/processes/00000000-0000-0000-0000-000000000000').set(bearer(admin)).send({ baseVersion: 1, definition: testProcess('X') }).expect(404);
      expect(missing.body.code).toBe('PROCESS_NOT_FOUND');
      const created = await create('BF-404-1');
      const noVersion = await t.http().get(`/api/processes/${created.id}?version=7`).set(bearer(admin)).expect(404);
      expect(noVersion.body).toMatchObject({ code: 'PROCESS_VERSION_NOT_FOUND', field: 'version' });
      const badVersion = await t.http().get(`/api/processes/${created.id}?version=two`).set(bearer(admin)).expect(400);
      expect(badVersion.body.field).toBe('version');
      const noBase = await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ definition: testProcess('BF-404-1') }).expect(400);
      expect(noBase.body.field).toBe('baseVersion');
    });

    it('refuses to change a stored version in the database itself', async () => {
      const created = await create('BF-IMMUTABLE-1');
      await expect(t.query(`UPDATE process_versions SET definition = '{}' WHERE id = ?`, [created.version.id])).rejects.toThrow(/immutable/);
      const stored = (await t.http().get(`/api/processes/${created.id}`).set(bearer(admin)).expect(200)).body;
      expect(stored.version.definition.name).toBe('BF-IMMUTABLE-1');
    });
  });

  describe('search, deprecation and deletion', () => {
    it('finds profiles by part of the name, node class or description, ignoring case', async () => {
      await create('BF-SEARCH-Alpha');
      const names = async (query: string) => (await t.http().get(`/api/processes?${query}`).set(bearer(designer)).expect(200)).body.map((p: { name: string }) => p.name);
      expect(await names('search=search-alpha')).toEqual(['BF-SEARCH-Alpha']);
      expect(await names('search=130%20nm')).toEqual(['BF130-G']);
      expect(await names('search=no-such-profile')).toEqual([]);
    });

    it('hides a deprecated profile from the list unless asked, keeps it readable, and can restore it', async () => {
      const created = await create('BF-DEPRECATE-1');
      const response = await t.http().post(`/api/processes/${created.id}/deprecate`).set(bearer(admin)).send({}).expect(200);
      expect(response.body.deprecated).toBe(true);
      const listed = async (query = '') => (await t.http().get(`/api/processes${query}`).set(bearer(designer)).expect(200)).body.map((p: { id: string }) => p.id);
      expect(await listed()).not.toContain(created.id);
      expect(await listed('?includeDeprecated=true')).toContain(created.id);
      await t.http().get(`/api/processes/${created.id}`).set(bearer(designer)).expect(200);
      const resolved = await t.app.get(ProcessesService).resolveDefinition(created.id);
      expect(resolved.deprecated).toBe(true);
      await t.http().post(`/api/processes/${created.id}/deprecate`).set(bearer(admin)).send({ deprecated: false }).expect(200);
      expect(await listed()).toContain(created.id);
    });

    it('deletes an unused profile with all its versions', async () => {
      const created = await create('BF-DELETE-1');
      const before = await countLibraryRows(t.dataSource);
      await t.http().delete(`/api/processes/${created.id}`).set(bearer(admin)).expect(204);
      await t.http().get(`/api/processes/${created.id}`).set(bearer(admin)).expect(404);
      expect(await countLibraryRows(t.dataSource)).toEqual({ profiles: before.profiles - 1, versions: before.versions - 1 });
    });

    it('refuses with 409 PROCESS_IN_USE to delete a profile a row elsewhere points at, and deletes nothing', async () => {
      // A stand-in for the sheets table: any table with a foreign key to a process version counts.
      await t.query(`CREATE TABLE "test_sheets" ("id" varchar PRIMARY KEY, "processVersionId" varchar NOT NULL REFERENCES "process_versions" ("id"))`);
      const created = await create('BF-INUSE-1');
      await t.query(`INSERT INTO "test_sheets" ("id", "processVersionId") VALUES ('ts-1', ?)`, [created.version.id]);
      const before = await countLibraryRows(t.dataSource);
      const response = await t.http().delete(`/api/processes/${created.id}`).set(bearer(admin)).expect(409);
      expect(response.body).toMatchObject({ code: 'PROCESS_IN_USE' });
      expect(response.body.message).toContain('1 in test_sheets');
      expect(await countLibraryRows(t.dataSource)).toEqual(before);
      await t.query(`DROP TABLE "test_sheets"`);
    });
  });

  describe('who may change the library', () => {
    it('refuses every write of a designer with 403 NOT_PROCESS_MAINTAINER and stores nothing', async () => {
      const target = await create('BF-GUARD-1');
      const before = await countLibraryRows(t.dataSource);
      const attempts = [
        t.http().post('/api/processes').set(bearer(designer)).send(createRequest('BF-GUARD-2')),
        t.http().put(`/api/processes/${target.id}`).set(bearer(designer)).send({ baseVersion: 1, definition: testProcess('BF-GUARD-1', (p) => (p.vdd = 2)) }),
        t.http().post(`/api/processes/${target.id}/deprecate`).set(bearer(designer)).send({}),
        t.http().delete(`/api/processes/${target.id}`).set(bearer(designer)),
        t.http().post('/api/processes/import').set(bearer(designer)).attach('file', Buffer.from('parameter,polarity,value,unit\n'), 'p.csv'),
      ];
      for (const response of await Promise.all(attempts)) {
        expect(response.status).toBe(403);
        expect(response.body.code).toBe('NOT_PROCESS_MAINTAINER');
      }
      expect(await countLibraryRows(t.dataSource)).toEqual(before);
      expect((await t.http().get(`/api/processes/${target.id}`).set(bearer(designer)).expect(200)).body.deprecated).toBe(false);
    });

    it('lets a member an admin marked as process maintainer create and edit', async () => {
      const users = (await t.http().get('/api/users').set(bearer(admin)).expect(200)).body;
      const reviewer = users.find((u: { email: string }) => u.email === DEMO_ACCOUNTS.reviewer.email);
      await t.http().patch(`/api/users/${reviewer.id}`).set(bearer(admin)).send({ processMaintainer: true }).expect(200);
      const token = await t.loginAs(DEMO_ACCOUNTS.reviewer.email);
      const created = await t.http().post('/api/processes').set(bearer(token)).send(createRequest('BF-MAINTAINER-1')).expect(201);
      expect(created.body.updatedBy.displayName).toBe(DEMO_ACCOUNTS.reviewer.displayName);
      await t.http().patch(`/api/users/${reviewer.id}`).set(bearer(admin)).send({ processMaintainer: false }).expect(200);
      await t.http().post('/api/processes').set(bearer(token)).send(createRequest('BF-MAINTAINER-2')).expect(403);
    });
  });

  describe('export and resolving for computations', () => {
    it('exports one version as our JSON file with schemaVersion, which imports back to the same numbers', async () => {
      const created = await create('BF-EXPORT-1');
      await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: testProcess('BF-EXPORT-1', (p) => (p.nmos.lambda = 0.07)) }).expect(200);
      const response = await t.http().get(`/api/processes/${created.id}/export?version=1`).set(bearer(designer)).expect(200);
      expect(response.headers['content-disposition']).toMatch(/^attachment; filename="?BF-EXPORT-1-v1\.process\.json"?$/);
      const file = processFileSchema.parse(response.body);
      expect(file).toMatchObject({ format: 'channelwright-process', schemaVersion: 1, nodeClass: '180 nm', source: { profileId: created.id, version: 1 } });
      expect(file.process).toEqual(testProcess('BF-EXPORT-1'));

      file.process.name = 'BF-EXPORT-1 copy';
      const imported = await t.http().post('/api/processes/import').set(bearer(admin)).attach('file', Buffer.from(JSON.stringify(file)), 'copy.json').expect(201);
      expect(imported.body.version.definition).toEqual({ ...testProcess('BF-EXPORT-1'), name: 'BF-EXPORT-1 copy' });
    });

    it('resolves a profile and version to its definition for the compute API and sheets', async () => {
      const created = await create('BF-RESOLVE-1');
      const v2 = (await t.http().put(`/api/processes/${created.id}`).set(bearer(admin)).send({ baseVersion: 1, definition: testProcess('BF-RESOLVE-1', (p) => (p.vdd = 1.7)) }).expect(200)).body;
      const service = t.app.get(ProcessesService);
      const latest = await service.resolveDefinition(created.id);
      expect(latest).toMatchObject({ profileId: created.id, name: 'BF-RESOLVE-1', version: 2, versionId: v2.version.id, deprecated: false });
      expect(latest.definition.vdd).toBe(1.7);
      expect((await service.resolveDefinition(created.id, 1)).definition.vdd).toBe(1.8);
      expect(await service.resolveVersion(created.version.id)).toMatchObject({ version: 1, versionId: created.version.id, profileId: created.id });
      await expect(service.resolveDefinition(created.id, 3)).rejects.toMatchObject({ code: 'PROCESS_VERSION_NOT_FOUND', status: 404, field: 'processVersion' });
      await expect(service.resolveDefinition('no-such-id')).rejects.toMatchObject({ code: 'PROCESS_NOT_FOUND', status: 404, field: 'processId' });
    });
  });
});
