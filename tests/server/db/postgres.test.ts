import { QueryTypes, type Transaction } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { dialectOf } from '../../../server/db/dialect';
import { buildPrint } from '../../support/factories';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';

/**
 * What only PostgreSQL needs: the dialect module's SQL, the write lock shared by every
 * process on the database, and two server instances on one database. Runs when the API
 * project runs against PostgreSQL (`TEST_POSTGRES_URL`, as `.ci/run` sets it).
 */
describe.runIf(testDatabaseDialect() === 'postgres')('on PostgreSQL', () => {
  let a: TestApp;
  let b: TestApp;
  beforeAll(async () => {
    a = await startTestApp();
    // A second instance on the same database: its own process state, no users of its own.
    b = await startTestApp({ databaseUrl: a.ctx.config.databaseUrl }, { users: false });
  });
  afterAll(async () => {
    await b.close();
    await a.close();
  });

  const one = async <T extends object>(sql: string) =>
    (await a.ctx.sequelize.query<T>(sql, { type: QueryTypes.SELECT }))[0]!;

  it('writes numbers as people do, joins text and casts bound values', async () => {
    const dialect = dialectOf(a.ctx.sequelize);
    expect(dialect.name).toBe('postgres');
    expect(dialect.indexHint('prints_live_risk')).toBe('');
    // trim_scale drops trailing zeros (PostgreSQL 15 manual, 9.3 Mathematical Functions).
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
    const typed = await one<{ flags: unknown; due: unknown }>(
      `SELECT v.column1 AS flags, v.column2 AS due
         FROM (VALUES (${dialect.typed("'[1,2]'", 'json')}, ${dialect.typed('NULL', 'date')})) AS v`,
    );
    expect(typed).toEqual({ flags: [1, 2], due: null });
    const counted = await one<{ n: unknown }>(
      `SELECT COUNT(*) AS n FROM prints WHERE has_processing_risk = ${dialect.true}`,
    );
    // int8 read as a number, as SQLite gives it.
    expect(counted.n).toBe(0);
  });

  it('keeps a second writer waiting until the first commits, across connections', async () => {
    const { sequelize } = a.ctx;
    const dialect = dialectOf(sequelize);
    let release!: () => void;
    const held = new Promise<void>((resolve) => (release = resolve));
    const first = sequelize.transaction(async (transaction: Transaction) => {
      await dialect.lockForWrite(sequelize, transaction);
      await held;
    });
    await expect.poll(() => waitingForLock(true)).toBe(1);
    // The other instance's pool: another process as far as the lock is concerned.
    const second = b.ctx.sequelize.transaction(async (transaction: Transaction) => {
      await dialectOf(b.ctx.sequelize).lockForWrite(b.ctx.sequelize, transaction);
    });
    await expect.poll(() => waitingForLock(false)).toBe(1);
    release();
    await Promise.all([first, second]);
    expect(await waitingForLock(false)).toBe(0);
  });

  /** Advisory locks granted (or waited for) at this moment. */
  async function waitingForLock(granted: boolean): Promise<number> {
    const row = await one<{ n: number }>(
      `SELECT COUNT(*) AS n FROM pg_locks WHERE locktype = 'advisory' AND granted = ${granted}`,
    );
    return row.n;
  }

  it('finds a print created, renamed or deleted through one instance by searching the other', async () => {
    const throughA = await a.as('archivist');
    const throughB = await signIn(b.app, 'archivist@test.example', TEST_PASSWORD);
    await b.ctx.searchIndex.ready();
    const found = async (words: string) =>
      (
        (await throughB.get(`/api/prints?q=${encodeURIComponent(words)}`)).body.items as Array<{
          id: number;
        }>
      ).map((item) => item.id);
    const created = await throughA
      .post('/api/prints')
      .send(buildPrint({ title: 'Quarry lantern' }));
    expect(created.status).toBe(201);
    // Woken by NOTIFY at A's commit; polled, not timed.
    await expect.poll(() => found('quarry lantern')).toEqual([created.body.id]);
    await throughA.patch(`/api/prints/${created.body.id}`).send({ title: 'Orchard lantern' });
    await expect.poll(() => found('orchard')).toEqual([created.body.id]);
    expect(await found('quarry')).toEqual([]);
    await throughA.delete(`/api/prints/${created.body.id}`);
    await expect.poll(() => found('orchard')).toEqual([]);
  });

  it('gives unique accession numbers to creates through two instances at once', async () => {
    const throughA = await a.as('archivist');
    const throughB = await signIn(b.app, 'archivist@test.example', TEST_PASSWORD);
    const responses = await Promise.all(
      Array.from({ length: 16 }, (_, i) =>
        (i % 2 ? throughA : throughB)
          .post('/api/prints')
          .send(buildPrint({ title: `Two doors ${i}` })),
      ),
    );
    expect(responses.map((response) => response.status)).toEqual(Array(16).fill(201));
    const numbers = responses.map((response) => response.body.accessionNumber as string);
    expect(new Set(numbers).size).toBe(16);
    const stored = await one<{ n: number }>(
      "SELECT COUNT(*) AS n FROM prints WHERE title LIKE 'Two doors %'",
    );
    expect(stored.n).toBe(16);
  });
});
