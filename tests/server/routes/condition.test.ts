import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../../../server/models';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  printId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
});
afterAll(async () => {
  // Uploads make web images in the background; let them finish before the database closes.
  await t.ctx.images.jobs.idle();
  await t.close();
});

const report = {
  reportedOn: '2026-06-02',
  grade: 'vulnerable',
  observations: [
    { term: 'silvering', location: 'image, shadows', severity: 'moderate' },
    { term: 'foxing', location: 'lower edge', severity: 'slight' },
  ],
  notes: 'Examined under raking light.',
  recommendation: 'Rehouse in a four-flap folder.',
  environment: { temperatureC: 18.5, rh: 47 },
};

describe('condition reports', () => {
  it('a conservator records one; the curator reads it back, newest first', async () => {
    const conservator = await t.as('conservator');
    const created = await conservator.post(`/api/prints/${printId}/condition-reports`).send(report);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      printId,
      reportedOn: '2026-06-02',
      grade: 'vulnerable',
      observations: report.observations,
      environment: { temperatureC: 18.5, rh: 47 },
      reportedBy: { name: 'Test conservator' },
      images: [],
    });
    await conservator
      .post(`/api/prints/${printId}/condition-reports`)
      .send({ reportedOn: '2026-08-01', grade: 'settled', observations: [] })
      .expect(201);
    const curator = await t.as('curator');
    const list = await curator.get(`/api/prints/${printId}/condition-reports`).expect(200);
    expect(list.body.items.map((item: { reportedOn: string }) => item.reportedOn)).toEqual([
      '2026-08-01',
      '2026-06-02',
    ]);
    const audit = await AuditEvent.findOne({
      where: { entity: 'condition-report', entityId: created.body.id },
    });
    expect(audit?.action).toBe('create');
  });

  it('attaches the print’s own photographs with marked areas, and refuses another print’s', async () => {
    const archivist = await t.as('archivist');
    // A different photograph each time: the same file twice on one print is refused.
    let shade = 100;
    const upload = async (id: number) =>
      (
        await archivist
          .post(`/api/prints/${id}/assets`)
          .field('view', 'detail')
          .attach('file', await buildJpeg(320, 240, [(shade += 20), 110, 80]), 'detail.jpg')
          .expect(201)
      ).body.id as number;
    const [first, second] = [await upload(printId), await upload(printId)];
    const otherPrint = (await archivist.post('/api/prints').send(buildPrint({ title: 'Other' })))
      .body.id;
    const foreign = await upload(otherPrint);
    const conservator = await t.as('conservator');
    const created = await conservator.post(`/api/prints/${printId}/condition-reports`).send({
      ...report,
      assetIds: [second],
      images: [
        {
          assetId: first,
          area: { x: 0.1, y: 0.2, width: 0.3, height: 0.25 },
          caption: 'Silvering',
        },
      ],
    });
    expect(created.status).toBe(201);
    expect(created.body.images).toEqual([
      expect.objectContaining({
        assetId: first,
        area: { x: 0.1, y: 0.2, width: 0.3, height: 0.25 },
        caption: 'Silvering',
        urls: { web: `/api/assets/${first}/web`, thumbnail: `/api/assets/${first}/thumbnail` },
      }),
      expect.objectContaining({ assetId: second, area: null }),
    ]);
    const refused = await conservator
      .post(`/api/prints/${printId}/condition-reports`)
      .send({ ...report, assetIds: [first, foreign] });
    expectProblem(refused, 422);
    expect(errorPaths(refused)).toEqual(['assetIds.1']);
    const outside = await conservator.post(`/api/prints/${printId}/condition-reports`).send({
      ...report,
      images: [{ assetId: first, area: { x: 0.9, y: 0, width: 0.5, height: 0.5 } }],
    });
    expectProblem(outside, 422);
    const treatment = await conservator.post(`/api/prints/${printId}/treatments`).send({
      treatedOn: '2026-04-01',
      action: 'Tear repaired',
      beforeAssetIds: [first],
      afterAssetIds: [second],
    });
    expect(treatment.status).toBe(201);
    expect(
      treatment.body.images.map((image: { assetId: number; stage: string }) => [
        image.assetId,
        image.stage,
      ]),
    ).toEqual([
      [first, 'before'],
      [second, 'after'],
    ]);
  });

  it('an admin may write one too', async () => {
    const admin = await t.as('admin');
    await admin.post(`/api/prints/${printId}/condition-reports`).send(report).expect(201);
  });

  it('refuses writers without the role, readers below curator, and no session', async () => {
    for (const role of ['curator', 'archivist', 'viewer'] as const) {
      const agent = await t.as(role);
      expectProblem(await agent.post(`/api/prints/${printId}/condition-reports`).send(report), 403);
    }
    const viewer = await t.as('viewer');
    expectProblem(await viewer.get(`/api/prints/${printId}/condition-reports`), 403);
    expectProblem(await t.anonymous().get(`/api/prints/${printId}/condition-reports`), 401);
    expectProblem(
      await t.anonymous().post(`/api/prints/${printId}/condition-reports`).send(report),
      401,
    );
  });

  it('names every bad field: unknown term, missing place, future date, impossible RH', async () => {
    const conservator = await t.as('conservator');
    const response = await conservator.post(`/api/prints/${printId}/condition-reports`).send({
      reportedOn: '2999-01-01',
      grade: 'excellent',
      observations: [{ term: 'sparkle', location: '', severity: 'huge' }],
      environment: { temperatureC: 20, rh: 120 },
    });
    expectProblem(response, 422);
    expect(errorPaths(response)).toEqual(
      expect.arrayContaining([
        'reportedOn',
        'grade',
        'observations.0.term',
        'observations.0.location',
        'observations.0.severity',
        'environment.rh',
      ]),
    );
  });

  it('refuses a report dated before the print was made, on create and on correction', async () => {
    const archivist = await t.as('archivist');
    const made = (await archivist.post('/api/prints').send(buildPrint({ madeOn: '2026-05-14' })))
      .body.id as number;
    const conservator = await t.as('conservator');
    const early = await conservator
      .post(`/api/prints/${made}/condition-reports`)
      .send({ ...report, reportedOn: '2026-05-13' });
    expectProblem(early, 422);
    expect(early.body.errors).toEqual([
      {
        path: 'reportedOn',
        message: 'The report cannot be dated before the print was made (2026-05-14)',
      },
    ]);
    // On the making day itself it is allowed, as for tone checks.
    const sameDay = await conservator
      .post(`/api/prints/${made}/condition-reports`)
      .send({ ...report, reportedOn: '2026-05-14' });
    expect(sameDay.status).toBe(201);
    const corrected = await conservator
      .patch(`/api/condition-reports/${sameDay.body.id}`)
      .send({ reportedOn: '2026-01-01' });
    expectProblem(corrected, 422);
    expect(errorPaths(corrected)).toEqual(['reportedOn']);
  });

  it('answers 404 for an unknown print', async () => {
    const conservator = await t.as('conservator');
    expectProblem(await conservator.post('/api/prints/99999/condition-reports').send(report), 404);
    expectProblem(await conservator.get('/api/prints/99999/condition-reports'), 404);
  });
});

const treatment = {
  treatedOn: '2026-04-10',
  action: 'Surface cleaned with a soft brush; rehoused',
  materials: 'Soft goat-hair brush; four-flap folder, buffered board',
  notes: 'Loose dirt removed from the margins only.',
};

describe('treatments', () => {
  it('a conservator records one; the curator lists them', async () => {
    const conservator = await t.as('conservator');
    const created = await conservator.post(`/api/prints/${printId}/treatments`).send(treatment);
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({ ...treatment, treatedBy: { name: 'Test conservator' } });
    const curator = await t.as('curator');
    const list = await curator.get(`/api/prints/${printId}/treatments`).expect(200);
    expect(list.body.items[0]).toMatchObject(treatment);
  });

  it('refuses other roles, no session and bad input', async () => {
    const archivist = await t.as('archivist');
    expectProblem(await archivist.post(`/api/prints/${printId}/treatments`).send(treatment), 403);
    expectProblem(await (await t.as('viewer')).get(`/api/prints/${printId}/treatments`), 403);
    expectProblem(
      await t.anonymous().post(`/api/prints/${printId}/treatments`).send(treatment),
      401,
    );
    const admin = await t.as('admin');
    const bad = await admin
      .post(`/api/prints/${printId}/treatments`)
      .send({ treatedOn: 'soon', action: ' ' });
    expectProblem(bad, 422);
    expect(errorPaths(bad)).toEqual(expect.arrayContaining(['treatedOn', 'action']));
    expectProblem(await admin.post('/api/prints/99999/treatments').send(treatment), 404);
  });
});
