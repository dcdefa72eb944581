import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { DEFAULT_PASSWORD_COST } from './auth/password';
import { storageFrom, type StorageConfig } from './services/storage/storage-url';

export interface Config {
  port: number;
  databaseUrl: string;
  /** Upload temp files and the derivative cache; also the originals when `storage` is disk. */
  uploadsDir: string;
  /** Where originals live (`STORAGE_URL`): the disk under `uploadsDir`, or S3. */
  storage: StorageConfig;
  dataDir: string;
  sessionSecret: string;
  demo: boolean;
  production: boolean;
  /** Failed sign-ins allowed per address and client before 429. */
  signInAttempts: number;
  /** Password-reset requests allowed per address and client in 15 minutes. */
  resetRequests: number;
  /** Password-reset requests allowed per address from all clients together in 15 minutes. */
  resetRequestsPerAccount: number;
  /** Failed sign-ins allowed per account (normalised address) from all clients together. */
  signInAttemptsPerAccount: number;
  /** scrypt cost (log2 N) of new password hashes (tests lower it; the hashing stays real). */
  passwordCost: number;
  /** Express `trust proxy`: `loopback` by default; the TLS proxy's address when one is in front. */
  trustProxy: string;
  /** Outgoing mail server; null starts the built-in local one. */
  smtpUrl: string | null;
  mailFrom: string;
  logLevel: string;
  /** Origin used in e-mailed links; null uses the request's own origin (see README). */
  publicUrl: string | null;
  /** Largest accepted upload, in MB (`UPLOAD_LIMIT_MB`). */
  uploadLimitMb: number;
}

type Env = Record<string, string | undefined>;

/** A setting that makes starting unsafe; the message is one line for the operator. */
export class ConfigError extends Error {
  override name = 'ConfigError';
}

/** Where the database is (`DATABASE_URL`); scripts that need only this read it alone. */
export function databaseUrlFrom(env: Env): string {
  return env.DATABASE_URL ?? 'sqlite:data/printwarden.sqlite';
}

/** Reads the contract's environment variables (contract.md, "Environment"). */
export function loadConfig(env: Env = process.env): Config {
  const production = env.NODE_ENV === 'production';
  const dataDir = resolve(env.DATA_DIR ?? 'data');
  if (production) refuseUnsafeProduction(env);
  return {
    port: Number(env.PORT ?? 3000),
    databaseUrl: databaseUrlFrom(env),
    uploadsDir: resolve(env.UPLOADS_DIR ?? 'uploads'),
    storage: storageOf(env),
    dataDir,
    sessionSecret: env.SESSION_SECRET ?? localSecret(dataDir),
    demo: (env.DEMO ?? (production ? '0' : '1')) === '1',
    production,
    signInAttempts: Number(env.SIGN_IN_ATTEMPTS ?? 10),
    resetRequests: Number(env.RESET_REQUESTS ?? 5),
    signInAttemptsPerAccount: Number(env.SIGN_IN_ATTEMPTS_PER_ACCOUNT ?? 50),
    resetRequestsPerAccount: Number(env.RESET_REQUESTS_PER_ACCOUNT ?? 10),
    passwordCost: Number(env.PASSWORD_COST ?? DEFAULT_PASSWORD_COST),
    trustProxy: env.TRUST_PROXY ?? 'loopback',
    smtpUrl: env.SMTP_URL || null,
    mailFrom: env.MAIL_FROM ?? 'Printwarden <no-reply@printwarden.test>',
    logLevel: env.LOG_LEVEL ?? 'info',
    publicUrl: env.PUBLIC_URL ? env.PUBLIC_URL.replace(/\/+$/, '') : null,
    uploadLimitMb: Number(env.UPLOAD_LIMIT_MB ?? 500),
  };
}

function storageOf(env: Env): StorageConfig {
  try {
    return storageFrom(env);
  } catch (error) {
    throw new ConfigError((error as Error).message);
  }
}

/** Production never runs the demo, and never builds e-mailed links from a request's Host. */
function refuseUnsafeProduction(env: Env): void {
  if ((env.DEMO ?? '0') !== '0')
    throw new ConfigError(
      'DEMO must be 0 when NODE_ENV=production: the demo accounts share a published password.',
    );
  if (!env.PUBLIC_URL)
    throw new ConfigError(
      'PUBLIC_URL must be set when NODE_ENV=production (the address people reach the server at, e.g. https://prints.example.org).',
    );
  if (!/^https?:\/\/[^/\s]+/.test(env.PUBLIC_URL))
    throw new ConfigError(`PUBLIC_URL must be an http(s) origin, not "${env.PUBLIC_URL}".`);
  if (!env.SESSION_SECRET)
    throw new ConfigError('SESSION_SECRET must be set when NODE_ENV=production.');
}

/** A secret generated once and kept beside the database, so sessions survive restarts. */
function localSecret(dataDir: string): string {
  const file = join(dataDir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
