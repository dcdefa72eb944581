// `npm start`: runs the compiled server with plain node, building first only when the
// build is missing or older than the sources, so `npm install && npm start` stays one step.
import { spawn, spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { buildState } from './build-freshness.mjs';
import { SERVER_NODE_FLAGS } from './server-node-flags.mjs';

// The server's Node flags cannot be set once this process runs: start again with them,
// passing signals on so a stop still shuts the server down cleanly.
if (!SERVER_NODE_FLAGS.every((flag) => process.execArgv.includes(flag))) {
  const child = spawn(
    process.execPath,
    [
      ...SERVER_NODE_FLAGS,
      ...process.execArgv,
      fileURLToPath(import.meta.url),
      ...process.argv.slice(2),
    ],
    { stdio: 'inherit' },
  );
  for (const signal of ['SIGINT', 'SIGTERM']) process.on(signal, () => child.kill(signal));
  child.on('exit', (code, signal) => process.exit(code ?? (signal ? 1 : 0)));
} else {
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
}
