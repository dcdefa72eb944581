import type { AddressInfo } from 'node:net';
import { rmSync } from 'node:fs';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { User } from '../../server/models';
import { openBenchApp } from '../bench-app';

/**
 * Printwarden with one account whose password is hashed at production strength (the
 * config's defaults), for `measure.ts`. Sign-in limits are raised so every wrong sign-in
 * does its hashing. Prints one JSON line with the address, then serves until killed.
 */
const { dir, ctx } = await openBenchApp('sign-in', {
  config: {
    LOG_LEVEL: 'warn',
    SIGN_IN_ATTEMPTS: '1000000',
    SIGN_IN_ATTEMPTS_PER_ACCOUNT: '1000000',
  },
});
await User.create({
  email: 'bench@printwarden.test',
  name: 'Bench',
  role: 'archivist',
  passwordHash: await hashPassword('bench-password-123', ctx.config.passwordCost),
  lastSignInAt: null,
});
const printwarden = createApp(ctx);
const server = printwarden.app.listen(0, '127.0.0.1', () => {
  const { port } = server.address() as AddressInfo;
  process.stdout.write(`${JSON.stringify({ url: `http://127.0.0.1:${port}` })}\n`);
});

function stop(): void {
  server.close();
  void printwarden
    .close()
    .then(() => ctx.sequelize.close())
    .finally(() => {
      rmSync(dir, { recursive: true, force: true });
      process.exit(0);
    });
}
process.on('SIGTERM', stop);
process.on('SIGINT', stop);
