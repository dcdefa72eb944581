import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let boxA: number;
let boxB: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  boxA = (await archivist.post('/api/locations').send({ code: 'MV-A', name: 'Box A' })).body.id;
  boxB = (await archivist.post('/api/locations').send({ code: 'MV-B', name: 'Box B' })).body.id;
});
afterAll(() => t.close());

const today = () => new Date().toISOString().slice(0, 10);

async function newPrint(title: string, locationId: number | null = boxA): Promise<number> {
  const archivist = await t.as('archivist');
  const created = await archivist.post('/api/prints').send(buildPrint({ title, locationId }));
  expect(created.status).toBe(201);
  return created.body.id;
}

describe('movements', () => {
  it('a new print with a place has one first movement; a move changes its place', async () => {
    const id = await newPrint('First place');
    const archivist = await t.as('archivist');
    const first = await archivist.get(`/api/prints/${id}/movements`);
    expect(first.body.items).toEqual([
      expect.objectContaining({
        from: null,
        to: expect.objectContaining({ id: boxA, code: 'MV-A' }),
        movedOn: today(),
        reason: 'storage',
        movedBy: expect.objectContaining({ name: expect.any(String) }),
      }),
    ]);
    const moved = await archivist
      .post(`/api/prints/${id}/movements`)
      .send({ toLocationId: boxB, reason: 'photography', movedOn: today() });
    expect(moved.status).toBe(201);
    expect(moved.body).toMatchObject({
      from: { id: boxA },
      to: { id: boxB },
      reason: 'photography',
    });
    const record = await archivist.get(`/api/prints/${id}`);
    expect(record.body.location.id).toBe(boxB);
    const history = await archivist.get(`/api/prints/${id}/movements`);
    expect(history.body.items.map((m: { reason: string }) => m.reason)).toEqual([
      'photography',
      'storage',
    ]);
  });

  it('editing the place field is a movement; a back-dated move leaves the latest place', async () => {
    const id = await newPrint('Edited place');
    const archivist = await t.as('archivist');
    expect((await archivist.patch(`/api/prints/${id}`).send({ locationId: boxB })).status).toBe(
      200,
    );
    const history = await archivist.get(`/api/prints/${id}/movements`);
    expect(history.body.items[0]).toMatchObject({ from: { id: boxA }, to: { id: boxB } });
    expect(history.body.items).toHaveLength(2);
    // Recorded now but dated back: the history gains it, the place stays the latest.
    const back = await archivist
      .post(`/api/prints/${id}/movements`)
      .send({ toLocationId: boxA, reason: 'study', movedOn: '2020-01-02' });
    expect(back.status).toBe(201);
    expect(back.body).toMatchObject({ from: null, movedOn: '2020-01-02' });
    expect((await archivist.get(`/api/prints/${id}`)).body.location.id).toBe(boxB);
  });

  it('bulk: one movement per print, one audit event each, searchable at once', async () => {
    const ids = [
      await newPrint('Bulk one'),
      await newPrint('Bulk two'),
      await newPrint('Bulk three'),
    ];
    const archivist = await t.as('archivist');
    const moved = await archivist
      .post('/api/movements')
      .send({ printIds: ids, toLocationId: boxB, reason: 'display', movedOn: today() });
    expect(moved.status).toBe(201);
    expect(moved.body).toMatchObject({ moved: 3, to: { id: boxB, code: 'MV-B' } });
    for (const id of ids) {
      const history = await archivist.get(`/api/prints/${id}/movements`);
      expect(history.body.items[0]).toMatchObject({ reason: 'display', to: { id: boxB } });
      const audit = await archivist.get(`/api/audit?entity=print&entityId=${id}`);
      expect(audit.body.events[0].after).toMatchObject({ locationId: boxB });
    }
    // The search index follows the write (place words match for curators and above).
    const found = await (await t.as('curator')).get('/api/prints?q=MV-B%20Bulk');
    expect(found.body.items.map((p: { id: number }) => p.id).sort()).toEqual([...ids].sort());
  });

  it('bulk refuses an unknown print or place (422) and moves none', async () => {
    const id = await newPrint('Stays put');
    const archivist = await t.as('archivist');
    expectProblem(
      await archivist
        .post('/api/movements')
        .send({ printIds: [id, 999_999], toLocationId: boxB, reason: 'study', movedOn: today() }),
      422,
    );
    expectProblem(
      await archivist
        .post('/api/movements')
        .send({ printIds: [id], toLocationId: 999_999, reason: 'study', movedOn: today() }),
      422,
    );
    expectProblem(
      await archivist
        .post('/api/movements')
        .send({ printIds: [id], toLocationId: boxB, reason: 'holiday', movedOn: today() }),
      422,
    );
    expect((await archivist.get(`/api/prints/${id}/movements`)).body.items).toHaveLength(1);
  });

  it('holdings now and on an earlier day', async () => {
    const archivist = await t.as('archivist');
    const shelf = (await archivist.post('/api/locations').send({ code: 'MV-S', name: 'Shelf' }))
      .body.id;
    const id = await newPrint('Holding', null);
    await archivist
      .post(`/api/prints/${id}/movements`)
      .send({ toLocationId: shelf, reason: 'storage', movedOn: '2021-03-01' });
    await archivist
      .post(`/api/prints/${id}/movements`)
      .send({ toLocationId: boxA, reason: 'study', movedOn: '2022-06-15' });
    const on = (day?: string) =>
      archivist.get(`/api/locations/${shelf}/holdings${day ? `?on=${day}` : ''}`);
    expect((await on('2021-02-28')).body.items).toEqual([]);
    expect((await on('2021-03-01')).body.items).toEqual([
      expect.objectContaining({ id, since: '2021-03-01' }),
    ]);
    expect((await on('2022-06-14')).body.items.map((h: { id: number }) => h.id)).toEqual([id]);
    expect((await on('2022-06-15')).body.items).toEqual([]);
    expect((await on()).body).toMatchObject({ on: today(), items: [] });
    expectProblem(await on('June'), 422);
  });

  it('roles: a curator reads, may not move; a viewer sees no movements; nobody is 401', async () => {
    const id = await newPrint('Roles');
    const curator = await t.as('curator');
    expect((await curator.get(`/api/prints/${id}/movements`)).status).toBe(200);
    expectProblem(
      await curator
        .post(`/api/prints/${id}/movements`)
        .send({ toLocationId: boxB, reason: 'study', movedOn: today() }),
      403,
    );
    expectProblem(await (await t.as('viewer')).get(`/api/prints/${id}/movements`), 403);
    expectProblem(await (await t.as('viewer')).get(`/api/locations/${boxA}/holdings`), 403);
    expectProblem(await t.anonymous().get(`/api/prints/${id}/movements`), 401);
    expectProblem(await (await t.as('archivist')).get('/api/prints/999999/movements'), 404);
  });
});
