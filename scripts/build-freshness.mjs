// Whether dist/ was built after the last change to its sources. `npm start` builds when it
// was not; tests that start the server in a child process run the compiled files when it was.
import { existsSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';

const STAMP = 'dist/.build-stamp';
const SOURCES = [
  'src',
  'server',
  'shared',
  'seeds',
  'index.html',
  'package.json',
  'package-lock.json',
  'vite.config.ts',
  'tailwind.config.ts',
];

/** The newest modification time under a file or folder. */
function newest(path) {
  if (!existsSync(path)) return 0;
  const stats = statSync(path);
  if (!stats.isDirectory()) return stats.mtimeMs;
  let latest = stats.mtimeMs;
  for (const entry of readdirSync(path)) latest = Math.max(latest, newest(join(path, entry)));
  return latest;
}

/** 'missing' (no build), 'stale' (a source changed since) or 'fresh'; paths from `root`. */
export function buildState(root = '.') {
  const stamp = join(root, STAMP);
  if (!existsSync(stamp) || !existsSync(join(root, 'dist/server/index.js'))) return 'missing';
  const built = statSync(stamp).mtimeMs;
  return SOURCES.some((source) => newest(join(root, source)) > built) ? 'stale' : 'fresh';
}
