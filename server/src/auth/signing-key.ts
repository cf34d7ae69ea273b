import { randomBytes } from 'node:crypto';
import { chmodSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';

export const SIGNING_KEY_FILE = 'jwt-signing-key';
/** 256 bits: the key size RFC 7518 §3.2 (2015) asks of HS256 at least. */
const KEY_BYTES = 32;

/**
 * The HS256 key of a server started without JWT_SECRET: generated at random on the first start and
 * kept in DATA_DIR, readable by the server's user only (mode 0600), so tokens survive a restart and no
 * key is ever written in the source. Written with the exclusive flag, so two servers starting on one
 * DATA_DIR at once end up sharing the first one's key.
 */
export function loadOrCreateSigningKey(dataDir: string): string {
  mkdirSync(dataDir, { recursive: true });
  const path = join(dataDir, SIGNING_KEY_FILE);
  try {
    writeFileSync(path, `${randomBytes(KEY_BYTES).toString('base64url')}\n`, { mode: 0o600, flag: 'wx' });
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
  }
  // An older file, or one restored from a backup, may have lost its mode: tighten it again.
  chmodSync(path, 0o600);
  const key = readFileSync(path, 'utf8').trim();
  if (Buffer.from(key, 'base64url').length < KEY_BYTES) throw new Error(`${path} does not hold a 256-bit key; delete it to have a new one generated`);
  return key;
}

/** JWT_SECRET when set, else the key kept in DATA_DIR. */
export function signingKeyOf(config: { jwtSecret: string | undefined; dataDir: string }): string {
  return config.jwtSecret ?? loadOrCreateSigningKey(config.dataDir);
}
