import { createHash, randomBytes } from 'node:crypto';

/** SHA-256 of a token: what the database keeps, so a stolen copy of it opens nothing. */
export function hashToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

/** A one-time token (32 random bytes, base64url) and its hash. */
export function newToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashToken(token) };
}

export const INVITATION_DAYS = 7;
export const RESET_MINUTES = 60;
