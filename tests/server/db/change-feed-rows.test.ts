import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  notePrintsChanged,
  onPrintsChanged,
  recordNotedChanges,
  type PrintsChanged,
} from '../../../server/db/prints-changed';
import { writeTransaction } from '../../../server/db/write-transaction';
import { buildPrint } from '../../support/factories';
import { lastFeedId } from '../../support/change-feed';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

interface FeedRow {
  id: number;
  print_ids: string | number[];
  what: string | string[];
}

const parsed = (value: string | unknown[]) =>
  typeof value === 'string' ? (JSON.parse(value) as unknown[]) : value;

async function feedAfter(id: number) {
  const rows = await t.ctx.sequelize.query<FeedRow>(
    'SELECT id, print_ids, what FROM print_changes WHERE id > ? ORDER BY id',
    { replacements: [id], type: QueryTypes.SELECT },
  );
  return rows.map((row) => ({ printIds: parsed(row.print_ids), what: parsed(row.what) }));
}

describe('the change feed of one write', () => {
  it('a row recorded early keeps what was noted; what is noted later gets a row of its own, and the one event has both', async () => {
    const before = await lastFeedId(t.ctx.sequelize);
    const events: PrintsChanged[] = [];
    const stop = onPrintsChanged(t.ctx.sequelize, (change) => {
      events.push(change);
    });
    try {
      await writeTransaction(t.ctx.sequelize, async (transaction) => {
        notePrintsChanged(transaction, [7001], 'tone');
        await recordNotedChanges(t.ctx.sequelize, transaction);
        notePrintsChanged(transaction, [7002], 'derived');
      });
    } finally {
      stop();
    }
    expect(await feedAfter(before)).toEqual([
      { printIds: [7001], what: ['tone'] },
      { printIds: [7002], what: ['derived'] },
    ]);
    expect(events).toEqual([{ printIds: [7001, 7002], what: ['derived', 'tone'] }]);
  });

  it('a rolled-back write leaves no row and sends no event, though it recorded one early', async () => {
    const before = await lastFeedId(t.ctx.sequelize);
    const events: PrintsChanged[] = [];
    const stop = onPrintsChanged(t.ctx.sequelize, (change) => {
      events.push(change);
    });
    try {
      await expect(
        writeTransaction(t.ctx.sequelize, async (transaction) => {
          notePrintsChanged(transaction, [7003], 'tone');
          await recordNotedChanges(t.ctx.sequelize, transaction);
          throw new Error('refused');
        }),
      ).rejects.toThrow('refused');
    } finally {
      stop();
    }
    expect(await feedAfter(before)).toEqual([]);
    expect(events).toEqual([]);
  });

  it('logging a check that moves the tone state writes one row, with the print', async () => {
    const archivist = await t.as('archivist');
    const conservator = await t.as('conservator');
    const print = await archivist.post('/api/prints').send(buildPrint());
    const before = await lastFeedId(t.ctx.sequelize);
    const logged = await conservator
      .post(`/api/prints/${print.body.id}/tone-checks`)
      .send(buildToneCheck({ baseline: true, checkedOn: new Date().toISOString().slice(0, 10) }));
    expect(logged.status).toBe(201);
    expect(logged.body.tone.status).not.toBe('unchecked');
    expect(await feedAfter(before)).toEqual([{ printIds: [print.body.id], what: ['tone'] }]);
  });

  it('creating a print writes one row, with the print, sent with its steps and audit', async () => {
    const archivist = await t.as('archivist');
    const before = await lastFeedId(t.ctx.sequelize);
    const created = await archivist.post('/api/prints').send(buildPrint());
    expect(created.status).toBe(201);
    expect(await feedAfter(before)).toEqual([{ printIds: [created.body.id], what: ['record'] }]);
  });
});
