import bcrypt from 'bcryptjs';

/** bcrypt work factor; 12 is a common default for interactive sign-in (common practice). */
export const DEFAULT_BCRYPT_ROUNDS = 12;

export function hashPassword(password: string, rounds = DEFAULT_BCRYPT_ROUNDS): Promise<string> {
  return bcrypt.hash(password, rounds);
}

let unknownUserHash: Promise<string> | undefined;

/**
 * Checks a password; with no stored hash it still does the bcrypt work, so an unknown
 * address takes as long to refuse as a wrong password.
 */
export async function checkPassword(password: string, hash: string | undefined): Promise<boolean> {
  if (hash) return bcrypt.compare(password, hash);
  unknownUserHash ??= bcrypt.hash('not a password of anyone', DEFAULT_BCRYPT_ROUNDS);
  await bcrypt.compare(password, await unknownUserHash);
  return false;
}
