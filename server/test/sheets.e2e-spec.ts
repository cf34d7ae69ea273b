import { ENGINE_VERSION } from '@channelwright/shared/device';
import { apiErrorBodySchema, deviceSchema, sheetSchema, type Device, type Process, type Sheet } from '@channelwright/shared/schemas';
import { countDeviceRows, newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('sheets and devices: stored results, edits and bad input', () => {
  let t: TestApp;
  let tokens: Tokens;
  let projectId: string;
  let bf180: { id: string; version: number; definition: Process };

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    projectId = (await wrenmoss(t, tokens.designer)).id;
    bf180 = await processByName(t, tokens.designer, 'BF180-G');
  });
  afterAll(() => t.close());

  const addDevice = async (sheetId: string, body: object) => deviceSchema.parse((await t.http().post(`/api/sheets/${sheetId}/devices`).set(bearer(tokens.designer)).send(body).expect(201)).body);
  const getSheet = async (sheetId: string): Promise<Sheet> => sheetSchema.parse((await t.http().get(`/api/sheets/${sheetId}`).set(bearer(tokens.designer)).expect(200)).body);
  const getDevice = async (sheetId: string, deviceId: string): Promise<Device> => (await getSheet(sheetId)).devices.find((d) => d.id === deviceId)!;
  /** What POST /api/compute/size answers for the request a device was computed from (the process inline). */
  const computeApi = async (device: Device) => {
    const { processId: _id, processVersion: _version, ...request } = device.sizeRequest;
    return (await t.http().post('/api/compute/size').set(bearer(tokens.designer)).send({ ...request, process: bf180.definition }).expect(200)).body;
  };
  const withoutProcessVersion = ({ processVersionId: _id, processVersion: _number, ...rest }: NonNullable<Device['result']>) => rest;

  describe('results', () => {
    let sheet: Sheet;
    beforeAll(async () => {
      sheet = await newSheet(t, tokens.designer, projectId, bf180.id, 'Results');
    });

    it('stores, with each new device, exactly what POST /api/compute/size answers for the same targets', async () => {
      const device = await addDevice(sheet.id, nmosTargets({ model: 'square-law', vds: 0.9, vov: 0.3 }));
      expect(device.result).not.toBeNull();
      expect(withoutProcessVersion(device.result!)).toEqual(await computeApi(device));
      expect(device.computedWith).toMatchObject({ engineVersion: ENGINE_VERSION, processVersionId: sheet.process.versionId, processVersion: bf180.version });
      expect(device.result).toMatchObject({ engineVersion: ENGINE_VERSION, processVersionId: sheet.process.versionId, processVersion: bf180.version });
      expect(device).toMatchObject({ stale: false, staleReasons: [], error: null, constraint: 'vov', version: 1 });
      // Shichman & Hodges, IEEE JSSC 3(3), 1968: saturation ID = (kp/2)(W/L)·VOV²·(1 + λ·VDS), λ scaled as lambda·lRef/L.
      const nmos = bf180.definition.nmos;
      const lambda = (nmos.lambda * nmos.lRef!) / device.targets.l;
      const expectedW = (2 * 20e-6 * device.targets.l) / (nmos.kp * 0.3 ** 2 * (1 + lambda * 0.9));
      expect(Math.abs(device.result!.w - expectedW)).toBeLessThanOrEqual(nmos.wgrid);
      // The stored row reads back the same.
      expect((await getDevice(sheet.id, device.id)).result).toEqual(device.result);
    });

    it('takes corner, temperature and model from the sheet when the device gives none, and the device\'s own when it does', async () => {
      const hot = sheetSchema.parse((await t.http().post(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).send({ name: 'Hot slow', processId: bf180.id, corner: 'SS', temperature: 85, model: 'square-law' }).expect(201)).body);
      const inherited = await addDevice(hot.id, nmosTargets({ name: 'MI' }));
      expect(inherited.result).toMatchObject({ corner: 'SS', temperature: 85, model: 'square-law' });
      const own = await addDevice(hot.id, nmosTargets({ name: 'MO', corner: 'FF', temperature: -40, model: 'all-region' }));
      expect(own.result).toMatchObject({ corner: 'FF', temperature: -40, model: 'all-region' });
      // Threshold temperature law VT(T) = VT0 + dVT/dT·(T − Tnom) + ΔVT(corner) (common practice, no source).
      const nmos = bf180.definition.nmos;
      const ss = bf180.definition.corners.find((c) => c.name === 'SS')!.nmos.dvt;
      expect(inherited.result!.vt).toBeCloseTo(nmos.vt0 + nmos.vtTc * (85 - bf180.definition.tnom) + ss, 12);
      expect(withoutProcessVersion(own.result!)).toEqual(await computeApi(own));
    });

    it('stores targets the engine cannot meet with result null and the engine\'s error naming the field, then a result once fixed', async () => {
      const refused = await addDevice(sheet.id, nmosTargets({ name: 'MW', gmId: 40, vov: undefined }));
      expect(refused.result).toBeNull();
      expect(refused.error).toMatchObject({ code: 'GM_ID_ABOVE_WEAK_INVERSION_LIMIT', field: 'gmId' });
      // The compute API refuses the same targets the same way.
      const { processId: _id, processVersion: _version, ...request } = refused.sizeRequest;
      const api = await t.http().post('/api/compute/size').set(bearer(tokens.designer)).send({ ...request, process: bf180.definition }).expect(400);
      expect(api.body).toMatchObject({ code: refused.error!.code, field: 'gmId' });
      expect((await getSheet(sheet.id)).totals.failedDeviceIds).toContain(refused.id);

      const fixed = deviceSchema.parse((await t.http().patch(`/api/sheets/${sheet.id}/devices/${refused.id}`).set(bearer(tokens.designer)).send({ version: refused.version, gmId: 15 }).expect(200)).body);
      expect(fixed).toMatchObject({ error: null, constraint: 'gmId', version: 2 });
      // Within what snapping W to the grid moves it.
      expect(fixed.result!.gmId).toBeCloseTo(15, 2);
      expect((await getSheet(sheet.id)).totals.failedDeviceIds).not.toContain(refused.id);
    });

    it('switches the constraint in a PATCH and keeps every other target', async () => {
      const device = await addDevice(sheet.id, nmosTargets({ name: 'MS', notes: 'keep me', matchGroup: 'pair', multiplier: 2 }));
      const patched = deviceSchema.parse((await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: 1, w: 4e-6 }).expect(200)).body);
      expect(patched.targets).toEqual({ ...device.targets, vov: undefined, w: 4e-6 });
      expect(patched.targets).not.toHaveProperty('vov');
      expect(patched.constraint).toBe('w');
      expect(patched.result!.w).toBeCloseTo(4e-6, 15);
      const cleared = deviceSchema.parse((await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: 2, matchGroup: null }).expect(200)).body);
      expect(cleared.targets).not.toHaveProperty('matchGroup');
    });

    it('answers 409 DEVICE_NAME_TAKEN for a second device of the same name in a sheet', async () => {
      const before = await countDeviceRows(t, sheet.id);
      const response = await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: 'M1' })).expect(409);
      expect(response.body).toMatchObject({ code: 'DEVICE_NAME_TAKEN', field: 'name' });
      expect(await countDeviceRows(t, sheet.id)).toBe(before);
    });
  });

  describe('bad input answers 400 naming the field, and nothing is stored', () => {
    let sheet: Sheet;
    let device: Device;
    beforeAll(async () => {
      sheet = await newSheet(t, tokens.designer, projectId, bf180.id, 'Bad input');
      device = await addDevice(sheet.id, nmosTargets());
    });

    const CASES: Array<[string, object, string, string]> = [
      ['a current that is not a number', { id: 'NaN' }, 'VALIDATION_FAILED', 'id'],
      ['a current given as null', { id: null }, 'VALIDATION_FAILED', 'id'],
      ['a negative current', { id: -1e-6 }, 'VALIDATION_FAILED', 'id'],
      ['two constraints at once', { vov: 0.2, w: 1e-6 }, 'VALIDATION_FAILED', 'w'],
      ['a corner the process lacks', { corner: 'XX' }, 'UNKNOWN_CORNER', 'corner'],
      ['multiplier 0', { multiplier: 0 }, 'VALIDATION_FAILED', 'multiplier'],
      ['a fractional multiplier', { multiplier: 1.5 }, 'VALIDATION_FAILED', 'multiplier'],
      ['a flavour the process lacks', { flavour: 'thick-oxide' }, 'UNKNOWN_FLAVOUR', 'flavour'],
      ['an NMOS flavour on a PMOS', { polarity: 'pmos', flavour: 'native' }, 'FLAVOUR_POLARITY_MISMATCH', 'polarity'],
      ['an unknown model', { model: 'bsim' }, 'VALIDATION_FAILED', 'model'],
      ['a field that does not exist', { gain: 40 }, 'VALIDATION_FAILED', ''],
    ];

    it.each(CASES)('POST with %s', async (_what, change, code, field) => {
      const before = await countDeviceRows(t);
      const response = await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send({ ...nmosTargets({ name: 'MX' }), ...change }).expect(400);
      const body = apiErrorBodySchema.parse(response.body);
      expect(body.code).toBe(code);
      if (field) expect(body.field).toBe(field);
      expect(await countDeviceRows(t)).toBe(before);
    });

    it.each(CASES.filter(([what]) => what !== 'two constraints at once'))('PATCH with %s', async (_what, change, code, field) => {
      const before = await getDevice(sheet.id, device.id);
      const response = await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: before.version, ...change }).expect(400);
      const body = apiErrorBodySchema.parse(response.body);
      expect(body.code).toBe(code);
      if (field) expect(body.field).toBe(field);
      expect(await getDevice(sheet.id, device.id)).toEqual(before);
    });

    it('PATCH with two constraints at once', async () => {
      const before = await getDevice(sheet.id, device.id);
      const response = await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: before.version, gmId: 12, vgs: 0.7 }).expect(400);
      expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'vgs' });
      expect(await getDevice(sheet.id, device.id)).toEqual(before);
    });

    it('a body that is not JSON (a bare NaN)', async () => {
      const before = await countDeviceRows(t);
      const response = await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).set('Content-Type', 'application/json').send('{"name":"MN","polarity":"nmos","id":NaN}');
      expect(response.status).toBe(400);
      expect(await countDeviceRows(t)).toBe(before);
    });

    it('a sheet on a process that does not exist, or with a corner it lacks', async () => {
      const before = (await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer))).body.length;
      const missing = await t.http().post(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).send({ name: 'Nowhere', processId: 'no-such-process' }).expect(404);
      expect(missing.body).toMatchObject({ code: 'PROCESS_NOT_FOUND', field: 'processId' });
      const corner = await t.http().post(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).send({ name: 'Odd corner', processId: bf180.id, corner: 'XX' }).expect(400);
      expect(corner.body).toMatchObject({ code: 'UNKNOWN_CORNER', field: 'corner' });
      const temperature = await t.http().post(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer)).send({ name: 'Too hot', processId: bf180.id, temperature: 1000 }).expect(400);
      expect(temperature.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'temperature' });
      expect((await t.http().get(`/api/projects/${projectId}/sheets`).set(bearer(tokens.designer))).body.length).toBe(before);
    });
  });

  describe('stale edits answer 409 STALE_EDIT and lose nothing', () => {
    let sheet: Sheet;
    beforeAll(async () => {
      sheet = await newSheet(t, tokens.designer, projectId, bf180.id, 'Stale edits');
    });

    it('for a device edited from an old version', async () => {
      const device = await addDevice(sheet.id, nmosTargets());
      await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: 1, id: 30e-6 }).expect(200);
      const afterFirst = await getDevice(sheet.id, device.id);
      const stale = await t.http().patch(`/api/sheets/${sheet.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: 1, id: 5e-6 }).expect(409);
      expect(stale.body).toMatchObject({ statusCode: 409, code: 'STALE_EDIT', field: 'version' });
      expect(await getDevice(sheet.id, device.id)).toEqual(afterFirst);
      expect(afterFirst.targets.id).toBe(30e-6);
      await t.http().delete(`/api/sheets/${sheet.id}/devices/${device.id}?version=1`).set(bearer(tokens.designer)).expect(409);
      expect(await getDevice(sheet.id, device.id)).toEqual(afterFirst);
    });

    it('for a sheet edited from an old version', async () => {
      await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: 1, name: 'Stale edits, renamed' }).expect(200);
      const afterFirst = await getSheet(sheet.id);
      const stale = await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ version: 1, corner: 'FF', name: 'From an old tab' }).expect(409);
      expect(stale.body.code).toBe('STALE_EDIT');
      expect(await getSheet(sheet.id)).toEqual(afterFirst);
      await t.http().delete(`/api/sheets/${sheet.id}?version=1`).set(bearer(tokens.designer)).expect(409);
      expect(await getSheet(sheet.id)).toEqual(afterFirst);
    });

    it('a PATCH without a version is refused 400 naming the field', async () => {
      const response = await t.http().patch(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).send({ name: 'No version' }).expect(400);
      expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'version' });
    });
  });

  describe('deleting', () => {
    it('a device, then the sheet with its remaining devices', async () => {
      const sheet = await newSheet(t, tokens.designer, projectId, bf180.id, 'Short-lived');
      const a = await addDevice(sheet.id, nmosTargets({ name: 'MA' }));
      await addDevice(sheet.id, nmosTargets({ name: 'MB' }));
      await t.http().delete(`/api/sheets/${sheet.id}/devices/${a.id}?version=${a.version}`).set(bearer(tokens.designer)).expect(204);
      expect((await getSheet(sheet.id)).devices.map((d) => d.targets.name)).toEqual(['MB']);
      await t.http().delete(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).expect(204);
      await t.http().get(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).expect(404);
      expect(await countDeviceRows(t, sheet.id)).toBe(0);
    });

    it('answers 404 DEVICE_NOT_FOUND for a device of another sheet', async () => {
      const one = await newSheet(t, tokens.designer, projectId, bf180.id, 'One');
      const other = await newSheet(t, tokens.designer, projectId, bf180.id, 'Other');
      const device = await addDevice(other.id, nmosTargets());
      const response = await t.http().patch(`/api/sheets/${one.id}/devices/${device.id}`).set(bearer(tokens.designer)).send({ version: 1, notes: 'x' }).expect(404);
      expect(response.body.code).toBe('DEVICE_NOT_FOUND');
      await t.http().delete(`/api/sheets/${one.id}/devices/${device.id}`).set(bearer(tokens.designer)).expect(404);
      expect(await countDeviceRows(t, other.id)).toBe(1);
    });
  });
});
