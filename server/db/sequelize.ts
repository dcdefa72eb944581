import { mkdirSync } from 'node:fs';
import { dirname } from 'node:path';
import { Sequelize } from 'sequelize';
import { parseDatabaseUrl } from './database-url';
import { dialectOf } from './dialect';
import { keepConnections } from './driver';
import { readNumbersAsNumbers } from './postgres-types';

/** How long a writer waits for another connection's lock before SQLITE_BUSY. */
const BUSY_TIMEOUT_MS = 10_000;

/** Opens the database named by DATABASE_URL; SQLite in WAL mode with foreign keys on. */
export async function openDatabase(url: string, logging = false): Promise<Sequelize> {
  const target = parseDatabaseUrl(url);
  const define = { underscored: true };
  if (target.dialect === 'postgres') {
    readNumbersAsNumbers();
    const sequelize = new Sequelize(target.url, {
      logging,
      define,
      // Writers wait in this process's queue (write-transaction.ts); readers share the rest.
      pool: { max: 10, min: 0, idle: 10_000 },
    });
    await sequelize.authenticate();
    await dialectOf(sequelize).prepare(sequelize, { inMemory: false });
    return sequelize;
  }
  // A first run (or create-admin before the first start) makes the database's folder.
  if (target.storage !== ':memory:') mkdirSync(dirname(target.storage), { recursive: true });
  const sequelize = new Sequelize({ dialect: 'sqlite', storage: target.storage, logging, define });
  const dialect = dialectOf(sequelize);
  keepConnections(sequelize, {
    busyTimeoutMs: BUSY_TIMEOUT_MS,
    connectionSettings: dialect.connectionSettings,
  });
  await dialect.prepare(sequelize, { inMemory: target.storage === ':memory:' });
  return sequelize;
}
