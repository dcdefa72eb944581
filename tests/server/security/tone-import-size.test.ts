import { performance } from 'node:perf_hooks';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let accession: string;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  accession = (await archivist.post('/api/prints').send(buildPrint())).body.accessionNumber;
});
afterAll(() => t.close());

/**
 * A CGATS.17 file with `rows` short data rows (so 300,000 stay under the 5 MB upload limit):
 * row n reads unknown print U<n / 4 in base 36>, patch <n % 4>.
 */
function bigFile(rows: number, first: string[] = []): Buffer {
  const lines = ['CGATS.17', 'CREATED "2026-06-01"', 'BEGIN_DATA_FORMAT'];
  lines.push('SAMPLE_NAME LAB_L LAB_A LAB_B', 'END_DATA_FORMAT', 'BEGIN_DATA');
  lines.push(...first);
  for (let n = first.length; n < rows; n += 1)
    lines.push(`U${(n >> 2).toString(36)}/${n & 3} 5 1 2`);
  lines.push('END_DATA', '');
  return Buffer.from(lines.join('\n'));
}

describe('POST /api/tone-checks/import with large files', () => {
  it('answers a 300,000-row file of unknown prints at once, refusing it with a plain message', async () => {
    const conservator = await t.as('conservator');
    const body = bigFile(300_000);
    const started = performance.now();
    const response = await conservator
      .post('/api/tone-checks/import')
      .attach('file', body, 'x.txt');
    const seconds = (performance.now() - started) / 1000;
    console.info(`300,000-row CGATS file answered in ${seconds.toFixed(2)} s`);
    expectProblem(response, 413);
    expect(response.body.detail).toMatch(/300,000 rows.*at most 100,000/);
  });

  it('groups the skipped rows of a 100,000-row file by unknown print, and still stores the known', async () => {
    const conservator = await t.as('conservator');
    const body = bigFile(100_000, [`${accession}/dmax 28.4 6.1 9.8`]);
    const started = performance.now();
    const response = await conservator
      .post('/api/tone-checks/import')
      .attach('file', body, 'x.txt');
    const seconds = (performance.now() - started) / 1000;
    console.info(
      `100,000-row CGATS file (25,000 unknown prints) answered in ${seconds.toFixed(2)} s`,
    );
    expect(response.status).toBe(201);
    expect(response.body.created).toBe(1);
    // One entry per unknown print (U0 has rows 1–3 after the known row; U1 rows 4–7 …).
    expect(response.body.skipped).toHaveLength(25_000);
    expect(response.body.skipped[0]).toEqual({
      row: 8,
      reason: 'no print with accession number U0 (3 rows: 8, 9, 10)',
    });
    expect(response.body.skipped[1]).toEqual({
      row: 11,
      reason: 'no print with accession number U1 (4 rows: 11, 12, 13, 14)',
    });
  });
});
