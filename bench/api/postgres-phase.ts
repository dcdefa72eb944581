import { freshPostgresDatabase, startPostgresServer } from '../postgres-cluster';
import { postmasterPid, withCpuShare } from './cpu-share';
import { concurrentCreates } from './concurrent-creates';
import { crossInstanceFreshness } from './cross-instance-fresh';
import { SECONDS, cannon, create, mixRequests, randomPage, signIn, type Figure } from './measure';
import { spawnServer } from './spawn-server';

const FRESH_CREATES = Number(process.env.BENCH_FRESH_CREATES ?? 100);
const CREATE_SECONDS = Math.min(SECONDS, 5);

type Instance = { api: string; prints: number; pid: number; stop: () => Promise<void> };
const round2 = (value: number) => Math.round(value * 100) / 100;

/**
 * Issue 16's keys: the same list and create on PostgreSQL (a fresh database on the bench's
 * server, `BENCH_PRINTS` prints) as the suite measured on SQLite; list and the 90/10 mix
 * through a round-robin proxy to one instance, then to two on the same database; freshness
 * from A to B; and concurrent creates on both instances.
 */
export async function postgresFigures(sqlite: { listReqPerSec: number; createReqPerSec: number }) {
  console.log('PostgreSQL: starting the server and filling a fresh database…');
  const cleanups: Array<() => Promise<void>> = [];
  try {
    const server = await startPostgresServer();
    cleanups.push(server.stop);
    const database = await freshPostgresDatabase(server.url);
    cleanups.push(database.drop);
    const instance = (fill: boolean) =>
      spawnServer<Instance>('bench/api/serve-one.ts', {
        BENCH_DATABASE_URL: database.url,
        BENCH_FILL: fill ? '1' : '0',
      });
    const proxy = (targets: string[]) =>
      spawnServer<{ url: string }>('bench/api/proxy.ts', {}, targets);
    const a = await instance(true);
    cleanups.push(a.stop);
    const headers = await signIn(a.api);
    const pages = Math.ceil(a.prints / 25);
    await (await fetch(`${a.api}/api/prints?q=weir`, { headers })).arrayBuffer();

    const results: Record<string, Figure> = {};
    const measure = async (name: string, url: string, requests: Parameters<typeof cannon>[2]) => {
      console.log(`  ${name}…`);
      results[name] = await cannon(url, headers, requests);
    };
    await measure('postgres list (random page)', a.api, [randomPage(pages)]);
    await measure('postgres create (6 steps)', a.api, [create()]);

    const toA = await proxy([a.api]);
    cleanups.push(toA.stop);
    const postmaster = await postmasterPid(database.url);
    const oneCpu = await withCpuShare(
      { instanceA: a.pid, proxy: toA.pid },
      postmaster,
      async () => {
        await measure('postgres proxy → 1 instance: list', toA.url, [randomPage(pages)]);
        await measure('postgres proxy → 1 instance: mix 90/10', toA.url, mixRequests(a.prints));
      },
    );

    const b = await instance(false);
    cleanups.push(b.stop);
    await (await fetch(`${b.api}/api/prints?q=weir`, { headers })).arrayBuffer();
    const toBoth = await proxy([a.api, b.api]);
    cleanups.push(toBoth.stop);
    const pids = { instanceA: a.pid, instanceB: b.pid, proxy: toBoth.pid };
    const twoCpu = await withCpuShare(pids, postmaster, async () => {
      await measure('postgres proxy → 2 instances: list', toBoth.url, [randomPage(pages)]);
      await measure('postgres proxy → 2 instances: mix 90/10', toBoth.url, mixRequests(a.prints));
    });

    console.log(`  ${FRESH_CREATES} creates through A, each searched through B…`);
    const fresh = await crossInstanceFreshness(a.api, b.api, headers, FRESH_CREATES);
    console.log(`  creates on both instances for ${CREATE_SECONDS} s…`);
    const creates = await concurrentCreates([a.api, b.api], headers, database.url, CREATE_SECONDS);

    const rate = (name: string) => results[name]!.reqPerSec;
    const vsOne = (run: string) =>
      round2(
        rate(`postgres proxy → 2 instances: ${run}`) / rate(`postgres proxy → 1 instance: ${run}`),
      );
    const one =
      rate('postgres proxy → 1 instance: list') + rate('postgres proxy → 1 instance: mix 90/10');
    const two =
      rate('postgres proxy → 2 instances: list') + rate('postgres proxy → 2 instances: mix 90/10');
    return {
      ratios: {
        postgresListVsSqlite: round2(rate('postgres list (random page)') / sqlite.listReqPerSec),
        postgresCreateVsSqlite: round2(rate('postgres create (6 steps)') / sqlite.createReqPerSec),
        // List and mix req/s added up (each run as long), two instances ÷ one.
        twoInstancesVsOne: round2(two / one),
      },
      figures: {
        crossInstanceFreshP99Ms: fresh.p99Ms,
        duplicateAccessions: creates.duplicateAccessions,
        concurrentCreatesLostWrites: creates.lostWrites,
        postgres: {
          results,
          crossInstanceFresh: fresh,
          concurrentCreates: creates,
          twoInstances: {
            listVsOne: vsOne('list'),
            mixVsOne: vsOne('mix 90/10'),
            // Cores each part used during the list and mix runs (machine: all busy cores).
            coresUsedOneInstance: oneCpu.coresUsed,
            coresUsedTwoInstances: twoCpu.coresUsed,
          },
        },
      },
    };
  } finally {
    for (const cleanup of cleanups.reverse()) await cleanup();
  }
}
