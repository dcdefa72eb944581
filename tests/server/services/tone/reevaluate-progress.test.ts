import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BackgroundWork } from '../../../../server/services/background';
import { writeTransaction } from '../../../../server/db/write-transaction';
import { InProcessQueue } from '../../../../server/services/jobs/in-process-queue';
import { ToneReevaluationRuns } from '../../../../server/services/tone/reevaluation-runs';
import { ToneReevaluation } from '../../../../server/models';
import { buildPrint } from '../../../support/factories';
import { startTestApp, type TestApp } from '../../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  for (let i = 0; i < 66; i += 1) {
    await archivist
      .post('/api/prints')
      .send(buildPrint({ title: `Progress ${i}` }))
      .expect(201);
  }
});
afterAll(() => t.close());

describe('tone re-evaluation progress', () => {
  const row = async () => (await ToneReevaluation.findByPk(1))!;

  it('counts prints as their new state commits, in steps, not all at once', async () => {
    const seen: number[] = [];
    await t.ctx.toneReevaluation.request();
    // Writers take turns: each empty write lets at most one range of the run commit first.
    for (;;) {
      const run = await row();
      if (seen.at(-1) !== run.done) seen.push(run.done);
      if (run.status !== 'running') break;
      await writeTransaction(t.ctx.sequelize, async () => undefined);
    }
    expect(await row()).toMatchObject({ status: 'done', done: 66, total: 66 });
    expect(seen.at(-1)).toBe(66);
    // A 66-print collection once went 0 → 66 in one step: now it moves about 20 times.
    expect(seen.length).toBeGreaterThanOrEqual(15);
    for (let i = 1; i < seen.length; i += 1) expect(seen[i]!).toBeGreaterThan(seen[i - 1]!);
    const [{ live }] = (await t.ctx.sequelize.query<{ live: number }>(
      'SELECT COUNT(*) AS live FROM prints WHERE deleted_at IS NULL',
      { type: QueryTypes.SELECT },
    )) as [{ live: number }];
    expect(live).toBe(66);
  });

  /** A run's machinery of its own on the test's database, as one server start has. */
  async function instance() {
    const background = new BackgroundWork();
    const jobs = new InProcessQueue(background, t.ctx.logger);
    const runs = new ToneReevaluationRuns(t.ctx.sequelize, jobs, background, t.ctx.logger);
    await jobs.handle('tone-reevaluation', () => runs.run());
    return { background, jobs, runs };
  }

  it("is stopped by the shutdown's background stop, says so, and the next start carries on", async () => {
    const first = await instance();
    await first.runs.request();
    // Writers take turns: each empty write lets at most one range of the run commit first.
    while ((await row()).done === 0) await writeTransaction(t.ctx.sequelize, async () => undefined);
    // The shutdown: no new jobs, then the running one stops between ranges.
    await first.jobs.pause();
    expect(await first.background.stop(10_000)).toBe(true);
    const stopped = await row();
    expect(stopped.status).toBe('stopped');
    expect(stopped.done).toBeLessThan(stopped.total);
    const kept = stopped.afterId;

    const next = await instance();
    await next.runs.resume();
    await next.runs.idle();
    const done = await row();
    expect(done).toMatchObject({ status: 'done', done: 66, total: 66, runs: stopped.runs });
    // Taken up after the last committed range, not from the first print.
    expect(kept).toBeGreaterThan(0);
    expect(done.startedAt).toEqual(stopped.startedAt);
    expect((await next.runs.progress())?.status).toBe('done');
  });

  it('follows a run with exactly one more when settings change during it', async () => {
    const { runs } = await instance();
    const before = (await ToneReevaluation.findByPk(1))?.runs ?? 0;
    await runs.request();
    // Three more changes while the first run is going: one more run owed, not three.
    const during = await Promise.all([runs.request(), runs.request(), runs.request()]);
    expect(during.map((progress) => progress.status)).toEqual(['running', 'running', 'running']);
    await runs.idle();
    expect(await row()).toMatchObject({ status: 'done', runs: before + 2, again: false });
  });
});
