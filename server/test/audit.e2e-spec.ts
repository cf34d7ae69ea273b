import { auditEventSchema } from '@channelwright/shared/schemas';
import Papa from 'papaparse';
import { AuditService } from '../src/audit/audit.service.js';
import { runInTransaction } from '../src/database/run-in-transaction.js';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const { admin, designer, reviewer, viewer } = DEMO_ACCOUNTS;

describe('the audit trail', () => {
  let t: TestApp;
  let projectId: string;
  let ids: Record<'designer' | 'reviewer', string>;

  beforeAll(async () => {
    t = await createTestApp();
    // A project of its own, so that only the events written here belong to it.
    const created = await t.http().post('/api/projects').set(bearer(await t.loginAs(designer.email))).send({ name: 'Audit trial' }).expect(201);
    projectId = created.body.id;
    for (const email of [reviewer.email, viewer.email]) {
      await t.http().post(`/api/projects/${projectId}/members`).set(bearer(await t.loginAs(designer.email))).send({ email, role: email === viewer.email ? 'viewer' : 'reviewer' }).expect(201);
    }
    const users = await t.query(`SELECT "id", "email" FROM "users"`);
    const idOf = (email: string) => users.find((u: { email: string }) => u.email === email).id as string;
    ids = { designer: idOf(designer.email), reviewer: idOf(reviewer.email) };
    const audit = t.app.get(AuditService);
    await runInTransaction(t.dataSource, async (manager) => {
      await audit.record(manager, { actor: { id: ids.designer }, projectId, entityType: 'revision', entityId: 'rev-1', action: 'revision.created', after: { number: 1, hash: 'ab12' }, summary: 'Froze r1 of Two-stage amplifier' });
      await audit.record(manager, { actor: { id: ids.designer }, projectId, entityType: 'review-request', entityId: 'req-1', action: 'review.requested', after: { reviewer: reviewer.email }, summary: '=HYPERLINK("x") asked for a review, with "quotes", commas' });
      await audit.record(manager, { actor: { id: ids.reviewer }, projectId, entityType: 'review-request', entityId: 'req-1', action: 'review.approved', before: { state: 'open' }, after: { state: 'approved' }, summary: 'Signed off r1' });
      await audit.record(manager, { actor: null, projectId: 'another-project', entityType: 'sheet', entityId: 's-9', action: 'sheet.updated', summary: 'Not in this project' });
    });
  });
  afterAll(() => t.close());

  const list = async (query: Record<string, string> = {}, status = 200, email: string = designer.email) =>
    t.http().get(`/api/projects/${projectId}/audit`).query(query).set(bearer(await t.loginAs(email))).expect(status);

  it("lists the project's events newest first, with actor, before and after", async () => {
    const response = await list();
    const events = response.body.map((event: unknown) => auditEventSchema.parse(event));
    expect(events.map((e: { action: string }) => e.action)).toEqual(['review.approved', 'review.requested', 'revision.created', 'member.added', 'member.added', 'project.created']);
    expect(events[0]).toMatchObject({ actor: { id: ids.reviewer, email: reviewer.email }, before: { state: 'open' }, after: { state: 'approved' }, projectId });
    expect(events[2]).toMatchObject({ before: null, after: { number: 1, hash: 'ab12' } });
  });

  it('filters by action, entity type, actor (id or e-mail) and dates', async () => {
    expect((await list({ action: 'review.requested' })).body.map((e: { entityId: string }) => e.entityId)).toEqual(['req-1']);
    expect((await list({ entityType: 'revision' })).body).toHaveLength(1);
    expect((await list({ actor: reviewer.email.toUpperCase() })).body.map((e: { action: string }) => e.action)).toEqual(['review.approved']);
    expect((await list({ actor: ids.designer, entityType: 'review-request' })).body).toHaveLength(1);
    expect((await list({ actor: ids.designer })).body).toHaveLength(5);
    const today = new Date().toISOString().slice(0, 10);
    expect((await list({ from: today, to: today })).body).toHaveLength(6);
    expect((await list({ to: '2001-01-01' })).body).toEqual([]);
    expect((await list({ from: '2999-01-01T00:00:00Z' })).body).toEqual([]);
  });

  it('refuses bad filters with a 400 naming the field', async () => {
    expect((await list({ from: 'yesterday' }, 400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'from' });
    expect((await list({ from: '2026-05-02', to: '2026-05-01' }, 400)).body).toMatchObject({ field: 'to' });
    expect((await list({ entityType: 'planet' }, 400)).body).toMatchObject({ field: 'entityType' });
    expect((await list({ format: 'xlsx' }, 400)).body).toMatchObject({ field: 'format' });
  });

  it('exports the same rows as CSV that papaparse reads back, with formula cells escaped', async () => {
    const response = await list({ format: 'csv' });
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    expect(response.headers['content-disposition']).toMatch(/attachment; filename="?audit-[0-9a-f-]+\.csv"?/);
    const parsed = Papa.parse<Record<string, string>>(response.text, { header: true, skipEmptyLines: true });
    expect(parsed.errors).toEqual([]);
    expect(parsed.meta.fields).toEqual(['id', 'at', 'actor', 'actorEmail', 'action', 'entityType', 'entityId', 'summary', 'before', 'after']);
    expect(parsed.data.map((row) => row.action)).toEqual(['review.approved', 'review.requested', 'revision.created', 'member.added', 'member.added', 'project.created']);
    expect(parsed.data[0]).toMatchObject({ actor: 'Brackenfold Reviewer', actorEmail: reviewer.email, before: '{"state":"open"}' });
    expect(parsed.data[1]!.summary).toBe(`'=HYPERLINK("x") asked for a review, with "quotes", commas`);
  });

  it('is readable by every member (viewers too) and by admins; outsiders get 404', async () => {
    await list({}, 200, viewer.email);
    await list({}, 200, admin.email);
    const outsider = await t.register({ email: 'outsider@brackenfold.example', displayName: 'Outsider', password: 'not-a-member-1' });
    const response = await t.http().get(`/api/projects/${projectId}/audit`).set(bearer(outsider.accessToken)).expect(404);
    expect(response.body.code).toBe('PROJECT_NOT_FOUND');
    await t.http().get('/api/projects/no-such-project/audit').set(bearer(outsider.accessToken)).expect(404);
  });

  it("shows new versions of a process profile in the audit of every project whose sheets use it, and only there", async () => {
    const adminToken = await t.loginAs(admin.email);
    const designerToken = await t.loginAs(designer.email);
    const wrenmoss = (await t.http().get('/api/projects').set(bearer(designerToken)).expect(200)).body.find((p: { name: string }) => p.name === 'Wrenmoss sensor front end');
    const [sheet] = (await t.http().get(`/api/projects/${wrenmoss.id}/sheets`).set(bearer(designerToken)).expect(200)).body;
    const profile = (await t.http().get(`/api/processes/${sheet.process.profileId}`).set(bearer(adminToken)).expect(200)).body;
    const definition = { ...profile.version.definition, description: 'Invented demo data, with a corrected description' };
    await t.http().put(`/api/processes/${profile.id}`).set(bearer(adminToken)).send({ baseVersion: profile.version.number, message: 'description corrected', definition }).expect(200);

    const seen = (await t.http().get(`/api/projects/${wrenmoss.id}/audit`).query({ action: 'process.version-created' }).set(bearer(designerToken)).expect(200)).body;
    expect(seen[0]).toMatchObject({ actor: { email: admin.email }, entityType: 'process-profile', entityId: profile.id, projectId: null, after: { version: profile.version.number + 1, message: 'description corrected' } });
    // The seeded first version was recorded too.
    expect(seen.at(-1)).toMatchObject({ entityId: profile.id, after: { version: 1 } });
    expect((await list({ action: 'process.version-created' })).body).toEqual([]);
  });

  it('is append-only: the database refuses to update or delete an event', async () => {
    const before = await t.query(`SELECT * FROM "audit_events" ORDER BY "id"`);
    await expect(t.query(`UPDATE "audit_events" SET "summary" = 'rewritten'`)).rejects.toThrow(/append-only/);
    await expect(t.query(`DELETE FROM "audit_events"`)).rejects.toThrow(/append-only/);
    expect(await t.query(`SELECT * FROM "audit_events" ORDER BY "id"`)).toEqual(before);
  });
});
