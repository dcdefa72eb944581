import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { buildToneCheck } from '../../tests/support/tone-factories';
import { load } from '../load';
import type { SuiteResult } from '../suite';
import { runEnvironmentBench } from './environment';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONCURRENCY = 8;

interface Started {
  api: string;
  prints: number;
  checks: number;
  reevaluateSeconds: number;
}

async function startServer() {
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, '--import', 'tsx', 'bench/tone/serve.ts'],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: process.env,
    },
  );
  const line = await new Promise<string>((resolve, reject) => {
    createInterface({ input: child.stdout }).once('line', resolve);
    child.once('exit', (code) => reject(new Error(`tone bench server exited with ${code}`)));
  });
  return { child, ...(JSON.parse(line) as Started) };
}

/** Issue 17 alone (`BENCH_TONE_ONLY=environment`): readings import and a year's figures. */
async function environmentOnly(): Promise<SuiteResult> {
  const environment = await runEnvironmentBench();
  report(environment);
  return {
    figures: environment as unknown as Record<string, unknown>,
    ratios: {
      placeYearMetricsOverGoal: Math.round((environment.placeYearMetricsMs / 500) * 100) / 100,
    },
  };
}

function report(environment: Awaited<ReturnType<typeof runEnvironmentBench>>) {
  console.table({
    readingsImportSeconds: { value: environment.readingsImportSeconds, goal: '—' },
    readingsImportPeakRssMb: { value: environment.readingsImportPeakRssMb, goal: '—' },
    placeYearMetricsMs: { value: environment.placeYearMetricsMs, goal: '≤ 500' },
    placeYearMetricsHttpMs: { value: environment.placeYearMetricsHttpMs, goal: '—' },
  });
}

/**
 * Issues 8 and 14: re-evaluation of 100,000 prints, the tone-watch list, and logging a check;
 * issue 17: a year of readings for 50 places imported, and their figures for the year.
 */
export async function run(): Promise<SuiteResult> {
  if (process.env.BENCH_TONE_ONLY === 'environment') return environmentOnly();
  console.log('Filling 100,000 prints with 8 checks each, re-evaluating, starting the server…');
  const server = await startServer();
  const signIn = await fetch(`${server.api}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({
      email: 'bench-conservator@printwarden.test',
      password: 'bench-password-123',
    }),
  });
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await signIn.json()) as { csrfToken: string };
  const headers = { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
  await (await fetch(`${server.api}/api/tone-watch`, { headers })).arrayBuffer();

  console.log('  tone watch…');
  const watch = await load(() => fetch(`${server.api}/api/tone-watch`, { headers }), {
    seconds: SECONDS,
    concurrency: CONCURRENCY,
    expectStatus: 200,
  });
  console.log('  log a check…');
  const body = JSON.stringify(buildToneCheck({ checkedOn: '2026-03-01' }));
  const logCheck = await load(
    (n) =>
      fetch(`${server.api}/api/prints/${(n % server.prints) + 1}/tone-checks`, {
        method: 'POST',
        headers,
        body,
      }),
    { seconds: SECONDS, concurrency: CONCURRENCY, expectStatus: 201 },
  );
  server.child.kill('SIGTERM');

  console.log('  a year of 10-minute readings for 50 places, and their figures…');
  const environment = await runEnvironmentBench();
  report(environment);

  const round = (value: number) => Math.round(value * 100) / 100;
  const figures = {
    prints: server.prints,
    checks: server.checks,
    patchesPerCheck: 4,
    concurrency: CONCURRENCY,
    secondsPerRun: SECONDS,
    reevaluate100kSeconds: round(server.reevaluateSeconds),
    toneWatchP95Ms: watch.p95Ms,
    logCheckP95Ms: logCheck.p95Ms,
    results: { toneWatch: watch, logCheck },
    ...environment,
  };
  const ratios = {
    reevaluateOverGoal: round(server.reevaluateSeconds / 10),
    toneWatchP95OverGoal: round(watch.p95Ms / 100),
    logCheckP95OverGoal: round(logCheck.p95Ms / 50),
    placeYearMetricsOverGoal: round(environment.placeYearMetricsMs / 500),
  };
  console.table({
    reevaluate100kSeconds: { value: figures.reevaluate100kSeconds, goal: '< 10' },
    toneWatchP95Ms: { value: figures.toneWatchP95Ms, goal: '< 100' },
    logCheckP95Ms: { value: figures.logCheckP95Ms, goal: '< 50' },
  });
  return { figures, ratios };
}
