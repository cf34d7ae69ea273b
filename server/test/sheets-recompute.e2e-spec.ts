import { BF180G, ENGINE_VERSION } from '@channelwright/shared/device';
import { sheetSchema, type Device, type Process, type Sheet } from '@channelwright/shared/schemas';
import { newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

/** BF180-G under another name, so a test can add versions to it (invented demo data). */
const trialProcess = (change: Partial<Process> = {}): Process => ({ ...structuredClone(BF180G), name: 'BF180-G trial', ...change });

describe('stale results and recompute after a process version change', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;
  let profileId: string;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
    const created = await t.http().post('/api/processes').set(bearer(tokens.admin)).send({ nodeClass: '180 nm', message: 'trial copy', definition: trialProcess() }).expect(201);
    profileId = created.body.id;
  });
  afterAll(() => t.close());

  const getSheet = async (id: string): Promise<Sheet> => sheetSchema.parse((await t.http().get(`/api/sheets/${id}`).set(bearer(tokens.designer)).expect(200)).body);
  const byName = (sheet: Sheet, name: string): Device => sheet.devices.find((d) => d.targets.name === name)!;
  const patchSheet = async (sheet: Sheet, change: object) =>
    sheetSchema.parse((await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: sheet.version, ...change }).expect(200)).body);
  const recompute = async (sheet: Sheet) => sheetSchema.parse((await t.http().post(`/api/sheets/${sheet.id}/recompute`).set(bearer(tokens.designer)).expect(200)).body);

  it('marks results stale when the sheet moves to a newer version, keeps them until recompute, and recompute follows the parameter change', async () => {
    const sheet = await newSheet(t, tokens.designer, projectId, profileId, 'Moves to v2');
    for (const body of [nmosTargets({ name: 'MN' }), nmosTargets({ name: 'MP', polarity: 'pmos' })]) {
      await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(body).expect(201);
    }
    const before = await getSheet(sheet.id);

    // Version 2 doubles the NMOS kp.
    const v2 = trialProcess({ nmos: { ...BF180G.nmos, kp: 2 * BF180G.nmos.kp } });
    await t.http().put(`/api/processes/${profileId}`).set(bearer(tokens.admin)).send({ baseVersion: 1, message: 'kp doubled', definition: v2 }).expect(200);
    expect((await getSheet(sheet.id)).process).toMatchObject({ version: 1, latestVersion: 2 });

    const moved = await patchSheet(before, { processVersion: 2 });
    expect(moved.process).toMatchObject({ version: 2, latestVersion: 2 });
    expect(moved.stale).toBe(true);
    expect(moved.staleCount).toBe(2);
    for (const device of moved.devices) {
      expect(device).toMatchObject({ stale: true, staleReasons: ['process'], computedWith: { processVersion: 1 } });
      expect(device.result).toEqual(byName(before, device.targets.name).result);
    }

    const fresh = await recompute(moved);
    expect(fresh.stale).toBe(false);
    for (const device of fresh.devices) expect(device).toMatchObject({ stale: false, staleReasons: [], computedWith: { processVersion: 2, engineVersion: ENGINE_VERSION }, version: 2 });
    // ID ∝ kp·W/L at a fixed overdrive, in the square law (Shichman & Hodges, IEEE JSSC 1968) and in the
    // all-region EKV form alike (Enz, Krummenacher & Vittoz, AICSP 8, 1995): doubling kp halves the width needed.
    const [nBefore, nAfter] = [byName(before, 'MN').result!, byName(fresh, 'MN').result!];
    expect(nAfter.wRequired / nBefore.wRequired).toBeCloseTo(0.5, 9);
    expect(nAfter.vt).toBe(nBefore.vt);
    // The PMOS parameters did not change, so neither does its result (but the process version it names).
    const { processVersionId: _a, processVersion: _b, ...pAfter } = byName(fresh, 'MP').result!;
    const { processVersionId: _c, processVersion: _d, ...pBefore } = byName(before, 'MP').result!;
    expect(pAfter).toEqual(pBefore);
  });

  it('migrates a sheet to BF130-G: stale until recompute, then every result on BF130-G, and a flavour BF130-G lacks is stored as that device\'s error', async () => {
    const bf130 = await processByName(t, tokens.designer, 'BF130-G');
    const sheet = await newSheet(t, tokens.designer, projectId, (await processByName(t, tokens.designer, 'BF180-G')).id, 'Migrates');
    await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: 'MN', vds: 0.4 })).expect(201);
    await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: 'MNAT', flavour: 'native', l: 1e-6, vov: undefined, vgs: 0 })).expect(201);
    const before = await getSheet(sheet.id);
    expect(before.totals.vdd).toBe(1.8);

    const moved = await patchSheet(before, { processId: bf130.id });
    expect(moved.process).toMatchObject({ name: 'BF130-G', version: bf130.version, flavours: [] });
    expect(moved.devices.every((d) => d.stale)).toBe(true);
    // Each stale result names the process it was computed on, not the sheet's new one.
    expect(moved.devices.map((d) => d.computedWith.processName)).toEqual(['BF180-G', 'BF180-G']);
    expect(moved.totals.vdd).toBe(bf130.definition.vdd);

    const fresh = await recompute(moved);
    expect(fresh.stale).toBe(false);
    const mn = byName(fresh, 'MN');
    expect(mn.result!.processVersionId).toBe(moved.process.versionId);
    // VSB = 0 at tnom and TT: VT is VT0 of the process the device is on (common practice, no source).
    expect(mn.result!.vt).toBeCloseTo(bf130.definition.nmos.vt0, 12);
    const native = byName(fresh, 'MNAT');
    expect(native).toMatchObject({ result: null, error: { code: 'UNKNOWN_FLAVOUR', field: 'flavour' }, stale: false });
    expect(fresh.totals.failedDeviceIds).toEqual([native.id]);
  });

  it('marks a result made by another engine version stale, and recompute brings it to this one', async () => {
    const sheet = await newSheet(t, tokens.designer, projectId, profileId, 'Old engine');
    const created = await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets()).expect(201);
    // As if an older engine had computed it.
    await t.query('UPDATE "devices" SET "engineVersion" = ? WHERE "id" = ?', ['0.9.0', created.body.id]);
    const old = await getSheet(sheet.id);
    expect(old.devices[0]).toMatchObject({ stale: true, staleReasons: ['engine'], computedWith: { engineVersion: '0.9.0' } });
    expect(old.stale).toBe(true);
    const fresh = await recompute(old);
    expect(fresh.devices[0]).toMatchObject({ stale: false, computedWith: { engineVersion: ENGINE_VERSION } });
  });

  it('refuses a move to a process that lacks the sheet\'s corner, naming the field, and changes nothing', async () => {
    const ttOnly = trialProcess({ name: 'TT only', corners: [{ name: 'TT', nmos: { dvt: 0, kpScale: 1 }, pmos: { dvt: 0, kpScale: 1 } }] });
    const other = (await t.http().post('/api/processes').set(bearer(tokens.admin)).send({ definition: ttOnly }).expect(201)).body;
    const sheet = sheetSchema.parse((await t.http().post(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).send({ name: 'Slow corner', processId: profileId, corner: 'SS' }).expect(201)).body);
    const response = await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: sheet.version, processId: other.id }).expect(400);
    expect(response.body).toMatchObject({ code: 'UNKNOWN_CORNER', field: 'corner' });
    expect(await getSheet(sheet.id)).toEqual(sheet);
    const missingVersion = await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: sheet.version, processVersion: 99 }).expect(404);
    expect(missingVersion.body).toMatchObject({ code: 'PROCESS_VERSION_NOT_FOUND', field: 'processVersion' });
    expect(await getSheet(sheet.id)).toEqual(sheet);
  });

  it('keeps a process version that sheets use from being deleted', async () => {
    const response = await t.http().delete(`/api/processes/${profileId}`).set(bearer(tokens.admin)).expect(409);
    expect(response.body.code).toBe('PROCESS_IN_USE');
  });
});
