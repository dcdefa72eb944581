import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PrintSearchIndex } from '../../../server/services/prints/search-index';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { wordsQuery } from '../../support/search';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let paperId: number;
let weirId: number;
let flaxId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  paperId = (await archivist.post('/api/papers').send({ name: 'Hot-pressed cotton rag 300' })).body
    .id;
  const place = await archivist
    .post('/api/locations')
    .send({ code: 'SR-C9', name: 'Plan chest by the east window' });
  const weir = await archivist.post('/api/prints').send(
    buildPrint({
      accessionNumber: '2024.0101',
      title: 'Weir below the footbridge',
      paperId,
      locationId: place.body.id,
      processing: buildSaltSteps({ fixing: 12, washing: 30 }),
    }),
  );
  weirId = weir.body.id;
  const flax = await archivist.post('/api/prints').send(
    buildPrint({
      accessionNumber: '2024.0102',
      title: 'Flax field, late June',
      description: 'Sensitised twice; colour shifted in the fixer.',
      processing: [
        {
          stage: 'sensitizing',
          chemical: 'silver nitrate',
          concentrationPercent: 12,
          method: 'brushed',
        },
        { stage: 'fixing', chemical: 'hypo', concentrationPercent: 20, minutes: 6 },
        { stage: 'washing', minutes: 4 },
      ],
    }),
  );
  flaxId = flax.body.id;
});
afterAll(() => t.close());

const ids = (body: { items: Array<{ id: number }> }) => body.items.map((item) => item.id).sort();

async function search(role: 'viewer' | 'curator', query: string) {
  const response = await (await t.as(role)).get(`/api/prints?${query}`);
  expect(response.status).toBe(200);
  return response.body;
}

describe('words across the processing history', () => {
  it('finds a print by its step text: chemical with concentration, and method', async () => {
    expect(ids(await search('viewer', 'q=thiosulfate%2015%25'))).toEqual([weirId]);
    expect(ids(await search('viewer', 'q=swabbed'))).toEqual([weirId]);
    expect(ids(await search('viewer', 'q=brushed%2012'))).toEqual([flaxId]);
  });

  it('forgives typos and treats the trade spellings alike', async () => {
    expect(ids(await search('viewer', 'q=footbrigde'))).toEqual([weirId]);
    expect(ids(await search('viewer', 'q=thiosulphate'))).toEqual([weirId, flaxId].sort());
    // "hypo" was written on the flax print; "sodium thiosulfate" on the weir.
    expect(ids(await search('viewer', 'q=hypo%206'))).toEqual([flaxId]);
    expect(ids(await search('viewer', 'q=sensitizing%20color'))).toEqual([flaxId]);
  });

  it('matches a print by its place for a curator, never for a viewer', async () => {
    expect(ids(await search('curator', 'q=plan%20chest'))).toEqual([weirId]);
    expect(ids(await search('viewer', 'q=plan%20chest'))).toEqual([]);
    expect(ids(await search('viewer', 'q=SR-C9'))).toEqual([]);
  });

  it('finds words with filters, and counts bands for the range controls', async () => {
    const body = await search('viewer', `q=cotton%20rag&fixingMinutesMin=10`);
    expect(ids(body)).toEqual([weirId]);
    expect(body.facets.paperId).toEqual([{ value: paperId, count: 1 }]);
    const band = body.facets.fixingBands.find((b: { from: number }) => b.from === 10);
    expect(band).toEqual({ from: 10, to: 15, count: 1 });
    expect(body.matchedWords).toEqual(expect.arrayContaining(['cotton', 'rag']));
  });
});

describe('the index follows every change in the same request', () => {
  it('an edit is searchable in the next request', async () => {
    const archivist = await t.as('archivist');
    await archivist.patch(`/api/prints/${flaxId}`).send({ title: 'Linseed heads at noon' });
    expect(ids(await search('viewer', 'q=linseed'))).toEqual([flaxId]);
    expect(ids(await search('viewer', 'q=flax'))).toEqual([]);
  });

  it('a deleted print is gone, and back when restored', async () => {
    const archivist = await t.as('archivist');
    expect((await archivist.delete(`/api/prints/${flaxId}`)).status).toBe(204);
    expect(ids(await search('viewer', 'q=linseed'))).toEqual([]);
    await archivist.post(`/api/prints/${flaxId}/restore`);
    expect(ids(await search('viewer', 'q=linseed'))).toEqual([flaxId]);
  });

  it('renaming a paper or a place changes what finds its prints', async () => {
    const archivist = await t.as('archivist');
    await archivist.patch(`/api/papers/${paperId}`).send({ name: 'Arches-like rag 310' });
    expect(ids(await search('viewer', 'q=310'))).toEqual([weirId]);
    const places = await archivist.get('/api/locations');
    await archivist
      .patch(`/api/locations/${places.body.items[0].id}`)
      .send({ name: 'Map cabinet upstairs' });
    expect(ids(await search('curator', 'q=upstairs'))).toEqual([weirId]);
    expect(ids(await search('curator', 'q=chest'))).toEqual([]);
  });
});

describe('snapshot', () => {
  it('starts from a fresh snapshot, and rebuilds in the background from a stale one', async () => {
    const file = join(t.dir, 'snapshot-test.bin');
    const first = new PrintSearchIndex(t.ctx.sequelize, file);
    await first.ready();
    expect(first.status().source).toBe('build');

    const second = new PrintSearchIndex(t.ctx.sequelize, file);
    await second.ready();
    expect(second.status()).toMatchObject({ source: 'snapshot', documents: 2 });

    const archivist = await t.as('archivist');
    await archivist.post('/api/prints').send(buildPrint({ title: 'Ferry steps at slack water' }));
    const third = new PrintSearchIndex(t.ctx.sequelize, file);
    const engine = await third.ready();
    expect(third.status().source).toBe('snapshot');
    // The stale snapshot answers at once, with the prints the change feed names since it was
    // saved put in first (before, it answered without the new print until the rebuild).
    expect(engine.documentCount).toBe(3);
    const ferry = () => third.query(wordsQuery('ferry'));
    expect((await ferry()).total).toBe(1);
    await third.rebuild();
    expect((await ferry()).total).toBe(1);
  });
});

describe('CSV export', () => {
  it('streams every match with a header row', async () => {
    const curator = await t.as('curator');
    const response = await curator.get('/api/prints.csv?q=rag');
    expect(response.status).toBe(200);
    const lines = response.text.trim().split('\n');
    expect(lines[0]).toMatch(/^accessionNumber,title,/);
    expect(lines.slice(1).map((line) => line.split(',')[0])).toEqual(['2024.0101']);
  });
});

describe('place names', () => {
  it('a place renamed while empty, or made after the index read places, names the prints moved there', async () => {
    const archivist = await t.as('archivist');
    const empty = await archivist
      .post('/api/locations')
      .send({ code: 'SR-D2', name: 'Drawer two' });
    // A print goes to a newer place, so the index reads every place name (this one's too)
    // before the rename.
    const other = await archivist
      .post('/api/locations')
      .send({ code: 'SR-D3', name: 'Cabinet three' });
    await archivist
      .post('/api/prints')
      .send(buildPrint({ title: 'Sluice at dusk', locationId: other.body.id }));
    await archivist.patch(`/api/locations/${empty.body.id}`).send({ name: 'Solander box shelf' });
    const moved = await archivist
      .post('/api/prints')
      .send(buildPrint({ title: 'Mill race', locationId: empty.body.id }));
    expect(ids(await search('curator', 'q=solander'))).toEqual([moved.body.id]);
    expect(ids(await search('curator', 'q=drawer'))).toEqual([]);

    const made = await archivist
      .post('/api/locations')
      .send({ code: 'SR-E5', name: 'Ebony cupboard' });
    const there = await archivist
      .post('/api/prints')
      .send(buildPrint({ title: 'Lock gates', locationId: made.body.id }));
    expect(ids(await search('curator', 'q=ebony'))).toEqual([there.body.id]);
  });
});
