import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Print, ProcessingStep } from '../../../server/models';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let paperId: number;
let locationId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  paperId = (await archivist.post('/api/papers').send({ name: 'Cotton rag 300' })).body.id;
  const room = await archivist.post('/api/locations').send({ code: 'R1', name: 'Store room' });
  const drawer = await archivist
    .post('/api/locations')
    .send({ code: 'R1-D1', name: 'Drawer 1', parentId: room.body.id });
  locationId = drawer.body.id;
});
afterAll(() => t.close());

async function createOne(overrides = {}) {
  const archivist = await t.as('archivist');
  const response = await archivist
    .post('/api/prints')
    .send(buildPrint({ paperId, locationId, ...overrides }));
  expect(response.status).toBe(201);
  return response.body;
}

describe('POST /api/prints', () => {
  it('creates a print with its ordered steps and denormalised fixing and washing minutes', async () => {
    const print = await createOne();
    expect(print.accessionNumber).toMatch(new RegExp(`^${new Date().getFullYear()}\\.\\d{4}$`));
    expect(print.processing.map((step: { stage: string }) => step.stage)).toEqual([
      'salting',
      'sensitizing',
      'exposure',
      'prewash',
      'fixing',
      'washing',
    ]);
    expect(print.processing.map((step: { position: number }) => step.position)).toEqual([
      1, 2, 3, 4, 5, 6,
    ]);
    expect(print).toMatchObject({ fixingMinutes: 12, washingMinutes: 20, processingRisk: false });
    expect(print.paper).toEqual({ id: paperId, name: 'Cotton rag 300' });
    expect(print.location.path).toBe('Store room › Drawer 1');
  });

  it('sums several fixing baths and flags a short fix as a processing risk', async () => {
    const steps = [...buildSaltSteps({ fixing: 3 }), { stage: 'fixing' as const, minutes: 4 }];
    const print = await createOne({ processing: steps });
    expect(print.fixingMinutes).toBe(7);
    expect(print.processingRisk).toBe(true);
    expect(print.riskReasons.map((reason: { code: string }) => reason.code)).toContain(
      'short-fixing',
    );
  });

  it('keeps a given accession number and refuses a duplicate with 409', async () => {
    await createOne({ accessionNumber: '2019.0042' });
    const archivist = await t.as('archivist');
    const again = await archivist
      .post('/api/prints')
      .send(buildPrint({ accessionNumber: '2019.0042' }));
    expectProblem(again, 409);
  });

  it('hands out unique accession numbers under concurrent creates', async () => {
    const archivist = await t.as('archivist');
    const responses = await Promise.all(
      Array.from({ length: 12 }, (_, i) =>
        archivist.post('/api/prints').send(buildPrint({ title: `Parallel ${i}` })),
      ),
    );
    expect(responses.map((response) => response.status)).toEqual(Array(12).fill(201));
    const numbers = responses.map((response) => response.body.accessionNumber);
    expect(new Set(numbers).size).toBe(12);
  });

  it('answers 422 naming each invalid field, including a fixing step without minutes', async () => {
    const archivist = await t.as('archivist');
    const steps = buildSaltSteps();
    const response = await archivist.post('/api/prints').send({
      title: '',
      process: 'daguerreotype',
      processing: [
        { ...steps[0], concentrationPercent: 140 },
        { stage: 'fixing', chemical: 'sodium thiosulfate' },
        { stage: 'washing', minutes: 10, temperatureC: 95 },
      ],
    });
    expectProblem(response, 422);
    expect(errorPaths(response)).toEqual(
      expect.arrayContaining([
        'title',
        'process',
        'processing.0.concentrationPercent',
        'processing.1.minutes',
        'processing.2.temperatureC',
      ]),
    );
  });

  it('refuses a date made in the future with 422 on madeOn, on create and on edit', async () => {
    const archivist = await t.as('archivist');
    for (const madeOn of ['2999-01-01', '2999', '2990s']) {
      const response = await archivist.post('/api/prints').send(buildPrint({ madeOn }));
      expectProblem(response, 422);
      expect(response.body.errors).toEqual([
        { path: 'madeOn', message: 'The date cannot be in the future' },
      ]);
    }
    // A range that starts in the past is not surely in the future: kept.
    const print = await createOne({ madeOn: '2020s' });
    expect(print.madeOn).toBe('2020s');
    const edit = await archivist.patch(`/api/prints/${print.id}`).send({ madeOn: '2999-06' });
    expectProblem(edit, 422);
    expect(errorPaths(edit)).toEqual(['madeOn']);
  });

  it('answers 422 for a link to a paper that does not exist, and writes nothing', async () => {
    const before = [await Print.count({ paranoid: false }), await ProcessingStep.count()];
    const archivist = await t.as('archivist');
    const response = await archivist.post('/api/prints').send(buildPrint({ paperId: 9999 }));
    expectProblem(response, 422);
    expect(errorPaths(response)).toEqual(['paperId']);
    expect([await Print.count({ paranoid: false }), await ProcessingStep.count()]).toEqual(before);
  });

  it('answers 400 for malformed JSON', async () => {
    const archivist = await t.as('archivist');
    const response = await archivist
      .post('/api/prints')
      .set('content-type', 'application/json')
      .send('{"title": "x",');
    expectProblem(response, 400);
  });

  it('is refused to a curator (403), and without a session (401)', async () => {
    const curator = await t.as('curator');
    expectProblem(await curator.post('/api/prints').send(buildPrint()), 403);
    expectProblem(await t.anonymous().post('/api/prints').send(buildPrint()), 401);
  });

  it('is refused with 403 when the CSRF header is missing', async () => {
    const archivist = await t.as('archivist');
    expectProblem(await archivist.agent.post('/api/prints').send(buildPrint()), 403);
  });
});

describe('GET /api/prints/:id', () => {
  it('shows a viewer the record without its storage location', async () => {
    const created = await createOne();
    const viewer = await t.as('viewer');
    const response = await viewer.get(`/api/prints/${created.id}`);
    expect(response.status).toBe(200);
    expect(response.body).not.toHaveProperty('location');
    expect(response.body.tone).toEqual({ status: 'unchecked', flags: [], nextCheckDue: null });
    expect(response.body.assets).toEqual([]);
    expect(response.body.can).toEqual({ edit: false, editCuratorial: false, delete: false });
  });

  it('shows a curator the location', async () => {
    const created = await createOne();
    const curator = await t.as('curator');
    const response = await curator.get(`/api/prints/${created.id}`);
    expect(response.body.location).toMatchObject({ id: locationId, code: 'R1-D1' });
  });

  it('answers 404 for an unknown id, 422 for a non-numeric one, 401 without a session', async () => {
    const viewer = await t.as('viewer');
    expectProblem(await viewer.get('/api/prints/999999'), 404);
    expectProblem(await viewer.get('/api/prints/abc'), 422);
    expectProblem(await t.anonymous().get('/api/prints/1'), 401);
  });
});

describe('PATCH /api/prints/:id', () => {
  it('lets an archivist replace the processing history and recomputes the minutes', async () => {
    const created = await createOne();
    const archivist = await t.as('archivist');
    const response = await archivist
      .patch(`/api/prints/${created.id}`)
      .send({ processing: buildSaltSteps({ washing: 4 }).reverse(), process: 'salt print' });
    expect(response.status).toBe(200);
    expect(response.body.washingMinutes).toBe(4);
    expect(response.body.processing[0].stage).toBe('washing');
    expect(response.body.riskReasons.map((r: { code: string }) => r.code)).toEqual(
      expect.arrayContaining(['short-washing', 'no-prewash']),
    );
  });

  it('refuses a sheet smaller than the image already recorded, on the sheet field', async () => {
    const created = await createOne();
    const archivist = await t.as('archivist');
    await archivist
      .patch(`/api/prints/${created.id}`)
      .send({ imageWidthMm: 127, imageHeightMm: 178 })
      .expect(200);
    const response = await archivist
      .patch(`/api/prints/${created.id}`)
      .send({ sheetHeightMm: 150 });
    expectProblem(response, 422);
    expect(response.body.errors).toEqual([
      {
        path: 'sheetHeightMm',
        message: 'The sheet must be at least as high as the image (178 mm)',
      },
    ]);
  });

  it('lets a curator change title, description and tags only', async () => {
    const created = await createOne();
    const curator = await t.as('curator');
    const ok = await curator
      .patch(`/api/prints/${created.id}`)
      .send({ title: 'Mill pond, second state', tags: ['Pond', 'pond', 'evening'] });
    expect(ok.status).toBe(200);
    expect(ok.body.title).toBe('Mill pond, second state');
    expect(ok.body.tags).toEqual(['pond', 'evening']);
    expect(ok.body.processing).toHaveLength(6);
    expectProblem(
      await curator.patch(`/api/prints/${created.id}`).send({ process: 'cyanotype' }),
      403,
    );
  });

  it('is refused to a viewer, without a session, for bad input and unknown ids', async () => {
    const created = await createOne();
    const viewer = await t.as('viewer');
    expectProblem(await viewer.patch(`/api/prints/${created.id}`).send({ title: 'x' }), 403);
    expectProblem(await t.anonymous().patch(`/api/prints/${created.id}`).send({ title: 'x' }), 401);
    const archivist = await t.as('archivist');
    const invalid = await archivist
      .patch(`/api/prints/${created.id}`)
      .send({ imageWidthMm: -3, colour: 'red' });
    expectProblem(invalid, 422);
    expectProblem(await archivist.patch('/api/prints/999999').send({ title: 'x' }), 404);
  });
});

describe('DELETE /api/prints/:id', () => {
  it('soft-deletes: the record is gone from lists but can be restored', async () => {
    const created = await createOne({ title: 'Soon deleted' });
    const archivist = await t.as('archivist');
    expect((await archivist.delete(`/api/prints/${created.id}`)).status).toBe(204);
    expectProblem(await archivist.get(`/api/prints/${created.id}`), 404);
    const deleted = await archivist.get('/api/prints?deleted=true');
    expect(deleted.body.items.map((item: { id: number }) => item.id)).toContain(created.id);
    const restored = await archivist.post(`/api/prints/${created.id}/restore`);
    expect(restored.status).toBe(200);
    expect(restored.body.deletedAt).toBeNull();
  });

  it('is refused to a curator, without a session, and 404 for unknown ids', async () => {
    const created = await createOne();
    expectProblem(await (await t.as('curator')).delete(`/api/prints/${created.id}`), 403);
    expectProblem(await t.anonymous().delete(`/api/prints/${created.id}`), 401);
    expectProblem(await (await t.as('archivist')).delete('/api/prints/999999'), 404);
    expectProblem(await (await t.as('curator')).get('/api/prints?deleted=true'), 403);
  });
});
