import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildCgatsFile } from '../../support/cgats';
import { buildPrint } from '../../support/factories';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let accession: string;
let printId: number;
beforeAll(async () => {
  t = await startTestApp();
  const print = await (
    await t.as('archivist')
  )
    .post('/api/prints')
    .send(buildPrint({ madeOn: '2020' }));
  accession = print.body.accessionNumber;
  printId = print.body.id;
});
afterAll(() => t.close());

describe('importing the same instrument file twice', () => {
  it('warns and skips the checks already stored for that print, date and patch', async () => {
    const conservator = await t.as('conservator');
    const body = buildCgatsFile([
      `1 "${accession}/dmax" 28.4 6.1 9.8`,
      `2 "${accession}/dmin" 93.0 0.4 4.1`,
    ]);
    const first = await conservator.post('/api/tone-checks/import').attach('file', body, 'a.txt');
    expect(first.body).toMatchObject({ created: 1, warnings: [] });

    const preview = await conservator
      .post('/api/tone-checks/import?dryRun=1')
      .attach('file', body, 'a.txt');
    expect(preview.body.checks).toEqual([]);
    expect(preview.body.warnings).toEqual([
      `${accession}, 2026-06-01: 2 readings already stored, not imported again (was this file imported before?)`,
    ]);

    const again = await conservator.post('/api/tone-checks/import').attach('file', body, 'a.txt');
    expect(again.status).toBe(201);
    expect(again.body.created).toBe(0);
    expect(
      again.body.skipped.map((s: { row: number; reason: string }) => [s.row, s.reason]),
    ).toEqual([
      [7, `already stored: ${accession}/dmax checked on 2026-06-01`],
      [8, `already stored: ${accession}/dmin checked on 2026-06-01`],
    ]);
    const checks = await conservator.get(`/api/prints/${printId}/tone-checks`);
    expect(checks.body.items).toHaveLength(1);
  });

  it('imports only the new patch of a file that adds one to a stored day, and says "1 reading"', async () => {
    const conservator = await t.as('conservator');
    const body = buildCgatsFile([
      `1 "${accession}/dmax" 28.4 6.1 9.8`,
      `2 "${accession}/mid" 55 4 12`,
    ]);
    const result = await conservator.post('/api/tone-checks/import').attach('file', body, 'b.txt');
    expect(result.body.created).toBe(1);
    expect(result.body.checks[0].patches).toEqual(['mid']);
    expect(result.body.warnings[0]).toMatch(/: 1 reading already stored/);
  });
});
