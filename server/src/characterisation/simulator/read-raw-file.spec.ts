import { canonicalVectorName, readRawFile } from './read-raw-file.mjs';

/** A binary rawfile as ngspice writes it (header lines, "Binary:", point-major float64). */
function rawFile(names: string[], rows: number[][], flags = 'real'): Uint8Array {
  const header = [
    'Title: * channelwright sweep abc-123',
    'Date: today',
    'Plotname: DC transfer characteristic',
    `Flags: ${flags}`,
    `No. Variables: ${names.length}`,
    `No. Points: ${rows.length}     `,
    'Variables:',
    ...names.map((name, i) => `\t${i}\t${name}\tvoltage`),
    'Binary:',
    '',
  ].join('\n');
  const data = new Float64Array(rows.flat());
  const bytes = new Uint8Array(header.length + data.byteLength);
  bytes.set(Buffer.from(header, 'latin1'));
  bytes.set(new Uint8Array(data.buffer), header.length);
  return bytes;
}

describe('readRawFile', () => {
  it('reads the title, the variable names and the point-major values of a binary rawfile', () => {
    const raw = readRawFile(rawFile(['v(v-sweep)', 'i(vd0)', 'v(@m0[vth])'], [[0, -1e-12, 0.45], [0.5, -2e-5, 0.45]]));
    expect(raw.title).toBe('* channelwright sweep abc-123');
    expect(raw.names).toEqual(['v(v-sweep)', 'i(vd0)', 'v(@m0[vth])']);
    expect(raw.points).toBe(2);
    expect(Array.from(raw.values)).toEqual([0, -1e-12, 0.45, 0.5, -2e-5, 0.45]);
  });

  it('refuses a rawfile without binary data, with complex data or with fewer points than its header says', () => {
    expect(() => readRawFile(Buffer.from('Title: x\nNo. Variables: 1\n'))).toThrow(/no binary rawfile data/);
    expect(() => readRawFile(rawFile(['frequency'], [[1, 0]], 'complex'))).toThrow(/Only real/);
    const short = rawFile(['a', 'b'], [[1, 2], [3, 4]]);
    expect(() => readRawFile(short.subarray(0, short.length - 8))).toThrow(/less data/);
  });
});

describe('canonicalVectorName', () => {
  it('names a device output the same whether the build wraps it in v() or i() or not', () => {
    expect(canonicalVectorName('v(@m1[vth])')).toBe('@m1[vth]');
    expect(canonicalVectorName('i(@M1[ID])')).toBe('@m1[id]');
    expect(canonicalVectorName('@m1[gm]')).toBe('@m1[gm]');
    expect(canonicalVectorName('i(vd1)')).toBe('i(vd1)');
    expect(canonicalVectorName('v(v-sweep)')).toBe('v(v-sweep)');
  });
});
