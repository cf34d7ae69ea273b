import { BF130G, computeSize } from '@channelwright/shared/device';
import { sheetMigrationSchema, sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { demoSheet, processByName, signInEveryone, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

describe('POST /api/sheets/:id/migrate', () => {
  let t: TestApp;
  let tokens: Tokens;
  let amplifier: Sheet;
  let bf130: { id: string; version: number };

  const migrate = (body: object, token = tokens.designer) => t.http().post(`/api/sheets/${amplifier.id}/migrate`).set(bearer(token)).send(body);
  const sourceRows = () => t.query('SELECT * FROM "devices" WHERE "sheetId" = ? ORDER BY "position"', [amplifier.id]);
  const sourceSheet = () => t.query('SELECT * FROM "sheets" WHERE "id" = ?', [amplifier.id]);

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    amplifier = await demoSheet(t, tokens.designer, 'Two-stage amplifier');
    bf130 = await processByName(t, tokens.designer, 'BF130-G');
  });
  afterAll(() => t.close());

  it('previews every device re-solved on BF130-G beside the old figures, L scaled by the ratio of lmin, and writes nothing', async () => {
    const [rows, sheetRow] = [await sourceRows(), await sourceSheet()];
    const count = (await t.query('SELECT COUNT(*) AS n FROM "sheets"'))[0].n;
    const preview = sheetMigrationSchema.parse((await migrate({ processId: bf130.id, preview: true }).expect(200)).body);
    expect(preview.sheet).toBeNull();
    expect(preview.to).toEqual({ processName: 'BF130-G', version: bf130.version, vdd: 1.2 });
    expect(preview.voltageScale).toBeCloseTo(1.2 / 1.8, 12);
    for (const row of preview.devices) {
      const device = amplifier.devices.find((d) => d.id === row.sourceDeviceId)!;
      expect(row.old?.w).toBe(device.result!.w);
      expect(row.lengthScale).toBeCloseTo(0.13 / 0.18, 12);
      // The same targets sized by hand on BF130-G (invented demo data) give the new figures.
      const constraint = device.constraint;
      const expected = computeSize(
        { processId: 'bf130g', polarity: device.targets.polarity, id: device.targets.id, l: row.new!.l, vds: device.targets.vds * (1.2 / 1.8), vsb: device.targets.vsb * (1.2 / 1.8), [constraint]: constraint === 'vgs' ? (device.targets.vgs as number) * (1.2 / 1.8) : device.targets[constraint] },
        BF130G,
      );
      expect(row.new?.w).toBe(expected.w);
      expect(row.new?.gmId).toBe(expected.gmId);
      expect(row.new?.area).toBeCloseTo(expected.w * expected.l * device.targets.multiplier, 24);
    }
    expect(await sourceRows()).toEqual(rows);
    expect(await sourceSheet()).toEqual(sheetRow);
    expect((await t.query('SELECT COUNT(*) AS n FROM "sheets"'))[0].n).toBe(count);
  });

  it('creates a new sheet on BF130-G with the re-solved devices and leaves the source untouched', async () => {
    const [rows, sheetRow] = [await sourceRows(), await sourceSheet()];
    const fixed = amplifier.devices.find((d) => d.targets.name === 'M5')!;
    const answer = sheetMigrationSchema.parse((await migrate({ processId: bf130.id, fixedLengths: [fixed.id] }).expect(200)).body);
    expect(answer.sheet?.name).toBe('Two-stage amplifier on BF130-G');
    expect(answer.sheet?.process.name).toBe('BF130-G');
    const created = sheetSchema.parse((await t.http().get(`/api/sheets/${answer.sheet!.id}`).set(bearer(tokens.viewer)).expect(200)).body);
    expect(created.devices.map((d) => d.targets.name)).toEqual(amplifier.devices.map((d) => d.targets.name));
    expect(created.devices.map((d) => d.result?.w ?? null)).toEqual(answer.devices.map((d) => d.new?.w ?? null));
    expect(created.devices.find((d) => d.targets.name === 'M5')?.targets.l).toBe(fixed.targets.l);
    expect(created.offsetBudgets).toEqual(amplifier.offsetBudgets);
    expect(await sourceRows()).toEqual(rows);
    expect(await sourceSheet()).toEqual(sheetRow);
  });

  it('keeps a device the new process cannot size, with the reason, and drops a flavour it lacks with a note', async () => {
    const bias = await demoSheet(t, tokens.designer, 'Bias generator');
    const answer = sheetMigrationSchema.parse((await t.http().post(`/api/sheets/${bias.id}/migrate`).set(bearer(tokens.designer)).send({ processId: bf130.id, preview: true }).expect(200)).body);
    const native = answer.devices.find((d) => d.name === 'MNAT')!;
    expect(native.notes).toEqual([expect.stringContaining('no NMOS flavour "native"')]);
  });

  it('answers 404 for a profile that does not exist and 403 to a viewer', async () => {
    expect((await migrate({ processId: 'nope' }).expect(404)).body).toMatchObject({ code: 'PROCESS_NOT_FOUND', field: 'processId' });
    expect((await migrate({ processId: bf130.id }, tokens.viewer).expect(403)).body.code).toBe('FORBIDDEN');
  });
});
