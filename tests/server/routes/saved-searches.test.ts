import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES } from '../../../shared/domain/roles';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';
import { rows } from '../role-matrix/rows/search';

let t: TestApp;
const printIds: number[] = [];
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  for (const [n, title] of ['Ferry steps', 'Bramble hedge', 'Goods yard in fog'].entries()) {
    const created = await archivist
      .post('/api/prints')
      .send(buildPrint({ accessionNumber: `2025.000${n + 1}`, title }));
    printIds.push(created.body.id);
  }
});
afterAll(() => t.close());

describe('role matrix rows of this area', () => {
  const sample: Record<string, string> = { ':id.csv': '999999.csv', ':id': '999999' };
  const pathOf = (path: string) => path.replace(/:id\.csv|:id/g, (match) => sample[match] ?? match);
  for (const row of rows) {
    const allowed = row.allowed === 'anyone' ? ROLES : row.allowed;
    it(`${row.method.toUpperCase()} ${row.path}: refused without a session and for other roles`, async () => {
      expect((await t.anonymous()[row.method](pathOf(row.path))).status).toBe(401);
      for (const role of ROLES.filter((role) => !allowed.includes(role))) {
        const response = await (await t.as(role))[row.method as 'get'](pathOf(row.path)).send({});
        expect(response.status, role).toBe(403);
      }
      for (const role of allowed) {
        const response = await (await t.as(role))[row.method as 'get'](pathOf(row.path)).send({});
        expect([200, 202, 404, 422], role).toContain(response.status);
      }
    });
  }
});

describe('saved searches', () => {
  it('saves, lists and deletes a curator’s own search', async () => {
    const curator = await t.as('curator');
    const saved = await curator
      .post('/api/saved-searches')
      .send({ name: 'Rag, fixed 10+', query: '?q=rag&fixingMinutesMin=10' });
    expect(saved.status).toBe(201);
    expect(saved.body).toEqual({
      id: expect.any(Number),
      name: 'Rag, fixed 10+',
      query: 'q=rag&fixingMinutesMin=10',
    });
    const list = await curator.get('/api/saved-searches');
    expect(list.body.items).toEqual([saved.body]);
    expect((await curator.delete(`/api/saved-searches/${saved.body.id}`)).status).toBe(204);
    expect((await curator.get('/api/saved-searches')).body.items).toEqual([]);
  });

  it('one user cannot see or delete another’s saved search', async () => {
    const curator = await t.as('curator');
    const saved = await curator.post('/api/saved-searches').send({ name: 'Mine', query: 'q=fog' });
    const conservator = await t.as('conservator');
    expect((await conservator.get('/api/saved-searches')).body.items).toEqual([]);
    const refused = await conservator.delete(`/api/saved-searches/${saved.body.id}`);
    expectProblem(refused, 404);
    expect((await curator.get('/api/saved-searches')).body.items).toHaveLength(1);
  });

  it('refuses a nameless search and a query the catalogue does not understand', async () => {
    const curator = await t.as('curator');
    const response = await curator
      .post('/api/saved-searches')
      .send({ name: ' ', query: 'pageSize=5000' });
    expectProblem(response, 422);
    expect(response.body.errors.map((e: { path: string }) => e.path).sort()).toEqual([
      'name',
      'query',
    ]);
  });
});

describe('checklists', () => {
  it('keeps the order given, reorders on PATCH, and exports CSV in that order', async () => {
    const curator = await t.as('curator');
    const created = await curator
      .post('/api/checklists')
      .send({ name: 'Autumn loan', printIds: [printIds[2], printIds[0]] });
    expect(created.status).toBe(201);
    expect(created.body.items.map((item: { title: string }) => item.title)).toEqual([
      'Goods yard in fog',
      'Ferry steps',
    ]);
    const id = created.body.id;
    const reordered = await curator
      .patch(`/api/checklists/${id}`)
      .send({ printIds: [printIds[0], printIds[1], printIds[2]] });
    expect(
      reordered.body.items.map((item: { accessionNumber: string }) => item.accessionNumber),
    ).toEqual(['2025.0001', '2025.0002', '2025.0003']);
    const csv = await curator.get(`/api/checklists/${id}.csv`);
    expect(csv.status).toBe(200);
    expect(csv.headers['content-type']).toMatch(/text\/csv/);
    expect(
      csv.text
        .trim()
        .split('\n')
        .slice(1)
        .map((line) => line.split(',')[0]),
    ).toEqual(['2025.0001', '2025.0002', '2025.0003']);
    const list = await (await t.as('admin')).get('/api/checklists');
    expect(list.body.items).toEqual([expect.objectContaining({ id, name: 'Autumn loan' })]);
    expect((await curator.delete(`/api/checklists/${id}`)).status).toBe(204);
    expectProblem(await curator.get(`/api/checklists/${id}`), 404);
  });

  it('refuses unknown prints, repeats and a bad id', async () => {
    const curator = await t.as('curator');
    const unknown = await curator.post('/api/checklists').send({ name: 'X', printIds: [999999] });
    expectProblem(unknown, 422);
    expect(unknown.body.errors[0].message).toMatch(/999999/);
    expectProblem(
      await curator
        .post('/api/checklists')
        .send({ name: 'X', printIds: [printIds[0], printIds[0]] }),
      422,
    );
    expectProblem(await curator.get('/api/checklists/abc'), 422);
  });
});

describe('search index', () => {
  it('rebuilds in the background for an admin, with progress', async () => {
    const admin = await t.as('admin');
    const started = await admin.post('/api/search-index/rebuild');
    expect(started.status).toBe(202);
    await t.ctx.searchIndex.rebuild();
    const status = await admin.get('/api/search-index');
    expect(status.body).toMatchObject({ state: 'ready', documents: 3, done: 3, total: 3 });
  });
});
