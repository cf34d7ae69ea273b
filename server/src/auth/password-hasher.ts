import bcrypt from 'bcryptjs';

export const BCRYPT_COST = 12;

/** A cost-12 hash of a random string nobody knows: compared against when the e-mail is unknown. */
const UNKNOWN_ACCOUNT_HASH = '$2b$12$RdwWAzxeu.B9OZIAVogX9OiIQK/ClNWsZefC6/GBqJnNEtpaGGh4O';

export function hashPassword(password: string): Promise<string> {
  return bcrypt.hash(password, BCRYPT_COST);
}

/**
 * Checks a password against a stored hash, or against a dummy hash when there is no account,
 * so an unknown e-mail takes as long to refuse as a wrong password.
 */
export async function verifyPassword(password: string, passwordHash: string | undefined): Promise<boolean> {
  const matches = await bcrypt.compare(password, passwordHash ?? UNKNOWN_ACCOUNT_HASH);
  return matches && passwordHash !== undefined;
}
