import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { renderReport } from '../../../server/services/report/render-report';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { expectProblem } from '../../support/problem';
import { asBuffer, readPdf } from '../../support/read-pdf';
import { buildReportInput } from '../../support/report';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  printId = (
    await archivist
      .post('/api/prints')
      .send(buildPrint({ accessionNumber: '2026.0077', madeOn: '2025-11-20' }))
  ).body.id;
  const conservator = await t.as('conservator');
  await conservator
    .post(`/api/prints/${printId}/condition-reports`)
    .send({
      reportedOn: '2026-02-01',
      grade: 'settled',
      observations: [{ term: 'foxing', location: 'upper edge', severity: 'slight' }],
    })
    .expect(201);
  await conservator
    .post(`/api/prints/${printId}/condition-reports`)
    .send({
      reportedOn: '2026-03-02',
      grade: 'vulnerable',
      observations: [{ term: 'silvering', location: 'image, shadows', severity: 'moderate' }],
      recommendation: 'Rehouse in a four-flap folder before the loan.',
      environment: { temperatureC: 18.5, rh: 47 },
    })
    .expect(201);
  await conservator
    .post(`/api/prints/${printId}/treatments`)
    .send({ treatedOn: '2026-03-05', action: 'Surface cleaned', materials: 'Soft brush' })
    .expect(201);
});
afterAll(async () => {
  // Uploads make web images in the background; let them finish before the database closes.
  await t.ctx.images.jobs.idle();
  await t.close();
});

const flat = (text: string) => text.replace(/\s+/g, ' ');

describe('GET /api/prints/:id/report.pdf', () => {
  it('is a PDF whose text holds the record, processing, latest condition report, producer and page numbers', async () => {
    const curator = await t.as('curator');
    const response = await asBuffer(curator.get(`/api/prints/${printId}/report.pdf`)).expect(200);
    expect(response.headers['content-type']).toBe('application/pdf');
    const { text, pages } = await readPdf(response.body as Buffer);
    const words = flat(text);
    expect(words).toContain('2026.0077');
    expect(words).toContain('Mill pond at dusk');
    expect(words).toContain('Fixing — sodium thiosulfate 15 % w/v, 12 min, 20 °C');
    expect(words).toContain('silvering, moderate — image, shadows');
    expect(words).not.toContain('foxing, slight'); // only the latest report is printed
    expect(words).toContain('vulnerable — Damage that handling');
    expect(words).toContain('18.5 °C, 47 % RH');
    expect(words).toContain('Rehouse in a four-flap folder before the loan.');
    expect(words).toContain('Surface cleaned');
    expect(words).toContain('by Test curator');
    expect(words).toContain(`Page 1 of ${pages}`);
    expect(words).toContain(`Page ${pages} of ${pages}`);
    expect(words).toContain('No tone checks are recorded for this print.');
    // The fonts embedded are the app's EB Garamond subsets.
    expect((response.body as Buffer).toString('latin1')).toMatch(
      /\/BaseFont \/[A-Z]{6}\+EBGaramond/,
    );
  });

  it('is refused to viewers and to no session; 404 for an unknown print', async () => {
    expectProblem(await (await t.as('viewer')).get(`/api/prints/${printId}/report.pdf`), 403);
    expectProblem(await t.anonymous().get(`/api/prints/${printId}/report.pdf`), 401);
    expectProblem(await (await t.as('conservator')).get('/api/prints/99999/report.pdf'), 404);
    expectProblem(await (await t.as('conservator')).get('/api/prints/x/report.pdf'), 422);
  });
});

describe('the PDF with images', () => {
  it('carries the recto and the latest report’s photographs, each with its caption', async () => {
    const archivist = await t.as('archivist');
    const id = (
      await archivist
        .post('/api/prints')
        .send(buildPrint({ title: 'With images', madeOn: '2025-11-20' }))
    ).body.id;
    // A different photograph each time: the same file twice on one print is refused.
    let shade = 100;
    const upload = async (view: string) =>
      (
        await archivist
          .post(`/api/prints/${id}/assets`)
          .field('view', view)
          .attach('file', await buildJpeg(400, 300, [(shade += 30), 110, 80]), `${view}.jpg`)
          .expect(201)
      ).body.id as number;
    await upload('recto');
    const details = [await upload('detail'), await upload('raking')];
    const conservator = await t.as('conservator');
    await conservator
      .post(`/api/prints/${id}/condition-reports`)
      .send({
        reportedOn: '2026-03-02',
        grade: 'settled',
        observations: [],
        images: details.map((assetId, index) => ({
          assetId,
          area: { x: 0.2, y: 0.2, width: 0.4, height: 0.3 },
          caption: `Marked detail ${index + 1}`,
        })),
      })
      .expect(201);
    const response = await asBuffer(conservator.get(`/api/prints/${id}/report.pdf`)).expect(200);
    const pdf = response.body as Buffer;
    const { text } = await readPdf(pdf);
    expect(flat(text)).toContain('Recto');
    expect(flat(text)).toContain('Marked detail 1');
    expect(flat(text)).toContain('Marked detail 2');
    // Three embedded pictures: the recto and the two photographs of the report.
    expect(pdf.toString('latin1').match(/\/Subtype \/Image/g)).toHaveLength(3);
  });
});

describe('renderReport', () => {
  it('sets ΔE00 (a glyph only the Greek subset has), the tone table and chart, images, over several pages', async () => {
    const curator = await t.as('curator');
    const print = (await curator.get(`/api/prints/${printId}`)).body;
    const png = await sharp({
      create: { width: 600, height: 400, channels: 3, background: '#8a6d4f' },
    })
      .png()
      .toBuffer();
    const image = { bytes: png, width: 600, height: 400 };
    const pdf = await renderReport(
      buildReportInput(
        print,
        {
          comparison: [
            {
              patch: 'dmax',
              dL: 1.25,
              da: -0.4,
              db: 0.8,
              dE00: 1.37,
              density: 1.42,
              dDensity: -0.05,
            },
            {
              patch: 'dmin',
              dL: -0.5,
              da: 0.1,
              db: 1.9,
              dE00: 1.61,
              density: 0.07,
              dDensity: 0.01,
            },
          ],
          trend: [
            {
              patch: 'dmax',
              series: [
                { checkedOn: '2024-01-10', dE00: 0 },
                { checkedOn: '2025-01-11', dE00: 0.7 },
                { checkedOn: '2026-01-12', dE00: 1.37 },
              ],
            },
            {
              patch: 'dmin',
              series: [
                { checkedOn: '2024-01-10', dE00: 0 },
                { checkedOn: '2025-01-11', dE00: 0.9 },
                { checkedOn: '2026-01-12', dE00: 1.61 },
              ],
            },
          ],
        },
        { recto: image },
      ),
    );
    const { text, pages } = await readPdf(pdf);
    const words = flat(text);
    expect(words).toContain('ΔE00');
    // Table cells are placed run by run, so the reader may put a space after Δ.
    expect(words).toMatch(/Patch Δ ?L\* Δ ?a\* Δ ?b\* Δ ?E00 Density Δ ?D/);
    expect(words).toMatch(/dmax \+1\.25 −0\.40 \+0\.80 1\.37 1\.420 −0\.050/);
    expect(words).toContain('Trend: ΔE00 against the baseline at each check');
    expect(words).toContain('noticeable (ΔE00 2)');
    expect(words).toContain('produced 2026-06-01 by Ada Example');
    expect(pages).toBeGreaterThanOrEqual(2);
    expect(words).toContain(`Page ${pages} of ${pages}`);
    expect(pdf.toString('latin1')).toContain('/Subtype /Image');
  });
});
