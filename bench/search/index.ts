import { openBenchApp } from '../bench-app';
import { rmSync } from 'node:fs';
import { spawn } from 'node:child_process';
import { Agent, get } from 'node:http';
import { createInterface } from 'node:readline';
import { join } from 'node:path';
import { monitorEventLoopDelay, performance } from 'node:perf_hooks';
import { setFlagsFromString } from 'node:v8';
import { runInNewContext } from 'node:vm';
import { PrintQuerySchema } from '../../shared/schemas/print';
import { hashPassword } from '../../server/auth/password';
import { User } from '../../server/models';
import { listPrints } from '../../server/services/prints/list-prints';
import { PrintSearchIndex } from '../../server/services/prints/search-index';
import { DocumentReader } from '../../server/services/search/documents';
import { readSnapshot } from '../../server/services/search/snapshot';
import { percentile } from '../load';
import type { SuiteResult } from '../suite';
import { fillSearchCorpus } from './corpus';
import { Fts5Peer } from './fts5-peer';
import { paramsOf, QUERIES, type QueryClass } from './queries';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

const PRINTS = Number(process.env.BENCH_SEARCH_PRINTS ?? 100_000);
const ROUNDS = Number(process.env.BENCH_SEARCH_ROUNDS ?? 25);

setFlagsFromString('--expose-gc');
const gc = runInNewContext('gc') as () => void;
const memoryMiB = () => {
  gc();
  const { heapUsed, arrayBuffers } = process.memoryUsage();
  return (heapUsed + arrayBuffers) / 2 ** 20;
};
const round = (value: number, places = 2) => Math.round(value * 10 ** places) / 10 ** places;
const p95 = (samples: number[]) =>
  round(
    percentile(
      [...samples].sort((a, b) => a - b),
      0.95,
    ),
  );

async function timed<T>(work: () => Promise<T> | T): Promise<[number, T]> {
  const start = performance.now();
  const result = await work();
  return [performance.now() - start, result];
}

/** Starts bench/search/serve.ts on the suite's folder; resolves once it listens. */
async function startHttpServer(dir: string) {
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, '--import', 'tsx', 'bench/search/serve.ts'],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: { ...process.env, BENCH_SEARCH_DIR: dir },
    },
  );
  const line = await new Promise<string>((resolve, reject) => {
    createInterface({ input: child.stdout }).once('line', resolve);
    child.once('exit', (code) => reject(new Error(`search HTTP server exited with ${code}`)));
  });
  const ready = JSON.parse(line) as { url: string; indexFrom: string; readyMs: number };
  const stop = () =>
    new Promise<void>((resolve) => {
      child.once('exit', () => resolve());
      child.kill('SIGTERM');
    });
  return { ...ready, stop };
}

/**
 * GET and parse one JSON answer over a kept-alive connection (node:http), the light client
 * the api suite's load generator also is: `fetch` adds a millisecond or more of its own
 * per call, which is the measuring side's cost, not the server's. Both are reported.
 */
function getJson<T>(agent: Agent, url: string, cookie: string): Promise<T> {
  return new Promise((resolve, reject) => {
    get(url, { agent, headers: { cookie } }, (response) => {
      let body = '';
      response.setEncoding('utf8');
      response.on('data', (part: string) => (body += part));
      response.on('end', () => {
        try {
          resolve(JSON.parse(body) as T);
        } catch (error) {
          reject(error instanceof Error ? error : new Error(String(error)));
        }
      });
      response.on('error', reject);
    }).on('error', reject);
  });
}

/** The search suite: 100,000 prints, 20 queries, our index beside SQLite FTS5. */
export async function run(): Promise<SuiteResult> {
  const { dir, ctx } = await openBenchApp('search');
  console.log(`Generating ${PRINTS} prints…`);
  const [fillMs, counts] = await timed(() => fillSearchCorpus(ctx.sequelize, PRINTS));
  console.log(`  ${counts.prints} prints, ${counts.steps} steps in ${round(fillMs / 1000, 1)} s`);

  // Build while measuring how long the event loop ever waits: the build runs in steps.
  const snapshotFile = join(dir, 'search-index.bin');
  const before = memoryMiB();
  const index = new PrintSearchIndex(ctx.sequelize, snapshotFile);
  const loop = monitorEventLoopDelay({ resolution: 5 });
  loop.enable();
  const cpu0 = process.cpuUsage();
  const [buildMs] = await timed(() => index.ready());
  const cpu = process.cpuUsage(cpu0);
  loop.disable();
  const heapMiB = memoryMiB() - before;
  console.log(`  index built in ${round(buildMs / 1000, 1)} s, ${round(heapMiB)} MiB`);
  const [snapshotLoadMs, loaded] = await timed(() => readSnapshot(snapshotFile));
  if (!loaded) throw new Error('snapshot did not load');

  const reader = new DocumentReader(ctx.sequelize, []);
  console.log('Building the FTS5 peer…');
  const [ftsBuildMs, fts] = await timed(() => Fts5Peer.build(join(dir, 'fts5.sqlite'), reader));

  // Replacing a print's document (an edit): the index work alone, SQL read excluded.
  const engine = await index.ready();
  const edited = await reader.byIds(Array.from({ length: 500 }, (_, i) => 1 + i * 197));
  const replaceMs: number[] = [];
  for (const document of edited) {
    document.text.title = `${document.text.title} restored`;
    replaceMs.push((await timed(() => engine.put(document)))[0]);
  }

  await User.create({
    email: 'curator@bench.test',
    name: 'Bench curator',
    role: 'curator',
    passwordHash: await hashPassword('bench-password-123', 4),
  });
  // HTTP goes to a server in a process of its own (bench/search/serve.ts), as deployed:
  // the in-process figure once shared its event loop with the client measuring it.
  const http = await startHttpServer(dir);
  console.log(`  HTTP server ready from its ${http.indexFrom} in ${http.readyMs} ms`);
  const base = http.url;
  const signIn = await fetch(`${base}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'curator@bench.test', password: 'bench-password-123' }),
  });
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;

  const agent = new Agent({ keepAlive: true, maxSockets: 1 });
  const samples = { service: {}, http: {}, httpFetch: {}, fts5: {} } as Record<
    'service' | 'http' | 'httpFetch' | 'fts5',
    Partial<Record<QueryClass, number[]>>
  >;
  const hits: Record<string, { service: number; fts5: number | null }> = {};
  const push = (side: keyof typeof samples, cls: QueryClass, ms: number) =>
    (samples[side][cls] ??= []).push(ms);
  console.log(`Running ${QUERIES.length} queries × ${ROUNDS} rounds…`);
  for (let round_ = -2; round_ < ROUNDS; round_ += 1) {
    for (const { class: cls, query } of QUERIES) {
      const parsed = PrintQuerySchema.parse(paramsOf(query));
      const [serviceMs, listed] = await timed(() =>
        listPrints(parsed, index, { includePlace: true, includePrivate: true }),
      );
      const [httpMs, response] = await timed(() =>
        getJson<{ total: number }>(agent, `${base}/api/prints?${query}`, cookie),
      );
      const [httpFetchMs, fetched] = await timed(async () => {
        const answer = await fetch(`${base}/api/prints?${query}`, { headers: { cookie } });
        return answer.json() as Promise<{ total: number }>;
      });
      if (response.total !== listed.total || fetched.total !== listed.total)
        throw new Error(`HTTP and service differ on ${query}`);
      let ftsTotal: number | null = null;
      if (cls !== 'filtersOnly') {
        const [ftsMs, total] = await timed(() =>
          fts.search(parsed.q ?? '', parsed, cls === 'prefix'),
        );
        ftsTotal = total;
        if (round_ >= 0) push('fts5', cls, ftsMs);
      }
      if (round_ < 0) {
        hits[query] = { service: listed.total, fts5: ftsTotal };
        continue;
      }
      push('service', cls, serviceMs);
      push('http', cls, httpMs);
      push('httpFetch', cls, httpFetchMs);
    }
  }
  agent.destroy();
  await http.stop();
  await fts.close();
  // The built-in mail server would keep the process alive after the suite.
  await ctx.mailer.close();
  await ctx.sequelize.close();
  rmSync(dir, { recursive: true, force: true });

  const union = (side: keyof typeof samples, classes: QueryClass[]) =>
    classes.flatMap((cls) => samples[side][cls] ?? []);
  const WORD: QueryClass[] = ['plain', 'prefix', 'typo', 'broad'];
  const ALL: QueryClass[] = [...WORD, 'wordsFilters', 'filtersOnly'];
  const byClass = Object.fromEntries(
    ALL.map((cls) => [
      cls,
      {
        serviceP95Ms: p95(samples.service[cls]!),
        httpP95Ms: p95(samples.http[cls]!),
        httpFetchP95Ms: p95(samples.httpFetch[cls]!),
        fts5P95Ms: samples.fts5[cls] ? p95(samples.fts5[cls]) : null,
      },
    ]),
  );
  console.table(byClass);
  console.table(hits);
  const figures = {
    prints: counts.prints,
    steps: counts.steps,
    rounds: ROUNDS,
    fillSeconds: round(fillMs / 1000),
    buildSeconds: round(buildMs / 1000),
    buildCpuSeconds: round((cpu.user + cpu.system) / 1e6),
    buildLongestPauseMs: round(loop.max / 1e6),
    heapMiB: round(heapMiB),
    snapshotLoadSeconds: round(snapshotLoadMs / 1000),
    httpServer: `own process, index from its ${http.indexFrom}`,
    httpClient: 'node:http on a kept-alive connection; fetch beside it (httpFetch…)',
    httpServerReadyMs: http.readyMs,
    replaceP95Ms: p95(replaceMs),
    filtersOnlyP95Ms: byClass.filtersOnly!.serviceP95Ms,
    typoP95Ms: byClass.typo!.serviceP95Ms,
    facets20kMs: byClass.broad!.serviceP95Ms,
    wordP95Ms: p95(union('service', WORD)),
    wordFts5P95Ms: p95(union('fts5', WORD)),
    wordsFiltersP95Ms: byClass.wordsFilters!.serviceP95Ms,
    wordsFiltersFts5P95Ms: byClass.wordsFilters!.fts5P95Ms,
    fts5BuildSeconds: round(ftsBuildMs / 1000),
    byClass,
    hits,
  };
  const ratios = {
    wordP95VsFts5: round(figures.wordP95Ms / figures.wordFts5P95Ms),
    wordsFiltersP95VsFts5: round(figures.wordsFiltersP95Ms / figures.wordsFiltersFts5P95Ms!),
    httpP95VsService: round(p95(union('http', ALL)) / p95(union('service', ALL))),
    httpFetchP95VsService: round(p95(union('httpFetch', ALL)) / p95(union('service', ALL))),
  };
  const { byClass: _b, hits: _h, ...headline } = figures;
  console.table(headline);
  return { figures, ratios };
}
