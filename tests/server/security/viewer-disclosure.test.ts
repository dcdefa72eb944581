import { writeFileSync } from 'node:fs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { originalKey } from '../../../server/services/storage/storage';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { buildToneCheck } from '../../support/tone-factories';
import { startTestApp, type TestApp } from '../../support/test-app';

/** What a viewer reads holds no internal error text and no one's e-mail address. */
let t: TestApp;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  printId = (await (await t.as('archivist')).post('/api/prints').send(buildPrint())).body.id;
});
afterAll(() => t.close());

describe('a viewer reading a record', () => {
  it('sees a plain sentence for an image that could not be processed, not the exception', async () => {
    const upload = await (
      await t.as('archivist')
    )
      .post(`/api/prints/${printId}/assets`)
      .field('view', 'recto')
      .attach('file', await buildJpeg(640, 480), 'scan.jpg');
    const { sha256 } = upload.body as { sha256: string };
    const { images } = t.ctx;
    await images.jobs.idle();
    // The stored original goes bad: making its derivatives again now fails inside sharp.
    writeFileSync(await images.storage.localPath(originalKey(sha256)), 'not an image any more');
    await images.derivatives.remove(sha256);
    await images.jobs.enqueue(sha256).catch(() => undefined);
    const record = await (await t.as('viewer')).get(`/api/prints/${printId}`);
    const asset = record.body.assets[0];
    expect(asset.status).toBe('failed');
    expect(asset.error).toBe('This image could not be processed.');
  });

  it('names a tone check’s checker by name, with no e-mail address', async () => {
    const conservator = await t.as('conservator');
    const created = await conservator
      .post(`/api/prints/${printId}/tone-checks`)
      // Checked today: never before the print was made, never in the future.
      .send(buildToneCheck({ checkedOn: new Date().toISOString().slice(0, 10) }));
    expect(created.status).toBe(201);
    for (const role of ['viewer', 'curator', 'conservator'] as const) {
      const checks = await (await t.as(role)).get(`/api/prints/${printId}/tone-checks`);
      expect(checks.body.items[0].checkedBy).toEqual({
        id: expect.any(Number),
        name: 'Test conservator',
      });
      expect(JSON.stringify(checks.body)).not.toContain('@test.example');
    }
  });
});
