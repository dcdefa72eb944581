import { mkdirSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { bootstrap } from '../server/bootstrap';
import { loadConfig } from '../server/config';

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
