import { rmSync } from 'node:fs';
import { performance } from 'node:perf_hooks';
import { ROLES } from '../shared/domain/roles';
import { User } from '../server/models';
import { overviewFor } from '../server/services/overview/overview';
import { openBenchApp } from './bench-app';
import { fillPrints } from './fill';

/**
 * Times the start page's summary per role at 100,000 prints (issue 20 asks ≤ 50 ms): fills a
 * throwaway database — prints spread over three years of accessions and two of due dates, an
 * alert and an image per print — then asks each role's summary 30 times. A script to run by
 * hand (`npx tsx bench/overview-timing.ts`), not a timed test. BENCH_PRINTS to change.
 */
const PRINTS = Number(process.env.BENCH_PRINTS ?? 100_000);
const ROUNDS = 30;
const { dir, ctx } = await openBenchApp('overview');
const sql = (text: string) => ctx.sequelize.query(text);

await fillPrints(ctx.sequelize, PRINTS);
await sql(`UPDATE prints SET
  created_at = strftime('%Y-%m-%d %H:%M:%S.000 +00:00', 'now', '-' || (id % 1095) || ' days'),
  next_check_due = date('now', '-365 days', '+' || (id % 730) || ' days')`);
await sql(`INSERT INTO alerts (print_id, kind, reason, opened_at, acknowledged_at)
  SELECT id, CASE id % 3 WHEN 0 THEN 'check-overdue' ELSE 'yellowing' END, 'bench',
         strftime('%Y-%m-%d %H:%M:%S.000 +00:00', 'now', '-' || (id % 1000) || ' days'),
         CASE WHEN id % 2 = 0 THEN strftime('%Y-%m-%d %H:%M:%S.000 +00:00', 'now') END
    FROM prints`);
await sql(`INSERT INTO assets (print_id, view, media_type, bytes, sha256, storage_key, width,
    height, bit_depth, channels, has_profile, exif, status, progress, created_at, updated_at)
  SELECT id, 'recto', 'image/tiff', 20000000 + id, printf('%064x', id), 'k', 4000, 5000, 16, 3,
         0, '{}', CASE WHEN id % 2000 = 0 THEN 'processing' ELSE 'ready' END, 0,
         datetime('now'), datetime('now') FROM prints`);
const users: Record<string, number> = {};
for (const role of ROLES) {
  const user = await User.create({
    email: `${role}@bench.test`,
    name: role,
    role,
    passwordHash: 'x',
    lastSignInAt: null,
  });
  users[role] = user.id;
}

const results: Record<string, { medianMs: number; maxMs: number; items: string }> = {};
const previous = new Date(Date.now() - 20 * 86_400_000);
for (const role of ROLES) {
  const asker = { id: users[role]!, role, toneChangesSeenAt: previous };
  const context = { sequelize: ctx.sequelize, uploadsDir: ctx.config.uploadsDir };
  await overviewFor(asker, context);
  const times: number[] = [];
  let last;
  for (let i = 0; i < ROUNDS; i += 1) {
    const start = performance.now();
    last = await overviewFor(asker, context);
    times.push(performance.now() - start);
  }
  times.sort((a, b) => a - b);
  results[role] = {
    medianMs: Math.round(times[ROUNDS >> 1]! * 10) / 10,
    maxMs: Math.round(times[ROUNDS - 1]! * 10) / 10,
    items: last!.items.map((item) => `${item.kind}=${item.count}`).join(' '),
  };
}
console.log(`Start-page summary at ${PRINTS} prints (${ROUNDS} rounds each):`);
console.table(results);
await ctx.sequelize.close();
rmSync(dir, { recursive: true, force: true });
process.exit(0);
