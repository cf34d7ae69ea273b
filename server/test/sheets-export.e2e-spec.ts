import { execFileSync } from 'node:child_process';
import { ENGINE_VERSION } from '@channelwright/shared/device';
import { SHEET_CSV_COLUMNS, sheetCsvTitle, sheetSchema, type Device, type Sheet } from '@channelwright/shared/schemas';
import Papa from 'papaparse';
import { newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

/** Result columns the table fills from the stored result (empty without one). */
const RESULT_NUMBERS = ['w', 'wOverL', 'fingers', 'fingerWidth', 'vgs', 'vt', 'vov', 'vdsat', 'gmId', 'gm', 'gds', 'ro', 'intrinsicGain', 'ic', 'cgs', 'cgd', 'ft', 'sigmaVos', 'ioff'] as const;
/** Target columns the table fills from the targets. */
const TARGET_NUMBERS = ['id', 'l', 'vds', 'vsb', 'multiplier'] as const;

function pythonRows(csv: string): string[][] {
  // Python's csv module with newline='' as its documentation asks for (docs.python.org, csv, 2024); the # lines
  // are skipped as a plain reader's caller would (they are comments by the file's own first line).
  const script = 'import csv, io, json, sys\nlines = [l for l in io.StringIO(sys.stdin.read(), newline="") if not l.startswith("#")]\nprint(json.dumps(list(csv.reader(lines))))';
  return JSON.parse(execFileSync('python3', ['-c', script], { input: csv, encoding: 'utf8' }));
}

function papaRows(csv: string): string[][] {
  return Papa.parse<string[]>(csv, { comments: '#', skipEmptyLines: true }).data;
}

describe('GET /api/sheets/:id/export', () => {
  let t: TestApp;
  let tokens: Tokens;
  let sheet: Sheet;
  let csv: string;
  let headers: Record<string, string>;

  beforeAll(async () => {
    t = await createTestApp();
    tokens = await signInEveryone(t);
    const project = await wrenmoss(t, tokens.designer);
    const bf180 = await processByName(t, tokens.designer, 'BF180-G');
    const created = await newSheet(t, tokens.designer, project.id, bf180.id, 'Export, "quoted" & odd');
    const bodies = [
      nmosTargets({ name: 'M1', function: 'input, with a comma', notes: 'line one\nline two' }),
      nmosTargets({ name: 'M2', polarity: 'pmos', vsb: 0.2, multiplier: 3, matchGroup: 'pair', supplyBranch: true, vov: undefined, gmId: 18 }),
      nmosTargets({ name: '=SUM(A1)', function: 'a name a spreadsheet would run', id: 1e-7, vov: undefined, w: 1.23456789e-6 }),
      nmosTargets({ name: 'MW', gmId: 40, vov: undefined }),
    ];
    for (const body of bodies) await t.http().post(`/api/sheets/${created.id}/devices`).set(bearer(tokens.designer)).send(body).expect(201);
    sheet = sheetSchema.parse((await t.http().get(`/api/sheets/${created.id}`).set(bearer(tokens.viewer)).expect(200)).body);
    const response = await t.http().get(`/api/sheets/${created.id}/export?format=csv`).set(bearer(tokens.viewer)).expect(200);
    csv = response.text;
    headers = response.headers as Record<string, string>;
  });
  afterAll(() => t.close());

  it('is a CSV attachment with a file name', () => {
    expect(headers['content-type']).toMatch(/^text\/csv; charset=utf-8/);
    expect(headers['content-disposition']).toMatch(/^attachment; filename="?Wrenmoss_sensor_front_end-Export_quoted_odd\.csv"?$/);
  });

  it('names the process, its version, the engine and the PMOS sign convention in # lines before the table', () => {
    const comments = csv.split('\r\n').filter((line) => line.startsWith('# '));
    const metadata = new Map(comments.map((line) => [line.slice(2, line.indexOf(': ')), line.slice(line.indexOf(': ') + 2)]));
    expect(metadata.get('process')).toBe('BF180-G');
    expect(metadata.get('processVersion')).toBe(String(sheet.process.version));
    expect(metadata.get('engineVersion')).toBe(ENGINE_VERSION);
    expect(metadata.get('sheet')).toBe(sheet.name);
    expect(Number(metadata.get('supplyCurrent (A)'))).toBeCloseTo(sheet.totals.supplyCurrent, 18);
    expect(metadata.get('signConvention')).toMatch(/^PMOS voltages are polarity-normalised/);
  });

  it('has a header row with units and one row per device', () => {
    const [header, ...devices] = papaRows(csv);
    expect(header).toEqual(SHEET_CSV_COLUMNS.map((column) => sheetCsvTitle(column)));
    expect(header).toEqual(expect.arrayContaining(['W (m)', 'L (m)', 'ID (A)', 'gm (S)', 'fT (Hz)']));
    expect(devices.length).toBe(sheet.devices.length);
  });

  it.each([
    ['papaparse', papaRows],
    ['Python\'s csv module', pythonRows],
  ])('reads back with %s to the numbers of the API within one part in 10¹⁴, with no binary noise in the text', (_reader, read) => {
    const [header, ...devices] = read(csv);
    // A cell a spreadsheet would run as a formula is escaped with an apostrophe (OWASP, CSV injection, 2024).
    expect(devices.map((row) => row[header.indexOf('Name')])).toEqual(['M1', 'M2', "'=SUM(A1)", 'MW']);
    let compared = 0;
    sheet.devices.forEach((device: Device, index) => {
      const row = devices[index];
      const check = (key: string, expected: number | null | undefined) => {
        const column = SHEET_CSV_COLUMNS.find((c) => c.key === key)!;
        const cell = row[header.indexOf(sheetCsvTitle(column))];
        if (expected === null || expected === undefined) return expect(cell).toBe('');
        expect(cell.replace(/e.*$/, '').replace(/[-.]/g, '').replace(/^0+/, '').length).toBeLessThanOrEqual(15);
        expect(Math.abs(Number.parseFloat(cell) - expected)).toBeLessThanOrEqual(Math.abs(expected) * 1e-14);
        compared++;
      };
      for (const key of RESULT_NUMBERS) check(key, device.result ? (device.result[key] as number | null) : null);
      for (const key of TARGET_NUMBERS) check(key, key === 'multiplier' ? device.targets.multiplier : device.sizeRequest[key]);
      expect(row[header.indexOf('Function')]).toBe(device.targets.function);
      expect(row[header.indexOf('Stale')]).toBe('false');
    });
    expect(compared).toBeGreaterThan(3 * RESULT_NUMBERS.length);
  });

  it('leaves the numbers of a device the engine refused empty and says why', () => {
    const [header, ...devices] = papaRows(csv);
    const row = devices[sheet.devices.findIndex((d) => d.targets.name === 'MW')];
    expect(row[header.indexOf('W (m)')]).toBe('');
    expect(row[header.indexOf('Error')]).toMatch(/^GM_ID_ABOVE_WEAK_INVERSION_LIMIT: /);
    expect(Number(row[header.indexOf('ID (A)')])).toBe(20e-6);
  });

  it('with metadata=none is a plain table any CSV reader takes as it is, and csv-metadata is the metadata as a second file', async () => {
    const plain = (await t.http().get(`/api/sheets/${sheet.id}/export?format=csv&metadata=none`).set(bearer(tokens.viewer)).expect(200)).text;
    const rows = JSON.parse(execFileSync('python3', ['-c', 'import csv, io, json, sys\nprint(json.dumps(list(csv.DictReader(io.StringIO(sys.stdin.read(), newline="")))))'], { input: plain, encoding: 'utf8' })) as Array<Record<string, string>>;
    expect(rows.map((r) => r.Name)).toEqual(['M1', 'M2', "'=SUM(A1)", 'MW']);
    const metadata = await t.http().get(`/api/sheets/${sheet.id}/export?format=csv-metadata`).set(bearer(tokens.viewer)).expect(200);
    expect(metadata.headers['content-disposition']).toMatch(/\.metadata\.csv"?$/);
    expect(Papa.parse<string[]>(metadata.text.trim()).data).toEqual(expect.arrayContaining([['key', 'value'], ['process', 'BF180-G']]));
  });

  it('writes lengths in µm with "(um)" in the header when asked', async () => {
    const text = (await t.http().get(`/api/sheets/${sheet.id}/export?format=csv&metadata=none&lengths=um`).set(bearer(tokens.viewer)).expect(200)).text;
    const [header, first] = papaRows(text);
    expect(header).toEqual(expect.arrayContaining(['W (um)', 'L (um)', 'Finger width (um)', 'Target W (um)']));
    expect(Number(first[header.indexOf('L (um)')])).toBe(0.5);
  });

  it('answers an unknown format 400 naming the field', async () => {
    const response = await t.http().get(`/api/sheets/${sheet.id}/export?format=xlsx`).set(bearer(tokens.viewer)).expect(400);
    expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'format' });
  });
});
