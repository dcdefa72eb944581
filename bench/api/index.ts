import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { build } from 'esbuild';
import autocannon, { type CannonRequest, type CannonResult } from 'autocannon';
import { buildPrint } from '../../tests/support/factories';
import { BENCH_ARCHIVIST } from '../bench-app';
import type { SuiteResult } from '../suite';
import { readYourWritesAfterStart } from './read-your-writes';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONNECTIONS = 8;
const CREATE_BODY = JSON.stringify(buildPrint());

/**
 * How the server process runs bench/serve.ts: through tsx (`BENCH_RUNTIME=tsx`, the default,
 * as `npm run dev` does) or bundled by esbuild and run by plain node (`compiled`, as
 * `npm start` runs the server).
 */
async function serverEntry(): Promise<string[]> {
  if (process.env.BENCH_RUNTIME !== 'compiled') return ['--import', 'tsx', 'bench/serve.ts'];
  const outfile = '.tmp/bench-serve.mjs';
  await build({
    entryPoints: ['bench/serve.ts'],
    outfile,
    bundle: true,
    packages: 'external',
    platform: 'node',
    format: 'esm',
    target: 'node20',
  });
  return [outfile];
}

/** Starts bench/serve.ts in its own process (with --cpu-prof when BENCH_PROFILE is set). */
async function startServers() {
  const profile = process.env.BENCH_PROFILE
    ? ['--cpu-prof', `--cpu-prof-dir=${process.env.BENCH_PROFILE}`]
    : [];
  const child = spawn(process.execPath, [...profile, ...(await serverEntry())], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: process.env,
  });
  const firstLine = await new Promise<string>((resolve, reject) => {
    const lines = createInterface({ input: child.stdout });
    lines.once('line', resolve);
    child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
  });
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  const stop = async () => {
    child.kill('SIGTERM');
    await exited;
  };
  return { stop, ...(JSON.parse(firstLine) as { api: string; raw: string; prints: number }) };
}

async function signIn(api: string): Promise<Record<string, string>> {
  const response = await fetch(`${api}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(BENCH_ARCHIVIST),
  });
  const cookie = response.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
}

interface Figure {
  reqPerSec: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
  requests: number;
}

function figure(result: CannonResult): Figure {
  return {
    reqPerSec: Math.round(result.requests.average * 10) / 10,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    requests: (result.requests as unknown as { total: number }).total,
  };
}

const cannon = (url: string, headers: Record<string, string>, requests: CannonRequest[]) =>
  autocannon({ url, connections: CONNECTIONS, duration: SECONDS, headers, requests });

const randomPage = (pages: number): CannonRequest => ({
  method: 'GET',
  setupRequest: (request) => ({
    ...request,
    path: `/api/prints?page=${1 + Math.floor(Math.random() * pages)}`,
  }),
});
const SEARCH: CannonRequest = { method: 'GET', path: '/api/prints?q=orchard&fixingMinutesMin=10' };
const randomRecord = (prints: number): CannonRequest => ({
  method: 'GET',
  setupRequest: (request) => ({
    ...request,
    path: `/api/prints/${1 + Math.floor(Math.random() * prints)}`,
  }),
});
const create = (onCreated?: () => void): CannonRequest => ({
  method: 'POST',
  path: '/api/prints',
  body: CREATE_BODY,
  onResponse: (status) => {
    if (status === 201) onCreated?.();
  },
});

async function totalPrints(api: string, headers: Record<string, string>): Promise<number> {
  const response = await fetch(`${api}/api/prints?pageSize=1`, { headers });
  return ((await response.json()) as { total: number }).total;
}

/**
 * The `api` suite: list (random pages), search with a filter, one record, a create with
 * six steps, and a 90/10 read/write mix, against Printwarden and the raw-SQL peer.
 */
export async function run(): Promise<SuiteResult> {
  console.log('Filling the database and starting the servers…');
  const servers = await startServers();
  const headers = await signIn(servers.api);
  const pages = Math.ceil(servers.prints / 25);
  const json = { 'content-type': 'application/json' };
  // Warm the search index and statement caches before measuring.
  await (await fetch(`${servers.api}/api/prints?q=weir`, { headers })).arrayBuffer();

  const results: Record<string, Figure> = {};
  const measure = async (
    name: string,
    url: string,
    h: Record<string, string>,
    r: CannonRequest[],
  ) => {
    console.log(`  ${name}…`);
    results[name] = figure(await cannon(url, h, r));
  };
  await measure('list (random page)', servers.api, headers, [randomPage(pages)]);
  await measure('raw list (random page)', servers.raw, json, [randomPage(pages)]);
  await measure('search q + fixing filter', servers.api, headers, [SEARCH]);
  await measure('raw search q + fixing filter', servers.raw, json, [SEARCH]);
  await measure('record', servers.api, headers, [randomRecord(servers.prints)]);
  await measure('raw record', servers.raw, json, [randomRecord(servers.prints)]);
  await measure('create (6 steps)', servers.api, headers, [create()]);
  await measure('raw create (6 steps)', servers.raw, json, [create()]);

  // 90/10: one create, then nine reads, per connection, round and round (the create comes
  // first so even a slow run writes something whose survival the count can check).
  const before = await totalPrints(servers.api, headers);
  let answeredCreates = 0;
  const reads = [randomPage(pages), SEARCH, randomRecord(servers.prints)];
  const mix = [
    create(() => (answeredCreates += 1)),
    ...Array.from({ length: 9 }, (_, i) => reads[i % 3]!),
  ];
  await measure('mix 90/10', servers.api, headers, mix);
  const after = await totalPrints(servers.api, headers);
  const lostWrites = Math.max(0, answeredCreates - (after - before));
  await servers.stop();

  const ratio = (ours: string, raw: string) =>
    Math.round((results[ours]!.reqPerSec / results[raw]!.reqPerSec) * 100) / 100;
  const ratios = {
    listThroughputVsRaw: ratio('list (random page)', 'raw list (random page)'),
    createThroughputVsRaw: ratio('create (6 steps)', 'raw create (6 steps)'),
    searchThroughputVsRaw: ratio('search q + fixing filter', 'raw search q + fixing filter'),
    recordThroughputVsRaw: ratio('record', 'raw record'),
  };
  const readBack = await readYourWritesAfterStart();
  const mixResult = results['mix 90/10']!;
  console.table(results);
  return {
    figures: {
      runtime: process.env.BENCH_RUNTIME === 'compiled' ? 'compiled' : 'tsx',
      printsInDatabase: servers.prints,
      connections: CONNECTIONS,
      secondsPerRun: SECONDS,
      mixP99Ms: mixResult.p99Ms,
      mixErrors: mixResult.errors + mixResult.non2xx,
      lostWrites,
      mixCreatesAnswered: answeredCreates,
      readYourWritesMissesAfterStart: readBack.misses,
      readYourWritesAfterStart: readBack,
      results,
    },
    ratios,
  };
}
