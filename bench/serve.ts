import { createBenchArchivist, openBenchApp } from './bench-app';
import { rmSync } from 'node:fs';
import type { Server } from 'node:http';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import type { Express } from 'express';
import { createApp } from '../server/app';
import { rawPeerApp } from './api/raw-peer';
import { fillPrints } from './fill';

/**
 * The servers under test, in a process of their own so the load generator (autocannon,
 * in the parent) does not share their event loop: Printwarden on a filled database, and
 * the raw-SQL peer on a copy of the same file. Prints one JSON line with the addresses,
 * then serves until killed. Run with `--cpu-prof` to see where the time goes.
 */
const PRINTS = Number(process.env.BENCH_PRINTS ?? 10_000);

function listen(app: Express): Promise<Server> {
  return new Promise((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => resolve(server));
  });
}
const url = (server: Server) => `http://127.0.0.1:${(server.address() as AddressInfo).port}`;

const { dir, ctx } = await openBenchApp('api', {
  config: { LOG_LEVEL: process.env.LOG_LEVEL ?? 'warn' },
});
await fillPrints(ctx.sequelize, PRINTS);
await createBenchArchivist();
const copy = join(dir, 'raw-peer.sqlite');
await ctx.sequelize.query(`VACUUM INTO '${copy}'`);
const printwarden = createApp(ctx);
const api = await listen(printwarden.app);
const raw = await listen(await rawPeerApp(copy));
process.stdout.write(`${JSON.stringify({ api: url(api), raw: url(raw), prints: PRINTS })}\n`);

function stop(): void {
  api.close();
  raw.close();
  void printwarden
    .close()
    .then(() => ctx.sequelize.close())
    .finally(() => {
      rmSync(dir, { recursive: true, force: true });
      // A normal exit lets --cpu-prof write its profile.
      process.exit(0);
    });
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
