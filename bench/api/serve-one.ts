import { mkdtempSync, rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createApp } from '../../server/app';
import { bootstrap } from '../../server/bootstrap';
import { loadConfig } from '../../server/config';
import { createBenchArchivist } from '../bench-app';
import { fillPrints } from '../fill';

/**
 * One Printwarden instance on `BENCH_DATABASE_URL` (PostgreSQL here), with its own data
 * folder (search index snapshot, uploads). With `BENCH_FILL=1` it first fills the empty
 * database with `BENCH_PRINTS` prints and the bench archivist; a second instance on the
 * same database starts without. Prints one JSON line with its address, then serves until
 * killed.
 */
const PRINTS = Number(process.env.BENCH_PRINTS ?? 10_000);
const dir = mkdtempSync(join(tmpdir(), 'printwarden-bench-instance-'));
const ctx = await bootstrap(
  loadConfig({
    DATABASE_URL: process.env.BENCH_DATABASE_URL!,
    DATA_DIR: dir,
    UPLOADS_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'bench',
    DEMO: '0',
    LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn',
  }),
);
if (process.env.BENCH_FILL === '1') {
  await fillPrints(ctx.sequelize, PRINTS);
  await createBenchArchivist();
}
const printwarden = createApp(ctx);
await ctx.searchIndex.ready();
const server = printwarden.app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.stdout.write(`${JSON.stringify({ api: `http://127.0.0.1:${port}`, prints: PRINTS })}\n`);
});

function stop(): void {
  server.close();
  void printwarden
    .close()
    .then(() => ctx.closeDatabase())
    .finally(() => {
      rmSync(dir, { recursive: true, force: true });
      process.exit(0);
    });
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
