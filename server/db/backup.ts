import {
  chmodSync,
  closeSync,
  copyFileSync,
  existsSync,
  openSync,
  rmSync,
  statSync,
} from 'node:fs';
import { Sequelize } from 'sequelize';
import { parseDatabaseUrl } from './database-url';
import { dialectOf } from './dialect';

function sqliteFile(databaseUrl: string): string {
  const target = parseDatabaseUrl(databaseUrl);
  if (target.dialect !== 'sqlite' || target.storage === ':memory:') {
    throw new Error('Backup and restore work on a SQLite file; use pg_dump for PostgreSQL.');
  }
  return target.storage;
}

/**
 * Writes a consistent copy of the live database with `VACUUM INTO`, which SQLite runs as
 * one read transaction: safe while the server is writing. The copy holds every password
 * hash and session, so it is readable by its owner only (0600) from its first byte.
 */
export async function backupDatabase(databaseUrl: string, file: string): Promise<void> {
  if (existsSync(file)) throw new Error(`${file} exists; choose a new file name.`);
  // SQLite writes INTO an empty file that exists; made here, it gets our mode, not the umask's.
  closeSync(openSync(file, 'wx', 0o600));
  chmodSync(file, 0o600);
  const sequelize = new Sequelize({
    dialect: 'sqlite',
    storage: sqliteFile(databaseUrl),
    logging: false,
  });
  try {
    await dialectOf(sequelize).copyInto(sequelize, file);
    // The admin's start page shows the age of the last backup (migration 0013).
    await sequelize.query('INSERT INTO backups (made_at, bytes) VALUES (?, ?)', {
      replacements: [new Date(), statSync(file).size],
    });
  } finally {
    await sequelize.close();
  }
}

/** Puts a backup in place of the database after checking it; stop the server first. */
export async function restoreDatabase(databaseUrl: string, file: string): Promise<void> {
  if (!existsSync(file)) throw new Error(`${file} does not exist.`);
  const check = new Sequelize({ dialect: 'sqlite', storage: file, logging: false });
  try {
    const verdict = await dialectOf(check).integrityCheck(check);
    if (verdict !== 'ok') throw new Error(`${file} fails SQLite's integrity check: ${verdict}`);
    await check.query('SELECT count(*) FROM schema_migrations');
  } finally {
    await check.close();
  }
  const target = sqliteFile(databaseUrl);
  // The old write-ahead log belongs to the old file; left behind it would be replayed.
  for (const suffix of ['-wal', '-shm']) rmSync(`${target}${suffix}`, { force: true });
  copyFileSync(file, target);
}
