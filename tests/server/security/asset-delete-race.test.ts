import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { binaryBody, buildJpeg } from '../../support/images';
import { startTestApp, type TestApp } from '../../support/test-app';

/**
 * Originals are stored once per SHA-256. Deleting the last image of a file while the same
 * file is uploaded again must never lose the original the new upload refers to.
 */
let t: TestApp;
let printId: number;
let otherPrintId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  printId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
  // The same file twice on one print is refused (409): the second upload goes to another.
  otherPrintId = (await archivist.post('/api/prints').send(buildPrint())).body.id;
});
afterAll(() => t.close());

describe('DELETE /api/assets/:id during an upload of the same file', () => {
  it('keeps the original and derivatives of the new upload (real concurrent requests)', async () => {
    const archivist = await t.as('archivist');
    const admin = await t.as('admin');
    const upload = (file: Buffer, to = printId) =>
      archivist
        .post(`/api/prints/${to}/assets`)
        .field('view', 'verso')
        .attach('file', file, 'scan.jpg');
    for (let round = 0; round < 4; round += 1) {
      // A different file each round, big enough that its tiles take a moment.
      const file = await buildJpeg(2400, 1800, [120 + round * 20, 90, 70]);
      const first = await upload(file);
      expect(first.status).toBe(201);
      const [deleted, again] = await Promise.all([
        admin.delete(`/api/assets/${first.body.id}`),
        upload(file, otherPrintId),
      ]);
      expect(deleted.status).toBe(204);
      expect(again.status).toBe(201);
      await t.ctx.images.jobs.idle();
      const id = again.body.id as number;
      const original = await archivist
        .get(`/api/assets/${id}/original`)
        .buffer(true)
        .parse(binaryBody);
      expect(original.status, `round ${round}: original`).toBe(200);
      expect(Buffer.compare(original.body as Buffer, file)).toBe(0);
      for (const size of ['thumbnail', 'web'] as const) {
        const derivative = await archivist.get(`/api/assets/${id}/${size}`);
        expect(derivative.status, `round ${round}: ${size}`).toBe(200);
      }
    }
  });
});
