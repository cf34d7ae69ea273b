import { execFileSync } from 'node:child_process';
import { ENGINE_VERSION } from '@channelwright/shared/device';
import { SHEET_CSV_COLUMNS, sheetSchema, type Device, type Sheet } from '@channelwright/shared/schemas';
import Papa from 'papaparse';
import { newSheet, nmosTargets, processByName, signInEveryone, wrenmoss, type Tokens } from './fixtures/sheets/sheet-fixtures.js';
import { bearer, createTestApp, type TestApp } from './helpers/test-app.js';

/** Numeric columns of the device table and where the API keeps each value. */
const NUMERIC = SHEET_CSV_COLUMNS.filter(([key]) => !['name', 'function', 'polarity', 'flavour', 'matchGroup', 'supplyBranch', 'constraint', 'corner', 'model', 'region', 'warnings', 'error', 'stale'].includes(key));

/** Targets the table shows even for a device without a result. */
const TARGET_COLUMNS = new Set(['id', 'l', 'vds', 'vsb', 'temperature']);

/** The number the API gives for a column, or null where the table leaves the cell empty. */
function apiValue(device: Device, key: string): number | null {
  if (key === 'multiplier') return device.targets.multiplier;
  const value = device.result ? (device.result as Record<string, unknown>)[key] : TARGET_COLUMNS.has(key) ? (device.sizeRequest as Record<string, unknown>)[key] : null;
  return typeof value === 'number' ? value : null;
}

/** Splits rows read back from the file: key,value metadata up to the first empty row, then header and devices. */
function sections(rows: string[][]) {
  const blank = rows.findIndex((row) => row.length === 0 || (row.length === 1 && row[0] === ''));
  const metadata = new Map(rows.slice(1, blank).map(([key, value]) => [key, value]));
  const [header, ...devices] = rows.slice(blank + 1).filter((row) => !(row.length === 1 && row[0] === ''));
  return { head: rows[0], metadata, header, devices };
}

function pythonRows(csv: string): string[][] {
  // Python's csv module with newline='' as its documentation asks for (docs.python.org, csv, 2024).
  const script = 'import csv, io, json, sys\nprint(json.dumps(list(csv.reader(io.StringIO(sys.stdin.read(), newline="")))))';
  return JSON.parse(execFileSync('python3', ['-c', script], { input: csv, encoding: 'utf8' }));
}

describe('GET /api/sheets/:id/export?format=csv', () => {
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

  it('names the process, its version and the engine version in key,value lines before the table', () => {
    const { head, metadata } = sections(Papa.parse<string[]>(csv).data);
    expect(head).toEqual(['key', 'value']);
    expect(metadata.get('process')).toBe('BF180-G');
    expect(metadata.get('processVersion')).toBe(String(sheet.process.version));
    expect(metadata.get('engineVersion')).toBe(ENGINE_VERSION);
    expect(metadata.get('sheet')).toBe(sheet.name);
    expect(Number(metadata.get('supplyCurrent (A)'))).toBe(sheet.totals.supplyCurrent);
    expect(Number(metadata.get('gateArea (m2)'))).toBe(sheet.totals.gateArea);
  });

  it('has a header row with units and one row per device', () => {
    const { header, devices } = sections(Papa.parse<string[]>(csv).data);
    expect(header).toEqual(SHEET_CSV_COLUMNS.map(([, title]) => title));
    expect(header).toEqual(expect.arrayContaining(['W (m)', 'L (m)', 'ID (A)', 'gm (S)', 'fT (Hz)']));
    expect(devices.length).toBe(sheet.devices.length);
  });

  it.each([
    ['papaparse', (text: string) => Papa.parse<string[]>(text).data],
    ['Python\'s csv module', pythonRows],
  ])('reads back with %s to exactly the numbers of the API, device by device', (_reader, read) => {
    const { header, devices } = sections(read(csv));
    // A cell a spreadsheet would run as a formula is escaped with an apostrophe (common practice, no source).
    expect(devices.map((row) => row[header.indexOf('Name')])).toEqual(['M1', 'M2', "'=SUM(A1)", 'MW']);
    let compared = 0;
    sheet.devices.forEach((device, index) => {
      const row = devices[index];
      for (const [key, title] of NUMERIC) {
        const cell = row[header.indexOf(title)];
        const expected = apiValue(device, key);
        if (expected === null) {
          expect(cell).toBe('');
        } else {
          // String(number) and parseFloat round-trip a double exactly (ECMAScript Number::toString, ECMA-262 2024).
          expect(Number.parseFloat(cell)).toBe(expected);
          compared++;
        }
      }
      expect(row[header.indexOf('Function')]).toBe(device.targets.function);
      expect(row[header.indexOf('Stale')]).toBe('false');
    });
    expect(compared).toBeGreaterThan(3 * (NUMERIC.length - 2));
  });

  it('leaves the numbers of a device the engine refused empty and says why', () => {
    const { header, devices } = sections(Papa.parse<string[]>(csv).data);
    const row = devices[sheet.devices.findIndex((d) => d.targets.name === 'MW')];
    expect(row[header.indexOf('W (m)')]).toBe('');
    expect(row[header.indexOf('Error')]).toMatch(/^GM_ID_ABOVE_WEAK_INVERSION_LIMIT: /);
    expect(Number(row[header.indexOf('ID (A)')])).toBe(20e-6);
  });

  it('answers an unknown format 400 naming the field', async () => {
    const response = await t.http().get(`/api/sheets/${sheet.id}/export?format=xlsx`).set(bearer(tokens.viewer)).expect(400);
    expect(response.body).toMatchObject({ code: 'VALIDATION_FAILED', field: 'format' });
  });
});
