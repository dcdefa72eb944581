import { spawn } from 'node:child_process';
import { createInterface } from 'node:readline';
import { buildPrint } from '../../tests/support/factories';
import { load, type LoadResult } from '../load';
import type { SuiteResult } from '../suite';

const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
const CONCURRENCY = 8;
const BENCH_USER = { email: 'bench@printwarden.test', password: 'bench-password-123' };

/** Starts bench/serve.ts in its own process and waits for its addresses. */
async function startServers() {
  const child = spawn(process.execPath, ['--import', 'tsx', 'bench/serve.ts'], {
    stdio: ['ignore', 'pipe', 'inherit'],
    env: process.env,
  });
  const firstLine = await new Promise<string>((resolve, reject) => {
    const lines = createInterface({ input: child.stdout });
    lines.once('line', resolve);
    child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
  });
  return { child, ...(JSON.parse(firstLine) as { api: string; bare: string; prints: number }) };
}

/** The API against a bare Express floor (issue 2's first benchmark). */
export async function run(): Promise<SuiteResult> {
  console.log('Filling the database and starting the servers…');
  const servers = await startServers();
  const signIn = await fetch(`${servers.api}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(BENCH_USER),
  });
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await signIn.json()) as { csrfToken: string };
  const headers = { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
  const body = JSON.stringify(buildPrint());
  const pages = Math.ceil(servers.prints / 25);

  const run = (label: string, send: (n: number) => Promise<Response>, expectStatus: number) => {
    console.log(`  ${label}…`);
    return load(send, { seconds: SECONDS, concurrency: CONCURRENCY, expectStatus });
  };

  // Warm the search index and statement caches before measuring.
  await (await fetch(`${servers.api}/api/prints?q=weir`, { headers })).arrayBuffer();

  const results: Record<string, LoadResult> = {};
  results['list: GET /api/prints, 25 a page'] = await run(
    'list',
    (n) => fetch(`${servers.api}/api/prints?page=${(n % pages) + 1}`, { headers }),
    200,
  );
  results['search: q + fixing filter'] = await run(
    'search',
    () => fetch(`${servers.api}/api/prints?q=orchard&fixingMinutesMin=10`, { headers }),
    200,
  );
  results['bare Express GET'] = await run('bare GET', () => fetch(`${servers.bare}/items`), 200);
  results['create: POST /api/prints, 6 steps'] = await run(
    'create',
    () => fetch(`${servers.api}/api/prints`, { method: 'POST', headers, body }),
    201,
  );
  results['bare Express POST'] = await run(
    'bare POST',
    () => fetch(`${servers.bare}/items`, { method: 'POST', headers, body }),
    201,
  );
  servers.child.kill('SIGTERM');

  const round = (value: number) => Math.round(value * 100) / 100;
  const list = results['list: GET /api/prints, 25 a page']!;
  const create = results['create: POST /api/prints, 6 steps']!;
  const bareGet = results['bare Express GET']!;
  const barePost = results['bare Express POST']!;
  const report = {
    printsInDatabase: servers.prints,
    concurrency: CONCURRENCY,
    secondsPerRun: SECONDS,
    results,
    ratios: {
      listP50OverBare: round(list.p50Ms / bareGet.p50Ms),
      listP95OverBare: round(list.p95Ms / bareGet.p95Ms),
      createPerSecondOverBare: round(create.perSecond / barePost.perSecond),
    },
  };

  const figures = {
    printsInDatabase: report.printsInDatabase,
    concurrency: report.concurrency,
    secondsPerRun: report.secondsPerRun,
    results: report.results,
  };
  console.table(
    Object.fromEntries(
      Object.entries(results).map(([name, r]) => [
        name,
        {
          'req/s': r.perSecond,
          'p50 ms': r.p50Ms,
          'p95 ms': r.p95Ms,
          'p99 ms': r.p99Ms,
          errors: r.errors,
        },
      ]),
    ),
  );
  console.table(report.ratios);
  return { figures, ratios: report.ratios };
}
