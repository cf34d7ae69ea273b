// Reads an ngspice rawfile in its binary form (the default `filetype=binary`): a text header ending in
// "Binary:\n", then for each point every variable as a little-endian float64. Plain JavaScript because
// the simulation worker thread loads it without a TypeScript build (see simulator-pool.ts).

/**
 * @param {Uint8Array} bytes the whole rawfile
 * @returns {{ title: string, names: string[], points: number, values: Float64Array }} values point-major
 */
export function readRawFile(bytes) {
  const marker = Buffer.from('Binary:\n');
  const at = Buffer.from(bytes.buffer, bytes.byteOffset, bytes.byteLength).indexOf(marker);
  if (at < 0) throw new Error('The simulator wrote no binary rawfile data (no "Binary:" line)');
  const header = Buffer.from(bytes.buffer, bytes.byteOffset, at).toString('latin1');
  const field = (name) => {
    const match = new RegExp(`^${name}:\\s*(.*)$`, 'm').exec(header);
    if (!match) throw new Error(`The rawfile header has no "${name}" line`);
    return match[1].trim();
  };
  const flags = field('Flags');
  if (!/\breal\b/.test(flags)) throw new Error(`Only real rawfile data is read, not "${flags}"`);
  const variables = Number(field('No. Variables'));
  const points = Number(field('No. Points'));
  const list = header.slice(header.indexOf('Variables:\n') + 'Variables:\n'.length).split('\n').filter((line) => line.trim() !== '');
  if (list.length !== variables) throw new Error(`The rawfile lists ${list.length} variables, its header says ${variables}`);
  const names = list.map((line) => line.trim().split(/\s+/)[1]);
  const start = bytes.byteOffset + at + marker.length;
  const size = variables * points * 8;
  if (bytes.byteLength - (at + marker.length) < size) throw new Error(`The rawfile holds less data than ${points} points of ${variables} variables`);
  const values = new Float64Array(bytes.buffer.slice(start, start + size));
  return { title: field('Title'), names, points, values };
}

/** A vector name as both ngspice builds write it: lower case, "v(@m1[vth])" and "i(@m1[id])" without the wrapper. */
export function canonicalVectorName(name) {
  const lower = name.toLowerCase();
  const wrapped = /^[vi]\((@.*)\)$/.exec(lower);
  return wrapped ? wrapped[1] : lower;
}
