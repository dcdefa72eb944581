import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildReadings, buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
const ids: Record<string, number> = {};

/** A print with a baseline in 2024 and a second check in 2026 (readings as given). */
async function printWithChecks(
  name: string,
  later: ReturnType<typeof buildReadings>,
  extra: Parameters<typeof buildPrint>[0] = {},
) {
  const print = await (
    await t.as('archivist')
  )
    .post('/api/prints')
    .send(buildPrint({ title: name, madeOn: '2023', ...extra }));
  ids[name] = print.body.id;
  const conservator = await t.as('conservator');
  await conservator
    .post(`/api/prints/${print.body.id}/tone-checks`)
    .send(buildToneCheck({ checkedOn: '2024-03-02', baseline: true }));
  await conservator
    .post(`/api/prints/${print.body.id}/tone-checks`)
    .send(buildToneCheck({ checkedOn: '2026-03-02', readings: later }));
}

beforeAll(async () => {
  t = await startTestApp();
  await printWithChecks('Steady one', buildReadings());
  await printWithChecks('Slightly yellow', buildReadings({ dminB: 6.5 }));
  await printWithChecks('Very yellow', buildReadings({ dminB: 9 }), {
    processing: buildSaltSteps({ washing: 3 }),
  });
  await printWithChecks('Faded', buildReadings({ dmaxL: 31 }));
});
afterAll(() => t.close());

describe('tone watch', () => {
  it('lists prints needing attention, most urgent first, with reasons; steady ones left out', async () => {
    const list = await (await t.as('conservator')).get('/api/tone-watch');
    expect(list.status).toBe(200);
    const titles = list.body.items.map((item: { print: { title: string } }) => item.print.title);
    // yellowing b* +4.9 (2.45× its threshold) before fading (density −0.086, 1.7×), then +2.4 (1.2×).
    expect(titles).toEqual(['Very yellow', 'Faded', 'Slightly yellow']);
    expect(list.body.items[0]).toMatchObject({
      status: 'yellowing',
      nextCheckDue: '2026-09-02',
      reasons: expect.arrayContaining(['bare paper b* +4.9 since 2024-03-02']),
    });
    expect(list.body.items[0].sparkline).toHaveLength(2);
    // The reason behind the status comes first (flags are stored in reading order).
    expect(list.body.items[0].flags[0].kind).toBe('yellowing');
  });

  it('filters by status and paper; refuses a viewer, curator and no session; 422 on a bad status', async () => {
    const conservator = await t.as('conservator');
    const fading = await conservator.get('/api/tone-watch?status=fading');
    expect(fading.body.items.map((i: { print: { id: number } }) => i.print.id)).toEqual([
      ids.Faded,
    ]);
    expectProblem(await (await t.as('viewer')).get('/api/tone-watch'), 403);
    expectProblem(await (await t.as('curator')).get('/api/tone-watch'), 403);
    expectProblem(await t.anonymous().get('/api/tone-watch'), 401);
    expectProblem(await conservator.get('/api/tone-watch?status=purple'), 422);
    expect((await (await t.as('admin')).get('/api/tone-watch?scope=all')).body.items).toHaveLength(
      4,
    );
  });

  it('shows the status in the prints list filter and facets', async () => {
    const list = await (await t.as('viewer')).get('/api/prints?toneStatus=yellowing');
    expect(list.body.total).toBe(2);
    const facet = list.body.facets.toneStatus.find(
      (f: { value: string }) => f.value === 'yellowing',
    );
    expect(facet.count).toBe(2);
  });
});

describe('alerts', () => {
  it('every change of status opens an alert; a conservator acknowledges it', async () => {
    const conservator = await t.as('conservator');
    const alerts = await conservator.get('/api/alerts');
    expect(alerts.status).toBe(200);
    const kinds = alerts.body.items.map((a: { kind: string; print: { id: number } }) => [
      a.print.id,
      a.kind,
    ]);
    expect(kinds).toEqual(
      expect.arrayContaining([
        [ids['Very yellow'], 'yellowing'],
        [ids.Faded, 'fading'],
      ]),
    );
    expect(kinds.some(([id]: [number]) => id === ids['Steady one'])).toBe(false);
    const first = alerts.body.items[0];
    const acked = await conservator.post(`/api/alerts/${first.id}/acknowledgement`);
    expect(acked.status).toBe(200);
    expect(acked.body.acknowledgedBy.email).toBe('conservator@test.example');
    const after = await conservator.get('/api/alerts');
    expect(after.body.items.at(-1).id).toBe(first.id);
    expectProblem(await (await t.as('curator')).get('/api/alerts'), 403);
    expectProblem(
      await (await t.as('viewer')).post(`/api/alerts/${first.id}/acknowledgement`),
      403,
    );
    expectProblem(await t.anonymous().get('/api/alerts'), 401);
    expectProblem(await conservator.post('/api/alerts/99999/acknowledgement'), 404);
    expectProblem(await conservator.post('/api/alerts/x/acknowledgement'), 422);
  });
});

describe('settings', () => {
  it('a conservator reads the defaults with their sources; only an admin changes them', async () => {
    const read = await (await t.as('conservator')).get('/api/settings');
    expect(read.body).toMatchObject({
      tone: {
        watchDE00: 1,
        noticeableDE00: 2,
        fadingDensity: 0.05,
        darkeningL: 2,
        yellowingB: 2,
        projectionYears: 5,
      },
      schedule: { steadyMonths: 24, watchMonths: 12, changingMonths: 6 },
    });
    expect(read.body.sources['tone.watchDE00'].source).toMatch(/from memory/);
    expectProblem(
      await (await t.as('conservator')).patch('/api/settings').send({ tone: { yellowingB: 3 } }),
      403,
    );
    expectProblem(await (await t.as('curator')).get('/api/settings'), 403);
    expectProblem(await t.anonymous().get('/api/settings'), 401);
    expectProblem(
      await (await t.as('admin')).patch('/api/settings').send({ tone: { yellowingB: -1 } }),
      422,
    );
    expectProblem(
      await (await t.as('admin')).patch('/api/settings').send({ tone: { colour: 1 } }),
      422,
    );
  });

  it('a change re-evaluates every print in the background, with progress', async () => {
    const admin = await t.as('admin');
    const changed = await admin.patch('/api/settings').send({ tone: { yellowingB: 3 } });
    expect(changed.status).toBe(200);
    expect(changed.body.tone.yellowingB).toBe(3);
    expect(changed.body.reevaluation.status).toMatch(/running|done/);
    await t.ctx.toneReevaluation.idle();
    const progress = (await admin.get('/api/settings')).body.reevaluation;
    expect(progress).toMatchObject({ status: 'done', done: 4, total: 4 });
    const slightly = await admin.get(`/api/prints/${ids['Slightly yellow']}`);
    // b* +2.4 is now under the yellowing threshold of 3.0; its ΔE00 keeps it on watch.
    expect(slightly.body.toneStatus).toBe('watch');
    expect((await admin.get(`/api/prints/${ids['Very yellow']}`)).body.toneStatus).toBe(
      'yellowing',
    );
    // The search follows through the change feed of each re-evaluated range (no rebuild).
    const found = async (status: string) =>
      (await admin.get(`/api/prints?toneStatus=${status}&pageSize=100`)).body.items.map(
        (item: { id: number }) => item.id,
      );
    expect(await found('watch')).toContain(ids['Slightly yellow']);
    expect(await found('yellowing')).not.toContain(ids['Slightly yellow']);
    await admin.patch('/api/settings').send({ tone: { yellowingB: 2 } });
    await t.ctx.toneReevaluation.idle();
  });
});

describe('cohorts', () => {
  it('groups checked prints by washing band with counts and a small-group caution', async () => {
    const response = await (await t.as('viewer')).get('/api/cohorts?by=washing');
    expect(response.status).toBe(200);
    const short = response.body.groups.find((g: { key: string }) => g.key === 'lt5');
    expect(short).toMatchObject({ prints: 1, checks: 2, small: true, label: 'Washed under 5 min' });
    const usual = response.body.groups.find((g: { key: string }) => g.key === '10-30');
    expect(usual).toMatchObject({ prints: 3, checks: 6 });
    expectProblem(await (await t.as('viewer')).get('/api/cohorts?by=colour'), 422);
    expectProblem(await t.anonymous().get('/api/cohorts?by=paper'), 401);
  });
});

describe('check rounds', () => {
  it('lists the prints due by the end of a period', async () => {
    const round = await (
      await t.as('conservator')
    ).get('/api/tone-rounds?from=2026-09-01&to=2026-09-30');
    expect(round.status).toBe(200);
    const due = round.body.places.flatMap((p: { prints: Array<{ title: string }> }) =>
      p.prints.map((x) => x.title),
    );
    // The three changing prints are due six months after 2026-03-02; the steady one in 2028.
    expect(due.sort()).toEqual(['Faded', 'Slightly yellow', 'Very yellow']);
    expect(round.body.places[0].prints[0].lastPatches).toEqual([
      'dmax',
      'mid',
      'highlight',
      'dmin',
    ]);
    expectProblem(
      await (await t.as('conservator')).get('/api/tone-rounds?from=2026-09-30&to=2026-09-01'),
      422,
    );
    expectProblem(
      await (await t.as('curator')).get('/api/tone-rounds?from=2026-09-01&to=2026-09-30'),
      403,
    );
    expectProblem(await t.anonymous().get('/api/tone-rounds?from=2026-09-01&to=2026-09-30'), 401);
  });

  it('keeps the small line with the print, and derives it for a print not evaluated since', async () => {
    const conservator = await t.as('conservator');
    const stored = (await conservator.get('/api/tone-watch')).body.items;
    await t.ctx.sequelize.query('UPDATE prints SET tone_sparkline = NULL');
    const derived = (await conservator.get('/api/tone-watch')).body.items;
    expect(derived.map((item: { sparkline: number[] }) => item.sparkline)).toEqual(
      stored.map((item: { sparkline: number[] }) => item.sparkline),
    );
    // The line is ΔE00 against the baseline: zero at the baseline itself.
    expect(stored[0].sparkline[0]).toBe(0);
    expect(stored[0].sparkline[1]).toBeGreaterThan(0);
  });

  it('counts again after a check changes a status', async () => {
    const conservator = await t.as('conservator');
    const before = (await conservator.get('/api/tone-watch')).body.total;
    await conservator
      .post(`/api/prints/${ids['Steady one']}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2026-06-02', readings: buildReadings({ dmaxL: 31 }) }));
    const after = await conservator.get('/api/tone-watch');
    expect(after.body.total).toBe(before + 1);
    expect(after.body.items.map((item: { print: { id: number } }) => item.print.id)).toContain(
      ids['Steady one'],
    );
  });
});
