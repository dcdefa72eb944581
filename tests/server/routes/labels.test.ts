import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { qrCodesInPdf } from '../../support/pdf-qr';
import { asBuffer, readPdf } from '../../support/read-pdf';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let shelf: number;
let box: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  shelf = (await archivist.post('/api/locations').send({ code: 'LB-SH', name: 'Shelf 4' })).body.id;
  box = (
    await archivist.post('/api/locations').send({ code: 'LB-BX1', name: 'Box 1', parentId: shelf })
  ).body.id;
});
afterAll(() => t.close());

describe('label sheets', () => {
  it("a place's labels: its code and name, and a QR code that opens its page", async () => {
    const archivist = await t.as('archivist');
    const response = await asBuffer(
      archivist.get(`/api/locations/${shelf}/labels.pdf?layout=a4-3x8`),
    );
    expect(response.status).toBe(200);
    expect(response.type).toBe('application/pdf');
    const pdf = response.body as Buffer;
    const { text, pages } = await readPdf(pdf);
    expect(pages).toBe(1);
    expect(text).toContain('LB-SH');
    expect(text).toContain('LB-BX1');
    const codes = await qrCodesInPdf(pdf);
    // Outside production without PUBLIC_URL, links use the request's own origin.
    const origin = /^http:\/\/127\.0\.0\.1:\d+$/;
    expect(codes).toHaveLength(2);
    const urls = codes.map((code) => new URL(code.text));
    expect(urls.map((url) => url.pathname).sort()).toEqual(
      [`/places/${shelf}`, `/places/${box}`].sort(),
    );
    for (const url of urls) expect(url.origin).toMatch(origin);
  });

  it('folder labels for prints, in the order asked, with PUBLIC_URL in the QR code', async () => {
    const archivist = await t.as('archivist');
    const ids: number[] = [];
    for (const title of ['Weir in flood', 'Lane under snow']) {
      ids.push((await archivist.post('/api/prints').send(buildPrint({ title }))).body.id);
    }
    t.ctx.config.publicUrl = 'https://prints.example.org';
    try {
      const response = await asBuffer(
        archivist.get(`/api/prints/labels.pdf?ids=${ids.join(',')}&layout=letter-3x10&skip=29`),
      );
      expect(response.status).toBe(200);
      const pdf = response.body as Buffer;
      // 29 labels already used: the first goes in the last place, the second on page two.
      expect((await readPdf(pdf)).pages).toBe(2);
      expect((await readPdf(pdf)).text).toContain('Weir in flood');
      const codes = await qrCodesInPdf(pdf);
      expect(codes).toEqual([
        { page: 1, text: `https://prints.example.org/prints/${ids[0]}` },
        { page: 2, text: `https://prints.example.org/prints/${ids[1]}` },
      ]);
    } finally {
      t.ctx.config.publicUrl = null;
    }
  });

  it('refuses a curator (403), nobody (401), an unknown layout or print (422), a lost place (404)', async () => {
    expectProblem(await (await t.as('curator')).get(`/api/locations/${shelf}/labels.pdf`), 403);
    expectProblem(await t.anonymous().get('/api/prints/labels.pdf?ids=1'), 401);
    const archivist = await t.as('archivist');
    expectProblem(await archivist.get(`/api/locations/${shelf}/labels.pdf?layout=a5-1x1`), 422);
    expectProblem(await archivist.get('/api/prints/labels.pdf?ids=999999'), 422);
    expectProblem(await archivist.get('/api/prints/labels.pdf?ids=1;2'), 422);
    expectProblem(await archivist.get('/api/locations/999999/labels.pdf'), 404);
  });
});
