import type { AddressInfo } from 'node:net';
import { seedDemo } from '../seeds/demo';
import { formatCount } from '../shared/domain/format';
import { createApp } from './app';
import { countDemoAccounts, endDemoSessions } from './auth/demo-accounts';
import { bootstrap } from './bootstrap';
import { ConfigError, loadConfig, type Config } from './config';
import type { AppContext } from './context';
import { scheduleToneDigest } from './services/tone/digest';
import { shutDown, type Running } from './shutdown';

let config: Config;
try {
  config = loadConfig();
} catch (error) {
  if (!(error instanceof ConfigError)) throw error;
  console.error(`Printwarden cannot start: ${error.message}`);
  process.exit(1);
}

// A stop may arrive at any moment, start-up included: remember it and act when safe.
let running: Running | null = null;
let stopRequested = false;
let stopping: Promise<void> | null = null;
function requestStop(): void {
  stopRequested = true;
  if (running && !stopping) {
    const { logger } = running.ctx;
    logger.info('Stopping: finishing requests in flight and background work.');
    stopping = shutDown(running).then(
      () => process.exit(0),
      (error: unknown) => {
        logger.error({ err: error }, 'Shutdown failed');
        process.exit(1);
      },
    );
  }
}
process.on('SIGTERM', requestStop);
process.on('SIGINT', requestStop);

const ctx = await bootstrap(config);
const { app, close } = createApp(ctx);
running = { ctx, server: null, closeApp: close };
if (stopRequested) requestStop();
else await start(ctx);

async function start(ctx: AppContext): Promise<void> {
  if (config.demo) {
    const seeded = await seedDemo(ctx, {
      images: 'background',
      passwordCost: config.passwordCost,
    });
    if (seeded)
      ctx.logger.info(`Demo collection seeded: ${seeded.prints} prints, ${seeded.users} users.`);
  } else await refuseDemoAccounts(ctx);
  if (stopRequested) return requestStop();
  // Load or build the search index now, not at the first search or write.
  void ctx.searchIndex.ready().catch((error: unknown) => {
    ctx.logger.error({ err: error }, 'The search index could not be started');
  });
  // Finish derivatives a stopped server left half-made.
  await ctx.images.jobs.resume();
  // And a tone re-evaluation a shutdown stopped.
  await ctx.toneReevaluation.resume();
  await scheduleToneDigest(ctx);
  const server = app.listen(config.port, () => {
    // PORT=0 picks a free port; name the one the system gave (the crash test reads it).
    const { port } = server.address() as AddressInfo;
    ctx.logger.info({ port }, `Printwarden listening on http://localhost:${port}`);
    if (ctx.mailer.usesLocalServer)
      ctx.logger.info('Mail goes to the built-in server: see Outbox.');
  });
  running!.server = server;
}

/** Demo off: the demo's accounts, if this database was once a demo, open nothing. */
async function refuseDemoAccounts(ctx: AppContext): Promise<void> {
  const count = await countDemoAccounts();
  if (count === 0) return;
  await endDemoSessions(ctx.sequelize);
  ctx.logger.warn(
    `${formatCount(count, 'demo account')} from an earlier demo run cannot sign in while the demo is off; remove them with: npm run create-admin -- --remove-demo`,
  );
}
