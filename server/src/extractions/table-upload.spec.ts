import { readCurveFile } from '@channelwright/shared/curve-file';
import { type LookupTable, TABLE_FIELDS, type TableGrid, tablePointCount } from '@channelwright/shared/device';
import { DomainError } from '../common/errors/domain-error.js';
import { tableUpload } from './table-upload.js';

// An invented table: 20 lengths × 20 VDS × 2 VSB × 101 VGS at one corner is 80,800 points, more than a file may hold.
const GRID: TableGrid = {
  polarity: 'pmos',
  modelName: 'invented',
  referenceWidth: 10e-6,
  lengths: Array.from({ length: 20 }, (_, k) => (k + 1) * 0.25e-6),
  vgs: { start: 0, step: 0.025, count: 101 },
  vds: Array.from({ length: 20 }, (_, k) => (k + 1) * 0.125),
  vsb: [0, 0.8],
  corners: ['TT'],
  temperatures: [27],
};
const table: LookupTable = {
  grid: GRID,
  // A current rising with the index, so that every point is a positive, distinct number.
  columns: Object.fromEntries(TABLE_FIELDS.map((field) => [field, Float64Array.from({ length: tablePointCount(GRID) }, (_, i) => 1e-9 * (1 + (i % 101)))])) as LookupTable['columns'],
};
const stored = { table, ref: { id: 't-1', sha256: 'ab'.repeat(32), characterisationId: 'c-1', model: 'invented' } };
const version = { processId: 'p-1', processName: 'Invented 250', version: 3 };
const device = { polarity: 'pmos' as const, flavour: 'lvt' };

describe('a table written as an upload', () => {
  it('refuses a choice of more points than a curve file may hold, before making them, naming the axis to thin', () => {
    const refusal = (() => {
      try {
        tableUpload(stored, version, device, { corner: 'TT' });
      } catch (error) {
        return error;
      }
    })();
    expect(refusal).toBeInstanceOf(DomainError);
    expect(refusal).toMatchObject({ code: 'VALIDATION_FAILED', field: 'lengths', status: 400 });
    expect((refusal as Error).message).toMatch(/80800 points; a fit reads at most 50000/);
  });

  it('names the process, version, device, table hash and corner in its comment lines, and reads back as a PMOS in the positive convention', () => {
    const upload = tableUpload(stored, version, device, { corner: 'TT', lengths: [0.5e-6], vds: [1.25, 2.5] });
    const comments = upload.text.split('\n').filter((line) => line.startsWith('#'));
    expect(comments[0]).toBe('# Points of a characterised table, not measured: Invented 250 version 3, PMOS lvt (card model invented), corner TT');
    expect(comments[1]).toBe(`# Table t-1 (SHA-256 ${'ab'.repeat(32)}) of characterisation c-1`);
    expect(upload.fileName).toBe('Invented_250-v3-pmos-lvt-TT-table.csv');
    expect(upload.origin).toEqual({ ...version, polarity: 'pmos', flavour: 'lvt', tableId: 't-1', sha256: 'ab'.repeat(32), characterisationId: 'c-1', model: 'invented', corner: 'TT' });
    const reading = readCurveFile(upload.text, { polarity: 'pmos' });
    if (!reading.ok) throw new Error(JSON.stringify(reading.problems));
    expect(reading.file.convention).toBe('positive');
    expect(reading.file.curves.map((c) => `${c.vds}/${c.vsb}`)).toEqual(['1.25/0', '2.5/0', '1.25/0.8', '2.5/0.8']);
    expect(reading.file.points).toHaveLength(4 * 101);
  });
});
