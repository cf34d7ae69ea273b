import { receivedMailSchema } from '@channelwright/shared/schemas';
import { UnitOfWork } from '../src/database/unit-of-work.js';
import { MailDeliveryService } from '../src/mail/mail-delivery.service.js';
import { MailSinkService } from '../src/mail/mail-sink.service.js';
import { MailService } from '../src/mail/mail.service.js';
import { OutboxMessageEntity } from '../src/mail/outbox-message.entity.js';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { closedPort, outboxRows, receivedMail } from './helpers/mail.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const APP_URL = 'http://cw.brackenfold.example:8080';
const { admin, designer, reviewer } = DEMO_ACCOUNTS;

describe('mail through the local SMTP sink (no SMTP_URL)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ env: { APP_URL } });
  });
  afterAll(() => t.close());

  it('starts an SMTP sink on 127.0.0.1 at a port of its own choosing', () => {
    const sink = t.app.get(MailSinkService);
    expect(sink.enabled).toBe(true);
    expect(sink.host).toBe('127.0.0.1');
    expect(sink.port).toBeGreaterThan(0);
  });

  it('delivers a notice over SMTP with a plain-text part, an HTML part and a link into the app', async () => {
    await t.app.get(MailService).notify({
      to: reviewer.email,
      subject: 'Review requested: Two-stage amplifier r1 — ΔVT ≤ 2 mV',
      heading: 'Review requested',
      paragraphs: ['Brackenfold Designer asks you to review r1.', 'Note: <check the tail & mirror>'],
      path: '/revisions/r-123',
      linkLabel: 'Open the revision',
    });
    const [mail] = await receivedMail(t, reviewer.email);
    expect(receivedMailSchema.parse(mail)).toMatchObject({
      to: [reviewer.email],
      subject: 'Review requested: Two-stage amplifier r1 — ΔVT ≤ 2 mV',
      from: 'Channelwright <no-reply@cw.brackenfold.example>',
    });
    expect(mail!.text).toContain('Note: <check the tail & mirror>');
    expect(mail!.text).toContain(`Open the revision:\n${APP_URL}/revisions/r-123`);
    expect(mail!.html).toContain(`<a href="${APP_URL}/revisions/r-123">Open the revision</a>`);
    expect(mail!.html).toContain('Note: &lt;check the tail &amp; mirror&gt;');
    expect(mail!.html).not.toContain('<check');
    const [row] = (await outboxRows(t)).filter((r) => r.recipient === reviewer.email);
    expect(row).toMatchObject({ state: 'sent', attempts: 1, lastError: null });
  });

  it('writes a mail sent inside a transaction only when that transaction commits', async () => {
    const mail = t.app.get(MailService);
    const message = { to: 'rolled-back@brackenfold.example', subject: 'Never sent', text: 'x', html: '<p>x</p>', link: `${APP_URL}/` };
    await expect(
      t.app.get(UnitOfWork).run(async (manager) => {
        await mail.send(message, manager);
        throw new Error('the change failed after the mail was written');
      }),
    ).rejects.toThrow('the change failed');
    await t.app.get(UnitOfWork).run((manager) => mail.send({ ...message, to: 'committed@brackenfold.example', subject: 'Sent' }, manager));
    expect(await receivedMail(t, 'rolled-back@brackenfold.example')).toEqual([]);
    expect((await outboxRows(t)).map((r) => r.recipient)).not.toContain('rolled-back@brackenfold.example');
    expect((await receivedMail(t, 'committed@brackenfold.example')).map((m) => m.subject)).toEqual(['Sent']);
  });

  it('lists received mail to admins only, filtered by recipient, and the outbox with delivery states', async () => {
    const adminToken = await t.loginAs(admin.email);
    const all = await t.http().get('/api/admin/mail').set(bearer(adminToken)).expect(200);
    expect(all.body.length).toBeGreaterThanOrEqual(2);
    const filtered = await t.http().get('/api/admin/mail').query({ to: 'REVIEWER@' }).set(bearer(adminToken)).expect(200);
    expect(filtered.body.map((m: { to: string[] }) => m.to)).toEqual([[reviewer.email]]);
    const outbox = await t.http().get('/api/admin/mail/outbox').query({ state: 'sent' }).set(bearer(adminToken)).expect(200);
    expect(outbox.body.map((m: { to: string }) => m.to).sort()).toEqual(['committed@brackenfold.example', reviewer.email]);

    const designerToken = await t.loginAs(designer.email);
    const refused = await t.http().get('/api/admin/mail').set(bearer(designerToken)).expect(403);
    expect(refused.body.code).toBe('FORBIDDEN');
    await t.http().get('/api/admin/mail').expect(401);
    const bad = await t.http().get('/api/admin/mail/outbox').query({ state: 'lost' }).set(bearer(adminToken)).expect(400);
    expect(bad.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'state' });
  });

  it("shows each user only the mail to their own address under /api/mail/mine", async () => {
    const mine = await t.http().get('/api/mail/mine').set(bearer(await t.loginAs(reviewer.email))).expect(200);
    expect(mine.body.map((m: { subject: string }) => m.subject)).toEqual(['Review requested: Two-stage amplifier r1 — ΔVT ≤ 2 mV']);
    const designers = await t.http().get('/api/mail/mine').set(bearer(await t.loginAs(designer.email))).expect(200);
    expect(designers.body).toEqual([]);
  });

  it('wraps the plain-text part within 72 characters a line (RFC 5322, 2.1.1: at most 78), the link on a line of its own', async () => {
    const long = 'Brackenfold Designer asks you to review r1 of the two-stage amplifier, whose input pair was re-sized to meet the offset budget of 2 mV and whose tail source moved to a longer channel.';
    await t.app.get(MailService).notify({ to: 'wrap-check@brackenfold.example', subject: 'Long', heading: 'Review requested', paragraphs: [long], path: '/revisions/r-456', linkLabel: 'Open the revision' });
    const mail = (await receivedMail(t, 'wrap-check@brackenfold.example')).find((m) => m.subject === 'Long')!;
    const lines = mail.text.split(/\r?\n/);
    expect(lines.filter((line) => !line.startsWith('http')).every((line) => line.length <= 72)).toBe(true);
    expect(lines).toContain(`${APP_URL}/revisions/r-456`);
    expect(mail.text.replace(/\s+/g, ' ')).toContain(long);
  });
});

describe('mail when the SMTP server cannot be reached', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ seed: false, env: { SMTP_URL: `smtp://127.0.0.1:${await closedPort()}` } });
  });
  afterAll(() => t.close());

  it('runs no sink, keeps the message queued with the error and a later attempt, and keeps what was committed', async () => {
    expect(t.app.get(MailSinkService).enabled).toBe(false);
    await t.app.get(UnitOfWork).run(async (manager) => {
      await manager.query(`INSERT INTO "users" ("id", "email", "displayName", "passwordHash") VALUES ('u-1', 'kept@brackenfold.example', 'Kept', 'x')`);
      await t.app.get(MailService).send({ to: 'kept@brackenfold.example', subject: 'Welcome', text: 'Hi', html: '<p>Hi</p>', link: 'http://localhost:3000/' }, manager);
    });
    await t.app.get(MailDeliveryService).idle();
    const [row] = await outboxRows(t);
    expect(row).toMatchObject({ recipient: 'kept@brackenfold.example', state: 'queued', attempts: 1 });
    expect(row!.lastError).toMatch(/ECONNREFUSED|connect/i);
    const [next] = await t.dataSource.getRepository(OutboxMessageEntity).find();
    expect(next!.nextAttemptAt.getTime()).toBeGreaterThan(Date.now());
    expect(await t.query(`SELECT "email" FROM "users"`)).toEqual([{ email: 'kept@brackenfold.example' }]);
  });
});
