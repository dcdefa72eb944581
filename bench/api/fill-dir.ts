import { createBenchArchivist, openBenchApp } from '../bench-app';
import { fillPrints } from '../fill';

/**
 * Fills a data folder for the read-your-writes phase: `BENCH_RYW_PRINTS` prints and the
 * bench archivist, then closes, so that the real server can start on it as after a restart.
 * Usage: tsx bench/api/fill-dir.ts DIR
 */
const dir = process.argv[2]!;
const prints = Number(process.env.BENCH_RYW_PRINTS ?? 100_000);
const { ctx } = await openBenchApp('ryw', { keep: dir, config: { LOG_LEVEL: 'warn' } });
await fillPrints(ctx.sequelize, prints);
await createBenchArchivist();
await ctx.mailer.close();
await ctx.sequelize.close();
// The built-in mail server's handles would keep the process alive.
process.exit(0);
