import { reviewRequestSchema, revisionSchema, sheetSchema, type Revision, type Sheet } from '@channelwright/shared/schemas';
import { QueryFailedError } from 'typeorm';
import { DEMO_ACCOUNTS } from '../src/seed/demo-accounts.js';
import { signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';
import { TEST_DATABASE_ENGINE } from './helpers/test-database.js';

/**
 * The database's own guard behind the API's 409s, on either engine: SQLite's triggers RAISE(ABORT, …), PostgreSQL's run
 * the plpgsql function refuse_change, which raises SQLSTATE 23000 (integrity_constraint_violation; PostgreSQL
 * documentation, "Appendix A. PostgreSQL Error Codes", 2024) with the same message.
 */
describe('the database refuses to change what has been signed or committed', () => {
  let t: TestApp;
  let tokens: Tokens;
  let amplifier: Sheet;
  let signed: Revision;
  let requestId: string;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    const projectId = (await wrenmoss(t, tokens.designer)).id;
    const summaries = (await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).expect(200)).body;
    const id = summaries.find((s: { name: string }) => s.name === 'Two-stage amplifier').id;
    amplifier = sheetSchema.parse((await t.http().get(`/api/sheets/${id}`).set(bearer(tokens.designer)).expect(200)).body);
    signed = revisionSchema.parse((await t.http().post(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.designer)).send({ message: 'For sign-off' }).expect(201)).body);
    const request = (await t.http().post(`/api/revisions/${signed.id}/review-requests`).set(bearer(tokens.designer)).send({ reviewerEmail: DEMO_ACCOUNTS.reviewer.email }).expect(201)).body;
    requestId = request.id;
    const decided = reviewRequestSchema.parse((await t.http().post(`/api/review-requests/${requestId}/decision`).set(bearer(tokens.reviewer)).send({ decision: 'approve' }).expect(200)).body);
    expect(decided.revision.state).toBe('signed-off');
  });
  afterAll(() => t.close());

  /** The refusal of `sql`: the trigger's message, and the engine's code for a trigger's refusal. */
  async function refusal(sql: string, params: unknown[]): Promise<{ message: string; code: string }> {
    const error = await t.query(sql, params).then(
      () => undefined,
      (failure: unknown) => failure,
    );
    if (!(error instanceof QueryFailedError)) throw new Error(`expected the database to refuse: ${sql}`);
    return { message: error.message, code: String((error.driverError as { code?: unknown }).code) };
  }

  const triggerCode = TEST_DATABASE_ENGINE === 'postgres' ? '23000' : 'SQLITE_CONSTRAINT_TRIGGER';

  it('refuses an UPDATE of a signed-off revision and of its devices, and keeps them as they were', async () => {
    const before = await t.query(`SELECT * FROM "revisions" WHERE "id" = ?`, [signed.id]);
    expect(await refusal(`UPDATE "revisions" SET "message" = 'rewritten' WHERE "id" = ?`, [signed.id])).toEqual({ message: expect.stringMatching(/revisions are immutable/), code: triggerCode });
    expect(await refusal(`UPDATE "revision_devices" SET "result" = NULL WHERE "revisionId" = ?`, [signed.id])).toEqual({ message: expect.stringMatching(/revisions are immutable/), code: triggerCode });
    expect(await refusal(`DELETE FROM "revisions" WHERE "id" = ?`, [signed.id])).toEqual({ message: expect.stringMatching(/revisions are immutable/), code: triggerCode });
    expect(await t.query(`SELECT * FROM "revisions" WHERE "id" = ?`, [signed.id])).toEqual(before);
  });

  it('refuses to reopen the sign-off or change whom it names', async () => {
    expect(await refusal(`UPDATE "review_requests" SET "state" = 'open' WHERE "id" = ?`, [requestId])).toEqual({ message: expect.stringMatching(/final/), code: triggerCode });
    expect(await refusal(`UPDATE "review_requests" SET "signedHash" = ? WHERE "id" = ?`, ['0'.repeat(64), requestId])).toEqual({ message: expect.stringMatching(/final/), code: triggerCode });
    const [request] = await t.query(`SELECT "state", "signedHash" FROM "review_requests" WHERE "id" = ?`, [requestId]);
    expect(request).toEqual({ state: 'approved', signedHash: signed.hash });
  });

  it('refuses an UPDATE of a committed process version, yet lets the library mark the profile deprecated', async () => {
    const versionId = amplifier.process.versionId;
    const [before] = await t.query(`SELECT "definition", "modelCard" FROM "process_versions" WHERE "id" = ?`, [versionId]);
    expect(await refusal(`UPDATE "process_versions" SET "definition" = '{}' WHERE "id" = ?`, [versionId])).toEqual({ message: expect.stringMatching(/process versions are immutable/), code: triggerCode });
    expect(await refusal(`UPDATE "process_versions" SET "modelCard" = NULL WHERE "id" = ?`, [versionId])).toEqual({ message: expect.stringMatching(/process versions are immutable/), code: triggerCode });
    expect(await t.query(`SELECT "definition", "modelCard" FROM "process_versions" WHERE "id" = ?`, [versionId])).toEqual([before]);
    // The trigger covers the content columns only: the profile row beside it still changes.
    const deprecated = await t.http().post(`/api/processes/${amplifier.process.profileId}/deprecate`).set(bearer(tokens.admin)).send({ deprecated: true }).expect(200);
    expect(deprecated.body.deprecated).toBe(true);
  });
});
