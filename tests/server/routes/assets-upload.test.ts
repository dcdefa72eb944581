import { createHash } from 'node:crypto';
import { existsSync, readFileSync, readdirSync, statSync } from 'node:fs';
import { join } from 'node:path';
import exifr from 'exifr';
import sharp from 'sharp';
import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { buildPrint } from '../../support/factories';
import { binaryBody, buildJpeg } from '../../support/images';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let printId: number;
let otherPrintId: number;
let jpeg: Buffer;

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  printId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
  otherPrintId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
  jpeg = await buildJpeg(900, 600);
});
afterAll(() => t.close());

const uploads = () => t.ctx.config.uploadsDir;
/** Every file under a directory, recursively. */
function filesUnder(dir: string): string[] {
  if (!existsSync(dir)) return [];
  return readdirSync(dir, { recursive: true, encoding: 'utf8' }).filter((name) =>
    statSync(join(dir, name)).isFile(),
  );
}

async function upload(
  role: 'archivist' | 'admin',
  file: Buffer,
  view = 'recto',
  name = 'scan.jpg',
  repeat?: 'refuse' | 'store',
) {
  const agent = await t.as(role);
  const request = agent.post(`/api/prints/${printId}/assets`).field('view', view);
  if (repeat) request.field('repeat', repeat);
  return request.attach('file', file, name);
}

describe('POST /api/prints/:id/assets', () => {
  it('stores the original by SHA-256, answers with the thumbnail made, then makes the web image', async () => {
    const response = await upload('archivist', jpeg, 'recto', '../../etc/passwd.jpg');
    expect(response.status).toBe(201);
    const sha256 = createHash('sha256').update(jpeg).digest('hex');
    expect(response.body).toMatchObject({
      sha256,
      width: 900,
      height: 600,
      view: 'recto',
      urls: {
        original: `/api/assets/${response.body.id}/original`,
        web: `/api/assets/${response.body.id}/web`,
        thumbnail: `/api/assets/${response.body.id}/thumbnail`,
      },
      exif: { width: 900, height: 600, bitDepth: 8, format: 'jpeg' },
    });
    const stored = join(uploads(), 'originals', sha256.slice(0, 2), sha256.slice(2, 4), sha256);
    expect(createHash('sha256').update(readFileSync(stored)).digest('hex')).toBe(sha256);
    // The client's name is kept as a label only; no path was made from it.
    expect(filesUnder(uploads()).some((name) => name.includes('passwd'))).toBe(false);

    await t.ctx.images.jobs.idle();
    const record = await (await t.as('viewer')).get(`/api/prints/${printId}`);
    const asset = record.body.assets.find((a: { id: number }) => a.id === response.body.id);
    expect(asset).toMatchObject({ status: 'ready', progress: 100 });
    const web = await sharp(join(uploads(), 'derivatives', sha256, 'web.jpg')).metadata();
    expect(Math.max(web.width!, web.height!)).toBeLessThanOrEqual(2048);
    const thumb = await sharp(join(uploads(), 'derivatives', sha256, 'thumbnail.jpg')).metadata();
    expect(Math.max(thumb.width!, thumb.height!)).toBe(400);
  });

  it('stores the same file once and deletes the original only with its last asset', async () => {
    const file = await buildJpeg(300, 200, [90, 60, 40]);
    const sha256 = createHash('sha256').update(file).digest('hex');
    const first = await upload('archivist', file, 'detail');
    // The same file on another print: its original is stored once for both.
    const second = await (
      await t.as('admin')
    )
      .post(`/api/prints/${otherPrintId}/assets`)
      .field('view', 'raking')
      .attach('file', file, 'scan.jpg');
    expect([first.status, second.status]).toEqual([201, 201]);
    expect(filesUnder(join(uploads(), 'originals')).filter((n) => n.endsWith(sha256))).toHaveLength(
      1,
    );

    const archivist = await t.as('archivist');
    expect((await archivist.delete(`/api/assets/${first.body.id}`)).status).toBe(204);
    expect(filesUnder(join(uploads(), 'originals')).filter((n) => n.endsWith(sha256))).toHaveLength(
      1,
    );
    expect((await archivist.delete(`/api/assets/${second.body.id}`)).status).toBe(204);
    expect(filesUnder(join(uploads(), 'originals')).filter((n) => n.endsWith(sha256))).toHaveLength(
      0,
    );
    expect(existsSync(join(uploads(), 'derivatives', sha256))).toBe(false);
  });

  it('refuses the same file twice on one print when asked (409), naming the image it repeats', async () => {
    const file = await buildJpeg(320, 200, [40, 80, 120]);
    const first = await upload('archivist', file, 'recto', 'front.jpg', 'refuse');
    expect(first.status).toBe(201);
    const archivist = await t.as('archivist');
    const before = (await archivist.get(`/api/prints/${printId}`)).body.assets.length;
    const again = await upload('archivist', file, 'verso', 'front-again.jpg', 'refuse');
    expectProblem(again, 409);
    expect(again.body.detail).toMatch(/already on this print as its recto \(front\.jpg\)/);
    expect(again.body.detail).toMatch(/nothing was stored/);
    expect((await archivist.get(`/api/prints/${printId}`)).body.assets.length).toBe(before);
    // Without asking, an image is stored, as the contract promises: a second view of it.
    const stored = await upload('archivist', file, 'verso', 'front-again.jpg');
    expect(stored.status).toBe(201);
    expect((await archivist.get(`/api/prints/${printId}`)).body.assets.length).toBe(before + 1);
    expect((await archivist.delete(`/api/assets/${stored.body.id}`)).status).toBe(204);
    expect((await archivist.delete(`/api/assets/${first.body.id}`)).status).toBe(204);
    expectProblem(
      await upload('archivist', file, 'recto', 'front.jpg', 'sometimes' as 'refuse'),
      422,
    );
  });

  it('reads capture date, device, resolution and ICC description, and strips GPS from derivatives', async () => {
    const tagged = await sharp({
      create: { width: 1200, height: 800, channels: 3, background: '#7a5a44' },
    })
      .withExif({
        IFD0: { Make: 'Testbed', Model: 'Flatbed 9000', Software: 'ScanKit 2' },
        IFD2: { DateTimeOriginal: '2025:03:04 10:11:12' },
        IFD3: {
          GPSLatitudeRef: 'N',
          GPSLatitude: '51/1 30/1 0/1',
          GPSLongitudeRef: 'W',
          GPSLongitude: '0/1 7/1 0/1',
        },
      })
      .withMetadata({ density: 600 })
      .jpeg()
      .toBuffer();
    // The fixture really carries GPS (exifr reads it back), so the check below can fail.
    expect(await exifr.gps(tagged)).toMatchObject({ latitude: 51.5 });
    const response = await upload('archivist', tagged, 'verso');
    expect(response.status).toBe(201);
    expect(response.body.exif).toMatchObject({
      capturedAt: '2025-03-04T10:11:12',
      device: 'Testbed Flatbed 9000',
      software: 'ScanKit 2',
      dpi: 600,
      iccProfile: 'sRGB',
    });
    await t.ctx.images.jobs.idle();
    const viewer = await t.as('viewer');
    for (const size of ['thumbnail', 'web']) {
      const served = await viewer
        .get(`/api/assets/${response.body.id}/${size}`)
        .buffer(true)
        .parse(binaryBody);
      expect(served.status).toBe(200);
      expect(await exifr.gps(served.body as Buffer)).toBeUndefined();
      const tags = await exifr.parse(served.body as Buffer, { tiff: true, exif: true, gps: true });
      expect(tags?.latitude).toBeUndefined();
      expect(tags?.Make).toBeUndefined();
    }
  });

  it('refuses a file that is not an image with 415 and leaves nothing on disk', async () => {
    const before = filesUnder(uploads()).length;
    const response = await upload(
      'archivist',
      Buffer.from('%PDF-1.4 not an image'),
      'recto',
      'x.jpg',
    );
    expectProblem(response, 415);
    const svg = Buffer.from('<svg xmlns="http://www.w3.org/2000/svg" width="10" height="10"/>');
    expectProblem(await upload('archivist', svg, 'recto', 'x.png'), 415);
    expect(filesUnder(uploads()).length).toBe(before);
  });

  it('refuses a truncated image with 422 and leaves nothing on disk', async () => {
    const before = filesUnder(uploads()).length;
    const whole = await buildJpeg(1600, 1200, [120, 90, 70]);
    const response = await upload('archivist', whole.subarray(0, Math.floor(whole.length * 0.6)));
    expectProblem(response, 422);
    expect(filesUnder(uploads()).length).toBe(before);
  });

  it('refuses a file over UPLOAD_LIMIT_MB with 413 and leaves nothing on disk', async () => {
    const small = { ...t.ctx, images: { ...t.ctx.images, uploadLimitMb: 1 } };
    const { app, close } = createApp(small, { clientDir: join(t.dir, 'no-client') });
    const agent = request.agent(app);
    const session = await agent
      .post('/api/session')
      .send({ email: 'archivist@test.example', password: 'correct horse battery staple' });
    const before = filesUnder(uploads()).length;
    const big = Buffer.alloc(1.5 * 1024 * 1024, 1);
    const response = await agent
      .post(`/api/prints/${printId}/assets`)
      .set('X-CSRF-Token', session.body.csrfToken)
      .field('view', 'recto')
      .attach('file', big, 'big.tif');
    expectProblem(response, 413);
    expect(filesUnder(uploads()).length).toBe(before);
    close();
  });

  it('needs a known view and a file (422), a known print (404)', async () => {
    const badView = await upload('archivist', jpeg, 'sideways');
    expectProblem(badView, 422);
    expect(errorPaths(badView)).toEqual(['view']);
    const archivist = await t.as('archivist');
    const noFile = await archivist.post(`/api/prints/${printId}/assets`).field('view', 'recto');
    expectProblem(noFile, 422);
    expect(errorPaths(noFile)).toEqual(['file']);
    const unknown = await archivist
      .post('/api/prints/999999/assets')
      .field('view', 'recto')
      .attach('file', jpeg, 'a.jpg');
    expectProblem(unknown, 404);
    expect(filesUnder(join(uploads(), 'tmp'))).toEqual([]);
  });

  it('is for archivists and admins: 403 for the other roles, 401 without a session', async () => {
    for (const role of ['viewer', 'curator', 'conservator'] as const) {
      const agent = await t.as(role);
      const response = await agent
        .post(`/api/prints/${printId}/assets`)
        .field('view', 'recto')
        .attach('file', jpeg, 'a.jpg');
      expectProblem(response, 403);
    }
    const anonymous = await t
      .anonymous()
      .post(`/api/prints/${printId}/assets`)
      .field('view', 'recto')
      .attach('file', jpeg, 'a.jpg');
    expectProblem(anonymous, 401);
    expect(
      (await upload('admin', await buildJpeg(900, 600, [60, 90, 30]), 'reference')).status,
    ).toBe(201);
  });
});
