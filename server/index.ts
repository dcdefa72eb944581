import { seedDemo } from '../seeds/demo';
import { createApp } from './app';
import { bootstrap } from './bootstrap';
import { loadConfig } from './config';

const config = loadConfig();
const ctx = await bootstrap(config);
if (config.demo) {
  const seeded = await seedDemo(ctx, { images: 'background' });
  if (seeded)
    console.log(`Demo collection seeded: ${seeded.prints} prints, ${seeded.users} users.`);
}
// Finish derivatives a stopped server left half-made.
void ctx.images.jobs.resume();
const { app, close } = createApp(ctx);
const server = app.listen(config.port, () => {
  console.log(`Printwarden listening on http://localhost:${config.port}`);
});

function shutdown(): void {
  close();
  server.close(() => {
    void ctx.sequelize.close().then(() => process.exit(0));
  });
}
process.on('SIGINT', shutdown);
process.on('SIGTERM', shutdown);
