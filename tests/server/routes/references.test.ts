import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('papers', () => {
  it('a viewer lists; an archivist creates, renames and deletes', async () => {
    const archivist = await t.as('archivist');
    const created = await archivist
      .post('/api/papers')
      .send({ name: 'Cold-pressed rag', weightGsm: 250 });
    expect(created.status).toBe(201);
    expect(created.body).toMatchObject({
      id: expect.any(Number),
      name: 'Cold-pressed rag',
      weightGsm: 250,
    });
    const renamed = await archivist
      .patch(`/api/papers/${created.body.id}`)
      .send({ name: 'Cold-pressed rag 250' });
    expect(renamed.body.name).toBe('Cold-pressed rag 250');
    const listed = await (await t.as('viewer')).get('/api/papers');
    expect(listed.body.items.map((p: { name: string }) => p.name)).toContain(
      'Cold-pressed rag 250',
    );
    expect((await archivist.delete(`/api/papers/${created.body.id}`)).status).toBe(204);
  });

  it('refuses changes to a curator (403), without a session (401), bad input (422), unknown id (404)', async () => {
    expectProblem(await (await t.as('curator')).post('/api/papers').send({ name: 'X' }), 403);
    expectProblem(await t.anonymous().get('/api/papers'), 401);
    const archivist = await t.as('archivist');
    expectProblem(await archivist.post('/api/papers').send({ name: '', weightGsm: -1 }), 422);
    expectProblem(await archivist.patch('/api/papers/9999').send({ name: 'Y' }), 404);
    expectProblem(await archivist.delete('/api/papers/9999'), 404);
  });

  it('refuses a duplicate name (409) and deleting a paper still in use (409)', async () => {
    const archivist = await t.as('archivist');
    const paper = await archivist.post('/api/papers').send({ name: 'In use' });
    expectProblem(await archivist.post('/api/papers').send({ name: 'In use' }), 409);
    await archivist.post('/api/prints').send(buildPrint({ paperId: paper.body.id }));
    expectProblem(await archivist.delete(`/api/papers/${paper.body.id}`), 409);
  });
});

describe('negatives', () => {
  it('an archivist creates one; a viewer lists; a conservator may not create', async () => {
    const archivist = await t.as('archivist');
    const created = await archivist
      .post('/api/negatives')
      .send({ code: 'GP-9', kind: 'glass plate', densityRange: 1.8 });
    expect(created.status).toBe(201);
    const listed = await (await t.as('viewer')).get('/api/negatives');
    expect(listed.body.items).toEqual([
      expect.objectContaining({ code: 'GP-9', kind: 'glass plate' }),
    ]);
    expectProblem(
      await (
        await t.as('conservator')
      )
        .post('/api/negatives')
        .send({ code: 'GP-10', kind: 'film' }),
      403,
    );
    expectProblem(
      await archivist.post('/api/negatives').send({ code: 'GP-11', kind: 'tintype' }),
      422,
    );
  });
});

describe('locations', () => {
  it('are nested, with full paths, and shown to curators but never to viewers', async () => {
    const archivist = await t.as('archivist');
    const room = await archivist.post('/api/locations').send({ code: 'SR', name: 'Store room' });
    const cabinet = await archivist
      .post('/api/locations')
      .send({ code: 'SR-C1', name: 'Cabinet 1', parentId: room.body.id });
    const listed = await (await t.as('curator')).get('/api/locations');
    expect(listed.body.items).toEqual(
      expect.arrayContaining([
        expect.objectContaining({
          id: cabinet.body.id,
          code: 'SR-C1',
          parentId: room.body.id,
          path: 'Store room › Cabinet 1',
        }),
      ]),
    );
    expectProblem(await (await t.as('viewer')).get('/api/locations'), 403);
  });

  it('refuses a place inside itself or under a missing parent (422), and deleting a parent (409)', async () => {
    const archivist = await t.as('archivist');
    const top = await archivist.post('/api/locations').send({ code: 'A', name: 'A' });
    const child = await archivist
      .post('/api/locations')
      .send({ code: 'A-1', name: 'A1', parentId: top.body.id });
    expectProblem(
      await archivist.patch(`/api/locations/${top.body.id}`).send({ parentId: child.body.id }),
      422,
    );
    expectProblem(
      await archivist.post('/api/locations').send({ code: 'B', name: 'B', parentId: 9999 }),
      422,
    );
    expectProblem(await archivist.delete(`/api/locations/${top.body.id}`), 409);
  });
});

describe('solution batches', () => {
  it('an archivist records a batch that a step can name; a curator may not', async () => {
    const archivist = await t.as('archivist');
    const batch = await archivist.post('/api/solution-batches').send({
      code: 'FIX-1',
      kind: 'fixer',
      chemical: 'sodium thiosulfate',
      concentrationPercent: 15,
    });
    expect(batch.status).toBe(201);
    const print = await archivist.post('/api/prints').send(
      buildPrint({
        processing: [
          { stage: 'fixing', minutes: 12, solutionBatchId: batch.body.id },
          { stage: 'washing', minutes: 20 },
        ],
      }),
    );
    expect(print.body.processing[0].solutionBatch).toEqual({ id: batch.body.id, code: 'FIX-1' });
    expectProblem(
      await (
        await t.as('curator')
      )
        .post('/api/solution-batches')
        .send({ code: 'X', kind: 'fixer', chemical: 'x' }),
      403,
    );
    expect((await (await t.as('viewer')).get('/api/solution-batches')).status).toBe(200);
  });
});
