import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { performance } from 'node:perf_hooks';
import { percentile } from '../load';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

/**
 * `npx tsx bench/sign-in/measure.ts`: how `GET /api/health` answers while wrong sign-ins
 * hash passwords, against a real server process (`serve.ts`) with production-strength
 * hashing. Each round fires PARALLEL wrong sign-ins at once and asks for the health route
 * one request after another until they have all answered. Prints one JSON line.
 */
const PARALLEL = Number(process.env.BENCH_SIGN_INS ?? 20);
const ROUNDS = Number(process.env.BENCH_ROUNDS ?? 3);

async function startServer() {
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, '--import', 'tsx', 'bench/sign-in/serve.ts'],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
    },
  );
  const lines = createInterface({ input: child.stdout });
  const first = await new Promise<string>((resolve) => lines.once('line', resolve));
  return { child, url: (JSON.parse(first) as { url: string }).url };
}

async function timed(send: () => Promise<Response>): Promise<number> {
  const t0 = performance.now();
  const response = await send();
  await response.arrayBuffer();
  return performance.now() - t0;
}

function summary(samples: number[]) {
  const sorted = [...samples].sort((a, b) => a - b);
  const round = (value: number) => Math.round(value);
  return {
    n: sorted.length,
    p50Ms: round(percentile(sorted, 0.5)),
    p95Ms: round(percentile(sorted, 0.95)),
    maxMs: round(sorted.at(-1) ?? Number.NaN),
  };
}

const { child, url } = await startServer();
try {
  const health = () => fetch(`${url}/api/health`);
  const wrongSignIn = () =>
    fetch(`${url}/api/session`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({ email: 'bench@printwarden.test', password: 'not the password' }),
    });
  const idle: number[] = [];
  for (let i = 0; i < 200; i += 1) idle.push(await timed(health));
  const single: number[] = [];
  for (let i = 0; i < 5; i += 1) single.push(await timed(wrongSignIn));
  const underLoad: number[] = [];
  const signIns: number[] = [];
  for (let round = 0; round < ROUNDS; round += 1) {
    let done = false;
    const batch = Promise.all(Array.from({ length: PARALLEL }, () => timed(wrongSignIn))).then(
      (times) => {
        done = true;
        signIns.push(...times);
      },
    );
    while (!done) underLoad.push(await timed(health));
    await batch;
  }
  process.stdout.write(
    `${JSON.stringify({
      parallelSignIns: PARALLEL,
      rounds: ROUNDS,
      healthIdle: summary(idle),
      healthDuringSignIns: summary(underLoad),
      singleWrongSignIn: summary(single),
      wrongSignInUnderLoad: summary(signIns),
    })}\n`,
  );
} finally {
  child.kill('SIGTERM');
}
