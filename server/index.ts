import { seedDemo } from '../seeds/demo';
import { createApp } from './app';
import { bootstrap } from './bootstrap';
import { loadConfig } from './config';

const config = loadConfig();
const ctx = await bootstrap(config);
if (config.demo) {
  const seeded = await seedDemo(ctx);
  if (seeded)
    console.log(`Demo collection seeded: ${seeded.prints} prints, ${seeded.users} users.`);
}
const { app, close } = createApp(ctx);
const server = app.listen(config.port, () => {
  console.log(`Printwarden listening on http://localhost:${config.port}`);
});

function shutdown(): void {
  close();
  server.close(() => {
    // The next start loads the saved index instead of rebuilding it.
    void ctx.searchIndex
      .saveSnapshot()
      .catch(() => undefined)
      .then(() => ctx.sequelize.close())
      .then(() => process.exit(0));
  });
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
