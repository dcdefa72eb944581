import { join } from 'node:path';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase, restoreDatabase } from '../../../server/db/backup';
import { parseDatabaseUrl } from '../../../server/db/database-url';
import { writeTransaction } from '../../../server/db/write-transaction';
import { Paper, Print } from '../../../server/models';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';

describe('DATABASE_URL', () => {
  it('reads relative, absolute and in-memory sqlite URLs', () => {
    expect(parseDatabaseUrl('sqlite:data/printwarden.sqlite', '/srv/app')).toEqual({
      dialect: 'sqlite',
      storage: '/srv/app/data/printwarden.sqlite',
    });
    const absolute = { dialect: 'sqlite', storage: '/var/lib/pw.sqlite' };
    expect(parseDatabaseUrl('sqlite:/var/lib/pw.sqlite')).toEqual(absolute);
    expect(parseDatabaseUrl('sqlite:///var/lib/pw.sqlite')).toEqual(absolute);
    expect(parseDatabaseUrl('sqlite::memory:')).toEqual({ dialect: 'sqlite', storage: ':memory:' });
    expect(parseDatabaseUrl('postgres://u@h/db').dialect).toBe('postgres');
    expect(() => parseDatabaseUrl('mysql://x')).toThrow(/sqlite: or postgres/);
  });
});

describe.runIf(testDatabaseDialect() === 'sqlite')('the SQLite file', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp();
  });
  afterAll(() => t.close());

  it('runs in WAL mode with foreign keys enforced', async () => {
    const select = { type: QueryTypes.SELECT } as const;
    const mode = await t.ctx.sequelize.query('PRAGMA journal_mode', select);
    const keys = await t.ctx.sequelize.query('PRAGMA foreign_keys', select);
    expect(mode).toEqual([{ journal_mode: 'wal' }]);
    expect(keys).toEqual([{ foreign_keys: 1 }]);
  });

  it('rolls a failed write back completely, and the next write still works', async () => {
    const before = await Paper.count();
    await expect(
      writeTransaction(t.ctx.sequelize, async (transaction) => {
        await Paper.create({ name: 'Half-written' }, { transaction });
        throw new Error('fails after the first insert');
      }),
    ).rejects.toThrow(/after the first insert/);
    expect(await Paper.count()).toBe(before);
    await writeTransaction(t.ctx.sequelize, (transaction) =>
      Paper.create({ name: 'Whole' }, { transaction }),
    );
    expect(await Paper.count()).toBe(before + 1);
  });

  it('keeps concurrent writers apart: each sees its own committed insert', async () => {
    const names = Array.from({ length: 10 }, (_, i) => `Concurrent ${i}`);
    await Promise.all(
      names.map((name) =>
        writeTransaction(t.ctx.sequelize, (transaction) => Paper.create({ name }, { transaction })),
      ),
    );
    expect((await Paper.findAll({ where: { name: names } })).length).toBe(10);
  });

  it('backs up while open and restores the copy', async () => {
    const archivist = await t.as('archivist');
    await archivist.post('/api/prints').send(buildPrint({ title: 'Before the backup' }));
    const file = join(t.dir, 'backup.sqlite');
    const url = t.ctx.config.databaseUrl;
    await backupDatabase(url, file);
    await expect(backupDatabase(url, file)).rejects.toThrow(/exists/);
    await archivist.post('/api/prints').send(buildPrint({ title: 'After the backup' }));
    const titlesNow = (await Print.findAll()).map((print) => print.title);
    expect(titlesNow).toContain('After the backup');

    await t.closeDatabase();
    await restoreDatabase(url, file);
    const reopened = await startTestApp({ databaseUrl: url }, { users: false });
    try {
      expect((await Print.findAll()).map((print) => print.title)).toEqual(['Before the backup']);
    } finally {
      await reopened.close();
    }
  });
});
