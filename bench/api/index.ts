import type { CannonRequest } from 'autocannon';
import type { SuiteResult } from '../suite';
import {
  CONNECTIONS,
  SECONDS,
  SEARCH,
  cannon,
  create,
  mixRequests,
  randomPage,
  randomRecord,
  signIn,
  totalPrints,
  type Figure,
} from './measure';
import { postgresFigures } from './postgres-phase';
import { readYourWritesAfterStart } from './read-your-writes';
import { spawnServer } from './spawn-server';

/** Printwarden and the raw-SQL peer on SQLite, in a process of their own (bench/serve.ts). */
const startServers = () =>
  spawnServer<{ api: string; raw: string; prints: number }>('bench/serve.ts');

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
    results[name] = await cannon(url, h, r);
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
  const mix = mixRequests(servers.prints, () => (answeredCreates += 1));
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
  const postgres = await postgresFigures({
    listReqPerSec: results['list (random page)']!.reqPerSec,
    createReqPerSec: results['create (6 steps)']!.reqPerSec,
  });
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
      // Issue 16's key counts every lost write: the SQLite mix's and the two PostgreSQL
      // instances' (each also on its own).
      lostWrites: lostWrites + postgres.figures.concurrentCreatesLostWrites,
      mixLostWrites: lostWrites,
      mixCreatesAnswered: answeredCreates,
      readYourWritesMissesAfterStart: readBack.misses,
      readYourWritesAfterStart: readBack,
      results,
      ...postgres.figures,
    },
    ratios: { ...ratios, ...postgres.ratios },
  };
}
