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
  /** Largest accepted upload, in MB (`UPLOAD_LIMIT_MB`). */
  uploadLimitMb: number;
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
    uploadLimitMb: Number(env.UPLOAD_LIMIT_MB ?? 500),
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
