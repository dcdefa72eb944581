import { createHash } from 'node:crypto';
import Color from 'colorjs.io';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { binaryBody, build16BitTiff, buildJpeg, flatRgb } from '../../support/images';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let printId: number;
let jpegId: number;
let jpeg: Buffer;

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  printId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
  jpeg = await buildJpeg(2600, 1800);
  jpegId = (await uploadAs('archivist', jpeg, 'recto', 'scan.jpg')).body.id;
  await t.ctx.images.jobs.idle();
});
afterAll(() => t.close());

async function uploadAs(role: 'archivist', file: Buffer, view: string, name: string) {
  const response = await (
    await t.as(role)
  )
    .post(`/api/prints/${printId}/assets`)
    .field('view', view)
    .attach('file', file, name);
  expect(response.status).toBe(201);
  return response;
}

describe('GET /api/assets/:id/:size', () => {
  it('gives a viewer the thumbnail and web image with an ETag and long caching, not the original', async () => {
    const viewer = await t.as('viewer');
    const web = await viewer.get(`/api/assets/${jpegId}/web`).buffer(true).parse(binaryBody);
    expect(web.status).toBe(200);
    expect(web.headers['content-type']).toBe('image/jpeg');
    expect(web.headers['cache-control']).toMatch(/max-age=31536000/);
    const meta = await sharp(web.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([2048, 1418]);
    const again = await viewer
      .get(`/api/assets/${jpegId}/web`)
      .set('If-None-Match', web.headers.etag!);
    expect(again.status).toBe(304);
    const thumb = await viewer
      .get(`/api/assets/${jpegId}/thumbnail`)
      .buffer(true)
      .parse(binaryBody);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(400);
    expectProblem(await viewer.get(`/api/assets/${jpegId}/original`), 403);
  });

  it('gives curators the original byte for byte, and byte ranges', async () => {
    const curator = await t.as('curator');
    const original = await curator
      .get(`/api/assets/${jpegId}/original`)
      .buffer(true)
      .parse(binaryBody);
    expect(original.status).toBe(200);
    expect(
      createHash('sha256')
        .update(original.body as Buffer)
        .digest('hex'),
    ).toBe(createHash('sha256').update(jpeg).digest('hex'));
    expect(original.headers['content-disposition']).toMatch(/^attachment; filename="?scan\.jpg"?$/);
    const range = await curator
      .get(`/api/assets/${jpegId}/original`)
      .set('Range', 'bytes=10-19')
      .buffer(true)
      .parse(binaryBody);
    expect(range.status).toBe(206);
    expect(range.headers['content-range']).toBe(`bytes 10-19/${jpeg.length}`);
    expect(Buffer.compare(range.body as Buffer, jpeg.subarray(10, 20))).toBe(0);
  });

  it('answers 401 without a session, 404 for an unknown image, 422 for an unknown size', async () => {
    expectProblem(await t.anonymous().get(`/api/assets/${jpegId}/web`), 401);
    const viewer = await t.as('viewer');
    expectProblem(await viewer.get('/api/assets/999999/web'), 404);
    expectProblem(await viewer.get(`/api/assets/${jpegId}/huge`), 422);
  });
});

describe('POST /api/assets/:id/samples', () => {
  // Check values: colorjs.io 0.7 (a general-purpose colour library) converting the same
  // sRGB (IEC 61966-2-1) to CIELAB (CIE 15) with Bradford adaptation to D50.
  it('gives the mean sRGB and Lab D50 of a region of known 8-bit sRGB pixels', async () => {
    const patches: Array<[number, number, number]> = [
      [200, 120, 80],
      [40, 30, 25],
      [235, 225, 205],
    ];
    const strip = await flatRgb(300, 100, [0, 0, 0])
      .composite(
        await Promise.all(
          patches.map(async (rgb, i) => ({
            input: await flatRgb(100, 100, rgb).png().toBuffer(),
            left: i * 100,
            top: 0,
          })),
        ),
      )
      .png()
      .toBuffer();
    const asset = (await uploadAs('archivist', strip, 'reference', 'patches.png')).body;
    const conservator = await t.as('conservator');
    for (const [i, rgb] of patches.entries()) {
      const response = await conservator
        .post(`/api/assets/${asset.id}/samples`)
        .send({ x: i * 100 + 10, y: 10, width: 80, height: 80 });
      expect(response.status).toBe(200);
      const expected = new Color('srgb', rgb.map((v) => v / 255) as [number, number, number]).to(
        'lab',
      ).coords as number[];
      expect(response.body.rgb.r).toBeCloseTo(rgb[0], 1);
      expect(response.body.rgb.g).toBeCloseTo(rgb[1], 1);
      expect(response.body.rgb.b).toBeCloseTo(rgb[2], 1);
      expect(Math.abs(response.body.lab.L - expected[0]!)).toBeLessThan(0.05);
      expect(Math.abs(response.body.lab.a - expected[1]!)).toBeLessThan(0.05);
      expect(Math.abs(response.body.lab.b - expected[2]!)).toBeLessThan(0.05);
    }
  });

  it('converts a 16-bit Display P3 TIFF through its profile to sRGB, keeping 16-bit precision', async () => {
    // Stored numbers in P3; colorjs.io gives the same colour as P3 → Lab D50.
    const p3 = [0.7, 0.35, 0.2] as [number, number, number];
    const tiff = await build16BitTiff(
      120,
      90,
      p3.map((v) => Math.round(v * 65535)) as [number, number, number],
      { profile: 'p3', compression: 'deflate' },
    );
    const asset = (await uploadAs('archivist', tiff, 'detail', 'p3.tif')).body;
    expect(asset.exif).toMatchObject({ bitDepth: 16, format: 'tiff' });
    const archivist = await t.as('archivist');
    const response = await archivist
      .post(`/api/assets/${asset.id}/samples`)
      .send({ x: 0, y: 0, width: 120, height: 90 });
    expect(response.status).toBe(200);
    const expected = new Color('p3', p3).to('lab').coords as number[];
    // lcms's perceptual transform of matrix profiles differs from the exact matrices by
    // well under one ΔE; a 16-bit pipeline keeps fractions of an 8-bit step.
    expect(Math.abs(response.body.lab.L - expected[0]!)).toBeLessThan(0.3);
    expect(Math.abs(response.body.lab.a - expected[1]!)).toBeLessThan(0.6);
    expect(Math.abs(response.body.lab.b - expected[2]!)).toBeLessThan(0.6);
    expect(Number.isInteger(response.body.rgb.r)).toBe(false);
    // An untagged reading of the same numbers would be a different colour.
    const untagged = new Color('srgb', p3).to('lab').coords as number[];
    expect(Math.abs(response.body.lab.a - untagged[1]!)).toBeGreaterThan(2);
  });

  it('is for conservators, archivists and admins; 403 for curators and viewers, 401, 422, 404', async () => {
    const region = { x: 0, y: 0, width: 10, height: 10 };
    for (const role of ['conservator', 'archivist', 'admin'] as const) {
      const response = await (await t.as(role)).post(`/api/assets/${jpegId}/samples`).send(region);
      expect(response.status).toBe(200);
    }
    for (const role of ['curator', 'viewer'] as const) {
      expectProblem(
        await (await t.as(role)).post(`/api/assets/${jpegId}/samples`).send(region),
        403,
      );
    }
    expectProblem(await t.anonymous().post(`/api/assets/${jpegId}/samples`).send(region), 401);
    const conservator = await t.as('conservator');
    const outside = await conservator
      .post(`/api/assets/${jpegId}/samples`)
      .send({ x: 2590, y: 0, width: 20, height: 10 });
    expectProblem(outside, 422);
    const negative = await conservator
      .post(`/api/assets/${jpegId}/samples`)
      .send({ x: -1, y: 0, width: 0, height: 10.5 });
    expectProblem(negative, 422);
    expect(errorPaths(negative).sort()).toEqual(['height', 'width', 'x']);
    expectProblem(await conservator.post('/api/assets/999999/samples').send(region), 404);
  });
});

describe('DELETE /api/assets/:id', () => {
  it('is for archivists and admins; others 403, 401 without a session, 404 unknown', async () => {
    const file = await buildJpeg(200, 150, [10, 20, 30]);
    const id = (await uploadAs('archivist', file, 'ultraviolet', 'uv.jpg')).body.id;
    for (const role of ['viewer', 'curator', 'conservator'] as const) {
      expectProblem(await (await t.as(role)).delete(`/api/assets/${id}`), 403);
    }
    expectProblem(await t.anonymous().delete(`/api/assets/${id}`), 401);
    expect((await (await t.as('admin')).delete(`/api/assets/${id}`)).status).toBe(204);
    expectProblem(await (await t.as('archivist')).delete(`/api/assets/${id}`), 404);
  });
});

describe('the print record', () => {
  it('lists its assets and the list shows the recto thumbnail', async () => {
    const viewer = await t.as('viewer');
    const record = await viewer.get(`/api/prints/${printId}`);
    expect(record.body.assets[0]).toMatchObject({ id: jpegId, view: 'recto', status: 'ready' });
    const list = await viewer.get('/api/prints');
    const item = list.body.items.find((i: { id: number }) => i.id === printId);
    expect(item.thumbnailUrl).toBe(`/api/assets/${jpegId}/thumbnail`);
  });
});
