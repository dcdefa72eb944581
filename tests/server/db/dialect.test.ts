import { readdirSync, readFileSync, statSync } from 'node:fs';
import { join, relative } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dialectOf } from '../../../server/db/dialect';
import { startTestApp, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const one = async <T extends object>(sql: string) =>
  (await t.ctx.sequelize.query<T>(sql, { type: QueryTypes.SELECT }))[0]!;

describe('the dialect module of the database in use', () => {
  it('writes numbers as people do and joins text', async () => {
    const dialect = dialectOf(t.ctx.sequelize);
    // SQLite: printf('%g') drops the REAL ".0" (SQLite docs, printf: %g as in C).
    // PostgreSQL: trim_scale drops trailing zeros (PostgreSQL 15 manual, 9.3 Mathematical
    // Functions).
    expect(
      await one<{ a: string; b: string }>(
        `SELECT ${dialect.numberText('15.0')} AS a, ${dialect.numberText('0.2')} AS b`,
      ),
    ).toEqual({ a: '15', b: '0.2' });
    const joined = await one<{ text: string }>(
      `SELECT ${dialect.stringAgg('word', "' '")} AS text
         FROM (SELECT 'salt' AS word UNION ALL SELECT 'print') AS words`,
    );
    expect(joined.text.split(' ').sort()).toEqual(['print', 'salt']);
  });
});

describe.runIf(testDatabaseDialect() === 'sqlite')('the SQLite dialect module', () => {
  it('names an index SQLite accepts and checks the file', async () => {
    const dialect = dialectOf(t.ctx.sequelize);
    expect(dialect.name).toBe('sqlite');
    // A partial index of migration 0013, named as the start page's count names it.
    const counted = await one<{ n: number }>(
      `SELECT COUNT(*) AS n FROM prints ${dialect.indexHint('prints_live_risk')}
        WHERE deleted_at IS NULL AND has_processing_risk = ${dialect.true}`,
    );
    expect(counted.n).toBe(0);
    expect(await dialect.integrityCheck(t.ctx.sequelize)).toBe('ok');
  });
});

/** SQL only SQLite understands; it belongs in server/db/dialect/sqlite.ts. */
const SQLITE_ONLY =
  /INDEXED BY|INSERT OR |ON CONFLICT|json_extract|json_each|BEGIN IMMEDIATE|PRAGMA |strftime\(|julianday\(|group_concat\(|ifnull\(|printf\(|VACUUM INTO|TYPES\.IMMEDIATE/i;

/**
 * Files of other areas that still hold SQLite-only SQL, each to move to the dialect module
 * by its owner. Remove a line once its file is clean; the test then keeps it clean.
 */
const NOT_YET_MOVED = new Set([
  'server/db/write-transaction.ts', // IMMEDIATE transactions (SQLite's write lock first)
  // ON CONFLICT upsert of the accession counter: PostgreSQL takes the same text.
  'server/services/prints/accession.ts',
]);

function sourceFiles(dir: string): string[] {
  return readdirSync(dir).flatMap((name) => {
    const path = join(dir, name);
    return statSync(path).isDirectory() ? sourceFiles(path) : path.endsWith('.ts') ? [path] : [];
  });
}

describe('SQLite-only SQL', () => {
  it('appears only in the dialect module (and in migrations, which never change)', () => {
    const root = join(__dirname, '../../..');
    const offenders = sourceFiles(join(root, 'server'))
      .map((path) => relative(root, path))
      .filter((path) => !path.startsWith('server/db/dialect/'))
      .filter((path) => !path.startsWith('server/db/migrations/'))
      .filter((path) => !NOT_YET_MOVED.has(path))
      .filter((path) =>
        readFileSync(join(root, path), 'utf8')
          .split('\n')
          // Comments may name the SQL they explain.
          .filter((line) => !/^\s*(\*|\/\/|\/\*)/.test(line))
          .some((line) => SQLITE_ONLY.test(line)),
      );
    expect(offenders).toEqual([]);
  });
});

describe('the sqlite3 driver', () => {
  it('is reached past Sequelize only in server/db/driver.ts', () => {
    const root = join(__dirname, '../../..');
    const reaching = sourceFiles(join(root, 'server'))
      .map((path) => relative(root, path))
      .filter((path) =>
        /connectionManager|\)\.connection\b|as unknown as \{ connection/.test(
          readFileSync(join(root, path), 'utf8'),
        ),
      );
    expect(reaching).toEqual(['server/db/driver.ts']);
  });
});
