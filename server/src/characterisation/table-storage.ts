import { createHash } from 'node:crypto';
import { promisify } from 'node:util';
import { gunzip, gzip } from 'node:zlib';
import { decodeTable, encodeTableInSteps, type LookupTable } from '@channelwright/shared/device';
import { shuffleBytes, unshuffleBytes } from './byte-shuffle.js';

const compress = promisify(gzip);
const decompress = promisify(gunzip);

/** Hashing goes in slices of this many bytes with a turn of the event loop between them (a full grid is tens of MB). */
const HASH_SLICE = 1 << 20;

/** Bytes of one element for the shuffle filter (Float32 columns). */
const ELEMENT = 4;

/** A table ready to store: its binary form byte-shuffled and gzip-compressed, and the SHA-256 of the binary form itself. */
export interface PackedTable {
  compressed: Buffer;
  sha256: string;
  /** Bytes before compression. */
  size: number;
}

/** SHA-256 (hex) of bytes, yielding to the event loop between slices. */
export async function sha256Of(bytes: Uint8Array): Promise<string> {
  const hash = createHash('sha256');
  for (let start = 0; start < bytes.length; start += HASH_SLICE) {
    hash.update(bytes.subarray(start, start + HASH_SLICE));
    if (start + HASH_SLICE < bytes.length) await new Promise((resolve) => setImmediate(resolve));
  }
  return hash.digest('hex');
}

/** Encodes (a column per turn of the event loop), hashes, shuffles and compresses a table (zlib's gzip runs on libuv's thread pool, off the event loop). */
export async function packTable(table: LookupTable): Promise<PackedTable> {
  const steps = encodeTableInSteps(table);
  let step = steps.next();
  while (!step.done) {
    await new Promise((resolve) => setImmediate(resolve));
    step = steps.next();
  }
  const bytes = step.value;
  const sha256 = await sha256Of(bytes);
  const compressed = await compress(await shuffleBytes(bytes, ELEMENT));
  return { compressed, sha256, size: bytes.length };
}

/** Decompresses and decodes a stored table; refuses it (TABLE_CORRUPT) when its content no longer has the stored hash. */
export async function unpackTable(compressed: Uint8Array, sha256: string): Promise<LookupTable> {
  const bytes = await unshuffleBytes(await decompress(compressed), ELEMENT);
  const actual = await sha256Of(bytes);
  if (actual !== sha256) throw new TableCorruptError(`The stored table's SHA-256 is ${actual}, not the recorded ${sha256}`);
  return decodeTable(bytes);
}

export class TableCorruptError extends Error {
  readonly code = 'TABLE_CORRUPT';
  constructor(message: string) {
    super(message);
    this.name = 'TableCorruptError';
  }
}
