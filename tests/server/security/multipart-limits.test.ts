import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { Test } from 'supertest';
import { buildPrint } from '../../support/factories';
import { buildJpeg } from '../../support/images';
import { buildCsv, buildCsvRow, CSV_MAPPING } from '../../support/imports';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

/** Every multipart route bounds its fields, their size and its parts; list pages are bounded. */
let t: TestApp;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  printId = (await (await t.as('archivist')).post('/api/prints').send(buildPrint())).body.id;
});
afterAll(() => t.close());

const cgats = Buffer.from(
  ['CGATS.17', 'CREATED "2026-06-01"', 'BEGIN_DATA_FORMAT', 'SAMPLE_NAME LAB_L LAB_A LAB_B']
    .concat(['END_DATA_FORMAT', 'BEGIN_DATA', 'X1/dmax 28 6 9', 'END_DATA', ''])
    .join('\n'),
);

function withFields(request: Test, count: number, value = 'x'): Test {
  for (let i = 0; i < count; i += 1) request.field(`extra${i}`, value);
  return request;
}

/** A 422 in plain words: no multer wording such as "Too many fields" or "LIMIT_". */
function expectPlainRefusal(response: Awaited<Test>) {
  expectProblem(response, 422);
  const text = JSON.stringify(response.body);
  expect(text).not.toMatch(/LIMIT_|Too many|Field value too long|Unexpected field/);
}

describe('multipart limits', () => {
  it('the tone-check import refuses many fields', async () => {
    const conservator = await t.as('conservator');
    const post = () => conservator.post('/api/tone-checks/import?dryRun=1');
    expect((await post().attach('file', cgats, 'round.txt')).status).toBe(200);
    expectPlainRefusal(await withFields(post(), 200).attach('file', cgats, 'round.txt'));
  });

  it('the tone-check import refuses a long field', async () => {
    const conservator = await t.as('conservator');
    const response = await withFields(
      conservator.post('/api/tone-checks/import?dryRun=1'),
      1,
      'x'.repeat(200_000),
    ).attach('file', cgats, 'round.txt');
    expectPlainRefusal(response);
  });

  it('the CSV import refuses many fields and an over-long mapping', async () => {
    const archivist = await t.as('archivist');
    const csv = Buffer.from(buildCsv([buildCsvRow(1)]));
    const post = () =>
      archivist.post('/api/imports?dryRun=1').field('mapping', JSON.stringify(CSV_MAPPING));
    expectPlainRefusal(await withFields(post(), 200).attach('file', csv, 'prints.csv'));
    const long = await archivist
      .post('/api/imports?dryRun=1')
      .field('mapping', JSON.stringify({ ...CSV_MAPPING, padding: 'x'.repeat(2_000_000) }))
      .attach('file', csv, 'prints.csv');
    expectPlainRefusal(long);
  });

  it('the image upload refuses many fields in plain words', async () => {
    const archivist = await t.as('archivist');
    const response = await withFields(
      archivist.post(`/api/prints/${printId}/assets`).field('view', 'recto'),
      50,
    ).attach('file', await buildJpeg(64, 64), 'scan.jpg');
    expectPlainRefusal(response);
  });
});

describe('GET /api/prints page', () => {
  it('accepts page 10,000 and refuses 10,001 with 422', async () => {
    const viewer = await t.as('viewer');
    expect((await viewer.get('/api/prints?page=10000')).status).toBe(200);
    expectProblem(await viewer.get('/api/prints?page=10001'), 422);
    expectProblem(await viewer.get('/api/prints?page=1e12'), 422);
  });
});
