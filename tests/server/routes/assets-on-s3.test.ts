import { createHash } from 'node:crypto';
import { existsSync, readdirSync, rmSync } from 'node:fs';
import { join } from 'node:path';
import { DeleteObjectCommand, GetObjectCommand, PutObjectCommand } from '@aws-sdk/client-s3';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { type S3Storage } from '../../../server/services/storage/s3-storage';
import { buildPrint } from '../../support/factories';
import { binaryBody, buildJpeg } from '../../support/images';
import { buildCsv, buildCsvRow, importCsv } from '../../support/imports';
import { expectProblem } from '../../support/problem';
import { startLocalS3, type LocalS3 } from '../../support/s3-server';
import { startTestApp, type TestApp } from '../../support/test-app';

const BUCKET = 'printwarden-originals';
const PREFIX = 'collection/originals';
let s3: LocalS3;
let t: TestApp;
let storage: S3Storage;
let printId: number;
let jpeg: Buffer;
let sha256: string;
let assetId: number;

beforeAll(async () => {
  s3 = await startLocalS3(BUCKET);
  t = await startTestApp({
    storage: {
      kind: 's3',
      bucket: BUCKET,
      prefix: PREFIX,
      endpoint: s3.endpoint,
      region: 'us-east-1',
    },
  });
  storage = t.ctx.images.storage as S3Storage;
  const archivist = await t.as('archivist');
  printId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
  jpeg = await buildJpeg(2600, 1800);
  sha256 = createHash('sha256').update(jpeg).digest('hex');
  const response = await upload(jpeg, 'recto');
  assetId = response.body.id;
  await t.ctx.images.jobs.idle();
});
afterAll(async () => {
  await t.close();
  storage.client.destroy();
  await s3.close();
});

async function upload(file: Buffer, view: string, to = printId) {
  const response = await (
    await t.as('archivist')
  )
    .post(`/api/prints/${to}/assets`)
    .field('view', view)
    .attach('file', file, 'scan.jpg');
  expect(response.status).toBe(201);
  return response;
}

/** An object straight from the bucket, past the app. */
async function objectBytes(key: string): Promise<Buffer> {
  const answer = await storage.client.send(new GetObjectCommand({ Bucket: BUCKET, Key: key }));
  return Buffer.from(await answer.Body!.transformToByteArray());
}

const objectKeyOf = (sha: string) =>
  `${PREFIX}/originals/${sha.slice(0, 2)}/${sha.slice(2, 4)}/${sha}`;

async function fixityToEnd(): Promise<Record<string, unknown>> {
  const admin = await t.as('admin');
  const started = await admin.post('/api/fixity-checks');
  expect(started.status).toBe(202);
  for (let i = 0; i < 200; i += 1) {
    const progress = await admin.get(`/api/fixity-checks/${started.body.id}`);
    if (progress.body.status !== 'running') return progress.body;
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
  throw new Error('fixity check did not finish');
}

describe('originals in S3-compatible object storage (STORAGE_URL=s3://…)', () => {
  it('stores the upload in the bucket under the prefix, byte for byte, and nothing on disk', async () => {
    expect((await objectBytes(objectKeyOf(sha256))).equals(jpeg)).toBe(true);
    expect(existsSync(join(t.ctx.config.uploadsDir, 'originals'))).toBe(false);
    const temp = join(t.ctx.config.uploadsDir, 'tmp');
    expect(existsSync(temp) ? readdirSync(temp) : []).toEqual([]);
  });

  it('makes the thumbnail, web image and IIIF tiles from the stored original', async () => {
    const viewer = await t.as('viewer');
    const record = await viewer.get(`/api/prints/${printId}`);
    expect(record.body.assets[0]).toMatchObject({ id: assetId, status: 'ready', progress: 100 });
    const web = await viewer.get(`/api/assets/${assetId}/web`).buffer(true).parse(binaryBody);
    expect(web.status).toBe(200);
    const meta = await sharp(web.body as Buffer).metadata();
    expect([meta.width, meta.height]).toEqual([2048, 1418]);
    const curator = await t.as('curator');
    const info = await curator.get(`/api/iiif/${assetId}/info.json`);
    expect(JSON.parse(info.text)).toMatchObject({ width: 2600, height: 1800 });
    const tile = await curator
      .get(`/api/iiif/${assetId}/0,0,512,512/512,512/0/default.jpg`)
      .buffer(true)
      .parse(binaryBody);
    expect(tile.status).toBe(200);
    expect((await sharp(tile.body as Buffer).metadata()).width).toBe(512);
  });

  it('rebuilds derivatives and tiles on demand where this instance has none cached', async () => {
    // As a second instance sees it: the bucket holds the original, the local caches are empty.
    rmSync(join(t.ctx.config.uploadsDir, 'derivatives'), { recursive: true, force: true });
    rmSync(join(t.ctx.config.dataDir, 'object-cache'), { recursive: true, force: true });
    const viewer = await t.as('viewer');
    const thumb = await viewer
      .get(`/api/assets/${assetId}/thumbnail`)
      .buffer(true)
      .parse(binaryBody);
    expect(thumb.status).toBe(200);
    expect((await sharp(thumb.body as Buffer).metadata()).width).toBe(400);
    const tile = await (
      await t.as('curator')
    )
      .get(`/api/iiif/${assetId}/512,512,512,512/512,512/0/default.jpg`)
      .buffer(true)
      .parse(binaryBody);
    expect(tile.status).toBe(200);
  });

  it('serves the original whole and in byte ranges from the bucket', async () => {
    const curator = await t.as('curator');
    const whole = await curator
      .get(`/api/assets/${assetId}/original`)
      .buffer(true)
      .parse(binaryBody);
    expect(whole.status).toBe(200);
    expect((whole.body as Buffer).equals(jpeg)).toBe(true);
    const range = await curator
      .get(`/api/assets/${assetId}/original`)
      .set('Range', 'bytes=1000-1999')
      .buffer(true)
      .parse(binaryBody);
    expect(range.status).toBe(206);
    expect(range.headers['content-range']).toBe(`bytes 1000-1999/${jpeg.length}`);
    expect((range.body as Buffer).equals(jpeg.subarray(1000, 2000))).toBe(true);
    const tail = await curator
      .get(`/api/assets/${assetId}/original`)
      .set('Range', 'bytes=-100')
      .buffer(true)
      .parse(binaryBody);
    expect((tail.body as Buffer).equals(jpeg.subarray(jpeg.length - 100))).toBe(true);
    expectProblem(
      await curator.get(`/api/assets/${assetId}/original`).set('Range', `bytes=${jpeg.length}-`),
      416,
    );
  });

  it('samples a region of the original fetched from the bucket', async () => {
    // A flat part of the generated image: sRGB (150, 110, 80) before JPEG coding.
    rmSync(join(t.ctx.config.dataDir, 'object-cache'), { recursive: true, force: true });
    const response = await (
      await t.as('conservator')
    )
      .post(`/api/assets/${assetId}/samples`)
      .send({ x: 2000, y: 100, width: 400, height: 400 });
    expect(response.status).toBe(200);
    const { r, g, b } = response.body.rgb as { r: number; g: number; b: number };
    expect(Math.abs(r - 150)).toBeLessThan(2);
    expect(Math.abs(g - 110)).toBeLessThan(2);
    expect(Math.abs(b - 80)).toBeLessThan(2);
    expect(response.body.pixels).toBe(160_000);
  });

  it('fixity reads every object: intact, then a changed one and a missing one', async () => {
    const detail = await buildJpeg(500, 400, [90, 70, 50]);
    const gone = await buildJpeg(300, 300, [30, 60, 90]);
    const detailId = (await upload(detail, 'detail')).body.id;
    const goneId = (await upload(gone, 'detail')).body.id;
    await t.ctx.images.jobs.idle();
    expect(await fixityToEnd()).toMatchObject({
      status: 'done',
      checked: 3,
      mismatches: [],
      missing: [],
    });

    const detailSha = createHash('sha256').update(detail).digest('hex');
    const changed = Buffer.from(detail);
    changed[300] = changed[300]! ^ 0x01;
    await storage.client.send(
      new PutObjectCommand({ Bucket: BUCKET, Key: objectKeyOf(detailSha), Body: changed }),
    );
    const goneSha = createHash('sha256').update(gone).digest('hex');
    await storage.client.send(
      new DeleteObjectCommand({ Bucket: BUCKET, Key: objectKeyOf(goneSha) }),
    );

    const report = await fixityToEnd();
    expect(report).toMatchObject({ status: 'done', checked: 3, missing: [goneId] });
    expect(report.mismatches).toEqual([
      {
        assetId: detailId,
        expected: detailSha,
        actual: createHash('sha256').update(changed).digest('hex'),
      },
    ]);
    expectProblem(await (await t.as('curator')).get(`/api/assets/${goneId}/original`), 410);
  });

  it('deletes the object with the last image that uses it', async () => {
    const file = await buildJpeg(320, 240, [200, 180, 150]);
    const sha = createHash('sha256').update(file).digest('hex');
    const first = (await upload(file, 'detail')).body.id;
    // The same file on another print (twice on one print is refused): one object for both.
    const otherPrintId = (
      await (await t.as('archivist')).post('/api/prints').send(buildPrint({ title: 'Second' }))
    ).body.id as number;
    const second = (await upload(file, 'detail', otherPrintId)).body.id;
    await t.ctx.images.jobs.idle();
    const archivist = await t.as('archivist');
    expect((await archivist.delete(`/api/assets/${first}`)).status).toBe(204);
    expect(
      await storage.stat(`originals/${sha.slice(0, 2)}/${sha.slice(2, 4)}/${sha}`),
    ).not.toBeNull();
    expect((await archivist.delete(`/api/assets/${second}`)).status).toBe(204);
    await expect(objectBytes(objectKeyOf(sha))).rejects.toMatchObject({ name: 'NoSuchKey' });
  });

  it('imports a CSV through the bucket (where any instance reads it) and removes it after', async () => {
    const archivist = await t.as('archivist');
    const job = await importCsv(archivist, buildCsv([buildCsvRow(701), buildCsvRow(702)]));
    expect(job).toMatchObject({ status: 'done', imported: 2 });
    expect(await storage.stat(`imports/${job.id}.csv`)).toBeNull();
    expect(readdirSync(join(t.ctx.config.uploadsDir, 'tmp'))).toEqual([]);
  });

  it('answers 503 when the storage does not answer, and keeps no upload behind', async () => {
    await s3.close();
    const curator = await t.as('curator');
    const original = await curator.get(`/api/assets/${assetId}/original`);
    expectProblem(original, 503);
    expect(original.body.title).toBe('Storage unavailable');
    const refused = await (
      await t.as('archivist')
    )
      .post(`/api/prints/${printId}/assets`)
      .field('view', 'detail')
      .attach('file', await buildJpeg(200, 150, [10, 200, 10]), 'while-down.jpg');
    expectProblem(refused, 503);
    expect(readdirSync(join(t.ctx.config.uploadsDir, 'tmp'))).toEqual([]);
    // Derivatives already cached on this instance are still served.
    expect((await curator.get(`/api/assets/${assetId}/web`)).status).toBe(200);
  });
});
