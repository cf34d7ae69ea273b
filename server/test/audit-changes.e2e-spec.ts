import { auditEventSchema, type AuditEvent } from '@channelwright/shared/schemas';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { newSheet, nmosTargets, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { outboxRows, receivedMail } from './helpers/mail.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const APP_URL = 'http://cw.brackenfold.example';
const NEWCOMER = 'newcomer@brackenfold.example';

describe('membership, sheet and device changes leave audit rows (and a new member a mail)', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;
  let newcomerId: string;

  beforeAll(async () => {
    t = await createTestApp({ env: { APP_URL } });
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
    newcomerId = (await t.register({ email: NEWCOMER, displayName: 'Ferris Newcomer', password: 'newcomer-pass-1' })).user.id;
  });
  afterAll(() => t.close());

  const audit = async (query: Record<string, string>): Promise<AuditEvent[]> =>
    (await t.http().get(`/api/projects/${projectId}/audit`).query(query).set(bearer(tokens.designer)).expect(200)).body.map((e: unknown) => auditEventSchema.parse(e));

  // Plain-text mail is wrapped at 72 characters: a sentence is read back with its line breaks as spaces.
  const unwrapped = (text: string) => text.replace(/([^\n])\n(?=[^\n])/g, '$1 ');

  it('mails a new member a link to the project and records who added them with which role', async () => {
    await t.http().post(`/api/projects/${projectId}/members`).set(bearer(tokens.designer)).send({ email: NEWCOMER, role: 'designer' }).expect(201);
    const [mail] = await receivedMail(t, NEWCOMER);
    expect(mail).toMatchObject({ to: [NEWCOMER], subject: 'You were added to Wrenmoss sensor front end' });
    expect(unwrapped(mail!.text)).toContain(`${DEMO_ACCOUNTS.designer.displayName} added you to the project Wrenmoss sensor front end as designer.`);
    expect(mail!.text).toContain(`${APP_URL}/projects/${projectId}`);
    expect(mail!.html).toContain(`href="${APP_URL}/projects/${projectId}"`);
    const [event] = await audit({ action: 'member.added' });
    expect(event).toMatchObject({ actor: { email: DEMO_ACCOUNTS.designer.email }, entityType: 'member', entityId: newcomerId, before: null, after: { email: NEWCOMER, role: 'designer' } });
  });

  it('writes neither mail nor audit row when adding a member fails', async () => {
    const mails = (await outboxRows(t)).length;
    await t.http().post(`/api/projects/${projectId}/members`).set(bearer(tokens.designer)).send({ email: NEWCOMER, role: 'viewer' }).expect(409);
    expect((await outboxRows(t)).length).toBe(mails);
    expect(await audit({ action: 'member.added' })).toHaveLength(1);
  });

  it('adds nobody and records nothing for an address without an account, but mails that address how to get one', async () => {
    const mails = (await outboxRows(t)).length;
    await t.http().post(`/api/projects/${projectId}/members`).set(bearer(tokens.designer)).send({ email: 'ghost@brackenfold.example', role: 'viewer' }).expect(201);
    expect((await outboxRows(t)).slice(mails).map((row) => row.recipient)).toEqual(['ghost@brackenfold.example']);
    expect(await audit({ action: 'member.added' })).toHaveLength(1);
    const [invitation] = await receivedMail(t, 'ghost@brackenfold.example');
    expect(unwrapped(invitation.text)).toContain('has no active account on this Channelwright server');
  });

  it('records a role change with the role before and after, and a removal', async () => {
    await t.http().patch(`/api/projects/${projectId}/members/${newcomerId}`).set(bearer(tokens.designer)).send({ role: 'reviewer' }).expect(200);
    await t.http().delete(`/api/projects/${projectId}/members/${newcomerId}`).set(bearer(tokens.designer)).expect(204);
    const [changed] = await audit({ action: 'member.role-changed' });
    expect(changed).toMatchObject({ entityId: newcomerId, before: { role: 'designer' }, after: { role: 'reviewer' } });
    const [removed] = await audit({ action: 'member.removed' });
    expect(removed).toMatchObject({ entityId: newcomerId, before: { email: NEWCOMER, role: 'reviewer' }, after: null });
  });

  it('records sheet and device edits with their state before and after', async () => {
    const profileId = (await t.http().get('/api/processes').set(bearer(tokens.designer))).body[0].id;
    const sheet = await newSheet(t, tokens.designer, projectId, profileId, 'Audited sheet');
    const device = (await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: 'MA' })).expect(201)).body;
    await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: device.version, l: 1e-6 }).expect(200);
    await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: sheet.version, name: 'Audited sheet, renamed' }).expect(200);
    await t.http().delete(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).expect(204);

    const [created] = await audit({ action: 'device.created' });
    expect(created).toMatchObject({ entityId: device.id, after: { name: 'MA', l: 0.5e-6 } });
    const [edited] = await audit({ action: 'device.updated' });
    expect(edited).toMatchObject({ entityId: device.id, before: { l: 0.5e-6 }, after: { l: 1e-6 }, summary: 'Edited MA in Audited sheet' });
    const [renamed] = await audit({ action: 'sheet.updated' });
    expect(renamed).toMatchObject({ entityId: sheet.id, before: { name: 'Audited sheet' }, after: { name: 'Audited sheet, renamed' } });
    expect(await audit({ action: 'device.deleted' })).toHaveLength(1);
    expect((await audit({ entityType: 'sheet', action: 'sheet.created' })).map((e) => e.entityId)).toEqual([sheet.id]);

    await t.http().delete(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).expect(204);
    expect((await audit({ action: 'sheet.deleted' })).map((e) => e.entityId)).toEqual([sheet.id]);
  });

  it('writes neither a new version nor an audit row for an edit that changes nothing', async () => {
    const profileId = (await t.http().get('/api/processes').set(bearer(tokens.designer))).body[0].id;
    const sheet = await newSheet(t, tokens.designer, projectId, profileId, 'Unchanged sheet');
    const device = (await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: 'MU' })).expect(201)).body;
    const edits = async () => (await audit({ action: 'device.updated' })).filter((e) => e.entityId === device.id);
    const onlyVersion = await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: device.version }).expect(200);
    expect(onlyVersion.body.version).toBe(device.version);
    const sameValue = await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: device.version, l: device.targets.l }).expect(200);
    expect(sameValue.body.version).toBe(device.version);
    expect(await edits()).toHaveLength(0);
    // A real change still writes both.
    await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: device.version, l: 2e-6 }).expect(200);
    expect(await edits()).toHaveLength(1);
  });

  it('refuses to delete a sheet that has revisions (409 SHEET_HAS_REVISIONS) and writes nothing', async () => {
    const profileId = (await t.http().get('/api/processes').set(bearer(tokens.designer))).body[0].id;
    const sheet = await newSheet(t, tokens.designer, projectId, profileId, 'Frozen once');
    await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets()).expect(201);
    await t.http().post(`/api/sheets/${sheet.id}/revisions`).set(bearer(tokens.designer)).send({ message: 'r1' }).expect(201);
    const auditBefore = await t.query(`SELECT COUNT(*) AS "n" FROM "audit_events"`);
    const refused = await t.http().delete(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).expect(409);
    expect(refused.body.code).toBe('SHEET_HAS_REVISIONS');
    await t.http().get(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).expect(200);
    expect(await t.query(`SELECT COUNT(*) AS "n" FROM "audit_events"`)).toEqual(auditBefore);
  });
});
