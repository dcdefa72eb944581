import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildCgatsFile } from '../../support/cgats';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let accession: string;
beforeAll(async () => {
  t = await startTestApp();
  const print = await (
    await t.as('archivist')
  )
    .post('/api/prints')
    .send(buildPrint({ madeOn: '2020' }));
  accession = print.body.accessionNumber;
});
afterAll(() => t.close());

/** A file as the store room's instrument writes it, with who made it and on what. */
const file = (rows: string[]) =>
  buildCgatsFile(rows, {
    keywords: { ORIGINATOR: 'Store room round', INSTRUMENTATION: 'Bench spectrophotometer' },
  });

describe('CGATS.17 import', () => {
  it('previews on a dry run, then creates one check per print and day, skipping rows with reasons', async () => {
    const conservator = await t.as('conservator');
    const body = file([
      `1 "${accession}/dmax" 28.4 6.1 9.8`,
      `2 "${accession}/dmin" 93.0 0.4 4.1`,
      '3 "1999.9999/dmax" 28.4 6.1 9.8',
      `4 "${accession}/mid" 55.0 200 12.0`,
      '5 "no-slash" 50 0 0',
    ]);
    const preview = await conservator
      .post('/api/tone-checks/import?dryRun=1')
      .attach('file', body, 'round.txt');
    expect(preview.status).toBe(200);
    expect(preview.body).toMatchObject({ created: 0, dryRun: true });
    const printId = preview.body.checks[0].printId;
    expect((await conservator.get(`/api/prints/${printId}/tone-checks`)).body.items).toHaveLength(
      0,
    );

    const imported = await conservator
      .post('/api/tone-checks/import')
      .attach('file', body, 'round.txt');
    expect(imported.status).toBe(201);
    expect(imported.body.created).toBe(1);
    expect(imported.body.checks[0]).toMatchObject({
      accessionNumber: accession,
      checkedOn: '2026-06-01',
      patches: ['dmax', 'dmin'],
    });
    expect(imported.body.skipped.map((s: { row: number }) => s.row)).toEqual([11, 12, 13]);
    expect(imported.body.skipped[0].reason).toMatch(/no print with accession number 1999.9999/);
    expect(imported.body.skipped[1].reason).toMatch(/a\*/);
    const checks = await conservator.get(
      `/api/prints/${imported.body.checks[0].printId}/tone-checks`,
    );
    expect(checks.body.items[0]).toMatchObject({
      instrument: 'Bench spectrophotometer',
      checkedOn: '2026-06-01',
    });
  });

  it('skips every row of a file dated on a day that does not exist, saying why', async () => {
    const conservator = await t.as('conservator');
    const body = buildCgatsFile([`1 "${accession}/dmax" 28.4 6.1 9.8`], {
      created: '2023-02-29',
    });
    const imported = await conservator
      .post('/api/tone-checks/import')
      .attach('file', body, 'round.txt');
    expect(imported.body.created).toBe(0);
    expect(imported.body.skipped).toEqual([
      { row: expect.any(Number), reason: '2023-02-29 is not a date: February 2023 has 28 days.' },
    ]);
  });

  it('a malformed file is 422 naming the line; no file 422; a curator 403; no session 401', async () => {
    const conservator = await t.as('conservator');
    const broken = await conservator
      .post('/api/tone-checks/import')
      .attach('file', file([`1 "${accession}/dmax" 28.4 6.1`]), 'broken.txt');
    expectProblem(broken, 422);
    expect(broken.body.errors[0]).toMatchObject({
      path: 'file.line.9',
      message: expect.stringMatching(/^Line 9: 4 values/),
    });
    expectProblem(await conservator.post('/api/tone-checks/import').send({}), 422);
    expectProblem(
      await (
        await t.as('curator')
      )
        .post('/api/tone-checks/import')
        .attach('file', file([]), 'x.txt'),
      403,
    );
    expectProblem(await t.anonymous().post('/api/tone-checks/import'), 401);
  });
});
