import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';
import { buildToneCheck } from '../../support/tone-factories';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const readings = (dmaxL: number, dminB: number) => [
  { patch: 'dmax', L: dmaxL, a: 6, b: 10 },
  { patch: 'dmin', L: 93, a: 0.4, b: dminB },
];

describe('status changes and alerts', () => {
  it('a reading 0.03 from the last neither changes the status nor opens another alert', async () => {
    const print = await (
      await t.as('archivist')
    )
      .post('/api/prints')
      .send(buildPrint({ madeOn: '2023' }));
    const conservator = await t.as('conservator');
    const log = (checkedOn: string, L: number, b: number, baseline = false) =>
      conservator
        .post(`/api/prints/${print.body.id}/tone-checks`)
        .send(buildToneCheck({ checkedOn, baseline, readings: readings(L, b) }));
    await log('2024-03-02', 28, 4.1, true);
    expect((await log('2026-03-02', 30, 6.43)).body.tone.status).toBe('yellowing');
    expect((await log('2026-04-02', 30, 6.4)).body.tone.status).toBe('yellowing');
    const trend = await conservator.get(`/api/prints/${print.body.id}/tone-trend`);
    expect(trend.body.status).toBe('yellowing');
    const alerts = (await conservator.get('/api/alerts')).body.items.filter(
      (a: { print: { id: number } }) => a.print.id === print.body.id,
    );
    expect(alerts.map((a: { kind: string }) => a.kind)).toEqual(['yellowing']);
  });

  it('the repeatability is a setting with its source; an admin may change it', async () => {
    const settings = await (await t.as('conservator')).get('/api/settings');
    expect(settings.body.tone).toMatchObject({ repeatabilityLab: 0.3, repeatabilityDensity: 0.01 });
    expect(settings.body.sources['tone.repeatabilityLab'].source).toMatch(/from memory/);
    const admin = await t.as('admin');
    expect(
      (await admin.patch('/api/settings').send({ tone: { repeatabilityLab: 0.5 } })).status,
    ).toBe(200);
    expect(
      (await admin.patch('/api/settings').send({ tone: { repeatabilityLab: -1 } })).status,
    ).toBe(422);
    await t.ctx.toneReevaluation.idle();
  });
});
