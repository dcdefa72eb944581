import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { BackgroundWork } from '../../../../server/services/background';
import {
  reevaluateAllPrints,
  ReevaluationTracker,
} from '../../../../server/services/tone/reevaluate-all';
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
  it('counts prints as their new state commits, in steps, not all at once', async () => {
    const seen: Array<[number, number]> = [];
    const total = await reevaluateAllPrints(t.ctx.sequelize, (done, all) => {
      seen.push([done, all]);
    });
    expect(total).toBe(66);
    expect(seen[0]).toEqual([0, 66]);
    expect(seen.at(-1)).toEqual([66, 66]);
    // A 66-print collection once went 0 → 66 in one step: now it moves about 20 times.
    const steps = seen.map(([done]) => done);
    expect(steps.length).toBeGreaterThanOrEqual(15);
    for (let i = 1; i < steps.length; i += 1) expect(steps[i]!).toBeGreaterThan(steps[i - 1]!);
    const [{ live }] = (await t.ctx.sequelize.query<{ live: number }>(
      'SELECT COUNT(*) AS live FROM prints WHERE deleted_at IS NULL',
      { type: QueryTypes.SELECT },
    )) as [{ live: number }];
    expect(live).toBe(66);
  });

  it('stops between ranges when asked, keeping the ranges it committed', async () => {
    let stop = false;
    const done = await reevaluateAllPrints(
      t.ctx.sequelize,
      (committed) => {
        if (committed > 0) stop = true;
      },
      () => stop,
    );
    // Before, the loop never asked and ran to the end (in tests, into a closed database).
    expect(done).toBeGreaterThan(0);
    expect(done).toBeLessThan(66);
  });

  it("is stopped by the shutdown's background stop and says so", async () => {
    const background = new BackgroundWork();
    const tracker = new ReevaluationTracker(t.ctx.sequelize, background);
    const progress = tracker.start();
    expect(await background.stop(10_000)).toBe(true);
    expect(progress.status).toBe('stopped');
    expect(progress.done).toBeLessThan(progress.total);
  });
});
