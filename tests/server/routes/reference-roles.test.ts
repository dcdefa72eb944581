import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

/** Each reference list with a valid body, a valid change and an invalid one. */
const RESOURCES = [
  {
    path: '/api/papers',
    reader: 'viewer',
    body: { name: 'Rag' },
    second: { name: 'Rag 2' },
    change: { weightGsm: 300 },
    bad: { weightGsm: 'heavy' },
  },
  {
    path: '/api/negatives',
    reader: 'viewer',
    body: { code: 'N1', kind: 'film' },
    second: { code: 'N2', kind: 'film' },
    change: { format: '4 × 5 in' },
    bad: { kind: 'tintype' },
  },
  {
    path: '/api/locations',
    reader: 'curator',
    body: { code: 'L1', name: 'Room' },
    second: { code: 'L2', name: 'Hall' },
    change: { name: 'Store room' },
    bad: { code: '' },
  },
  {
    path: '/api/solution-batches',
    reader: 'viewer',
    body: { code: 'B1', kind: 'fixer', chemical: 'sodium thiosulfate' },
    second: { code: 'B2', kind: 'toner', chemical: 'gold chloride' },
    change: { volumeMl: 2000 },
    bad: { concentrationPercent: 120 },
  },
] as const;

describe.each(RESOURCES)('$path', ({ path, reader, body, second, change, bad }) => {
  it('GET: a reader may list, no session is 401', async () => {
    const response = await (await t.as(reader)).get(path);
    expect(response.status).toBe(200);
    expect(response.body.items).toEqual(expect.any(Array));
    expectProblem(await t.anonymous().get(path), 401);
  });

  it('POST: an archivist and an admin may; a conservator may not; bad input is 422', async () => {
    const archivist = await t.as('archivist');
    expect((await archivist.post(path).send(body)).status).toBe(201);
    const admin = await t.as('admin');
    expect((await admin.post(path).send(second)).status).toBe(201);
    expectProblem(await (await t.as('conservator')).post(path).send(body), 403);
    expectProblem(await t.anonymous().post(path).send(body), 401);
    expectProblem(await archivist.post(path).send({ ...body, ...bad }), 422);
  });

  it('PATCH and DELETE: an archivist may; a curator may not; unknown id 404; bad input 422', async () => {
    const archivist = await t.as('archivist');
    const [first] = (await archivist.get(path)).body.items;
    const patched = await archivist.patch(`${path}/${first.id}`).send(change);
    expect(patched.status).toBe(200);
    expect(patched.body).toMatchObject(change);
    expectProblem(await archivist.patch(`${path}/${first.id}`).send(bad), 422);
    expectProblem(await archivist.patch(`${path}/${first.id}`).send({ unknownField: 1 }), 422);
    const curator = await t.as('curator');
    expectProblem(await curator.patch(`${path}/${first.id}`).send(change), 403);
    expectProblem(await curator.delete(`${path}/${first.id}`), 403);
    expectProblem(await t.anonymous().delete(`${path}/${first.id}`), 401);
    expectProblem(await archivist.patch(`${path}/99999`).send(change), 404);
    expect((await archivist.delete(`${path}/${first.id}`)).status).toBe(204);
    expectProblem(await archivist.delete(`${path}/${first.id}`), 404);
  });
});

describe('POST /api/prints/:id/restore', () => {
  it('is refused to a curator (403), without a session (401), 404 for unknown ids', async () => {
    const archivist = await t.as('archivist');
    const created = await archivist.post('/api/prints').send({ title: 'R', process: 'salt print' });
    await archivist.delete(`/api/prints/${created.body.id}`);
    expectProblem(
      await (await t.as('curator')).post(`/api/prints/${created.body.id}/restore`),
      403,
    );
    expectProblem(await t.anonymous().post(`/api/prints/${created.body.id}/restore`), 401);
    expectProblem(await archivist.post('/api/prints/99999/restore'), 404);
    expect((await archivist.post(`/api/prints/${created.body.id}/restore`)).status).toBe(200);
  });
});
