import { copyFileSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';
import type { Express } from 'express';
import type { DestinationStream } from 'pino';
import { ROLES, type Role } from '../../shared/domain/roles';
import { createApp } from '../../server/app';
import { hashPassword } from '../../server/auth/password';
import { bootstrap } from '../../server/bootstrap';
import { loadConfig, type Config } from '../../server/config';
import type { AppContext } from '../../server/context';
import { User } from '../../server/models';
import { freshTestDatabase } from './test-database';

export const TEST_PASSWORD = 'correct horse battery staple';

export interface SignedIn {
  agent: ReturnType<typeof request.agent>;
  csrf: string;
  get: (url: string) => request.Test;
  post: (url: string) => request.Test;
  patch: (url: string) => request.Test;
  delete: (url: string) => request.Test;
}

export interface TestApp {
  app: Express;
  ctx: AppContext;
  dir: string;
  /** A supertest agent signed in as the demo-like user of that role, CSRF header preset. */
  as: (role: Role) => Promise<SignedIn>;
  anonymous: () => ReturnType<typeof request>;
  /** Closes the database only (to swap its file); close() then skips it. */
  closeDatabase: () => Promise<void>;
  close: () => Promise<void>;
}

/** The whole app on a fresh SQLite file built by the migrations, one user per role. */
export async function startTestApp(
  overrides: Partial<Config> = {},
  /**
   * `users: false` leaves the users table empty (for the demo seed); `serveClient` serves
   * dist/client; `logDestination` receives the server's log lines (set LOG_LEVEL in overrides).
   */
  options: {
    users?: boolean;
    serveClient?: boolean;
    logDestination?: DestinationStream;
    /** Starts from a copy of this SQLite file (a seeded template) instead of an empty one. */
    databaseFrom?: string;
  } = {},
): Promise<TestApp> {
  const dir = mkdtempSync(join(tmpdir(), 'printwarden-test-'));
  const database = await freshTestDatabase(dir);
  if (options.databaseFrom) {
    if (database.dialect !== 'sqlite') throw new Error('A seeded template is a SQLite file.');
    copyFileSync(options.databaseFrom, join(dir, 'test.sqlite'));
  }
  const config = {
    ...loadConfig({
      DATABASE_URL: database.url,
      DATA_DIR: dir,
      UPLOADS_DIR: join(dir, 'uploads'),
      SESSION_SECRET: 'test-secret',
      DEMO: '0',
      LOG_LEVEL: process.env.LOG_LEVEL ?? 'silent',
      PASSWORD_COST: '4',
    }),
    ...overrides,
  };
  const ctx = await bootstrap(config, { logDestination: options.logDestination });
  // A low work factor keeps the suite quick; the hashing itself is real scrypt.
  if (options.users !== false) await createRoleUsers();
  const clientDir = options.serveClient ? undefined : join(dir, 'no-client');
  const { app, close } = createApp(ctx, { clientDir });
  const cache = new Map<Role, SignedIn>();
  let databaseOpen = true;
  const closeDatabase = async () => {
    if (databaseOpen) await ctx.closeDatabase();
    databaseOpen = false;
  };

  return {
    app,
    ctx,
    dir,
    anonymous: () => request(app),
    as: async (role) => {
      const known = cache.get(role);
      if (known) return known;
      const signedIn = await signIn(app, `${role}@test.example`, TEST_PASSWORD);
      cache.set(role, signedIn);
      return signedIn;
    },
    closeDatabase,
    close: async () => {
      // As the server's shutdown does: background jobs stop at a safe point first, so none
      // is left writing to a closed database.
      await ctx.background.stop(10_000);
      await close();
      await closeDatabase();
      await database.drop();
      rmSync(dir, { recursive: true, force: true });
    },
  };
}

async function createRoleUsers(): Promise<void> {
  const passwordHash = await hashPassword(TEST_PASSWORD, 4);
  await User.bulkCreate(
    ROLES.map((role) => ({
      email: `${role}@test.example`,
      name: `Test ${role}`,
      role,
      passwordHash,
    })),
  );
}

export async function signIn(app: Express, email: string, password: string): Promise<SignedIn> {
  const agent = request.agent(app);
  const response = await agent.post('/api/session').send({ email, password });
  if (response.status !== 200) throw new Error(`sign-in failed: ${response.status}`);
  const csrf = response.body.csrfToken as string;
  return {
    agent,
    csrf,
    get: (url) => agent.get(url),
    post: (url) => agent.post(url).set('X-CSRF-Token', csrf),
    patch: (url) => agent.patch(url).set('X-CSRF-Token', csrf),
    delete: (url) => agent.delete(url).set('X-CSRF-Token', csrf),
  };
}
