import { spawn } from 'node:child_process';
import { basename } from 'node:path';
import { createInterface } from 'node:readline';
import { build } from 'esbuild';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

/**
 * How a server process runs a bench script: through tsx (`BENCH_RUNTIME=tsx`, the default,
 * as `npm run dev` does) or bundled by esbuild and run by plain node (`compiled`, as
 * `npm start` runs the server).
 */
async function entry(script: string): Promise<string[]> {
  if (process.env.BENCH_RUNTIME !== 'compiled') return ['--import', 'tsx', script];
  const outfile = `.tmp/bench-${basename(script, '.ts')}.mjs`;
  await build({
    entryPoints: [script],
    outfile,
    bundle: true,
    packages: 'external',
    platform: 'node',
    format: 'esm',
    target: 'node20',
  });
  return [outfile];
}

/**
 * Starts a bench server script in its own process (with --cpu-prof when BENCH_PROFILE is
 * set), `env` over this process's environment, and waits for the JSON line it prints first.
 */
export async function spawnServer<T>(
  script: string,
  env: Record<string, string> = {},
  args: string[] = [],
): Promise<T & { pid: number; stop: () => Promise<void> }> {
  const profile = process.env.BENCH_PROFILE
    ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_PROFILE}`]
    : [];
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, ...profile, ...(await entry(script)), ...args],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: { ...process.env, ...env },
    },
  );
  const firstLine = await new Promise<string>((resolve, reject) => {
    const lines = createInterface({ input: child.stdout });
    lines.once('line', resolve);
    child.once('exit', (code) => reject(new Error(`${script} exited with ${code}`)));
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const stop = async () => {
    child.kill('SIGTERM');
    await exited;
  };
  return { ...(JSON.parse(firstLine) as T), pid: child.pid!, stop };
}
