import { seedDemo } from '../seeds/demo';
import { createApp } from './app';
import { bootstrap } from './bootstrap';
import { loadConfig } from './config';

const config = loadConfig();
const ctx = await bootstrap(config);
if (config.demo) {
  const seeded = await seedDemo(ctx);
  if (seeded)
    ctx.logger.info(`Demo collection seeded: ${seeded.prints} prints, ${seeded.users} users.`);
}
const { app, close } = createApp(ctx);
const server = app.listen(config.port, () => {
  ctx.logger.info(`Printwarden listening on http://localhost:${config.port}`);
  if (ctx.mailer.usesLocalServer) ctx.logger.info('Mail goes to the built-in server: see Outbox.');
});

function shutdown(): void {
  server.close(() => {
    void close()
      .then(() => ctx.sequelize.close())
      .then(() => process.exit(0));
  });
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
