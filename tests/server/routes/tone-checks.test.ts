import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildReadings, buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

async function newPrint(overrides: Parameters<typeof buildPrint>[0] = {}): Promise<number> {
  const created = await (await t.as('archivist')).post('/api/prints').send(buildPrint(overrides));
  expect(created.status).toBe(201);
  return created.body.id as number;
}

describe('logging a tone check', () => {
  it('a conservator logs a baseline and a later check and gets the comparison per patch', async () => {
    const id = await newPrint({ madeOn: '2024-01-10' });
    const conservator = await t.as('conservator');
    const baseline = await conservator
      .post(`/api/prints/${id}/tone-checks`)
      .send(buildToneCheck({ baseline: true }));
    expect(baseline.status).toBe(201);
    expect(baseline.body.comparison).toHaveLength(4);
    for (const row of baseline.body.comparison) {
      expect(row).toMatchObject({ dL: 0, da: 0, db: 0, dE76: 0, dE94: 0, dE00: 0, dDensity: 0 });
    }
    const later = await conservator
      .post(`/api/prints/${id}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2026-03-02', readings: buildReadings({ dminB: 7.2 }) }));
    expect(later.status).toBe(201);
    const dmin = later.body.comparison.find((c: { patch: string }) => c.patch === 'dmin');
    expect(dmin.db).toBeCloseTo(3.1, 9);
    expect(dmin.dE76).toBeCloseTo(3.1, 9);
    expect(later.body.tone.status).toBe('yellowing');
    expect(later.body.tone.flags.map((f: { reason: string }) => f.reason)).toContain(
      'bare paper b* +3.1 since 2024-03-02',
    );
    const record = await (await t.as('viewer')).get(`/api/prints/${id}`);
    expect(record.body.toneStatus).toBe('yellowing');
    expect(record.body.tone.nextCheckDue).toBe('2026-09-02');
    expect(record.body.tone.flags.map((f: { kind: string }) => f.kind)).toContain('yellowing');
  });

  it('warns about a baseline measured on the day the print was made and marks a processing risk', async () => {
    const id = await newPrint({ madeOn: '2026-05-14' });
    const response = await (
      await t.as('conservator')
    )
      .post(`/api/prints/${id}/tone-checks`)
      .send(buildToneCheck({ checkedOn: '2026-05-14', baseline: true }));
    expect(response.body.warnings.join(' ')).toMatch(/dries down/);
    const record = await (await t.as('viewer')).get(`/api/prints/${id}`);
    expect(record.body.riskReasons.map((r: { code: string }) => r.code)).toContain(
      'early-baseline',
    );
    const risky = await (await t.as('viewer')).get('/api/prints?processingRisk=true&pageSize=100');
    expect(risky.body.items.map((p: { id: number }) => p.id)).toContain(id);
    // An archivist's later edit keeps the reason: it comes from the stored baseline date.
    await (await t.as('archivist')).patch(`/api/prints/${id}`).send({ title: 'Renamed' });
    const again = await (await t.as('viewer')).get(`/api/prints/${id}`);
    expect(again.body.riskReasons.map((r: { code: string }) => r.code)).toContain('early-baseline');
  });

  it('refuses readings out of range (422), a viewer or curator (403), no session (401), unknown print (404)', async () => {
    const id = await newPrint({ madeOn: '2023' });
    const conservator = await t.as('conservator');
    const bad = await conservator.post(`/api/prints/${id}/tone-checks`).send(
      buildToneCheck({
        readings: [
          { patch: 'dmax', L: 101, a: 0, b: 0 },
          { patch: 'dmin', L: 90, a: 129, b: -130 },
        ],
      }),
    );
    expectProblem(bad, 422);
    expect(errorPaths(bad)).toEqual(['readings.0.L', 'readings.1.a', 'readings.1.b']);
    expectProblem(
      await (await t.as('viewer')).post(`/api/prints/${id}/tone-checks`).send(buildToneCheck()),
      403,
    );
    expectProblem(
      await (await t.as('curator')).post(`/api/prints/${id}/tone-checks`).send(buildToneCheck()),
      403,
    );
    expectProblem(
      await (await t.as('archivist')).post(`/api/prints/${id}/tone-checks`).send(buildToneCheck()),
      403,
    );
    expectProblem(
      await t.anonymous().post(`/api/prints/${id}/tone-checks`).send(buildToneCheck()),
      401,
    );
    expectProblem(
      await conservator.post('/api/prints/99999/tone-checks').send(buildToneCheck()),
      404,
    );
    const admin = await t.as('admin');
    expect((await admin.post(`/api/prints/${id}/tone-checks`).send(buildToneCheck())).status).toBe(
      201,
    );
  });

  it('a conservator corrects and deletes a check; the audit trail keeps both', async () => {
    const id = await newPrint({ madeOn: '2023' });
    const conservator = await t.as('conservator');
    const created = await conservator.post(`/api/prints/${id}/tone-checks`).send(buildToneCheck());
    const corrected = await conservator
      .patch(`/api/tone-checks/${created.body.id}`)
      .send({ readings: buildReadings({ dmaxL: 29 }) });
    expect(corrected.status).toBe(200);
    expect(corrected.body.readings[0].L).toBe(29);
    expectProblem(await conservator.patch(`/api/tone-checks/${created.body.id}`).send({}), 422);
    expectProblem(await (await t.as('curator')).delete(`/api/tone-checks/${created.body.id}`), 403);
    expect((await conservator.delete(`/api/tone-checks/${created.body.id}`)).status).toBe(204);
    expectProblem(await conservator.delete(`/api/tone-checks/${created.body.id}`), 404);
    const audit = await (
      await t.as('admin')
    ).get(`/api/audit?entity=tone-check&entityId=${created.body.id}`);
    expect(audit.body.events.map((e: { action: string }) => e.action)).toEqual([
      'delete',
      'update',
      'create',
    ]);
    expect(audit.body.events[1].before.readings[0].L).toBe(28.4);
    const list = await (await t.as('viewer')).get(`/api/prints/${id}/tone-checks`);
    expect(list.body.items).toEqual([]);
  });
});

describe('tone trend', () => {
  it('gives per patch the series, slopes and projection (contract shape)', async () => {
    const id = await newPrint({ madeOn: '2019' });
    const conservator = await t.as('conservator');
    const dates = ['2020-01-01', '2021-01-01', '2022-01-01'];
    for (const [i, checkedOn] of dates.entries()) {
      await conservator
        .post(`/api/prints/${id}/tone-checks`)
        .send(buildToneCheck({ checkedOn, readings: buildReadings({ dminB: 4.1 + i * 0.5 }) }));
    }
    const trend = await (await t.as('viewer')).get(`/api/prints/${id}/tone-trend`);
    expect(trend.status).toBe(200);
    expect(trend.body).toMatchObject({
      status: expect.any(String),
      flags: expect.any(Array),
      nextCheckDue: expect.any(String),
    });
    const dmin = trend.body.patches.find((p: { patch: string }) => p.patch === 'dmin');
    expect(dmin.series).toHaveLength(3);
    expect(Object.keys(dmin.series[0]).sort()).toEqual([
      'L',
      'a',
      'b',
      'checkedOn',
      'dE00',
      'density',
    ]);
    // b* rose 0.5 over 366 and 365 days: a slope just under 0.5 a year (365.25 days).
    expect(dmin.slopePerYear.b).toBeCloseTo((0.5 * 365.25) / 365.5, 3);
    expect(dmin.projectedNoticeableOn).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    expectProblem(await t.anonymous().get(`/api/prints/${id}/tone-trend`), 401);
    expectProblem(await (await t.as('viewer')).get('/api/prints/abc/tone-trend'), 422);
    expectProblem(await (await t.as('viewer')).get('/api/prints/99999/tone-trend'), 404);
  });
});
