import { randomBytes, scrypt, timingSafeEqual } from 'node:crypto';
import bcrypt from 'bcryptjs';

/**
 * scrypt work factor as log2 N, with r = 8 and p = 3: one of the equivalent settings the
 * OWASP Password Storage Cheat Sheet lists (N = 2^15, r = 8, p = 3; 32 MiB per hash).
 * Tests lower it (`PASSWORD_COST=4`); the hashing stays real.
 */
export const DEFAULT_PASSWORD_COST = 15;
const BLOCK_SIZE = 8;
const PARALLELISM = 3;
const KEY_BYTES = 32;
const SALT_BYTES = 16;
/** Stored as `$scrypt$ln=15,r=8,p=3$<salt>$<key>` (PHC string format, base64 without padding). */
const SCRYPT_FORMAT = /^\$scrypt\$ln=(\d+),r=(\d+),p=(\d+)\$([A-Za-z0-9+/]+)\$([A-Za-z0-9+/]+)$/;

interface Params {
  ln: number;
  r: number;
  p: number;
}

/**
 * Hashes run on libuv's worker threads (crypto.scrypt), never on the event loop; at most
 * two at once, so a burst of sign-ins leaves two of libuv's four worker threads to SQLite
 * and the file system (measured with bench/sign-in: the health route's p95 stays in tens
 * of milliseconds while 20 wrong sign-ins run).
 */
const AT_ONCE = 2;
let running = 0;
const waiting: Array<() => void> = [];

async function limited<T>(work: () => Promise<T>): Promise<T> {
  if (running >= AT_ONCE) await new Promise<void>((resolve) => waiting.push(resolve));
  running += 1;
  try {
    return await work();
  } finally {
    running -= 1;
    waiting.shift()?.();
  }
}

function derive(password: string, salt: Buffer, { ln, r, p }: Params): Promise<Buffer> {
  const N = 2 ** ln;
  return limited(
    () =>
      new Promise<Buffer>((resolve, reject) => {
        const maxmem = 128 * N * r * 2 + 1024 * 1024;
        scrypt(password.normalize('NFC'), salt, KEY_BYTES, { N, r, p, maxmem }, (error, key) =>
          error ? reject(error) : resolve(key),
        );
      }),
  );
}

const b64 = (buffer: Buffer) => buffer.toString('base64').replace(/=+$/, '');

/** A new scrypt hash of the password, with a fresh random salt. */
export async function hashPassword(
  password: string,
  cost = DEFAULT_PASSWORD_COST,
): Promise<string> {
  const params = { ln: cost, r: BLOCK_SIZE, p: PARALLELISM };
  const salt = randomBytes(SALT_BYTES);
  const key = await derive(password, salt, params);
  return `$scrypt$ln=${params.ln},r=${params.r},p=${params.p}$${b64(salt)}$${b64(key)}`;
}

function parseScrypt(hash: string): (Params & { salt: Buffer; key: Buffer }) | null {
  const match = SCRYPT_FORMAT.exec(hash);
  if (!match) return null;
  const [, ln, r, p, salt, key] = match;
  return {
    ln: Number(ln),
    r: Number(r),
    p: Number(p),
    salt: Buffer.from(salt!, 'base64'),
    key: Buffer.from(key!, 'base64'),
  };
}

const isBcrypt = (hash: string) => /^\$2[aby]\$\d{2}\$/.test(hash);

let unknownUserHash: { cost: number; hash: Promise<string> } | undefined;

/**
 * Checks a password against an scrypt hash, or a bcrypt one made before scrypt (verified
 * as before). With no stored hash it still does the scrypt work, so an unknown address
 * takes as long to refuse as a wrong password.
 */
export async function checkPassword(
  password: string,
  hash: string | undefined,
  cost = DEFAULT_PASSWORD_COST,
): Promise<boolean> {
  if (hash && isBcrypt(hash)) return bcrypt.compare(password, hash);
  const stored = hash ? parseScrypt(hash) : null;
  if (!stored) {
    if (unknownUserHash?.cost !== cost)
      unknownUserHash = { cost, hash: hashPassword('not a password of anyone', cost) };
    await checkPassword(password, await unknownUserHash.hash, cost);
    return false;
  }
  const key = await derive(password, stored.salt, stored);
  return key.length === stored.key.length && timingSafeEqual(key, stored.key);
}

/** Whether a hash that just matched should be made again: bcrypt, or other scrypt settings. */
export function needsRehash(hash: string, cost = DEFAULT_PASSWORD_COST): boolean {
  const stored = parseScrypt(hash);
  return !stored || stored.ln !== cost || stored.r !== BLOCK_SIZE || stored.p !== PARALLELISM;
}
