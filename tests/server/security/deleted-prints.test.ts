import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

/** Deleted prints are for archivists and admins, wherever a print or its files appear. */
let t: TestApp;
let live: { id: number; accessionNumber: string };
let gone: { id: number; accessionNumber: string };
let goneAssetId: number;
let checklistId: number;

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  live = (await archivist.post('/api/prints').send(buildPrint({ title: 'Weir in spate' }))).body;
  gone = (
    await archivist
      .post('/api/prints')
      .send(buildPrint({ title: 'Quincewort meadow', description: 'Withdrawn glasshouse view' }))
  ).body;
  const upload = await archivist
    .post(`/api/prints/${gone.id}/assets`)
    .field('view', 'recto')
    .attach('file', await buildJpeg(700, 500), 'scan.jpg');
  goneAssetId = upload.body.id;
  await t.ctx.images.jobs.idle();
  const curator = await t.as('curator');
  checklistId = (
    await curator.post('/api/checklists').send({ name: 'Loan', printIds: [live.id, gone.id] })
  ).body.id;
  expect((await archivist.delete(`/api/prints/${gone.id}`)).status).toBe(204);
});
afterAll(() => t.close());

const csvLines = (text: string) => text.trim().split('\n').slice(1);

describe('deleted prints outside the archivist and admin roles', () => {
  it('the CSV export refuses deleted=true to a curator and gives it to an archivist', async () => {
    expectProblem(await (await t.as('curator')).get('/api/prints.csv?deleted=true'), 403);
    const archivist = await (await t.as('archivist')).get('/api/prints.csv?deleted=true');
    expect(archivist.status).toBe(200);
    expect(csvLines(archivist.text).join('\n')).toContain(gone.accessionNumber);
  });

  it('a checklist and its CSV leave the deleted print out for a curator, not for an archivist', async () => {
    const curator = await t.as('curator');
    const list = await curator.get(`/api/checklists/${checklistId}`);
    expect(list.body.items.map((item: { id: number }) => item.id)).toEqual([live.id]);
    const csv = await curator.get(`/api/checklists/${checklistId}.csv`);
    expect(csv.text).not.toContain(gone.accessionNumber);
    expect(csvLines(csv.text)).toHaveLength(1);
    const archivist = await (await t.as('archivist')).get(`/api/checklists/${checklistId}`);
    expect(archivist.body.items.map((item: { id: number }) => item.id)).toEqual([live.id, gone.id]);
  });

  it('images and IIIF tiles of a deleted print are 404 for a viewer and a curator', async () => {
    for (const role of ['viewer', 'curator'] as const) {
      const agent = await t.as(role);
      expectProblem(await agent.get(`/api/assets/${goneAssetId}/thumbnail`), 404);
      expectProblem(await agent.get(`/api/assets/${goneAssetId}/web`), 404);
      expectProblem(await agent.get(`/api/iiif/${goneAssetId}/info.json`), 404);
      expectProblem(
        await agent.get(`/api/iiif/${goneAssetId}/0,0,512,512/512,/0/default.jpg`),
        404,
      );
    }
    expectProblem(await (await t.as('curator')).get(`/api/assets/${goneAssetId}/original`), 404);
    const conservator = await t.as('conservator');
    expectProblem(
      await conservator
        .post(`/api/assets/${goneAssetId}/samples`)
        .send({ x: 0, y: 0, width: 10, height: 10 }),
      404,
    );
    const archivist = await t.as('archivist');
    expect((await archivist.get(`/api/assets/${goneAssetId}/thumbnail`)).status).toBe(200);
    expect((await archivist.get(`/api/iiif/${goneAssetId}/info.json`)).status).toBe(200);
  });

  it('a deleted print’s words are not among the matched words of a viewer’s search', async () => {
    const viewer = await t.as('viewer');
    for (const q of ['quincewort', 'quincewor', 'quincewart', 'glasshouse']) {
      const response = await viewer.get(`/api/prints?q=${q}`);
      expect(response.body.total).toBe(0);
      expect(response.body.matchedWords).toEqual([]);
    }
    const archivist = await t.as('archivist');
    const deleted = await archivist.get('/api/prints?q=quincewor&deleted=true');
    expect(deleted.body.total).toBe(1);
    expect(deleted.body.matchedWords).toEqual(['quincewort']);
  });
});
