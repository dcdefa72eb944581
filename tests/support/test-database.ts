import { join } from 'node:path';
import pg from 'pg';

/**
 * The database a test app runs on. By default a new SQLite file in the test's folder. In
 * the `api-postgres` project (vite.config.ts, present when `TEST_POSTGRES_URL` names a
 * server whose user may create databases) `TEST_DATABASE_SERVER` holds that URL, and each
 * test app gets a new, empty PostgreSQL database there, dropped again when it closes.
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
  await onServer(server, `CREATE DATABASE ${name}`);
  const url = new URL(server);
  url.pathname = `/${name}`;
  return {
    url: url.toString(),
    dialect: 'postgres',
    drop: () => onServer(server, `DROP DATABASE IF EXISTS ${name} WITH (FORCE)`),
  };
}

async function onServer(server: string, sql: string): Promise<void> {
  const client = new pg.Client({ connectionString: server });
  await client.connect();
  try {
    await client.query(sql);
  } finally {
    await client.end();
  }
}
