import { createHash } from 'node:crypto';
import { gunzipSync } from 'node:zlib';
import { encodeTable, type LookupTable, TABLE_FIELDS, tablePointCount, type TableGrid } from '@channelwright/shared/device';
import { shuffleBytes, unshuffleBytes } from './byte-shuffle.js';
import { packTable, sha256Of, unpackTable } from './table-storage.js';

const grid: TableGrid = { polarity: 'nmos', modelName: 'n', referenceWidth: 1e-5, lengths: [1e-7, 1e-6], vgs: { start: 0, step: 0.1, count: 11 }, vds: [0.5, 1], vsb: [0], corners: ['tt'], temperatures: [27] };
const table: LookupTable = {
  grid,
  columns: Object.fromEntries(TABLE_FIELDS.map((field, f) => [field, Float32Array.from({ length: tablePointCount(grid) }, (_, i) => Math.sin(i + f) * 1e-3)])) as LookupTable['columns'],
};

describe('byte shuffle', () => {
  it('groups the k-th bytes of all elements and gives the bytes back unchanged, tail included', async () => {
    const bytes = Uint8Array.from([1, 2, 3, 4, 5, 6, 7, 8, 9, 10]);
    const shuffled = await shuffleBytes(bytes, 4);
    expect(Array.from(shuffled)).toEqual([1, 5, 2, 6, 3, 7, 4, 8, 9, 10]);
    expect(Array.from(await unshuffleBytes(shuffled, 4))).toEqual(Array.from(bytes));
    const big = new Uint8Array(5 * 1024 * 1024 + 3).map((_, i) => (i * 7) % 256);
    expect(Buffer.compare(await unshuffleBytes(await shuffleBytes(big, 4), 4), big)).toBe(0);
  });
});

describe('table storage', () => {
  it('hashes the uncompressed binary form with SHA-256 (FIPS 180-4, 2015), also across slices', async () => {
    const packed = await packTable(table);
    expect(packed.sha256).toBe(createHash('sha256').update(encodeTable(table)).digest('hex'));
    expect(gunzipSync(packed.compressed).length).toBe(encodeTable(table).length);
    const big = new Uint8Array(3 * 1024 * 1024 + 17).map((_, i) => i % 251);
    expect(await sha256Of(big)).toBe(createHash('sha256').update(big).digest('hex'));
  });

  it('gives back the same table from what it stored', async () => {
    const packed = await packTable(table);
    const back = await unpackTable(packed.compressed, packed.sha256);
    expect(back.grid).toEqual(grid);
    for (const field of TABLE_FIELDS) expect(Array.from(back.columns[field])).toEqual(Array.from(table.columns[field]));
  });

  it('refuses a stored table whose content does not match its recorded hash', async () => {
    const packed = await packTable(table);
    await expect(unpackTable(packed.compressed, '0'.repeat(64))).rejects.toMatchObject({ code: 'TABLE_CORRUPT' });
  });
});
