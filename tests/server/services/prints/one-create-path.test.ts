import fc from 'fast-check';
import { QueryTypes } from 'sequelize';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { PRINT_STATUSES, PROCESSES } from '../../../../shared/domain/vocabulary';
import { rowToPrint } from '../../../../server/services/imports/row-to-print';
import { buildCsv, CSV_MAPPING, importCsv } from '../../../support/imports';
import { startTestApp, type SignedIn, type TestApp } from '../../../support/test-app';
import { readJson } from '../../../../server/repositories/decode-columns';

// Issue 14: a print typed into the form and the same print imported from a spreadsheet are
// stored identically — the print's row, its processing steps and its audit event — whether
// the import wrote its rows as one batch or one by one.
let t: TestApp;
let archivist: SignedIn;
beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
});
afterAll(() => t.close());

const HEADERS = [...Object.keys(CSV_MAPPING), 'Status', 'Tags', 'Sheet width (mm)'];
const MAPPING = {
  ...CSV_MAPPING,
  Status: 'status',
  Tags: 'tags',
  'Sheet width (mm)': 'sheetWidthMm',
};
const COLUMNS = Object.fromEntries(
  HEADERS.map((header, index) => [(MAPPING as Record<string, string>)[header], index]),
);

const words = fc.stringMatching(/^[A-Za-z][A-Za-z ,.'-]{0,30}[A-Za-z.]$/);
const minutes = fc.oneof(
  fc.constant(''),
  fc.integer({ min: 1, max: 600 }).map((tenths) => String(tenths / 10)),
);
/** The cells of one spreadsheet row, accession number aside. */
const rowArb = fc.record({
  title: words,
  process: fc.constantFrom(...PROCESSES),
  maker: fc.oneof(fc.constant(''), words),
  madeOn: fc.constantFrom('', '2019', '1890s', '2021-05-03', '2022-11'),
  fixing: minutes,
  washing: minutes,
  description: fc.oneof(fc.constant(''), words),
  status: fc.constantFrom('', ...PRINT_STATUSES),
  tags: fc.constantFrom('', 'study', 'study; portrait', 'gift|exhibited'),
  sheetWidth: fc.constantFrom('', '203.2', '254'),
});
type Row = typeof rowArb extends fc.Arbitrary<infer T> ? T : never;
const cells = (accession: string, row: Row) => [
  accession,
  row.title,
  row.process,
  row.maker,
  row.madeOn,
  row.fixing,
  row.washing,
  row.description,
  row.status,
  row.tags,
  row.sheetWidth,
];

/** What is stored of a print, minus what must differ (ids, number, times). */
async function stored(accessionNumber: string) {
  const [print] = await t.ctx.sequelize.query<Record<string, unknown>>(
    'SELECT * FROM prints WHERE accession_number = ?',
    { replacements: [accessionNumber], type: QueryTypes.SELECT },
  );
  expect(print, accessionNumber).toBeDefined();
  const steps = await t.ctx.sequelize.query<Record<string, unknown>>(
    'SELECT * FROM processing_steps WHERE print_id = ? ORDER BY position',
    { replacements: [print!.id], type: QueryTypes.SELECT },
  );
  const [audit] = await t.ctx.sequelize.query<{ action: string; after: string; before: unknown }>(
    "SELECT action, before, after FROM audit_events WHERE entity = 'print' AND entity_id = ?",
    { replacements: [print!.id], type: QueryTypes.SELECT },
  );
  const { id: _id, accession_number: _n, created_at: _c, updated_at: _u, ...row } = print!;
  const after = readJson<Record<string, unknown>>(audit!.after);
  // Where the print came from is kept beside the record: it is the one thing that differs.
  const { accessionNumber: _an, source, ...record } = after;
  return {
    row,
    steps: steps.map(({ id: _sid, print_id: _pid, ...step }) => step),
    audit: { action: audit!.action, before: audit!.before, record },
    source: (source as { from?: string } | undefined)?.from,
  };
}

let runs = 0;
describe('one way to create a print', () => {
  it('stores a print from the form and the same print from an import identically', async () => {
    await fc.assert(
      fc.asyncProperty(fc.array(rowArb, { minLength: 1, maxLength: 6 }), async (rows) => {
        runs += 1;
        const imported = rows.map((_row, i) => `IMP.${runs}.${i}`);
        const result = await importCsv(
          archivist,
          buildCsv(
            rows.map((row, i) => cells(imported[i]!, row)),
            HEADERS,
          ),
          { mapping: MAPPING },
        );
        expect(result.status, JSON.stringify(result)).toBe('done');
        for (const [i, row] of rows.entries()) {
          const lookups = {
            papers: new Map(),
            negatives: new Map(),
            locations: new Map(),
            sources: new Map(),
          };
          const { input, errors } = rowToPrint(cells(`FORM.${runs}.${i}`, row), COLUMNS, lookups);
          expect(errors).toEqual([]);
          const created = await archivist.post('/api/prints').send(input!);
          expect(created.status, JSON.stringify(created.body)).toBe(201);
          const fromForm = await stored(`FORM.${runs}.${i}`);
          const fromImport = await stored(imported[i]!);
          expect(fromForm.source).toBe('form');
          expect(fromImport).toEqual({ ...fromForm, source: 'import' });
        }
      }),
      { numRuns: 8 },
    );
  }, 120_000);
});
