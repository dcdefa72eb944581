import type { AddressInfo } from 'node:net';
import { resolve } from 'node:path';
import { seedDemo } from '../../seeds/demo';
import { createApp } from '../../server/app';
import { openBenchApp } from '../bench-app';

/**
 * The client bench's server, in its own process: the demo collection on a throwaway SQLite
 * file, serving the built client from BENCH_CLIENT_DIR (default dist/client, where `npm run build` puts it and `npm start` serves it from). Prints one JSON line
 * with its address, then serves until killed.
 */
const clientDir = resolve(process.env.BENCH_CLIENT_DIR ?? 'dist/client');
const { ctx } = await openBenchApp('client', { config: { DEMO: '1', LOG_LEVEL: 'silent' } });
await seedDemo(ctx, { passwordCost: 4, images: false });
const { app } = createApp(ctx, { clientDir });
const server = app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  console.log(JSON.stringify({ url: `http://127.0.0.1:${port}` }));
});
