import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { openBenchApp } from '../bench-app';

/**
 * The search suite's HTTP side in a process of its own, as a deployed server runs: it
 * opens the suite's database folder (`BENCH_SEARCH_DIR`), starts from the index snapshot
 * the suite's build wrote there, and prints one JSON line with its address. Serves until
 * killed; the suite removes the folder.
 */
const dir = process.env.BENCH_SEARCH_DIR;
if (!dir) throw new Error('BENCH_SEARCH_DIR is not set');
const { ctx } = await openBenchApp('search-http', { keep: dir, config: { LOG_LEVEL: 'warn' } });
const started = Date.now();
await ctx.searchIndex.ready();
const { source } = ctx.searchIndex.status();
const printwarden = createApp(ctx);
const server = printwarden.app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  const readyMs = Date.now() - started;
  process.stdout.write(
    `${JSON.stringify({ url: `http://127.0.0.1:${port}`, indexFrom: source, readyMs })}\n`,
  );
});

function stop(): void {
  server.close();
  void printwarden
    .close()
    .then(() => ctx.sequelize.close())
    .finally(() => process.exit(0));
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
