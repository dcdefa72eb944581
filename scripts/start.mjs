// `npm start`: runs the compiled server with plain node, building first only when the
// build is missing or older than the sources, so `npm install && npm start` stays one step.
import { spawnSync } from 'node:child_process';
import { buildState } from './build-freshness.mjs';

const state = buildState();
if (state !== 'fresh') {
  console.log(
    state === 'missing'
      ? 'No build yet: building…'
      : 'Sources changed since the last build: building…',
  );
  const result = spawnSync('npm', ['run', 'build'], { stdio: 'inherit' });
  if (result.status !== 0) process.exit(result.status ?? 1);
}
await import('../dist/server/index.js');
