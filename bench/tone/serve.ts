import { openBenchApp } from '../bench-app';
import { rmSync, writeFileSync } from 'node:fs';
import { Session } from 'node:inspector/promises';
import type { AddressInfo } from 'node:net';
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { User } from '../../server/models';
import { saveToneSettings } from '../../server/services/tone/settings-store';
import { seededRandom } from '../../seeds/random';
import { fillPrints } from '../fill';

/**
 * The tone bench's server, in its own process: 100,000 prints with 8 checks of 4 patches
 * each, a settings change re-evaluated (timed here, where it runs), then the API served.
 * Prints one JSON line with the address and the re-evaluation time, then serves until killed.
 */
const PRINTS = Number(process.env.BENCH_TONE_PRINTS ?? 100_000);
const CHECKS = 8;
// BENCH_KEEP_DIR keeps the filled database for profiling afterwards (must be an empty folder).
const keep = process.env.BENCH_KEEP_DIR;
const { dir, ctx } = await openBenchApp('tone', { keep });
await fillPrints(ctx.sequelize, PRINTS);

/** Eight yearly checks a print, drifting at a per-print rate, with a little noise. */
async function fillChecks(): Promise<void> {
  const rng = seededRandom(11);
  const ids = await ctx.sequelize.query<{ id: number }>('SELECT id FROM prints ORDER BY id', {
    type: QueryTypes.SELECT,
  });
  const now = new Date().toISOString();
  await ctx.sequelize.transaction(async (transaction) => {
    for (let start = 0; start < ids.length; start += 500) {
      const values: unknown[] = [];
      const tuples: string[] = [];
      for (const { id } of ids.slice(start, start + 500)) {
        const drift = rng.next() < 0.2 ? rng.next() * 1.5 : rng.next() * 0.1;
        for (let k = 0; k < CHECKS; k += 1) {
          const noise = () => (rng.next() - 0.5) * 0.3;
          const readings = [
            { patch: 'dmax', L: 28 + drift * k + noise(), a: 7 + noise(), b: 11 + noise() },
            { patch: 'mid', L: 54 + drift * k * 0.8 + noise(), a: 5 + noise(), b: 14 + noise() },
            { patch: 'highlight', L: 87 + noise(), a: 1.5 + noise(), b: 7 + drift * k + noise() },
            { patch: 'dmin', L: 93 + noise(), a: 0.5 + noise(), b: 4.2 + drift * k + noise() },
          ];
          tuples.push("(?, ?, 'spectrophotometer', 'D50', '2', ?, ?, ?, ?)");
          values.push(id, `${2017 + k}-03-01`, k === 0 ? 1 : 0, JSON.stringify(readings), now, now);
        }
      }
      await ctx.sequelize.query(
        `INSERT INTO tone_checks (print_id, checked_on, method, illuminant, observer, baseline, readings, created_at, updated_at) VALUES ${tuples.join(', ')}`,
        { replacements: values, transaction },
      );
    }
  });
}
await fillChecks();
// As if each print had been evaluated when its checks were logged: the baseline date is set
// (a settings re-evaluation never moves it), so logging a check re-derives no risk reasons.
await ctx.sequelize.query("UPDATE prints SET tone_baseline_on = '2017-03-01'");
/** Starts V8's sampling profiler; the function returned stops it and gives the profile. */
async function startProfile(): Promise<() => Promise<object>> {
  const session = new Session();
  session.connect();
  await session.post('Profiler.enable');
  await session.post('Profiler.start');
  return async () => (await session.post('Profiler.stop')).profile;
}

/** A re-evaluation as a settings change runs it: the job, its ranges and its progress row. */
async function reevaluate(): Promise<void> {
  await ctx.toneReevaluation.request();
  await ctx.toneReevaluation.idle();
}
await reevaluate(); // the state before the change
// A running server has its search index up: it re-reads the prints whose tone state moves
// (re-evaluation notes them as changed). Built here, so neither the timed re-evaluation nor
// the first logged check pays for building it from nothing.
await ctx.searchIndex.ready();
await ctx.searchIndex.settled();

// BENCH_TONE_PROFILE=FILE writes a CPU profile of the timed part alone (the fill excluded).
const profiler = process.env.BENCH_TONE_PROFILE ? await startProfile() : null;
const started = performance.now();
await ctx.sequelize.transaction((transaction) =>
  saveToneSettings({ tone: { yellowingB: 2.5 } }, transaction),
);
await reevaluate();
const reevaluateSeconds = (performance.now() - started) / 1000;
if (profiler) writeFileSync(process.env.BENCH_TONE_PROFILE!, JSON.stringify(await profiler()));

await User.create({
  email: 'bench-conservator@printwarden.test',
  name: 'Bench',
  role: 'conservator',
  passwordHash: await hashPassword('bench-password-123', 4),
});
const server = createApp(ctx).app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.stdout.write(
    `${JSON.stringify({ api: `http://127.0.0.1:${port}`, prints: PRINTS, checks: PRINTS * CHECKS, reevaluateSeconds })}\n`,
  );
});
process.on('SIGTERM', () => {
  if (!keep) rmSync(dir, { recursive: true, force: true });
  process.exit(0);
});
