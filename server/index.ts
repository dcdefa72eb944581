import type { AddressInfo } from 'node:net';
import { seedDemo } from '../seeds/demo';
import { createApp } from './app';
import { bootstrap } from './bootstrap';
import { loadConfig } from './config';
import { scheduleToneDigest } from './services/tone/digest';

const config = loadConfig();
const ctx = await bootstrap(config);
if (config.demo) {
  const seeded = await seedDemo(ctx, { images: 'background' });
  if (seeded)
    ctx.logger.info(`Demo collection seeded: ${seeded.prints} prints, ${seeded.users} users.`);
}
// Finish derivatives a stopped server left half-made.
void ctx.images.jobs.resume();
const { app, close } = createApp(ctx);
const digest = scheduleToneDigest(ctx);
const server = app.listen(config.port, () => {
  // PORT=0 picks a free port; name the one the system gave (the crash test reads it).
  const { port } = server.address() as AddressInfo;
  ctx.logger.info({ port }, `Printwarden listening on http://localhost:${port}`);
  if (ctx.mailer.usesLocalServer) ctx.logger.info('Mail goes to the built-in server: see Outbox.');
});

function shutdown(): void {
  digest.stop();
  server.close(() => {
    // The next start loads the saved index instead of rebuilding it.
    void ctx.searchIndex
      .saveSnapshot()
      .catch(() => undefined)
      .then(() => close())
      .then(() => ctx.sequelize.close())
      .then(() => process.exit(0));
  });
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
