import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { up as repairAlertDates } from '../../../server/db/migrations/0011-alert-dates';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';
import { buildReadings, buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
let printId: number;

beforeAll(async () => {
  t = await startTestApp();
  const print = await (
    await t.as('archivist')
  )
    .post('/api/prints')
    .send(buildPrint({ title: 'Yellowing a little', madeOn: '2023' }));
  printId = print.body.id;
  const conservator = await t.as('conservator');
  await conservator
    .post(`/api/prints/${printId}/tone-checks`)
    .send(buildToneCheck({ checkedOn: '2024-03-02', baseline: true }));
  // Bare paper b* +2.4: yellowing at the default 2.0, not at 3.0.
  await conservator
    .post(`/api/prints/${printId}/tone-checks`)
    .send(buildToneCheck({ checkedOn: '2026-03-02', readings: buildReadings({ dminB: 6.5 }) }));
});
afterAll(() => t.close());

describe('alerts after a threshold change', () => {
  it('still list, with the alert the re-evaluation opened, and again after changing it back', async () => {
    const admin = await t.as('admin');
    const conservator = await t.as('conservator');
    await admin.patch('/api/settings').send({ tone: { yellowingB: 3 } });
    await t.ctx.toneReevaluation.idle();
    const after = await conservator.get('/api/alerts');
    expect(after.status).toBe(200);
    const opened = after.body.items.find(
      (a: { print: { id: number }; reason: string }) =>
        a.print.id === printId && a.reason.startsWith('Tone eased to watch (was yellowing)'),
    );
    expect(opened).toBeDefined();
    expect(Number.isNaN(Date.parse(opened.openedAt))).toBe(false);

    await admin.patch('/api/settings').send({ tone: { yellowingB: 2 } });
    await t.ctx.toneReevaluation.idle();
    const back = await conservator.get('/api/alerts');
    expect(back.status).toBe(200);
  });

  // Only SQLite kept dates as text that could be written wrongly; PostgreSQL refuses them.
  it.skipIf(testDatabaseDialect() !== 'sqlite')(
    'migration 0011 mends alerts written with ISO dates by the old re-evaluation',
    async () => {
      await t.ctx.sequelize.query(
        `INSERT INTO alerts (print_id, kind, reason, opened_at)
       VALUES (?, 'watch', 'written by the old re-evaluation', '2026-11-30T08:00:00.000Z')`,
        { replacements: [printId] },
      );
      const broken = await (await t.as('conservator')).get('/api/alerts');
      expect(broken.status).toBe(500);
      await repairAlertDates({ context: t.ctx.sequelize.getQueryInterface() });
      const mended = await (await t.as('conservator')).get('/api/alerts');
      expect(mended.status).toBe(200);
      const old = mended.body.items.find(
        (a: { reason: string }) => a.reason === 'written by the old re-evaluation',
      );
      expect(old.openedAt).toBe('2026-11-30T08:00:00.000Z');
    },
  );
});
