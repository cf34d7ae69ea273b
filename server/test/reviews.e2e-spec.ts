import {
  auditEventSchema,
  reviewRequestListSchema,
  reviewRequestSchema,
  revisionCommentSchema,
  revisionSchema,
  sheetReviewStateSchema,
  sheetSchema,
  type AuditEvent,
  type Revision,
  type Sheet,
} from '@channelwright/shared/schemas';
import { revisionHash } from '../src/revisions/revision-content.js';
import { RevisionDeviceEntity } from '../src/revisions/revision-device.entity.js';
import { RevisionEntity } from '../src/revisions/revision.entity.js';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { outboxRows, receivedMail } from './helpers/mail.js';
import { snapshotRows } from './helpers/review-rows.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const APP_URL = 'http://cw.brackenfold.example';
const { designer, reviewer, viewer } = DEMO_ACCOUNTS;

describe('review and sign-off: designer → request → reviewer approves → signed off', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;
  let amplifier: Sheet;
  let r1: Revision;
  let requestId: string;

  beforeAll(async () => {
    t = await createTestApp({ env: { APP_URL } });
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
    const summaries = (await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).expect(200)).body;
    const id = summaries.find((s: { name: string }) => s.name === 'Two-stage amplifier').id;
    amplifier = sheetSchema.parse((await t.http().get(`/api/sheets/${id}`).set(bearer(tokens.designer)).expect(200)).body);
  });
  afterAll(() => t.close());

  const post = (path: string, token: string, body: object = {}) => t.http().post(path).set(bearer(token)).send(body);
  const get = (path: string, token: string) => t.http().get(path).set(bearer(token));
  const freeze = async (message: string) => revisionSchema.parse((await post(`/api/sheets/${amplifier.id}/revisions`, tokens.designer, { message }).expect(201)).body);
  const reviewState = async () => sheetReviewStateSchema.parse((await get(`/api/sheets/${amplifier.id}/review-state`, tokens.viewer).expect(200)).body);
  const audit = async (query: Record<string, string> = {}): Promise<AuditEvent[]> =>
    (await get(`/api/projects/${projectId}/audit`, tokens.viewer).query(query).expect(200)).body.map((e: unknown) => auditEventSchema.parse(e));

  it('starts as a draft: the sheet has no revision and differs from none', async () => {
    expect(await reviewState()).toMatchObject({ projectId, state: 'draft', latestRevision: null, lastSignedOff: null, changedSinceLatest: true, revisions: [] });
    r1 = await freeze('Ready for review');
    expect(await reviewState()).toMatchObject({ state: 'draft', latestRevision: { id: r1.id, state: 'draft' }, changedSinceLatest: false });
  });

  it('refuses a self-review (403 SELF_REVIEW) and reviewers without the reviewer or owner role (400 REVIEWER_NOT_ELIGIBLE)', async () => {
    const designerId = r1.author!.id;
    const before = await snapshotRows(t);
    const self = await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerId: designerId, note: 'me' }).expect(403);
    expect(self.body).toMatchObject({ code: 'SELF_REVIEW', field: 'reviewerId' });
    const selfByEmail = await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: designer.email.toUpperCase() }).expect(403);
    expect(selfByEmail.body).toMatchObject({ code: 'SELF_REVIEW', field: 'reviewerEmail' });
    const viewerAsked = await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: viewer.email }).expect(400);
    expect(viewerAsked.body).toMatchObject({ code: 'REVIEWER_NOT_ELIGIBLE', field: 'reviewerEmail' });
    const outsiderAsked = await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: 'outsider@elsewhere.example' }).expect(400);
    expect(outsiderAsked.body.code).toBe('REVIEWER_NOT_ELIGIBLE');
    await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: 'nobody@brackenfold.example' }).expect(400);
    const neither = await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { note: 'who?' }).expect(400);
    expect(neither.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'reviewerId' });
    // Only designers and owners ask for reviews.
    expect((await post(`/api/revisions/${r1.id}/review-requests`, tokens.reviewer, { reviewerEmail: reviewer.email }).expect(403)).body.code).toBe('FORBIDDEN');
    expect((await post(`/api/revisions/${r1.id}/review-requests`, tokens.outsider, { reviewerEmail: reviewer.email }).expect(404)).body.code).toBe('REVISION_NOT_FOUND');
    expect(await snapshotRows(t)).toEqual(before);
  });

  it('asks the reviewer: the request is open, the revision in review, the reviewer mailed with a link, an audit row written', async () => {
    const response = await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email, note: 'Please check the input pair offset' }).expect(201);
    const request = reviewRequestSchema.parse(response.body);
    requestId = request.id;
    expect(request).toMatchObject({ state: 'open', sheetName: 'Two-stage amplifier', projectId, revision: { id: r1.id, label: 'r1', state: 'in-review' }, reviewer: { email: reviewer.email }, note: 'Please check the input pair offset' });
    expect((await reviewState()).state).toBe('in-review');

    const [mail] = await receivedMail(t, reviewer.email);
    expect(mail).toMatchObject({ to: [reviewer.email], subject: 'Review requested: Two-stage amplifier r1' });
    expect(mail!.text).toContain(`${APP_URL}/revisions/${r1.id}`);
    expect(mail!.text).toContain('Please check the input pair offset');
    expect(mail!.html).toContain(`href="${APP_URL}/revisions/${r1.id}"`);

    const [event] = await audit({ action: 'review.requested' });
    expect(event).toMatchObject({ actor: { email: designer.email }, entityType: 'review-request', entityId: requestId, after: { revisionId: r1.id, reviewer: reviewer.email, state: 'open' } });
    expect((await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(409)).body.code).toBe('REVIEW_ALREADY_OPEN');
  });

  it("shows the request in the reviewer's inbox (assigned) and in the designer's (authored)", async () => {
    const assigned = reviewRequestListSchema.parse((await get('/api/review-requests?mine=assigned', tokens.reviewer).expect(200)).body);
    expect(assigned.map((r) => r.id)).toEqual([requestId]);
    const authored = reviewRequestListSchema.parse((await get('/api/review-requests?mine=authored', tokens.designer).expect(200)).body);
    expect(authored.map((r) => r.id)).toEqual([requestId]);
    expect((await get('/api/review-requests?mine=assigned', tokens.designer).expect(200)).body).toEqual([]);
    expect((await get('/api/review-requests?mine=everyone', tokens.designer).expect(400)).body.field).toBe('mine');
    await get(`/api/review-requests/${requestId}`, tokens.viewer).expect(200);
    expect((await get(`/api/review-requests/${requestId}`, tokens.outsider).expect(404)).body.code).toBe('REVIEW_REQUEST_NOT_FOUND');
  });

  it('takes comments on the whole revision and on a device; viewers may not comment; a foreign device is refused', async () => {
    const m1 = r1.devices.find((d) => d.name === 'M1')!;
    const onDevice = revisionCommentSchema.parse((await post(`/api/revisions/${r1.id}/comments`, tokens.reviewer, { body: 'gm/ID of 16 is fine for the offset budget', deviceId: m1.id }).expect(201)).body);
    expect(onDevice).toMatchObject({ device: { id: m1.id, name: 'M1' }, author: { displayName: reviewer.displayName } });
    await post(`/api/revisions/${r1.id}/comments`, tokens.designer, { body: 'Thanks for looking' }).expect(201);
    expect((await post(`/api/revisions/${r1.id}/comments`, tokens.viewer, { body: 'me too' }).expect(403)).body.code).toBe('COMMENT_NOT_ALLOWED');
    expect((await post(`/api/revisions/${r1.id}/comments`, tokens.reviewer, { body: 'x', deviceId: 'elsewhere' }).expect(400)).body).toMatchObject({ code: 'DEVICE_NOT_IN_REVISION', field: 'deviceId' });
    expect((await post(`/api/revisions/${r1.id}/comments`, tokens.reviewer, { body: '' }).expect(400)).body.field).toBe('body');
    const list = (await get(`/api/revisions/${r1.id}/comments`, tokens.viewer).expect(200)).body;
    expect(list.map((c: { body: string; device: { name: string } | null }) => [c.device?.name ?? null, c.body])).toEqual([
      ['M1', 'gm/ID of 16 is fine for the offset budget'],
      [null, 'Thanks for looking'],
    ]);
    expect((await audit({ action: 'comment.added' })).map((e) => e.actor!.email)).toEqual([designer.email, reviewer.email]);
  });

  it('lets only the assigned reviewer decide', async () => {
    const before = await snapshotRows(t);
    expect((await post(`/api/review-requests/${requestId}/decision`, tokens.designer, { decision: 'approve' }).expect(403)).body.code).toBe('NOT_ASSIGNED_REVIEWER');
    await post(`/api/review-requests/${requestId}/decision`, tokens.viewer, { decision: 'approve' }).expect(403);
    await post(`/api/review-requests/${requestId}/decision`, tokens.outsider, { decision: 'approve' }).expect(404);
    expect((await post(`/api/review-requests/${requestId}/decision`, tokens.reviewer, { decision: 'maybe' }).expect(400)).body.field).toBe('decision');
    expect(await snapshotRows(t)).toEqual(before);
  });

  it('approves: the revision is signed off with reviewer, time and hash; the designer is mailed; an audit row written', async () => {
    const decided = reviewRequestSchema.parse((await post(`/api/review-requests/${requestId}/decision`, tokens.reviewer, { decision: 'approve', comment: 'Signed off for layout' }).expect(200)).body);
    expect(decided).toMatchObject({ state: 'approved', decisionComment: 'Signed off for layout', signedHash: r1.hash, revision: { state: 'signed-off' } });
    const revision = revisionSchema.parse((await get(`/api/revisions/${r1.id}`, tokens.designer).expect(200)).body);
    expect(revision.state).toBe('signed-off');
    expect(revision.signOff).toMatchObject({ reviewRequestId: requestId, by: { displayName: reviewer.displayName }, hash: r1.hash });
    expect(Date.parse(revision.signOff!.at)).not.toBeNaN();
    expect(await reviewState()).toMatchObject({ state: 'signed-off', lastSignedOff: { id: r1.id }, openRequests: [] });

    const [mail] = await receivedMail(t, designer.email);
    expect(mail).toMatchObject({ to: [designer.email], subject: 'Signed off: Two-stage amplifier r1' });
    expect(mail!.text).toContain('Signed off for layout');
    expect(mail!.text).toContain(`${APP_URL}/revisions/${r1.id}`);
    const [event] = await audit({ action: 'review.approved' });
    expect(event).toMatchObject({ actor: { email: reviewer.email }, before: { state: 'open' }, after: { state: 'approved', signedHash: r1.hash } });
  });

  it('keeps a decision final: deciding twice or withdrawing afterwards is refused with 409 and nothing written', async () => {
    const before = await snapshotRows(t);
    expect((await post(`/api/review-requests/${requestId}/decision`, tokens.reviewer, { decision: 'request-changes', comment: 'On second thought' }).expect(409)).body.code).toBe('REVIEW_ALREADY_DECIDED');
    expect((await post(`/api/review-requests/${requestId}/decision`, tokens.reviewer, { decision: 'approve' }).expect(409)).body.code).toBe('REVIEW_ALREADY_DECIDED');
    expect((await post(`/api/review-requests/${requestId}/withdraw`, tokens.designer).expect(409)).body.code).toBe('REVIEW_ALREADY_DECIDED');
    expect((await post(`/api/revisions/${r1.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(409)).body.code).toBe('REVISION_SIGNED_OFF');
    await expect(t.query(`UPDATE "review_requests" SET "state" = 'open' WHERE "id" = ?`, [requestId])).rejects.toThrow(/final/);
    expect(await snapshotRows(t)).toEqual(before);
  });

  it('refuses any change of the signed-off revision or its devices with 409 REVISION_SIGNED_OFF and writes nothing', async () => {
    const before = await snapshotRows(t);
    const device = r1.devices[0]!;
    for (const attempt of [
      t.http().patch(`/api/revisions/${r1.id}`).send({ message: 'quietly rewritten' }),
      t.http().delete(`/api/revisions/${r1.id}`),
      t.http().patch(`/api/revisions/${r1.id}/devices/${device.id}`).send({ l: 2e-6 }),
      t.http().delete(`/api/revisions/${r1.id}/devices/${device.id}`),
    ]) {
      const response = await attempt.set(bearer(tokens.designer)).expect(409);
      expect(response.body).toMatchObject({ statusCode: 409, code: 'REVISION_SIGNED_OFF' });
    }
    expect(await snapshotRows(t)).toEqual(before);
    expect((await get(`/api/revisions/${r1.id}/verify`, tokens.designer).expect(200)).body.valid).toBe(true);
  });

  it('keeps the sheet editable as a draft after the sign-off, and says that it changed since r1', async () => {
    const device = amplifier.devices.find((d) => d.targets.name === 'M5')!;
    await t.http().patch(`/api/sheets/${amplifier.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: device.version, l: 1.2e-6 }).expect(200);
    expect(await reviewState()).toMatchObject({ state: 'signed-off', changedSinceLatest: true, lastSignedOff: { id: r1.id } });
    expect((await get(`/api/revisions/${r1.id}/verify`, tokens.designer).expect(200)).body.valid).toBe(true);
  });

  it('lets the requester withdraw an open request; a withdrawn request cannot be decided; the reviewer is mailed', async () => {
    const r2 = await freeze('Longer tail device');
    const request = reviewRequestSchema.parse((await post(`/api/revisions/${r2.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(201)).body);
    expect((await post(`/api/review-requests/${request.id}/withdraw`, tokens.reviewer).expect(403)).body.code).toBe('NOT_REQUEST_AUTHOR');
    const withdrawn = reviewRequestSchema.parse((await post(`/api/review-requests/${request.id}/withdraw`, tokens.designer).expect(200)).body);
    expect(withdrawn).toMatchObject({ state: 'withdrawn', revision: { state: 'draft' } });
    expect((await post(`/api/review-requests/${request.id}/decision`, tokens.reviewer, { decision: 'approve' }).expect(409)).body.code).toBe('REVIEW_WITHDRAWN');
    expect((await receivedMail(t, reviewer.email)).map((m) => m.subject)).toContain('Review withdrawn: Two-stage amplifier r2');

    // The diff of r2 defaults to the last signed-off revision, r1.
    const diff = (await get(`/api/revisions/${r2.id}/diff`, tokens.reviewer).expect(200)).body;
    expect(diff).toMatchObject({ againstId: r1.id, againstLabel: 'r1', added: [], removed: [] });
    expect(diff.changed.map((c: { name: string }) => c.name)).toEqual(['M5']);
    expect(diff.changed[0].changes).toEqual(expect.arrayContaining([{ path: 'targets.l', from: 1e-6, to: 1.2e-6 }]));
  });

  it('sends a revision back with request-changes (a comment is required); a new revision then goes to review', async () => {
    const [r2] = (await get(`/api/sheets/${amplifier.id}/revisions`, tokens.designer)).body;
    const request = reviewRequestSchema.parse((await post(`/api/revisions/${r2.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(201)).body);
    expect((await post(`/api/review-requests/${request.id}/decision`, tokens.reviewer, { decision: 'request-changes' }).expect(400)).body).toMatchObject({ field: 'comment' });
    const back = reviewRequestSchema.parse((await post(`/api/review-requests/${request.id}/decision`, tokens.reviewer, { decision: 'request-changes', comment: 'M5 needs more headroom' }).expect(200)).body);
    expect(back).toMatchObject({ state: 'changes-requested', signedHash: null, revision: { state: 'changes-requested' } });
    expect((await reviewState()).state).toBe('changes-requested');
    expect((await receivedMail(t, designer.email)).map((m) => m.subject)).toContain('Changes requested: Two-stage amplifier r2');
    expect((await post(`/api/revisions/${r2.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(409)).body.code).toBe('REVISION_CHANGES_REQUESTED');
    const history = reviewRequestListSchema.parse((await get(`/api/revisions/${r2.id}/review-requests`, tokens.viewer).expect(200)).body);
    expect(history.map((r) => [r.state, r.decisionComment])).toEqual([['withdrawn', null], ['changes-requested', 'M5 needs more headroom']]);
    await get(`/api/revisions/${r2.id}/review-requests`, tokens.outsider).expect(404);

    const r3 = await freeze('More headroom for M5');
    const r4 = await freeze('And a note');
    expect((await post(`/api/revisions/${r3.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(409)).body.code).toBe('REVISION_SUPERSEDED');
    await post(`/api/revisions/${r4.id}/review-requests`, tokens.designer, { reviewerEmail: reviewer.email }).expect(201);
    expect((await reviewState()).state).toBe('in-review');
  });

  it('refuses to sign off a revision whose stored rows no longer match its hash, leaving the request open', async () => {
    const [r4] = (await get(`/api/sheets/${amplifier.id}/revisions`, tokens.designer)).body;
    const [open] = reviewRequestListSchema.parse((await get('/api/review-requests?mine=assigned&state=open', tokens.reviewer).expect(200)).body);
    expect(open!.revision.id).toBe(r4.id);
    await t.dropTrigger('TRG_revision_devices_no_update', 'revision_devices');
    await t.query(`UPDATE "revision_devices" SET "targets" = replace("targets", '"multiplier":1', '"multiplier":2') WHERE "revisionId" = ?`, [r4.id]);
    const before = await snapshotRows(t);
    expect((await post(`/api/review-requests/${open!.id}/decision`, tokens.reviewer, { decision: 'approve' }).expect(409)).body.code).toBe('REVISION_HASH_MISMATCH');
    expect(await snapshotRows(t)).toEqual(before);
    expect((await get(`/api/review-requests/${open!.id}`, tokens.reviewer).expect(200)).body.state).toBe('open');
  });

  it('left a mail for every step, to the right recipient, all delivered', async () => {
    const subjects = (email: string) => receivedMail(t, email).then((mails) => mails.map((m) => m.subject).reverse());
    expect(await subjects(reviewer.email)).toEqual([
      'Review requested: Two-stage amplifier r1',
      'Review requested: Two-stage amplifier r2',
      'Review withdrawn: Two-stage amplifier r2',
      'Review requested: Two-stage amplifier r2',
      'Review requested: Two-stage amplifier r4',
    ]);
    expect(await subjects(designer.email)).toEqual(['Signed off: Two-stage amplifier r1', 'Changes requested: Two-stage amplifier r2']);
    expect(await subjects(viewer.email)).toEqual([]);
    expect((await outboxRows(t)).every((row) => row.state === 'sent' && row.attempts === 1)).toBe(true);
  });

  it('left an audit row for every step, in order, each with its actor', async () => {
    // The seed's process versions are in the project's trail as well (its sheets use that profile); they are not review steps.
    const events = (await audit()).filter((e) => e.entityType !== 'process-profile').reverse().map((e) => [e.action, e.actor?.email]);
    expect(events).toEqual([
      ['revision.created', designer.email],
      ['review.requested', designer.email],
      ['comment.added', reviewer.email],
      ['comment.added', designer.email],
      ['review.approved', reviewer.email],
      ['device.updated', designer.email],
      ['revision.created', designer.email],
      ['review.requested', designer.email],
      ['review.withdrawn', designer.email],
      ['review.requested', designer.email],
      ['review.changes-requested', reviewer.email],
      ['revision.created', designer.email],
      ['revision.created', designer.email],
      ['review.requested', designer.email],
    ]);
  });
  // Last in this file: it rewrites the signed-off revision behind the server's back.
  it('keeps a signed-off revision provable: rows rewritten with a re-computed stored hash, then a rewritten decision, are both caught', async () => {
    const verify = async () => (await get(`/api/revisions/${r1.id}/verify`, tokens.designer).expect(200)).body;
    expect(await verify()).toMatchObject({ valid: true, problems: [], signatures: [{ signedHash: r1.hash, auditedHash: r1.hash, matches: true }] });

    // An insider edits a frozen result and re-computes the stored hash so the rows agree with it again.
    for (const [trigger, table] of [['TRG_revision_devices_no_update', 'revision_devices'], ['TRG_revisions_no_update', 'revisions'], ['TRG_review_requests_final', 'review_requests']]) await t.dropTrigger(trigger, table);
    const [row] = await t.query(`SELECT "id", "result" FROM "revision_devices" WHERE "revisionId" = ? ORDER BY "position" LIMIT 1`, [r1.id]);
    await t.query(`UPDATE "revision_devices" SET "result" = ? WHERE "id" = ?`, [JSON.stringify({ ...JSON.parse(row.result), w: 9.99e-6 }), row.id]);
    const revision = await t.dataSource.getRepository(RevisionEntity).findOneByOrFail({ id: r1.id });
    const rehashed = revisionHash(revision, await t.dataSource.getRepository(RevisionDeviceEntity).findBy({ revisionId: r1.id }));
    await t.query(`UPDATE "revisions" SET "hash" = ? WHERE "id" = ?`, [rehashed, r1.id]);
    const first = await verify();
    expect(first).toMatchObject({ valid: false, storedHash: rehashed, computedHash: rehashed, signatures: [{ signedHash: r1.hash, auditedHash: r1.hash, matches: false }] });
    expect(first.problems).toEqual([expect.stringContaining('differ from what was signed off')]);

    // Rewriting the decision's hash too still leaves the audit trail, which the database keeps append-only.
    await t.query(`UPDATE "review_requests" SET "signedHash" = ? WHERE "revisionId" = ? AND "state" = 'approved'`, [rehashed, r1.id]);
    const second = await verify();
    expect(second).toMatchObject({ valid: false, signatures: [{ signedHash: rehashed, auditedHash: r1.hash, matches: false }] });
    expect(second.problems).toEqual([expect.stringContaining('differs from the one the audit trail recorded')]);
  });
});
