import { sheetImportResultSchema, sheetSchema, type Sheet } from '@channelwright/shared/schemas';
import { countDeviceRows, newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

const HEADER = 'Name,Function,Polarity,ID (A),L (um),VDS (V),VSB (V),Constraint,Target VOV (V),Target gm/ID (1/V),Match group';

describe('POST /api/sheets/:id/import', () => {
  let t: TestApp;
  let tokens: Tokens;
  let sheet: Sheet;

  const send = (text: string | Buffer, fields: Record<string, string> = {}, token = tokens.designer, name = 'devices.csv') => {
    const request = t.http().post(`/api/sheets/${sheet.id}/import`).set(bearer(token));
    for (const [key, value] of Object.entries(fields)) request.field(key, value);
    return request.attach('file', Buffer.isBuffer(text) ? text : Buffer.from(text, 'utf8'), name);
  };
  const load = async () => sheetSchema.parse((await t.http().get(`/api/sheets/${sheet.id}`).set(bearer(tokens.designer)).expect(200)).body);
  const snapshot = () => t.query('SELECT "id", "name", "version", "targets" FROM "devices" WHERE "sheetId" = ? ORDER BY "position"', [sheet.id]);

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    const project = await wrenmoss(t, tokens.designer);
    const bf180 = await processByName(t, tokens.designer, 'BF180-G');
    sheet = await newSheet(t, tokens.designer, project.id, bf180.id, 'Imported');
    await t.http().post(`/api/sheets/${sheet.id}/devices`).set(bearer(tokens.designer)).send(nmosTargets({ name: 'M1', function: 'kept function' })).expect(201);
    sheet = await load();
  });
  afterAll(() => t.close());

  it('previews a good file (new rows, a row updating a device by name) and writes nothing', async () => {
    const before = await snapshot();
    const text = `${HEADER}\nM1,,nmos,30u,0.5,0.6,0,vov,0.25,,\nM2,tail,pmos,10u,1,0.4,0,gmId,,16,pair\n`;
    const result = sheetImportResultSchema.parse((await send(text).expect(200)).body);
    expect(result).toMatchObject({ mode: 'preview', applied: false, delimiter: ',', problems: [] });
    expect(result.created).toEqual([{ row: 3, name: 'M2' }]);
    expect(result.updated).toEqual([{ row: 2, name: 'M1', deviceId: sheet.devices[0].id }]);
    expect(await snapshot()).toEqual(before);
  });

  it('applies it in one transaction: the update keeps fields the file has no column for, the new device is sized', async () => {
    const text = `Name,Polarity,ID (A),L (um),VDS (V),Constraint,Target VOV (V),Target gm/ID (1/V)\nM1,nmos,30u,0.5,0.6,vov,0.25,\nM2,pmos,10u,1,0.4,gmId,,16\n`;
    const result = sheetImportResultSchema.parse((await send(text, { mode: 'apply' }).expect(200)).body);
    expect(result.applied).toBe(true);
    const after = await load();
    const m1 = after.devices.find((d) => d.targets.name === 'M1')!;
    expect(m1.targets).toMatchObject({ id: 30e-6, vov: 0.25, function: 'kept function' });
    expect(m1.result?.id).toBeCloseTo(30e-6, 15);
    const m2 = after.devices.find((d) => d.targets.name === 'M2')!;
    expect(m2.targets).toMatchObject({ polarity: 'pmos', gmId: 16, l: 1e-6 });
    expect(m2.result?.gmId).toBeCloseTo(16, 2);
  });

  it('reads a byte-order mark, semicolons with decimal commas, quoted fields and prefixes in cells', async () => {
    const text = `\uFEFFName;Function;Polarity;ID (A);L (m);VDS (V);Constraint;Target VOV (V)\r\nM3;"input; ""plus""";nmos;5u;0,5u;600m;vov;0,2\r\n`;
    const result = sheetImportResultSchema.parse((await send(text).expect(200)).body);
    expect(result.delimiter).toBe(';');
    expect(result.problems).toEqual([]);
    expect(result.created).toEqual([{ row: 2, name: 'M3' }]);
  });

  it('lists unknown columns as ignored and names the row and column of every row in error', async () => {
    const text = `${HEADER},Colour\nM4,,nmos,abc,0.5,0.6,0,vov,0.2,,,red\nM5,,nmos,5u,0.5,0.6,0,vov,0.2,,,blue\nM5,,nmos,5u,0.5,0.6,0,vov,0.2,,,blue\nM6,,nmos,5u,0.05,0.6,0,vov,0.2,,,green\n`;
    const result = sheetImportResultSchema.parse((await send(text).expect(200)).body);
    expect(result.ignoredColumns).toEqual(['Colour']);
    expect(result.created.map((r) => r.name)).toEqual(['M5', 'M6']);
    expect(result.problems).toEqual([
      { row: 2, field: 'ID (A)', message: expect.stringContaining('"abc" does not start with a number') },
      { row: 4, field: 'Name', message: 'Name M5 is already used on row 3: each device appears once' },
    ]);
  });

  it('refuses to apply a file with an error (400 IMPORT_INVALID, nothing stored) unless only the good rows are asked for', async () => {
    const text = `${HEADER}\nM7,,nmos,5u,0.5,0.6,0,vov,0.2,,\nM8,,nmos,5u,0.5,0.6,0,corner,0.2,,\n`;
    const before = await snapshot();
    const refused = await send(text, { mode: 'apply' }).expect(400);
    expect(refused.body).toMatchObject({ code: 'IMPORT_INVALID', problems: [{ row: 3, field: 'Constraint' }] });
    expect(await snapshot()).toEqual(before);
    const partly = sheetImportResultSchema.parse((await send(text, { mode: 'apply', onlyValid: 'true' }).expect(200)).body);
    expect(partly.created).toEqual([{ row: 2, name: 'M7' }]);
    expect((await load()).devices.map((d) => d.targets.name)).toContain('M7');
    expect((await load()).devices.map((d) => d.targets.name)).not.toContain('M8');
  });

  it('refuses a flavour the sheet\'s process lacks on its row', async () => {
    const text = 'Name,Polarity,Flavour,ID (A),L (um),VDS (V),Constraint,Target VOV (V)\nM9,pmos,native,5u,1,0.6,vov,0.2\n';
    const result = sheetImportResultSchema.parse((await send(text).expect(200)).body);
    expect(result.problems).toEqual([{ row: 2, field: 'Polarity', message: expect.stringContaining('native is NMOS') }]);
  });

  it('round-trips its own export: every device updated, none created, nothing changed', async () => {
    const exported = (await t.http().get(`/api/sheets/${sheet.id}/export?format=csv`).set(bearer(tokens.designer)).expect(200)).text;
    const before = (await load()).devices.map((d) => d.targets);
    const result = sheetImportResultSchema.parse((await send(exported, { mode: 'apply' }).expect(200)).body);
    expect(result.created).toEqual([]);
    expect(result.updated.length).toBe(before.length);
    expect((await load()).devices.map((d) => d.targets)).toEqual(before);
  });

  it('answers 413 to a 5 MB file and 400 to a missing file, an empty one and UTF-16; nothing stored', async () => {
    const count = await countDeviceRows(t, sheet.id);
    const big = Buffer.alloc(5 * 1024 * 1024, 'a');
    expect((await send(big).expect(413)).body).toMatchObject({ code: 'PAYLOAD_TOO_LARGE', field: 'file' });
    expect((await t.http().post(`/api/sheets/${sheet.id}/import`).set(bearer(tokens.designer)).field('mode', 'apply').expect(400)).body.code).toBe('FILE_REQUIRED');
    expect((await send('').expect(400)).body.code).toBe('IMPORT_INVALID');
    expect((await send(Buffer.from([0xff, 0xfe, 0x41, 0x00])).expect(400)).body.problems[0].message).toMatch(/UTF-16/);
    expect((await send(`${HEADER}\n`, { mode: 'later' }).expect(400)).body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'mode' });
    expect(await countDeviceRows(t, sheet.id)).toBe(count);
  });

  it('is for designers and owners: a viewer gets 403', async () => {
    expect((await send(`${HEADER}\n`, {}, tokens.viewer).expect(403)).body.code).toBe('FORBIDDEN');
  });
});
