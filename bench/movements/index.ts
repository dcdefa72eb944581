import { readFileSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { hashPassword } from '../../server/auth/password';
import { insertMany } from '../../server/db/insert-many';
import { writeTransaction } from '../../server/db/write-transaction';
import { User } from '../../server/models';
import { selectRows } from '../../server/db/select-rows';
import { bulkMove, holdingsOf } from '../../server/services/movements/movements';
import { seededRandom } from '../../seeds/random';
import { openBenchApp } from '../bench-app';
import { percentile } from '../load';
import { fillSearchCorpus } from '../search/corpus';
import type { SuiteResult } from '../suite';

const PRINTS = Number(process.env.BENCH_MOVEMENT_PRINTS ?? 100_000);
const MOVEMENTS = Number(process.env.BENCH_MOVEMENTS ?? 1_000_000);
const PLACES = 1_000;
const BULK = 10_000;
const QUERIES = Number(process.env.BENCH_PLACE_QUERIES ?? 300);

const round = (value: number, places = 2) => Math.round(value * 10 ** places) / 10 ** places;
const loadAverage = () => readFileSync('/proc/loadavg', 'utf8').split(' ').slice(0, 3).join(' ');
const DAY_MS = 86_400_000;
const FIRST_DAY = Date.UTC(2000, 0, 1);
const LAST_DAY = Date.UTC(2025, 11, 31);
const isoDay = (ms: number) => new Date(ms).toISOString().slice(0, 10);

/**
 * Issue 18: a bulk move of 10,000 prints through the service (one transaction: movements,
 * audit events, places settled, the search index taking the prints in before it answers),
 * and a place's holdings on a day at 100,000 prints and 1,000,000 movements.
 */
export async function run(): Promise<SuiteResult> {
  const { ctx } = await openBenchApp('movements');
  const rng = seededRandom(18);
  console.log(`Generating ${PRINTS} prints…`);
  await fillSearchCorpus(ctx.sequelize, PRINTS);
  // The corpus's raw INSERTs leave the registrar's marks column at its default, which the
  // search documents do not read as a list; no print here has marks.
  await ctx.sequelize.query(`UPDATE prints SET marks = '[]'`);
  const user = await User.create({
    email: 'bench-mover@printwarden.test',
    name: 'Bench mover',
    role: 'archivist',
    passwordHash: await hashPassword('bench-password-123', 4),
    lastSignInAt: null,
  });

  console.log(`Adding places up to ${PLACES} and ${MOVEMENTS} movements…`);
  const fillStart = performance.now();
  const existing = await selectRows<{ id: number }>(ctx.sequelize, 'SELECT id FROM locations', []);
  const now = new Date().toISOString().replace('T', ' ').replace('Z', ' +00:00');
  await writeTransaction(ctx.sequelize, async (transaction) => {
    await insertMany(
      ctx.sequelize,
      'locations',
      ['code', 'name', 'created_at', 'updated_at'],
      Array.from({ length: PLACES - existing.length }, (_, i) => [
        `BOX-${i + 1}`,
        `Box ${i + 1}`,
        now,
        now,
      ]),
      transaction,
    );
  });
  const placeIds = (
    await selectRows<{ id: number }>(ctx.sequelize, 'SELECT id FROM locations ORDER BY id', [])
  ).map((row) => row.id);
  const prints = await selectRows<{ id: number }>(ctx.sequelize, 'SELECT id FROM prints', []);
  const perPrint = Math.max(1, Math.round(MOVEMENTS / prints.length));
  const columns = [
    'print_id',
    'from_location_id',
    'to_location_id',
    'moved_on',
    'moved_by',
    'reason',
    'created_at',
  ];
  const reasons = ['storage', 'study', 'photography', 'display', 'loan', 'treatment', 'return'];
  const settled: Array<[number, number]> = [];
  // Written in slices of 20,000 prints' movements per transaction, places settled at the end.
  for (let start = 0; start < prints.length; start += 20_000) {
    const rows: unknown[][] = [];
    for (const { id } of prints.slice(start, start + 20_000)) {
      const days = Array.from(
        { length: perPrint },
        () => FIRST_DAY + rng.int(0, (LAST_DAY - FIRST_DAY) / DAY_MS) * DAY_MS,
      ).sort((a, b) => a - b);
      let from: number | null = null;
      for (const day of days) {
        const to = rng.pick(placeIds);
        rows.push([id, from, to, isoDay(day), user.id, rng.pick(reasons), now]);
        from = to;
      }
      settled.push([id, from!]);
    }
    await writeTransaction(ctx.sequelize, (transaction) =>
      insertMany(ctx.sequelize, 'movements', columns, rows, transaction),
    );
  }
  await writeTransaction(ctx.sequelize, async (transaction) => {
    for (let start = 0; start < settled.length; start += 10_000) {
      const chunk = settled.slice(start, start + 10_000);
      await ctx.sequelize.query(
        `UPDATE prints SET location_id = CASE id ${chunk.map(([id, place]) => `WHEN ${id} THEN ${place}`).join(' ')} END
         WHERE id IN (${chunk.map(([id]) => id).join(',')})`,
        { transaction },
      );
    }
  });
  const [{ count } = { count: 0 }] = await selectRows<{ count: number }>(
    ctx.sequelize,
    'SELECT count(*) AS count FROM movements',
    [],
  );
  console.log(`  ${count} movements in ${round((performance.now() - fillStart) / 1000, 1)} s`);

  console.log('Building the search index (the bulk move feeds it)…');
  await ctx.searchIndex.ready();

  console.log('Bulk moves of 10,000 prints…');
  const loadBefore = loadAverage();
  const moveSeconds: number[] = [];
  for (let round_ = 0; round_ < 3; round_++) {
    const ids = new Set<number>();
    while (ids.size < Math.min(BULK, prints.length)) ids.add(rng.pick(prints).id);
    const start = performance.now();
    const result = await bulkMove(
      { ...ctx, user },
      {
        printIds: [...ids],
        toLocationId: rng.pick(placeIds),
        reason: 'storage',
        movedOn: '2026-01-0' + String(round_ + 1),
        note: null,
      },
    );
    moveSeconds.push((performance.now() - start) / 1000);
    if (result.moved !== ids.size) throw new Error(`moved ${result.moved}, not ${ids.size}`);
  }
  moveSeconds.sort((a, b) => a - b);

  console.log(`Holdings of a place on a day, ${QUERIES} queries…`);
  const samples: number[] = [];
  let held = 0;
  for (let n = 0; n < QUERIES; n++) {
    const place = rng.pick(placeIds);
    const on = isoDay(FIRST_DAY + rng.int(0, (LAST_DAY - FIRST_DAY) / DAY_MS) * DAY_MS);
    const start = performance.now();
    const holdings = await holdingsOf(ctx, place, on);
    samples.push(performance.now() - start);
    held += holdings.items.length;
  }
  samples.sort((a, b) => a - b);
  const loadAfter = loadAverage();
  await ctx.mailer.close();
  await ctx.sequelize.close();

  const figures = {
    prints: prints.length,
    movementsBeforeMoves: count,
    places: placeIds.length,
    bulkMove10kSeconds: round(moveSeconds[1]!),
    bulkMove10kSecondsAll: moveSeconds.map((value) => round(value)),
    placeOnDateP50Ms: round(percentile(samples, 0.5)),
    placeOnDateP95Ms: round(percentile(samples, 0.95)),
    placeOnDateMeanHoldings: round(held / QUERIES, 1),
    loadAverageBefore: loadBefore,
    loadAverageAfter: loadAfter,
  };
  console.log(figures);
  return { figures, ratios: {} };
}
