import iconv from 'iconv-lite';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent, Print } from '../../../server/models';
import { buildCsv, buildCsvRow, CSV_HEADERS, CSV_MAPPING, importCsv } from '../../support/imports';
import { errorPaths, expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const rows = (from: number, to: number) =>
  Array.from({ length: to - from + 1 }, (_, index) => buildCsvRow(from + index));

describe('POST /api/imports/inspection', () => {
  it('reads the columns and guesses the mapping from their names', async () => {
    const archivist = await t.as('archivist');
    const response = await archivist
      .post('/api/imports/inspection')
      .attach('file', Buffer.from(buildCsv(rows(1, 3))), 'prints.csv')
      .expect(200);
    expect(response.body.headers).toEqual(CSV_HEADERS);
    expect(response.body.encoding).toBe('utf-8');
    expect(response.body.sample).toHaveLength(3);
    expect(response.body.mapping).toMatchObject({
      'Accession no.': 'accessionNumber',
      Title: 'title',
      Process: 'process',
    });
  });
});

describe('dry run', () => {
  it('previews every row with its errors and writes nothing', async () => {
    const archivist = await t.as('archivist');
    const before = await Print.count();
    const csv = buildCsv([
      ...rows(1, 4),
      buildCsvRow(5, { Process: 'daguerreotype' }),
      buildCsvRow(6, { Title: '' }),
    ]);
    const job = await importCsv(archivist, csv, { dryRun: true });
    expect(job).toMatchObject({ status: 'done', dryRun: true, rows: 6, processed: 6, imported: 0 });
    expect(job.preview.map((row: { action: string }) => row.action)).toEqual([
      'create',
      'create',
      'create',
      'create',
      'invalid',
      'invalid',
    ]);
    expect(job.failed).toEqual([
      { row: 6, errors: [expect.objectContaining({ field: 'process' })] },
      { row: 7, errors: [expect.objectContaining({ field: 'title' })] },
    ]);
    expect(await Print.count()).toBe(before);
  });
});

describe('import', () => {
  it('imports the good rows, lists the bad ones, and re-importing never duplicates', async () => {
    const archivist = await t.as('archivist');
    const csv = buildCsv([
      ...rows(101, 110),
      buildCsvRow(111, { 'Fixing (min)': 'twelve' }),
      buildCsvRow(112, { Title: '=HYPERLINK("http://x.test","click")' }),
      buildCsvRow(101, { Title: 'Same number again' }),
    ]);
    const job = await importCsv(archivist, csv);
    expect(job).toMatchObject({ status: 'done', rows: 13, processed: 13, imported: 10 });
    expect(job.failed.map((failure: { row: number }) => failure.row)).toEqual([12, 13, 14]);
    expect(job.failed[1].errors[0].message).toMatch(/formula/);
    expect(job.failed[2].errors[0].message).toMatch(/already on row 2/);
    const print = await Print.findOne({ where: { accessionNumber: 'IMP.00105' } });
    expect(print).toMatchObject({
      title: 'Imported print 105',
      fixingMinutes: 12,
      washingMinutes: 20,
    });
    expect(
      await AuditEvent.count({ where: { entity: 'print', entityId: print!.id, action: 'create' } }),
    ).toBe(1);

    const again = await importCsv(archivist, csv);
    expect(again).toMatchObject({ imported: 0, updated: 0, unchanged: 10 });
    expect(
      await Print.count({ where: { accessionNumber: rows(101, 110).map((row) => row[0]!) } }),
    ).toBe(10);

    // The failed rows come back as a CSV with their problems; fixed, they import.
    const failedCsv = await archivist.get(`/api/imports/${job.id}/failed.csv`).expect(200);
    expect(failedCsv.headers['content-type']).toMatch(/^text\/csv/);
    const parsed = Papa.parse<string[]>(failedCsv.text.replace(/^\uFEFF/, ''), {
      skipEmptyLines: true,
    }).data;
    expect(parsed[0]).toEqual([...CSV_HEADERS, 'problems']);
    expect(parsed).toHaveLength(4);
    expect(parsed[1]![5]).toBe('twelve');
    // The problem names the field as the import screen does, not by its key.
    expect(parsed[1]!.at(-1)).toMatch(/^Fixing \(minutes\): /);
    expect(parsed[2]![1]).toBe(`'=HYPERLINK("http://x.test","click")`); // defused for spreadsheets
    const fixed = parsed.slice(1, 3).map((row, index) => {
      const copy = [...row];
      copy[5] = '12';
      copy[1] = `Fixed print ${index}`;
      return copy;
    });
    const retry = await importCsv(archivist, buildCsv(fixed, [...CSV_HEADERS, 'problems']));
    expect(retry).toMatchObject({ status: 'done', imported: 2, failed: [] });

    // The list of recent imports gives each one's counts, not its failed or preview rows.
    const list = await archivist.get('/api/imports').expect(200);
    const listed = list.body.items.find((item: { id: number }) => item.id === job.id);
    expect(listed).toMatchObject({ status: 'done', rows: 13, processed: 13, imported: 10 });
    expect(listed).toMatchObject({ failed: [], preview: [] });
  });

  it('updates changed fields of an existing print by its accession number', async () => {
    const archivist = await t.as('archivist');
    await importCsv(archivist, buildCsv(rows(201, 202)));
    const job = await importCsv(
      archivist,
      buildCsv([buildCsvRow(201, { Title: 'Renamed' }), buildCsvRow(202)]),
    );
    expect(job).toMatchObject({ imported: 0, updated: 1, unchanged: 1 });
    expect((await Print.findOne({ where: { accessionNumber: 'IMP.00201' } }))!.title).toBe(
      'Renamed',
    );
  });

  it('reads Windows-1252, a BOM, and quoted newlines', async () => {
    const archivist = await t.as('archivist');
    const latin = iconv.encode(buildCsv([buildCsvRow(301, { Title: 'Café – étude' })]), 'win1252');
    const first = await importCsv(archivist, latin);
    expect(first).toMatchObject({ encoding: 'windows-1252', imported: 1 });
    expect((await Print.findOne({ where: { accessionNumber: 'IMP.00301' } }))!.title).toBe(
      'Café – étude',
    );

    const withBom = Buffer.concat([
      Buffer.from([0xef, 0xbb, 0xbf]),
      Buffer.from(buildCsv([buildCsvRow(302)])),
    ]);
    expect(await importCsv(archivist, withBom)).toMatchObject({ encoding: 'utf-8', imported: 1 });

    const multiline = buildCsv([
      buildCsvRow(303, { Description: 'First line\nsecond line, with a comma' }),
      buildCsvRow(304, { Process: 'unknown' }),
    ]);
    const job = await importCsv(archivist, multiline);
    expect(job.imported).toBe(1);
    expect(job.failed.map((failure: { row: number }) => failure.row)).toEqual([3]);
    expect((await Print.findOne({ where: { accessionNumber: 'IMP.00303' } }))!.description).toBe(
      'First line\nsecond line, with a comma',
    );
  });

  // One row typed in a UTF-8 editor ("é" = C3 A9), one pasted from a Windows-1252 file
  // ("é" = E9): no single encoding reads both, so the misread row must be flagged, never stored.
  it('flags the rows of a file that mixes UTF-8 and Windows-1252, and reads it as chosen', async () => {
    const archivist = await t.as('archivist');
    const header = buildCsv([]);
    const utf8Row = Buffer.from(
      buildCsv([buildCsvRow(451, { Title: 'Café at noon' })], []).trimStart(),
    );
    const latinRow = iconv.encode(
      buildCsv([buildCsvRow(452, { Title: 'Étude of a weir' })], []).trimStart(),
      'win1252',
    );
    const mixed = Buffer.concat([Buffer.from(header), utf8Row, latinRow]);
    const failedRows = (job: { failed: Array<{ row: number }> }) =>
      job.failed.map((failure) => failure.row);

    const auto = await importCsv(archivist, mixed, { dryRun: true });
    expect(auto.encoding).toBe('windows-1252');
    expect(failedRows(auto)).toEqual([2]);
    expect(auto.failed[0].errors[0]).toMatchObject({ field: 'title' });
    expect(auto.failed[0].errors[0].message).toMatch(/Choose the file’s encoding/);

    const asUtf8 = await importCsv(archivist, mixed, { dryRun: true, encoding: 'utf-8' });
    expect(asUtf8.encoding).toBe('utf-8');
    expect(failedRows(asUtf8)).toEqual([3]);

    // A UTF-8 byte-order mark does not make the Windows-1252 row readable.
    const bom = Buffer.concat([Buffer.from([0xef, 0xbb, 0xbf]), mixed]);
    const imported = await importCsv(archivist, bom);
    expect(failedRows(imported)).toEqual([3]);
    expect(await Print.count({ where: { accessionNumber: 'IMP.00452' } })).toBe(0);
    expect((await Print.findOne({ where: { accessionNumber: 'IMP.00451' } }))!.title).toBe(
      'Café at noon',
    );
    expectProblem(
      await archivist
        .post('/api/imports?encoding=latin-9')
        .field('mapping', JSON.stringify(CSV_MAPPING))
        .attach('file', mixed, 'prints.csv'),
      422,
    );
  });

  // Fixing and washing columns say nothing of a pre-wash: not knowing is not "no pre-wash".
  it('does not say an imported print had no pre-wash when only fixing and washing are known', async () => {
    const archivist = await t.as('archivist');
    await importCsv(archivist, buildCsv([buildCsvRow(501)]));
    const print = await Print.findOne({ where: { accessionNumber: 'IMP.00501' } });
    const codes = (print!.riskReasons ?? []).map((reason: { code: string }) => reason.code);
    expect(codes).not.toContain('no-prewash');
    expect(print!.hasProcessingRisk).toBe(false);
  });

  it('accepts 50,000 rows (dry run)', async () => {
    const archivist = await t.as('archivist');
    const job = await importCsv(archivist, buildCsv(rows(10_000, 59_999)), { dryRun: true });
    expect(job).toMatchObject({ status: 'done', rows: 50_000, processed: 50_000, failed: [] });
  }, 120_000);
});

describe('refusals', () => {
  it('answers 422 for missing required columns, unknown columns, no file, no mapping or an empty file', async () => {
    const archivist = await t.as('archivist');
    const csv = Buffer.from(buildCsv(rows(1, 2)));
    const noTitle = { ...CSV_MAPPING } as Record<string, string>;
    delete noTitle.Title;
    const missing = await archivist
      .post('/api/imports')
      .field('mapping', JSON.stringify(noTitle))
      .attach('file', csv, 'prints.csv');
    expectProblem(missing, 422);
    expect(errorPaths(missing)).toContain('mapping.title');

    const unknown = await archivist
      .post('/api/imports')
      .field('mapping', JSON.stringify({ ...CSV_MAPPING, Colour: 'tags' }))
      .attach('file', csv, 'prints.csv');
    expectProblem(unknown, 422);
    expect(errorPaths(unknown)).toEqual(['mapping.Colour']);

    expectProblem(
      await archivist.post('/api/imports').field('mapping', JSON.stringify(CSV_MAPPING)),
      422,
    );
    expectProblem(await archivist.post('/api/imports').attach('file', csv, 'prints.csv'), 422);
    const empty = await archivist
      .post('/api/imports')
      .field('mapping', JSON.stringify(CSV_MAPPING))
      .attach('file', Buffer.from(''), 'empty.csv');
    expectProblem(empty, 422);
    expect(empty.body.errors[0].path).toBe('file');
  });

  it('is for archivists and admins only', async () => {
    const csv = Buffer.from(buildCsv(rows(401, 401)));
    const admin = await t.as('admin');
    expect((await importCsv(admin, csv.toString())).imported).toBe(1);
    for (const role of ['curator', 'conservator', 'viewer'] as const) {
      const agent = await t.as(role);
      expectProblem(
        await agent
          .post('/api/imports')
          .field('mapping', JSON.stringify(CSV_MAPPING))
          .attach('file', csv, 'p.csv'),
        403,
      );
      expectProblem(await agent.get('/api/imports/1'), 403);
    }
    expectProblem(await t.anonymous().post('/api/imports'), 401);
    expectProblem(await t.anonymous().get('/api/imports/1'), 401);
    expectProblem(await admin.get('/api/imports/99999'), 404);
    expectProblem(await admin.get('/api/imports/99999/failed.csv'), 404);
  });
});
