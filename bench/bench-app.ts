import { mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { hashPassword } from '../server/auth/password';
import { bootstrap } from '../server/bootstrap';
import { loadConfig } from '../server/config';
import { User } from '../server/models';

/**
 * Printwarden on a throwaway SQLite file for a bench suite: a fresh temp folder (or `keep`,
 * an empty folder that stays for profiling afterwards), no demo, and any config given.
 */
export async function openBenchApp(
  name: string,
  options: { keep?: string; config?: Record<string, string> } = {},
) {
  if (options.keep) mkdirSync(options.keep, { recursive: true });
  const dir = options.keep ?? mkdtempSync(join(tmpdir(), `printwarden-bench-${name}-`));
  const ctx = await bootstrap(
    loadConfig({
      DATABASE_URL: `sqlite:${join(dir, 'bench.sqlite')}`,
      DATA_DIR: dir,
      UPLOADS_DIR: join(dir, 'uploads'),
      SESSION_SECRET: 'bench',
      DEMO: '0',
      ...options.config,
    }),
  );
  return { dir, ctx };
}

/** The archivist the api suites sign in as (`bench@printwarden.test`, a cheap hash). */
export const BENCH_ARCHIVIST = { email: 'bench@printwarden.test', password: 'bench-password-123' };

/** Adds the bench archivist to an open bench database. */
export async function createBenchArchivist(): Promise<void> {
  await User.create({
    email: BENCH_ARCHIVIST.email,
    name: 'Bench',
    role: 'archivist',
    passwordHash: await hashPassword(BENCH_ARCHIVIST.password, 4),
    lastSignInAt: null,
  });
}
