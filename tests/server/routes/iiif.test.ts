import { normalize } from '@iiif/parser';
import type { Manifest } from '@iiif/presentation-3';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { binaryBody, buildJpeg } from '../../support/images';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let printId: number;
let rectoId: number;
let versoId: number;
const WIDTH = 5000;
const HEIGHT = 4000;

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  printId = (await archivist.post('/api/prints').send(buildPrint({ title: 'Ferry steps' }))).body
    .id;
  const upload = async (view: string, file: Buffer) =>
    (
      await archivist
        .post(`/api/prints/${printId}/assets`)
        .field('view', view)
        .attach('file', file, `${view}.jpg`)
    ).body.id as number;
  versoId = await upload('verso', await buildJpeg(1200, 900, [220, 210, 190]));
  rectoId = await upload('recto', await buildJpeg(WIDTH, HEIGHT));
  await t.ctx.images.jobs.idle();
});
afterAll(() => t.close());

describe('IIIF Image API 3.0 service', () => {
  it('describes a level-0 tile pyramid; curators get every scale factor', async () => {
    const curator = await t.as('curator');
    const info = await curator.get(`/api/iiif/${rectoId}/info.json`);
    expect(info.status).toBe(200);
    expect(info.headers['content-type']).toMatch(/^application\/ld\+json/);
    const body = JSON.parse(info.text);
    expect(body).toMatchObject({
      '@context': 'http://iiif.io/api/image/3/context.json',
      type: 'ImageService3',
      profile: 'level0',
      width: WIDTH,
      height: HEIGHT,
    });
    expect(body.id).toMatch(new RegExp(`^http://127\\.0\\.0\\.1:\\d+/api/iiif/${rectoId}$`));
    expect(body.maxWidth).toBeUndefined();
    expect(body.tiles[0]).toMatchObject({ width: 512, scaleFactors: [1, 2, 4, 8, 16] });
    const tile = await curator
      .get(`/api/iiif/${rectoId}/0,0,512,512/512,512/0/default.jpg`)
      .buffer(true)
      .parse(binaryBody);
    expect(tile.status).toBe(200);
    expect((await sharp(tile.body as Buffer).metadata()).width).toBe(512);
  });

  it('caps viewers at web size: maxWidth in info.json and 403 for finer tiles', async () => {
    const viewer = await t.as('viewer');
    const body = JSON.parse((await viewer.get(`/api/iiif/${rectoId}/info.json`)).text);
    expect(body).toMatchObject({ maxWidth: 2048, maxHeight: 1638 });
    expect(body.tiles[0].scaleFactors).toEqual([4, 8, 16]);
    expectProblem(await viewer.get(`/api/iiif/${rectoId}/0,0,512,512/512,512/0/default.jpg`), 403);
    // One tile at scale factor 4 covers 2048 source pixels.
    const coarse = await viewer.get(`/api/iiif/${rectoId}/0,0,2048,2048/512,512/0/default.jpg`);
    expect(coarse.status).toBe(200);
    // A small image is under the cap, so nothing is withheld.
    const small = JSON.parse((await viewer.get(`/api/iiif/${versoId}/info.json`)).text);
    expect(small.maxWidth).toBeUndefined();
  });

  it('answers 401 without a session, 404 for unknown images and malformed tiles', async () => {
    expectProblem(await t.anonymous().get(`/api/iiif/${rectoId}/info.json`), 401);
    const viewer = await t.as('viewer');
    expectProblem(await viewer.get('/api/iiif/999999/info.json'), 404);
    expectProblem(await viewer.get(`/api/iiif/${rectoId}/..,..,1,1/512,512/0/default.jpg`), 404);
    expectProblem(await viewer.get(`/api/iiif/${rectoId}/full/max/90/default.jpg`), 404);
    expectProblem(await viewer.get('/api/iiif/abc/info.json'), 422);
    const redirect = await viewer.get(`/api/iiif/${rectoId}`);
    expect(redirect.status).toBe(303);
    expect(redirect.headers.location).toBe(`/api/iiif/${rectoId}/info.json`);
  });
});

describe('GET /api/prints/:id/manifest.json', () => {
  it('is a IIIF Presentation 3.0 manifest that @iiif/parser normalises, recto first', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get(`/api/prints/${printId}/manifest.json`);
    expect(response.status).toBe(200);
    const manifest = JSON.parse(response.text) as Manifest;
    expect(manifest['@context']).toBe('http://iiif.io/api/presentation/3/context.json');
    const { entities, resource } = normalize(manifest);
    expect(resource).toEqual({ type: 'Manifest', id: manifest.id });
    const canvases = Object.values(entities.Canvas) as Array<{ width: number; label: unknown }>;
    expect(canvases.map((canvas) => canvas.width)).toEqual([WIDTH, 1200]);
    expect(Object.keys(entities.Annotation)).toHaveLength(2);
    const services = Object.values(entities.Service) as Array<{ id: string; type: string }>;
    expect(services.map((service) => service.id.replace(/^http:\/\/[^/]+/, ''))).toEqual([
      `/api/iiif/${rectoId}`,
      `/api/iiif/${versoId}`,
    ]);
    // Each service answers on this server.
    for (const service of services) {
      const path = new URL(`${service.id}/info.json`).pathname;
      expect((await viewer.get(path)).status).toBe(200);
    }
  });

  it('answers 401 without a session, 404 for an unknown print, 422 for a bad id', async () => {
    expectProblem(await t.anonymous().get(`/api/prints/${printId}/manifest.json`), 401);
    const viewer = await t.as('viewer');
    expectProblem(await viewer.get('/api/prints/999999/manifest.json'), 404);
    expectProblem(await viewer.get('/api/prints/x/manifest.json'), 422);
  });
});
