import { apiErrorBodySchema, projectMemberListSchema, projectSchema, sheetListSchema } from '@channelwright/shared/schemas';
import { WRENMOSS_PROJECT } from '../src/projects/projects-demo.seeder.js';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('projects and membership', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
  });
  afterAll(() => t.close());

  const members = async (id = projectId) => projectMemberListSchema.parse((await t.http().get(`/api/projects/${id}/members`).set(bearer(tokens.designer)).expect(200)).body);

  describe('the seeded Wrenmoss project', () => {
    it('is owned by the demo designer with the reviewer and the viewer as members, the admin not a member', async () => {
      const list = await members();
      expect(list.map((m) => [m.email, m.role])).toEqual([
        [DEMO_ACCOUNTS.designer.email, 'owner'],
        [DEMO_ACCOUNTS.reviewer.email, 'reviewer'],
        [DEMO_ACCOUNTS.viewer.email, 'viewer'],
      ]);
    });

    it('says it is invented demo data and holds the three sheets of the demo scenario', async () => {
      const project = projectSchema.parse((await t.http().get(`/api/projects/${projectId}`).set(bearer(tokens.viewer)).expect(200)).body);
      expect(project).toMatchObject({ name: WRENMOSS_PROJECT.name, myRole: 'viewer', memberCount: 3, sheetCount: 3 });
      expect(project.description).toMatch(/^Invented demo data/);
      const sheets = sheetListSchema.parse((await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.viewer)).expect(200)).body);
      expect(sheets.map((s) => s.name)).toEqual(['Bias generator', 'Sleep switch', 'Two-stage amplifier']);
      expect(sheets.every((s) => s.process.name === 'BF180-G' && !s.stale && s.deviceCount > 0)).toBe(true);
    });

    it('is listed for its members and for admins, each with their own role', async () => {
      for (const [token, role] of [[tokens.designer, 'owner'], [tokens.reviewer, 'reviewer'], [tokens.viewer, 'viewer'], [tokens.admin, null]] as const) {
        const list = (await t.http().get('/api/projects').set(bearer(token)).expect(200)).body;
        expect(list.filter((p: { id: string }) => p.id === projectId).map((p: { myRole: string | null }) => p.myRole)).toEqual([role]);
      }
    });
  });

  describe('outsiders', () => {
    it('do not see the project in their list', async () => {
      const list = (await t.http().get('/api/projects').set(bearer(tokens.outsider)).expect(200)).body;
      expect(list).toEqual([]);
    });

    it('get the same 404 for the project and its member list as for a project that does not exist', async () => {
      const missing = (await t.http().get('/api/projects/00000000-0000-4000-8000-000000000000').set(bearer(tokens.outsider)).expect(404)).body;
      expect(missing).toEqual({ statusCode: 404, code: 'PROJECT_NOT_FOUND', message: expect.any(String) });
      for (const path of [`/api/projects/${projectId}`, `/api/projects/${projectId}/members`, `/api/projects/${projectId}/sheets`]) {
        const response = await t.http().get(path).set(bearer(tokens.outsider)).expect(404);
        expect(response.body).toEqual(missing);
      }
      await t.http().patch(`/api/projects/${projectId}`).set(bearer(tokens.outsider)).send({ version: 1, name: 'Taken over' }).expect(404);
      await t.http().post(`/api/projects/${projectId}/members`).set(bearer(tokens.outsider)).send({ email: 'outsider@elsewhere.example', role: 'owner' }).expect(404);
      expect((await members()).length).toBe(3);
    });

    it('need to sign in first', async () => {
      await t.http().get('/api/projects').expect(401);
      await t.http().get(`/api/projects/${projectId}`).expect(401);
    });
  });

  describe('creating and editing', () => {
    it('makes the creator the owner of a new project', async () => {
      const response = await t.http().post('/api/projects').set(bearer(tokens.outsider)).send({ name: '  Loam probe  ', description: 'A second block' }).expect(201);
      const project = projectSchema.parse(response.body);
      expect(project).toMatchObject({ name: 'Loam probe', description: 'A second block', version: 1, myRole: 'owner', memberCount: 1, sheetCount: 0 });
      const list = projectMemberListSchema.parse((await t.http().get(`/api/projects/${project.id}/members`).set(bearer(tokens.outsider)).expect(200)).body);
      expect(list.map((m) => [m.email, m.role])).toEqual([['outsider@elsewhere.example', 'owner']]);
      // The demo designer is not in it: 404, not 403.
      await t.http().get(`/api/projects/${project.id}`).set(bearer(tokens.designer)).expect(404);
    });

    it('refuses a project without a name, naming the field, and stores nothing', async () => {
      const before = (await t.http().get('/api/projects').set(bearer(tokens.admin))).body.length;
      const response = await t.http().post('/api/projects').set(bearer(tokens.designer)).send({ name: '   ' }).expect(400);
      expect(apiErrorBodySchema.parse(response.body)).toMatchObject({ code: 'VALIDATION_FAILED', field: 'name' });
      expect((await t.http().get('/api/projects').set(bearer(tokens.admin))).body.length).toBe(before);
    });

    it('lets the owner rename with the version edited, and answers a stale rename 409 STALE_EDIT writing nothing', async () => {
      const created = (await t.http().post('/api/projects').set(bearer(tokens.designer)).send({ name: 'Rename me' }).expect(201)).body;
      const renamed = (await t.http().patch(`/api/projects/${created.id}`).set(bearer(tokens.designer)).send({ version: 1, name: 'Renamed once' }).expect(200)).body;
      expect(renamed).toMatchObject({ name: 'Renamed once', version: 2 });
      const stale = await t.http().patch(`/api/projects/${created.id}`).set(bearer(tokens.designer)).send({ version: 1, name: 'From an old tab' }).expect(409);
      expect(stale.body).toMatchObject({ statusCode: 409, code: 'STALE_EDIT', field: 'version' });
      expect((await t.http().get(`/api/projects/${created.id}`).set(bearer(tokens.designer))).body).toMatchObject({ name: 'Renamed once', version: 2 });
    });

    it('records the creation and the rename in the project audit trail, and nothing for a refused rename', async () => {
      const created = (await t.http().post('/api/projects').set(bearer(tokens.designer)).send({ name: 'Audited project' }).expect(201)).body;
      await t.http().patch(`/api/projects/${created.id}`).set(bearer(tokens.designer)).send({ version: 1, name: 'Audited project, renamed' }).expect(200);
      await t.http().patch(`/api/projects/${created.id}`).set(bearer(tokens.designer)).send({ version: 1, name: 'Stale' }).expect(409);
      const events = (await t.http().get(`/api/projects/${created.id}/audit`).query({ entityType: 'project' }).set(bearer(tokens.designer)).expect(200)).body;
      expect(events.map((e: { action: string }) => e.action)).toEqual(['project.updated', 'project.created']);
      expect(events[0]).toMatchObject({ before: { name: 'Audited project' }, after: { name: 'Audited project, renamed' }, summary: 'Renamed the project Audited project to Audited project, renamed' });
    });

    it('lets only owners and admins rename: reviewers and viewers get 403', async () => {
      for (const token of [tokens.reviewer, tokens.viewer]) {
        const response = await t.http().patch(`/api/projects/${projectId}`).set(bearer(token)).send({ version: 1, name: 'Not mine' }).expect(403);
        expect(response.body.code).toBe('FORBIDDEN');
      }
      const project = (await t.http().get(`/api/projects/${projectId}`).set(bearer(tokens.admin)).expect(200)).body;
      expect(project.myRole).toBeNull();
      expect(project.name).toBe(WRENMOSS_PROJECT.name);
    });
  });

  describe('managing members', () => {
    let blockId: string;
    let colleague: { id: string; email: string };

    beforeAll(async () => {
      blockId = (await t.http().post('/api/projects').set(bearer(tokens.designer)).send({ name: 'Members block' }).expect(201)).body.id;
      const registered = await t.register({ email: 'colleague@brackenfold.example', displayName: 'A Colleague', password: 'a-colleague-1' });
      colleague = { id: registered.user.id, email: registered.user.email };
    });

    it('adds a member by e-mail (any case) with a role, who then sees the project with that role', async () => {
      const response = await t.http().post(`/api/projects/${blockId}/members`).set(bearer(tokens.designer)).send({ email: 'Colleague@Brackenfold.Example', role: 'designer' }).expect(201);
      expect(response.body).toMatchObject({ userId: colleague.id, email: colleague.email, role: 'designer' });
      const token = await t.loginAs(colleague.email, 'a-colleague-1');
      expect((await t.http().get(`/api/projects/${blockId}`).set(bearer(token)).expect(200)).body.myRole).toBe('designer');
    });

    it('answers 409 MEMBER_EXISTS for a member added twice, naming the field, and an unknown e-mail exactly like a known one, adding nobody', async () => {
      const twice = await t.http().post(`/api/projects/${blockId}/members`).set(bearer(tokens.designer)).send({ email: colleague.email, role: 'viewer' }).expect(409);
      expect(twice.body).toMatchObject({ code: 'MEMBER_EXISTS', field: 'email' });
      const unknown = await t.http().post(`/api/projects/${blockId}/members`).set(bearer(tokens.designer)).send({ email: 'nobody@brackenfold.example', role: 'viewer' }).expect(201);
      const known = await t.http().post(`/api/projects/${blockId}/members`).set(bearer(tokens.designer)).send({ email: DEMO_ACCOUNTS.viewer.email, role: 'viewer' }).expect(201);
      const shape = (body: Record<string, unknown>) => Object.fromEntries(Object.entries(body).map(([key, value]) => [key, key === 'email' || key === 'displayName' ? 'the address' : typeof value]));
      expect(shape(unknown.body)).toEqual(shape(known.body));
      expect(unknown.body).toMatchObject({ email: 'nobody@brackenfold.example', displayName: 'nobody@brackenfold.example', role: 'viewer' });
      await t.http().delete(`/api/projects/${blockId}/members/${known.body.userId}`).set(bearer(tokens.designer)).expect(204);
      const badRole = await t.http().post(`/api/projects/${blockId}/members`).set(bearer(tokens.designer)).send({ email: colleague.email, role: 'boss' }).expect(400);
      expect(badRole.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'role' });
      expect((await members(blockId)).map((m) => m.role)).toEqual(['owner', 'designer']);
    });

    it('changes a role, and a designer may not manage members (403)', async () => {
      const colleagueToken = await t.loginAs(colleague.email, 'a-colleague-1');
      const refused = await t.http().post(`/api/projects/${blockId}/members`).set(bearer(colleagueToken)).send({ email: DEMO_ACCOUNTS.viewer.email, role: 'viewer' }).expect(403);
      expect(refused.body.code).toBe('FORBIDDEN');
      await t.http().patch(`/api/projects/${blockId}/members/${colleague.id}`).set(bearer(tokens.designer)).send({ role: 'reviewer' }).expect(200);
      expect((await t.http().get(`/api/projects/${blockId}`).set(bearer(colleagueToken)).expect(200)).body.myRole).toBe('reviewer');
    });

    it('keeps at least one owner: demoting or removing the last owner is 409 LAST_OWNER and changes nothing', async () => {
      const designer = (await members(blockId)).find((m) => m.role === 'owner')!;
      const demote = await t.http().patch(`/api/projects/${blockId}/members/${designer.userId}`).set(bearer(tokens.designer)).send({ role: 'viewer' }).expect(409);
      expect(demote.body.code).toBe('LAST_OWNER');
      const remove = await t.http().delete(`/api/projects/${blockId}/members/${designer.userId}`).set(bearer(tokens.designer)).expect(409);
      expect(remove.body.code).toBe('LAST_OWNER');
      expect((await members(blockId)).map((m) => m.role)).toEqual(['owner', 'reviewer']);
    });

    it('removes a member, who then gets 404 for the project', async () => {
      await t.http().delete(`/api/projects/${blockId}/members/${colleague.id}`).set(bearer(tokens.designer)).expect(204);
      const colleagueToken = await t.loginAs(colleague.email, 'a-colleague-1');
      await t.http().get(`/api/projects/${blockId}`).set(bearer(colleagueToken)).expect(404);
      const again = await t.http().delete(`/api/projects/${blockId}/members/${colleague.id}`).set(bearer(tokens.designer)).expect(404);
      expect(again.body.code).toBe('MEMBER_NOT_FOUND');
    });

    it('lets an admin who is not a member manage the members (to hand a project on), but not edit its sheets', async () => {
      await t.http().post(`/api/projects/${blockId}/members`).set(bearer(tokens.admin)).send({ email: colleague.email, role: 'owner' }).expect(201);
      expect((await members(blockId)).filter((m) => m.role === 'owner').length).toBe(2);
      const [bf180] = (await t.http().get('/api/processes?search=BF180').set(bearer(tokens.admin))).body;
      const refused = await t.http().post(`/api/projects/${blockId}/sheets`).set(bearer(tokens.admin)).send({ name: 'Admin sheet', processId: bf180.id }).expect(403);
      expect(refused.body.code).toBe('FORBIDDEN');
    });
  });
});
