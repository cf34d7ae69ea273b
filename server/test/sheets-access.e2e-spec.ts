import { sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { countDeviceRows, newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

type Method = 'get' | 'post' | 'patch' | 'delete';

interface Route {
  method: Method;
  path: (ids: { projectId: string; sheetId: string; deviceId: string }) => string;
  body?: (sheet: Sheet) => object;
  write: boolean;
  /** The status a designer gets. */
  ok: number;
}

/** Every sheet and device route, with a body that a designer's request would pass. */
const ROUTES: Route[] = [
  { method: 'get', path: (i) => `/api/projects/${i.projectId}/sheets`, write: false, ok: 200 },
  { method: 'post', path: (i) => `/api/projects/${i.projectId}/sheets`, body: (s) => ({ name: 'Another', processId: s.process.profileId }), write: true, ok: 201 },
  { method: 'get', path: (i) => `/api/sheets/${i.sheetId}`, write: false, ok: 200 },
  { method: 'patch', path: (i) => `/api/sheets/${i.sheetId}`, body: (s) => ({ version: s.version, description: 'changed' }), write: true, ok: 200 },
  { method: 'get', path: (i) => `/api/sheets/${i.sheetId}/devices`, write: false, ok: 200 },
  { method: 'post', path: (i) => `/api/sheets/${i.sheetId}/devices`, body: () => nmosTargets({ name: 'M99' }), write: true, ok: 201 },
  { method: 'patch', path: (i) => `/api/sheets/${i.sheetId}/devices/${i.deviceId}`, body: (s) => ({ version: s.devices[0].version, notes: 'changed' }), write: true, ok: 200 },
  { method: 'delete', path: (i) => `/api/sheets/${i.sheetId}/devices/${i.deviceId}`, write: true, ok: 204 },
  { method: 'post', path: (i) => `/api/sheets/${i.sheetId}/recompute`, write: true, ok: 200 },
  { method: 'get', path: (i) => `/api/sheets/${i.sheetId}/export?format=csv`, write: false, ok: 200 },
  { method: 'delete', path: (i) => `/api/sheets/${i.sheetId}`, write: true, ok: 204 },
];

const label = (route: Route) => `${route.method.toUpperCase()} ${route.path({ projectId: ':id', sheetId: ':id', deviceId: ':deviceId' })}`;

describe('who may do what with sheets and devices', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;
  let sheet: Sheet;
  let ids: { projectId: string; sheetId: string; deviceId: string };

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
    const bf180 = await processByName(t, tokens.designer, 'BF180-G');
    const created = await newSheet(t, tokens.designer, projectId, bf180.id, 'Access sheet');
    await t.http().post(`/api/sheets/${created.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets()).expect(201);
    sheet = sheetSchema.parse((await t.http().get(`/api/sheets/${created.id}`).set(bearer(tokens.designer)).expect(200)).body);
    ids = { projectId, sheetId: sheet.id, deviceId: sheet.devices[0].id };
  });
  afterAll(() => t.close());

  const send = (route: Route, token: string) => {
    const request = t.http()[route.method](route.path(ids)).set(bearer(token));
    return route.body ? request.send(route.body(sheet)) : request;
  };

  const snapshot = async () => ({
    sheet: (await t.http().get(`/api/sheets/${ids.sheetId}`).set(bearer(tokens.designer)).expect(200)).body,
    sheets: (await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).expect(200)).body.length,
    devices: await countDeviceRows(t),
  });

  describe.each([
    ['viewer', 'viewer'],
    ['reviewer', 'reviewer'],
  ] as const)('a %s', (_name, who) => {
    it.each(ROUTES.filter((r) => !r.write).map((r) => [label(r), r] as const))('may %s', async (_label, route) => {
      const response = await send(route, tokens[who]);
      expect(response.status).toBe(200);
    });

    it.each(ROUTES.filter((r) => r.write).map((r) => [label(r), r] as const))('gets 403 for %s, and nothing changes', async (_label, route) => {
      const before = await snapshot();
      const response = await send(route, tokens[who]);
      expect(response.status).toBe(403);
      expect(response.body).toMatchObject({ statusCode: 403, code: 'FORBIDDEN' });
      expect(await snapshot()).toEqual(before);
    });
  });

  describe('an outsider', () => {
    it.each(ROUTES.map((r) => [label(r), r] as const))('gets 404 for %s, the same answer as for a missing resource', async (_label, route) => {
      const before = await snapshot();
      const response = await send(route, tokens.outsider);
      expect(response.status).toBe(404);
      const missing = route.path(ids).startsWith('/api/projects/') ? 'PROJECT_NOT_FOUND' : 'SHEET_NOT_FOUND';
      expect(response.body).toEqual({ statusCode: 404, code: missing, message: expect.any(String) });
      expect(await snapshot()).toEqual(before);
    });

    it('gets exactly the body a sheet id that does not exist gets', async () => {
      const outsider = await t.http().get(`/api/sheets/${ids.sheetId}`).set(bearer(tokens.outsider)).expect(404);
      const missing = await t.http().get('/api/sheets/00000000-0000-4000-8000-000000000000').set(bearer(tokens.designer)).expect(404);
      expect(outsider.body).toEqual(missing.body);
    });
  });

  describe('an admin who is not a member', () => {
    it('reads and exports', async () => {
      await t.http().get(`/api/sheets/${ids.sheetId}`).set(bearer(tokens.admin)).expect(200);
      await t.http().get(`/api/sheets/${ids.sheetId}/export?format=csv`).set(bearer(tokens.admin)).expect(200);
    });

    it('gets 403 for a device edit', async () => {
      await t.http().post(`/api/sheets/${ids.sheetId}/devices`).set(bearer(tokens.admin)).send(nmosTargets({ name: 'MA' })).expect(403);
    });
  });

  describe('the designer (owner)', () => {
    it.each(ROUTES.map((r) => [label(r), r] as const))('may %s', async (_label, route) => {
      // Re-read before each write so the version sent is the stored one.
      sheet = sheetSchema.parse((await t.http().get(`/api/sheets/${ids.sheetId}`).set(bearer(tokens.designer)).expect(200)).body);
      ids.deviceId = sheet.devices[0]?.id ?? ids.deviceId;
      const response = await send(route, tokens.designer);
      expect(response.status).toBe(route.ok);
    });
  });
});
