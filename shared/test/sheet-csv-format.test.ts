import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { plainNumber, plainNumberIn, readSheetCsv, writeSheetCsv, writeSheetMetadataCsv } from '../src/formats/index.js';
import { SHEET_CSV_COLUMNS, sheetCsvTitle, type Device, type Sheet } from '../src/schemas/index.js';
import { demoSheet } from './support/demo-sheet.js';

const context = { projectName: 'Wrenmoss sensor front end', exportedAt: new Date('2030-01-02T03:04:05Z'), engineVersion: 'test' };

/** The targets as a reader gets them back: what deviceTargetsSchema keeps, without the sheet-level defaults. */
const stored = (device: Device) => device.targets;

describe('plainNumber', () => {
  it('drops the binary noise of a computed value and keeps what was typed (IEEE 754-2019: 15 digits always survive)', () => {
    expect(plainNumber(2.77e-6 * (1 + 2 ** -52))).toBe('0.00000277');
    expect(plainNumber(0.1 + 0.2)).toBe('0.3');
    expect(plainNumber(0.5e-6)).toBe('5e-7');
    expect(plainNumber(-0.05)).toBe('-0.05');
    expect(plainNumber(Number.POSITIVE_INFINITY)).toBe('');
  });

  it('writes lengths in µm without noise', () => {
    expect(plainNumberIn(0.5e-6, -6)).toBe('0.5');
    expect(plainNumberIn(1.23e-6, -6)).toBe('1.23');
    expect(plainNumberIn(0.18e-6, -6)).toBe('0.18');
  });
});

describe('writeSheetCsv', () => {
  const sheet = demoSheet();
  const csv = writeSheetCsv(sheet, context);
  const lines = csv.split('\r\n');

  it('puts the metadata in # lines above a header with units, one row per device, CRLF, no byte-order mark', () => {
    expect(csv.charCodeAt(0)).not.toBe(0xfeff);
    const comments = lines.filter((line) => line.startsWith('#'));
    expect(comments).toEqual(expect.arrayContaining(['# format: channelwright-sheet', '# formatVersion: 2', '# process: BF180-G', `# sheet: ${sheet.name}`]));
    expect(comments.some((line) => line.startsWith('# signConvention: PMOS voltages are polarity-normalised'))).toBe(true);
    const header = lines[comments.length];
    expect(header.split(',')).toEqual(SHEET_CSV_COLUMNS.map((column) => sheetCsvTitle(column)));
    expect(header).toContain('W (m),L (m)');
    expect(lines.length).toBe(comments.length + 1 + sheet.devices.length + 1);
  });

  it('with metadata "none" is the table alone, and the metadata is a key,value file of its own', () => {
    const plain = writeSheetCsv(sheet, context, { metadata: 'none' });
    expect(plain.startsWith('Name,Function,')).toBe(true);
    const meta = writeSheetMetadataCsv(sheet, context).split('\r\n');
    expect(meta[0]).toBe('key,value');
    expect(meta).toContain('process,BF180-G');
  });

  it('writes lengths in µm with the unit in the header when asked', () => {
    const [header, first] = Papa.parse<string[]>(writeSheetCsv(sheet, context, { metadata: 'none', lengths: 'um' })).data;
    expect(header).toContain('L (um)');
    expect(header).toContain('W (um)');
    expect(Number(first[header.indexOf('L (um)')])).toBeCloseTo(sheet.devices[0].targets.l * 1e6, 12);
  });

  it('reads back to the same targets, device by device', () => {
    const read = readSheetCsv(csv);
    expect(read.problems).toEqual([]);
    expect(read.rows.map((r) => r.targets)).toEqual(sheet.devices.map(stored));
    expect(read.ignoredColumns).toEqual(expect.arrayContaining(['W (m)', 'gm (S)', 'Warnings']));
  });
});

describe('readSheetCsv', () => {
  const header = 'Name,Polarity,ID (A),L (um),VDS (V),Constraint,Target gm/ID (1/V),Target VOV (V)';

  it('takes a byte-order mark, semicolons with decimal commas, quoted fields and SI prefixes in cells', () => {
    const text = '\uFEFFName;Function;Polarity;ID (A);L (um);VDS (V);Constraint;Target VOV (V)\r\n"M1";"input; the ""plus"" side";nmos;20u;0,5;600m;vov;0,2\r\n';
    const read = readSheetCsv(text);
    expect(read.problems).toEqual([]);
    expect(read.delimiter).toBe(';');
    expect(read.rows[0].targets).toMatchObject({ name: 'M1', function: 'input; the "plus" side', id: 20e-6, l: 0.5e-6, vds: 0.6, vov: 0.2 });
  });

  it('reads gm/ID written as S/A or A/V, and a length with its own unit in a µm column', () => {
    const read = readSheetCsv(`${header}\nM1,pmos,10u,500 nm,0.6,gmId,18 S/A,\nM2,pmos,10u,0.5,0.6,gmId,18 A/V,\n`);
    expect(read.problems).toEqual([]);
    expect(read.rows.map((r) => [r.targets.gmId, r.targets.l])).toEqual([[18, 0.5e-6], [18, 0.5e-6]]);
  });

  it('names the row and the column of every problem, and refuses a name used twice', () => {
    const read = readSheetCsv(`# a comment line\n${header}\nM1,nmos,abc,0.5,0.6,vov,,0.2\nM2,nmos,20u,0.5,0.6,vov,,0.2\nM2,nmos,20u,0.5,0.6,vov,,0.2\nM3,nmos,20u,0.5,0.6,,,\nM4,xmos,20u,0.5,-1,vov,,0.2\n`);
    expect(read.rows.map((r) => r.targets.name)).toEqual(['M2']);
    expect(read.problems).toEqual([
      { row: 3, field: 'ID (A)', message: expect.stringContaining('"abc" does not start with a number') },
      { row: 5, field: 'Name', message: 'Name M2 is already used on row 4: each device appears once' },
      { row: 6, field: 'Constraint', message: 'No constraint: fill Constraint and its target column' },
      { row: 7, field: 'Polarity', message: expect.stringContaining('polarity must be "nmos" or "pmos"') },
      { row: 7, field: 'VDS (V)', message: expect.stringContaining('VDS must be above 0 V') },
    ]);
  });

  it('lists the columns it does not read and refuses a header without the required ones', () => {
    const read = readSheetCsv(`${header},Colour,gm (S)\nM1,nmos,20u,0.5,0.6,vov,,0.2,red,1m\n`);
    expect(read.ignoredColumns).toEqual(['Colour', 'gm (S)']);
    const bad = readSheetCsv('Name,Polarity\nM1,nmos\n');
    expect(bad.rows).toEqual([]);
    expect(bad.problems[0]).toMatchObject({ row: 1, field: 'header', message: expect.stringContaining('ID (A), L (m), VDS (V)') });
  });

  it('counts rows as lines of the file, also after a cell that spans two lines', () => {
    const read = readSheetCsv(`${header},Notes\nM1,nmos,20u,0.5,0.6,vov,,0.2,"line one\nline two"\nM2,nmos,-1,0.5,0.6,vov,,0.2,\n`);
    expect(read.rows[0].targets.notes).toBe('line one\nline two');
    expect(read.problems).toEqual([{ row: 4, field: 'ID (A)', message: expect.stringContaining('ID must be above 0 A') }]);
  });
});

export type { Sheet };
