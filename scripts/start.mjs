// `npm start`: runs the compiled server with plain node, building first only when the
// build is missing or older than the sources, so `npm install && npm start` stays one step.
import { spawnSync } from 'node:child_process';
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

const built = existsSync(STAMP) && existsSync('dist/server/index.js') ? statSync(STAMP).mtimeMs : 0;
if (built === 0 || SOURCES.some((source) => newest(source) > built)) {
  console.log(
    built === 0 ? 'No build yet: building…' : 'Sources changed since the last build: building…',
  );
  const result = spawnSync('npm', ['run', 'build'], { stdio: 'inherit' });
  if (result.status !== 0) process.exit(result.status ?? 1);
}
await import('../dist/server/index.js');
