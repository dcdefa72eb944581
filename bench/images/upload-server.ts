import { openBenchApp } from '../bench-app';
import { rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { join } from 'node:path';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { Print, User } from '../../server/models';

/**
 * Printwarden in its own process for the upload measurement. It samples its own RSS every
 * 20 ms; the bench asks over IPC for the baseline and the peak since the last reset.
 */
const { dir, ctx } = await openBenchApp('images');
await User.create({
  email: 'bench@printwarden.test',
  name: 'Bench',
  role: 'archivist',
  passwordHash: await hashPassword('bench-password-123', 4),
});
const print = await Print.create({
  accessionNumber: '2026.9999',
  title: 'Bench print',
  process: 'salt print',
  status: 'in storage',
  tags: [],
  hasProcessingRisk: false,
  riskReasons: [],
  fixingMinutes: null,
  washingMinutes: null,
  maker: null,
  madeOn: null,
  madeFrom: null,
  madeTo: null,
  imageWidthMm: null,
  imageHeightMm: null,
  sheetWidthMm: null,
  sheetHeightMm: null,
  edition: null,
  description: null,
  createdBy: null,
});
const { app } = createApp(ctx, { clientDir: join(dir, 'none') });
const server = app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.send!({ url: `http://127.0.0.1:${port}`, printId: print.id });
});

let baseline = process.memoryUsage.rss();
let peak = baseline;
setInterval(() => {
  peak = Math.max(peak, process.memoryUsage.rss());
}, 20).unref();
process.on('message', (message: string) => {
  if (message === 'reset') {
    global.gc?.();
    baseline = process.memoryUsage.rss();
    peak = baseline;
    process.send!({ baseline });
  } else if (message === 'report') {
    process.send!({ baseline, peak });
  } else if (message === 'stop') {
    server.close();
    void ctx.images.jobs.idle().then(async () => {
      await ctx.sequelize.close();
      rmSync(dir, { recursive: true, force: true });
      process.exit(0);
    });
  }
});
