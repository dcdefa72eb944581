import { mkdtempSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { bootstrap } from '../../server/bootstrap';
import { loadConfig } from '../../server/config';
import { User } from '../../server/models';

/**
 * Printwarden on an empty throwaway database, in its own process so its RSS is its own.
 * Prints one JSON line `{ url, pid }`, then serves until killed.
 */
const dir = mkdtempSync(join(tmpdir(), 'printwarden-bench-import-'));
const ctx = await bootstrap(
  loadConfig({
    DATABASE_URL: `sqlite:${join(dir, 'bench.sqlite')}`,
    DATA_DIR: dir,
    UPLOADS_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'bench',
    DEMO: '0',
  }),
);
for (const role of ['archivist', 'conservator'] as const) {
  await User.create({
    email: `${role}@bench.test`,
    name: `Bench ${role}`,
    role,
    passwordHash: await hashPassword('bench-password-123', 4),
  });
}
const server = createApp(ctx).app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.stdout.write(
    `${JSON.stringify({ url: `http://127.0.0.1:${port}`, pid: process.pid, dir })}\n`,
  );
});
