import { randomBytes, scrypt, timingSafeEqual, type ScryptOptions } from 'node:crypto';
import { availableParallelism } from 'node:os';
import { deserialize, serialize } from '@phc/format';
import bcrypt from 'bcryptjs';
import pLimit from 'p-limit';

/**
 * scrypt (RFC 7914, 2016) with N = 2^15, r = 8, p = 3: one of the equivalent settings the OWASP Password
 * Storage Cheat Sheet (2023) lists (N = 2^17, r = 8, p = 1 and its trades of memory for parallel passes).
 * Each hash takes 128·N·r = 32 MiB and about 0.7 s on the 2-core machine CI uses (N = 2^17, p = 1 took 1.7 s
 * there), and runs on libuv's thread pool, never on the event loop, so a burst of sign-ins does not stall
 * other requests; at most (cores − 1, at least 1) hashes run at once (see `hashing`). The parameters are stored in each
 * hash: raising them later re-hashes every account on its next sign-in.
 */
export const SCRYPT_PARAMS = { ln: 15, r: 8, p: 3 } as const;

/**
 * Hashes at once: one core fewer than the machine has (at least one), so that a burst of sign-ins always
 * leaves a core to the event loop and every other request; the rest wait their turn.
 */
const hashing = pLimit(Math.max(1, availableParallelism() - 1));
const SALT_BYTES = 16;
const HASH_BYTES = 32;

export interface PasswordCheck {
  valid: boolean;
  /** The stored hash is bcrypt or scrypt of other parameters: store a new one now that the password is known. */
  needsRehash: boolean;
}

/**
 * A self-describing hash in the PHC string format (Password Hashing Competition, 2016):
 * `$scrypt$ln=15,r=8,p=3$<salt>$<hash>`, salt and hash in unpadded base64.
 */
export async function hashPassword(password: string): Promise<string> {
  const salt = randomBytes(SALT_BYTES);
  const hash = await scryptOf(password, salt, SCRYPT_PARAMS);
  return serialize({ id: 'scrypt', params: { ...SCRYPT_PARAMS }, salt, hash });
}

// Compared against when there is no account, so an unknown e-mail costs one scrypt of the current
// parameters, as a wrong password does. The stand-in hash is random: it never matches.
const UNKNOWN_ACCOUNT = { salt: randomBytes(SALT_BYTES), hash: randomBytes(HASH_BYTES) };

/**
 * Checks a password against a stored hash (ours, or a bcrypt hash of an account from before scrypt), or,
 * when there is no account, against a stand-in at the same cost. Never throws for a malformed hash: it does
 * not match.
 */
export async function verifyPassword(password: string, storedHash: string | undefined): Promise<PasswordCheck> {
  if (storedHash === undefined) {
    await matches(password, UNKNOWN_ACCOUNT.salt, UNKNOWN_ACCOUNT.hash, SCRYPT_PARAMS);
    return { valid: false, needsRehash: false };
  }
  if (/^\$2[aby]\$\d\d\$/.test(storedHash)) {
    // bcrypt from before scrypt: bcryptjs runs on the event loop (in slices), so such a hash is checked once
    // and replaced by the caller on that sign-in.
    return { valid: await bcrypt.compare(password, storedHash), needsRehash: true };
  }
  const parsed = parseScrypt(storedHash);
  if (!parsed) return { valid: false, needsRehash: false };
  const valid = await matches(password, parsed.salt, parsed.hash, parsed.params);
  const current = parsed.params.ln === SCRYPT_PARAMS.ln && parsed.params.r === SCRYPT_PARAMS.r && parsed.params.p === SCRYPT_PARAMS.p;
  return { valid, needsRehash: !current };
}

interface ScryptParams {
  ln: number;
  r: number;
  p: number;
}

function parseScrypt(storedHash: string): { salt: Buffer; hash: Buffer; params: ScryptParams } | undefined {
  try {
    const { id, params, salt, hash } = deserialize(storedHash);
    const { ln, r, p } = params ?? {};
    if (id !== 'scrypt' || !salt || !hash || typeof ln !== 'number' || typeof r !== 'number' || typeof p !== 'number') return undefined;
    return { salt, hash, params: { ln, r, p } };
  } catch {
    return undefined;
  }
}

async function matches(password: string, salt: Buffer, expected: Buffer, params: ScryptParams): Promise<boolean> {
  const actual = await scryptOf(password, salt, params, expected.length);
  return timingSafeEqual(actual, expected);
}

function scryptOf(password: string, salt: Buffer, params: ScryptParams, length = HASH_BYTES): Promise<Buffer> {
  const N = 2 ** params.ln;
  // Node refuses to use more than maxmem; scrypt needs 128·N·r bytes (RFC 7914 §6), so leave it room.
  const options: ScryptOptions = { N, r: params.r, p: params.p, maxmem: 2 * 128 * N * params.r };
  return hashing(
    () =>
      new Promise<Buffer>((resolve, reject) => {
        scrypt(password.normalize('NFKC'), salt, length, options, (error, key) => (error ? reject(error) : resolve(key)));
      }),
  );
}
