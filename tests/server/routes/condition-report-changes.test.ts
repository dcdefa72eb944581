import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  printId = (await (await t.as('archivist')).post('/api/prints').send(buildPrint())).body.id;
});
afterAll(() => t.close());

const report = {
  reportedOn: '2026-06-02',
  grade: 'vulnerable',
  observations: [{ term: 'silvering', location: 'image, shadows', severity: 'moderate' }],
  notes: 'Examined under raking light.',
};

describe('condition reports need a grade, and can be corrected or removed', () => {
  it('refuses an empty report (no grade, nothing observed) with 422 on grade', async () => {
    const empty = await (
      await t.as('conservator')
    )
      .post(`/api/prints/${printId}/condition-reports`)
      .send({ reportedOn: '2026-06-02' });
    expectProblem(empty, 422);
    expect(empty.body.errors.map((e: { path: string }) => e.path)).toEqual(['grade']);
    expect(empty.body.errors[0].message).toBe('Choose a grade');
  });

  it('a conservator corrects a report; the audit trail keeps it before and after', async () => {
    const conservator = await t.as('conservator');
    const created = await conservator.post(`/api/prints/${printId}/condition-reports`).send(report);
    const corrected = await conservator
      .patch(`/api/condition-reports/${created.body.id}`)
      .send({ grade: 'settled', environment: { temperatureC: 19, rh: 45 } });
    expect(corrected.status).toBe(200);
    expect(corrected.body).toMatchObject({
      grade: 'settled',
      notes: 'Examined under raking light.',
      environment: { temperatureC: 19, rh: 45 },
    });
    const audit = await (
      await t.as('admin')
    ).get(`/api/audit?entity=condition-report&entityId=${created.body.id}`);
    const update = audit.body.events.find((e: { action: string }) => e.action === 'update');
    expect(update.before.grade).toBe('vulnerable');
    expect(update.after.grade).toBe('settled');
    expectProblem(
      await conservator.patch(`/api/condition-reports/${created.body.id}`).send({ grade: null }),
      422,
    );
    expectProblem(
      await conservator.patch(`/api/condition-reports/${created.body.id}`).send({}),
      422,
    );
    expectProblem(
      await (
        await t.as('curator')
      )
        .patch(`/api/condition-reports/${created.body.id}`)
        .send({ grade: 'settled' }),
      403,
    );
    expectProblem(
      await conservator.patch('/api/condition-reports/99999').send({ grade: 'settled' }),
      404,
    );
  });

  it('a conservator or an admin removes a report; an archivist may not; no session 401', async () => {
    const conservator = await t.as('conservator');
    const created = await conservator.post(`/api/prints/${printId}/condition-reports`).send(report);
    expectProblem(
      await (await t.as('archivist')).delete(`/api/condition-reports/${created.body.id}`),
      403,
    );
    expectProblem(await t.anonymous().delete(`/api/condition-reports/${created.body.id}`), 401);
    expect((await conservator.delete(`/api/condition-reports/${created.body.id}`)).status).toBe(
      204,
    );
    const list = await conservator.get(`/api/prints/${printId}/condition-reports`);
    expect(list.body.items.map((r: { id: number }) => r.id)).not.toContain(created.body.id);
    expectProblem(
      await (await t.as('admin')).delete(`/api/condition-reports/${created.body.id}`),
      404,
    );
    const audit = await (
      await t.as('admin')
    ).get(`/api/audit?entity=condition-report&entityId=${created.body.id}`);
    expect(audit.body.events[0]).toMatchObject({ action: 'delete', after: null });
  });
});
