import jsonld from 'jsonld';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

// Expected IRIs: schema.org's vocabulary (http://schema.org/, the @vocab of its own JSON-LD
// context) and DCMI Metadata Terms (http://purl.org/dc/terms/), as published by each.
const SCHEMA = 'http://schema.org/';
const DCTERMS = 'http://purl.org/dc/terms/';

let t: TestApp;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  const paper = await archivist.post('/api/papers').send({ name: 'Cotton rag 300' });
  printId = (
    await archivist
      .post('/api/prints')
      .send(buildPrint({ accessionNumber: '2026.0042', paperId: paper.body.id, madeOn: 'c. 2019' }))
  ).body.id;
  await archivist
    .post('/api/prints')
    .send(buildPrint({ accessionNumber: '2026.0043', title: 'Weir in flood' }));
});
afterAll(async () => {
  // Uploads make web images in the background; let them finish before the database closes.
  await t.ctx.images.jobs.idle();
  await t.close();
});

type Expanded = Record<string, Array<Record<string, unknown>>>;
const values = (node: Expanded, iri: string) =>
  (node[iri] ?? []).map((item) => item['@value'] ?? item['@id']);

describe('GET /api/prints/:id.jsonld', () => {
  it('expands, with the jsonld processor, to a schema.org VisualArtwork with Dublin Core terms', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get(`/api/prints/${printId}.jsonld`).expect(200);
    expect(response.headers['content-type']).toMatch(/^application\/ld\+json/);
    const [node] = (await jsonld.expand(JSON.parse(response.text))) as Expanded[];
    expect(node!['@type']).toEqual([`${SCHEMA}VisualArtwork`]);
    expect(String(node!['@id'])).toMatch(new RegExp(`/prints/${printId}$`));
    expect(values(node!, `${SCHEMA}name`)).toEqual(['Mill pond at dusk']);
    expect(values(node!, `${DCTERMS}title`)).toEqual(['Mill pond at dusk']);
    expect(values(node!, `${SCHEMA}identifier`)).toEqual(['2026.0042']);
    expect(values(node!, `${DCTERMS}identifier`)).toEqual(['2026.0042']);
    expect(values(node!, `${SCHEMA}artMedium`)).toEqual(['salt print']);
    expect(values(node!, `${SCHEMA}artworkSurface`)).toEqual(['Cotton rag 300']);
    expect(values(node!, `${DCTERMS}created`)).toEqual(['c. 2019']);
    expect(values(node!, `${DCTERMS}type`)).toEqual(['http://purl.org/dc/dcmitype/StillImage']);
    expect(values(node!, `${DCTERMS}subject`).sort()).toEqual(['dusk', 'pond']);
    const width = (node![`${SCHEMA}width`] as Expanded[])[0]!;
    expect(values(width, `${SCHEMA}value`)).toEqual([101.6]);
    // UN/CEFACT Recommendation 20: MMT is the common code for millimetre.
    expect(values(width, `${SCHEMA}unitCode`)).toEqual(['MMT']);
  });

  it('links the recto image and the IIIF manifest once the print has images', async () => {
    const archivist = await t.as('archivist');
    const asset = await archivist
      .post(`/api/prints/${printId}/assets`)
      .field('view', 'recto')
      .attach('file', await buildJpeg(200, 150), 'recto.jpg')
      .expect(201);
    const response = await (await t.as('viewer')).get(`/api/prints/${printId}.jsonld`).expect(200);
    const [node] = (await jsonld.expand(JSON.parse(response.text))) as Expanded[];
    expect(values(node!, `${SCHEMA}image`)[0]).toMatch(
      new RegExp(`/api/assets/${asset.body.id}/web$`),
    );
    expect(values(node!, `${SCHEMA}subjectOf`)[0]).toMatch(
      new RegExp(`/api/prints/${printId}/manifest.json$`),
    );
  });

  it('answers 404 for an unknown print and 401 without a session', async () => {
    expectProblem(await (await t.as('viewer')).get('/api/prints/99999.jsonld'), 404);
    expectProblem(await t.anonymous().get(`/api/prints/${printId}.jsonld`), 401);
    expectProblem(await (await t.as('viewer')).get('/api/prints/abc.jsonld'), 422);
  });
});

describe('GET /api/prints.jsonld', () => {
  it('gives curators the whole catalogue as one collection whose parts expand to artworks', async () => {
    const curator = await t.as('curator');
    const response = await curator.get('/api/prints.jsonld').expect(200);
    const expanded = (await jsonld.expand(JSON.parse(response.text))) as Expanded[];
    const collection = expanded[0]!;
    expect(collection['@type']).toEqual(
      expect.arrayContaining([`${SCHEMA}Collection`, 'http://purl.org/dc/dcmitype/Collection']),
    );
    const parts = collection[`${SCHEMA}hasPart`] as Expanded[];
    expect(parts.map((part) => values(part, `${SCHEMA}identifier`)[0])).toEqual([
      '2026.0042',
      '2026.0043',
    ]);
    expect(
      parts.every((part) => (part['@type'] as unknown as string[])[0] === `${SCHEMA}VisualArtwork`),
    ).toBe(true);
    expect(collection[`${DCTERMS}hasPart`]).toHaveLength(2);
  });

  it('is refused to viewers and to no session', async () => {
    expectProblem(await (await t.as('viewer')).get('/api/prints.jsonld'), 403);
    expectProblem(await t.anonymous().get('/api/prints.jsonld'), 401);
  });
});
