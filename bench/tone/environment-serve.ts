import { rmSync } from 'node:fs';
import type { AddressInfo } from 'node:net';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { Location, User } from '../../server/models';
import { openBenchApp } from '../bench-app';

/**
 * The environment bench's server, in its own process (its RSS is what the bench samples):
 * an empty database with `BENCH_ENV_PLACES` places (50) and a conservator. Prints one JSON
 * line with its address, pid, the place ids and its folder, then serves until killed.
 */
const PLACES = Number(process.env.BENCH_ENV_PLACES ?? 50);
const { dir, ctx } = await openBenchApp('environment');
const room = await Location.create({ code: 'ROOM', name: 'Bench store room', parentId: null });
const ids: number[] = [];
for (let i = 1; i <= PLACES; i += 1) {
  const place = await Location.create({
    code: `CAB-${i}`,
    name: `Cabinet ${i}`,
    parentId: room.id,
  });
  ids.push(place.id);
}
await User.create({
  email: 'bench-conservator@printwarden.test',
  name: 'Bench',
  role: 'conservator',
  passwordHash: await hashPassword('bench-password-123', 4),
});
const server = createApp(ctx).app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.stdout.write(
    `${JSON.stringify({ api: `http://127.0.0.1:${port}`, pid: process.pid, places: ids, dir })}\n`,
  );
});
process.on('SIGTERM', () => {
  rmSync(dir, { recursive: true, force: true });
  process.exit(0);
});
