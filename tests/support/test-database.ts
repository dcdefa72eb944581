import { join } from 'node:path';
import { inject } from 'vitest';
import { databaseUrlOn, runOnServer } from './postgres-server';

/**
 * The database a test app runs on. By default a new SQLite file in the test's folder. In
 * the `api-postgres` project (vite.config.ts, present when `TEST_POSTGRES_URL` names a
 * server whose user may create databases) `TEST_DATABASE_SERVER` holds that URL, and each
 * test app gets a copy of the migrated template there (postgres-global-setup.ts), dropped
 * again when it closes.
 * Other projects (the browser tests' seeded template) stay on SQLite.
 */
export interface TestDatabase {
  url: string;
  dialect: 'sqlite' | 'postgres';
  drop: () => Promise<void>;
}

let made = 0;

export function testDatabaseDialect(): 'sqlite' | 'postgres' {
  return process.env.TEST_DATABASE_SERVER ? 'postgres' : 'sqlite';
}

export async function freshTestDatabase(dir: string): Promise<TestDatabase> {
  const server = process.env.TEST_DATABASE_SERVER;
  if (!server) {
    return { url: `sqlite:${join(dir, 'test.sqlite')}`, dialect: 'sqlite', drop: async () => {} };
  }
  made += 1;
  const name = `printwarden_test_${process.pid}_${made}_${Date.now().toString(36)}`;
  await runOnServer(server, `CREATE DATABASE ${name} TEMPLATE ${inject('postgresTemplate')}`);
  return {
    url: databaseUrlOn(server, name),
    dialect: 'postgres',
    drop: () => runOnServer(server, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`),
  };
}
