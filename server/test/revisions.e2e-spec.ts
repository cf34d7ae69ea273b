import { createHash } from 'node:crypto';
import { BF180G } from '@channelwright/shared/device';
import { revisionDiffSchema, revisionListSchema, revisionSchema, sheetSchema, type Process, type Revision, type Sheet } from '@channelwright/shared/schemas';
import { canonicalJson } from '../src/revisions/canonical-json.js';
import { newSheet, nmosTargets, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { snapshotRows } from './helpers/review-rows.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('revisions: freezing a sheet into an immutable, hashed snapshot', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;
  let amplifier: Sheet;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
    const summaries = (await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).expect(200)).body;
    amplifier = await getSheet(summaries.find((s: { name: string }) => s.name === 'Two-stage amplifier').id);
  });
  afterAll(() => t.close());

  async function getSheet(id: string): Promise<Sheet> {
    return sheetSchema.parse((await t.http().get(`/api/sheets/${id}`).set(bearer(tokens.designer)).expect(200)).body);
  }
  async function freeze(sheetId: string, message: string, token = tokens.designer, status = 201) {
    return t.http().post(`/api/sheets/${sheetId}/revisions`).set(bearer(token)).send({ message }).expect(status);
  }
  const devicesOf = (revision: Revision) => new Map(revision.devices.map((d) => [d.name, d]));

  it('freezes every device target and stored result with the process and engine version, as r1', async () => {
    const revision = revisionSchema.parse((await freeze(amplifier.id, 'First complete sizing')).body);
    expect(revision).toMatchObject({ number: 1, label: 'r1', message: 'First complete sizing', state: 'draft', signOff: null, deviceCount: amplifier.devices.length });
    expect(revision.process).toEqual({ profileId: amplifier.process.profileId, name: amplifier.process.name, versionId: amplifier.process.versionId, version: amplifier.process.version });
    expect(revision.engineVersion).toBe(amplifier.devices[0]!.computedWith.engineVersion);
    expect(revision.sheet).toMatchObject({ id: amplifier.id, name: 'Two-stage amplifier', corner: amplifier.corner, model: amplifier.model });
    for (const device of amplifier.devices) {
      const frozen = devicesOf(revision).get(device.targets.name)!;
      expect(frozen).toMatchObject({ id: device.id, position: device.position });
      expect(frozen.targets).toEqual(device.targets);
      expect(frozen.result).toEqual(device.result);
      expect(frozen.computedAt).toBe(device.computedWith.computedAt);
    }
    expect(revision.hash).toMatch(/^[0-9a-f]{64}$/);
  });

  it('hashes the canonical JSON of everything it froze: the hash can be recomputed from the response', async () => {
    const [summary] = revisionListSchema.parse((await t.http().get(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.viewer)).expect(200)).body);
    const revision = revisionSchema.parse((await t.http().get(`/api/revisions/${summary!.id}`).set(bearer(tokens.viewer)).expect(200)).body);
    const { id: _id, projectId: _projectId, ...sheetFields } = revision.sheet;
    const content = {
      format: 'channelwright.revision',
      formatVersion: 1,
      id: revision.id,
      sheetId: revision.sheetId,
      projectId: revision.projectId,
      number: revision.number,
      message: revision.message,
      authorId: revision.author!.id,
      createdAt: revision.createdAt,
      sheet: sheetFields,
      process: revision.process,
      engineVersion: revision.engineVersion,
      devices: revision.devices.map(({ id, ...device }) => ({ deviceId: id, ...device })),
    };
    // SHA-256: FIPS 180-4 (2015); canonical JSON: RFC 8785 (2020).
    expect(createHash('sha256').update(canonicalJson(content)).digest('hex')).toBe(revision.hash);
    const verify = await t.http().get(`/api/revisions/${revision.id}/verify`).set(bearer(tokens.viewer)).expect(200);
    expect(verify.body).toEqual({ valid: true, algorithm: 'sha-256', storedHash: revision.hash, computedHash: revision.hash, signatures: [], problems: [] });
  });

  it('numbers the revisions of a sheet r1, r2 … and lists them newest first', async () => {
    await freeze(amplifier.id, 'Same numbers again');
    const list = revisionListSchema.parse((await t.http().get(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.designer)).expect(200)).body);
    expect(list.map((r) => r.label)).toEqual(['r2', 'r1']);
    expect(list[0]!.hash).not.toBe(list[1]!.hash);
  });

  it('lets designers and owners freeze; reviewers and viewers get 403, outsiders 404; a bad message 400', async () => {
    expect((await freeze(amplifier.id, 'x', tokens.reviewer, 403)).body.code).toBe('FORBIDDEN');
    await freeze(amplifier.id, 'x', tokens.viewer, 403);
    expect((await freeze(amplifier.id, 'x', tokens.outsider, 404)).body.code).toBe('SHEET_NOT_FOUND');
    expect((await freeze(amplifier.id, '   ', tokens.designer, 400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'message' });
    const [revision] = (await t.http().get(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.designer))).body;
    expect((await t.http().get(`/api/revisions/${revision.id}`).set(bearer(tokens.outsider)).expect(404)).body.code).toBe('REVISION_NOT_FOUND');
    await t.http().get(`/api/revisions/${revision.id}/verify`).set(bearer(tokens.outsider)).expect(404);
  });

  it('refuses to freeze a sheet without devices, or one whose results are stale, writing nothing', async () => {
    const empty = await newSheet(t, tokens.designer, projectId, amplifier.process.profileId, 'Empty for now');
    expect((await freeze(empty.id, 'Nothing yet', tokens.designer, 409)).body.code).toBe('SHEET_HAS_NO_DEVICES');

    const trial: Process = { ...structuredClone(BF180G), name: 'BF180-G revision trial' };
    const profile = (await t.http().post('/api/processes').set(bearer(tokens.admin)).send({ nodeClass: '180 nm', message: 'trial', definition: trial }).expect(201)).body;
    const sheet = await newSheet(t, tokens.designer, projectId, profile.id, 'Goes stale');
    await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets()).expect(201);
    await t.http().put(`/api/processes/${profile.id}`).set(bearer(tokens.admin)).send({ baseVersion: 1, message: 'kp up', definition: { ...trial, nmos: { ...trial.nmos, kp: 1.5 * trial.nmos.kp } } }).expect(200);
    const current = await getSheet(sheet.id);
    await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: current.version, processVersion: 2 }).expect(200);
    const stale = await freeze(sheet.id, 'Before recompute', tokens.designer, 409);
    expect(stale.body.code).toBe('SHEET_RESULTS_STALE');
    expect(stale.body.message).toContain('M1');
    const [count] = await t.query(`SELECT COUNT(*) AS "n" FROM "revisions" WHERE "sheetId" IN (?, ?)`, [empty.id, sheet.id]);
    expect(count.n).toBe(0);
    await t.http().post(`/api/sheets/${sheet.id}/recompute`).set(bearer(tokens.designer)).expect(200);
    const revision = revisionSchema.parse((await freeze(sheet.id, 'After recompute')).body);
    expect(revision.process.version).toBe(2);
  });

  it('diffs two revisions: devices added, removed and changed, with each target and result from what to what', async () => {
    const sheet = await newSheet(t, tokens.designer, projectId, amplifier.process.profileId, 'Diff trial');
    const created = async (body: object) => (await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(body).expect(201)).body;
    const m1 = await created(nmosTargets({ name: 'M1' }));
    const m2 = await created(nmosTargets({ name: 'M2' }));
    const r1 = revisionSchema.parse((await freeze(sheet.id, 'Two devices')).body);
    await t.http().patch(`/api/sheets/${sheet.id}/devices/${m1.id}`).set(bearer(tokens.designer)).send({ version: m1.version, l: 1e-6 }).expect(200);
    await t.http().delete(`/api/sheets/${sheet.id}/devices/${m2.id}`).set(bearer(tokens.designer)).expect(204);
    const m3 = await created(nmosTargets({ name: 'M3', id: 5e-6 }));
    const r2 = revisionSchema.parse((await freeze(sheet.id, 'Longer M1, M3 instead of M2')).body);

    const diff = revisionDiffSchema.parse((await t.http().get(`/api/revisions/${r2.id}/diff`).query({ against: r1.id }).set(bearer(tokens.reviewer)).expect(200)).body);
    expect(diff).toMatchObject({ revisionId: r2.id, againstId: r1.id, againstLabel: 'r1', added: [{ id: m3.id, name: 'M3' }], removed: [{ id: m2.id, name: 'M2' }], sheetChanges: [] });
    expect(diff.changed.map((c) => c.name)).toEqual(['M1']);
    const changes = new Map(diff.changed[0]!.changes.map((c) => [c.path, c]));
    expect(changes.get('targets.l')).toEqual({ path: 'targets.l', from: 0.5e-6, to: 1e-6 });
    const w = changes.get('result.w')!;
    expect(w.from).toBe(r1.devices.find((d) => d.name === 'M1')!.result!.w);
    expect(w.to).toBe(r2.devices.find((d) => d.name === 'M1')!.result!.w);
    expect(w.to as number).toBeGreaterThan(w.from as number);
    expect(changes.has('targets.id')).toBe(false);

    // With nothing signed off yet there is nothing to compare with by default.
    const unsigned = revisionDiffSchema.parse((await t.http().get(`/api/revisions/${r2.id}/diff`).set(bearer(tokens.designer)).expect(200)).body);
    expect(unsigned).toMatchObject({ againstId: null, removed: [], changed: [] });
    expect(unsigned.added.map((d) => d.name)).toEqual(['M1', 'M3']);

    const [other] = (await t.http().get(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.designer))).body;
    const refused = await t.http().get(`/api/revisions/${r2.id}/diff`).query({ against: other.id }).set(bearer(tokens.designer)).expect(400);
    expect(refused.body).toMatchObject({ code: 'REVISION_OTHER_SHEET', field: 'against' });
    const missing = await t.http().get(`/api/revisions/${r2.id}/diff`).query({ against: 'no-such-revision' }).set(bearer(tokens.designer)).expect(404);
    expect(missing.body).toMatchObject({ code: 'REVISION_NOT_FOUND', field: 'against' });
  });

  it('answers every attempt to change a revision with 409 and writes nothing', async () => {
    const [revision] = (await t.http().get(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.designer))).body;
    const full = revisionSchema.parse((await t.http().get(`/api/revisions/${revision.id}`).set(bearer(tokens.designer))).body);
    const before = await snapshotRows(t);
    const patch = await t.http().patch(`/api/revisions/${revision.id}`).set(bearer(tokens.designer)).send({ message: 'rewritten' }).expect(409);
    expect(patch.body.code).toBe('REVISION_IMMUTABLE');
    await t.http().patch(`/api/revisions/${revision.id}/devices/${full.devices[0]!.id}`).set(bearer(tokens.designer)).send({ l: 1e-6 }).expect(409);
    await t.http().delete(`/api/revisions/${revision.id}`).set(bearer(tokens.designer)).expect(409);
    expect((await t.http().delete(`/api/revisions/${revision.id}/devices/not-in-it`).set(bearer(tokens.designer)).expect(404)).body.code).toBe('DEVICE_NOT_FOUND');
    await t.http().patch(`/api/revisions/${revision.id}`).set(bearer(tokens.viewer)).send({}).expect(403);
    expect(await snapshotRows(t)).toEqual(before);
  });

  it('is guarded by the database too: UPDATE and DELETE of revisions and their devices are refused', async () => {
    const before = await snapshotRows(t);
    await expect(t.query(`UPDATE "revisions" SET "message" = 'rewritten'`)).rejects.toThrow(/immutable/);
    await expect(t.query(`UPDATE "revision_devices" SET "result" = NULL`)).rejects.toThrow(/immutable/);
    await expect(t.query(`DELETE FROM "revision_devices"`)).rejects.toThrow(/immutable/);
    await expect(t.query(`DELETE FROM "revisions"`)).rejects.toThrow(/immutable/);
    expect(await snapshotRows(t)).toEqual(before);
  });

  it('fails verification once a stored row was tampered with directly in the database', async () => {
    const [revision] = revisionListSchema.parse((await t.http().get(`/api/sheets/${amplifier.id}/revisions`).set(bearer(tokens.designer))).body).slice(-1);
    await t.dropTrigger('TRG_revision_devices_no_update', 'revision_devices');
    const [row] = await t.query(`SELECT "id", "result" FROM "revision_devices" WHERE "revisionId" = ? ORDER BY "position" LIMIT 1`, [revision!.id]);
    const result = JSON.parse(row.result);
    await t.query(`UPDATE "revision_devices" SET "result" = ? WHERE "id" = ?`, [JSON.stringify({ ...result, w: result.w * 1.01 }), row.id]);
    const verify = await t.http().get(`/api/revisions/${revision!.id}/verify`).set(bearer(tokens.designer)).expect(200);
    expect(verify.body).toMatchObject({ valid: false, storedHash: revision!.hash });
    expect(verify.body.computedHash).toMatch(/^[0-9a-f]{64}$/);
    expect(verify.body.computedHash).not.toBe(revision!.hash);
  });
});
