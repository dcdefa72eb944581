import { randomBytes } from 'node:crypto';
import { existsSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';

export interface Config {
  port: number;
  databaseUrl: string;
  uploadsDir: string;
  dataDir: string;
  sessionSecret: string;
  demo: boolean;
  production: boolean;
  /** Failed sign-ins allowed per address and client before 429. */
  signInAttempts: number;
  /** Password-reset requests allowed per address and client in 15 minutes. */
  resetRequests: number;
  /** bcrypt work factor for new passwords (tests lower it; the hashing stays real). */
  bcryptRounds: number;
  /** Express `trust proxy`: `loopback` by default; the TLS proxy's address when one is in front. */
  trustProxy: string;
  /** Outgoing mail server; null starts the built-in local one. */
  smtpUrl: string | null;
  mailFrom: string;
  logLevel: string;
  /** Origin used in e-mailed links; null uses the request's own origin (see README). */
  publicUrl: string | null;
}

type Env = Record<string, string | undefined>;

/** Reads the contract's environment variables (contract.md, "Environment"). */
export function loadConfig(env: Env = process.env): Config {
  const production = env.NODE_ENV === 'production';
  const dataDir = resolve(env.DATA_DIR ?? 'data');
  return {
    port: Number(env.PORT ?? 3000),
    databaseUrl: env.DATABASE_URL ?? 'sqlite:data/printwarden.sqlite',
    uploadsDir: resolve(env.UPLOADS_DIR ?? 'uploads'),
    dataDir,
    sessionSecret: env.SESSION_SECRET ?? localSecret(dataDir, production),
    demo: (env.DEMO ?? (production ? '0' : '1')) === '1',
    production,
    signInAttempts: Number(env.SIGN_IN_ATTEMPTS ?? 10),
    resetRequests: Number(env.RESET_REQUESTS ?? 5),
    bcryptRounds: Number(env.BCRYPT_ROUNDS ?? 12),
    trustProxy: env.TRUST_PROXY ?? 'loopback',
    smtpUrl: env.SMTP_URL || null,
    mailFrom: env.MAIL_FROM ?? 'Printwarden <no-reply@printwarden.test>',
    logLevel: env.LOG_LEVEL ?? 'info',
    publicUrl: env.PUBLIC_URL ? env.PUBLIC_URL.replace(/\/+$/, '') : null,
  };
}

/** A secret generated once and kept beside the database, so sessions survive restarts. */
function localSecret(dataDir: string, production: boolean): string {
  if (production) throw new Error('SESSION_SECRET must be set when NODE_ENV=production');
  const file = join(dataDir, 'session-secret');
  if (existsSync(file)) return readFileSync(file, 'utf8').trim();
  mkdirSync(dataDir, { recursive: true });
  const secret = randomBytes(32).toString('hex');
  writeFileSync(file, secret, { mode: 0o600 });
  return secret;
}
