import { openBenchApp } from '../bench-app';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { User } from '../../server/models';

/**
 * Printwarden on an empty throwaway database, in its own process so its RSS is its own.
 * Prints one JSON line `{ url, pid }`, then serves until killed.
 */
const { dir, ctx } = await openBenchApp('import');
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
