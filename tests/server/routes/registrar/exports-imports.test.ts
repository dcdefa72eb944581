import jsonld from 'jsonld';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../../support/factories';
import { buildCsv, importCsv } from '../../../support/imports';
import { IN_COPYRIGHT, makeSource, NO_KNOWN_COPYRIGHT } from '../../../support/registrar';
import { startTestApp, type SignedIn, type TestApp } from '../../../support/test-app';

// Expected IRIs: DCMI Metadata Terms (http://purl.org/dc/terms/, as DCMI publishes them),
// schema.org's vocabulary (http://schema.org/, the @vocab of its own JSON-LD context, which
// the documents' context uses) and RDF Schema (http://www.w3.org/2000/01/rdf-schema#).
const SCHEMA = 'http://schema.org/';
const DCTERMS = 'http://purl.org/dc/terms/';
const RDFS = 'http://www.w3.org/2000/01/rdf-schema#';

type Expanded = Record<string, Array<Record<string, unknown>>>;
const values = (node: Expanded, iri: string) =>
  (node[iri] ?? []).map((item) => item['@value'] ?? item['@id']);

let t: TestApp;
let archivist: SignedIn;
let printId: number;

beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
  const sourceId = await makeSource(archivist, {
    name: 'Marguerite Ollis',
    kind: 'person',
    contact: 'marguerite@ollis.test',
  });
  const created = await archivist.post('/api/prints').send(
    buildPrint({
      accessionNumber: 'REG.0001',
      acquisition: {
        method: 'gift',
        sourceId,
        acquiredOn: '2024-03-02',
        reference: 'DA-2024-7',
        creditLine: 'Gift of Marguerite Ollis, 2024',
        price: 90,
      },
      provenance: [
        { owner: 'The maker', from: 'c. 1905', to: '1931', evidence: 'Studio stamp' },
        { owner: 'Edith Ollis', from: '1931', to: '1998' },
      ],
      rights: { statement: IN_COPYRIGHT, holder: 'Estate of J. Tait', note: 'Ask first' },
      marks: [
        {
          position: 'verso',
          kind: 'pencil inscription',
          transcription: 'Lerwick, Aug. 1907',
          reading: 'Lerwick, August 1907',
        },
        { position: 'verso', kind: 'ink stamp', transcription: 'J. TAIT LERWICK' },
        { position: 'folder', kind: 'label', transcription: 'insured 90', private: true },
      ],
    }),
  );
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  printId = created.body.id;
});
afterAll(() => t.close());

describe('JSON-LD', () => {
  it('carries provenance, rights, holder, credit line and inscriptions as DC and schema.org terms', async () => {
    const response = await (await t.as('viewer')).get(`/api/prints/${printId}.jsonld`).expect(200);
    expect(response.text).not.toMatch(/insured 90|marguerite@ollis|"price"/);
    const [node] = (await jsonld.expand(JSON.parse(response.text))) as Expanded[];
    const provenance = (node![`${DCTERMS}provenance`] as Expanded[])[0]!;
    expect(provenance['@type']).toEqual([`${DCTERMS}ProvenanceStatement`]);
    expect(values(provenance, `${RDFS}label`)).toEqual([
      'The maker (c. 1905 to 1931) [Studio stamp]; Edith Ollis (1931 to 1998); Gift of Marguerite Ollis, 2024-03-02 (DA-2024-7).',
    ]);
    expect(values(node!, `${DCTERMS}rights`)).toEqual([IN_COPYRIGHT]);
    expect(values(node!, `${SCHEMA}copyrightHolder`)).toEqual(['Estate of J. Tait']);
    expect(values(node!, `${SCHEMA}creditText`)).toEqual(['Gift of Marguerite Ollis, 2024']);
    const marks = node![`${SCHEMA}hasPart`] as Expanded[];
    expect(marks.map((mark) => values(mark, `${SCHEMA}text`)[0])).toEqual([
      'Lerwick, Aug. 1907',
      'J. TAIT LERWICK',
    ]);
    expect(values(marks[0]!, `${SCHEMA}name`)).toEqual(['pencil inscription, verso']);
    expect(values(marks[0]!, `${SCHEMA}description`)).toEqual(['Lerwick, August 1907']);
  });

  it('the catalogue document carries the same terms', async () => {
    const response = await (await t.as('curator')).get('/api/prints.jsonld').expect(200);
    const [collection] = (await jsonld.expand(JSON.parse(response.text))) as Expanded[];
    const part = (collection![`${SCHEMA}hasPart`] as Expanded[]).find(
      (item) => values(item, `${SCHEMA}identifier`)[0] === 'REG.0001',
    )!;
    expect(values(part, `${DCTERMS}rights`)).toEqual([IN_COPYRIGHT]);
    expect(values(part, `${SCHEMA}creditText`)).toEqual(['Gift of Marguerite Ollis, 2024']);
  });
});

describe('CSV export and import', () => {
  it('exports the registrar columns (no price, no private mark) and imports them back', async () => {
    const curator = await t.as('curator');
    const exported = await curator.get('/api/prints.csv?q=REG.0001').expect(200);
    const rows = Papa.parse<Record<string, string>>(exported.text, { header: true }).data.filter(
      (row) => row.accessionNumber,
    );
    expect(rows).toHaveLength(1);
    expect(rows[0]).toMatchObject({
      acquisitionMethod: 'gift',
      source: 'Marguerite Ollis',
      acquiredOn: '2024-03-02',
      acquisitionReference: 'DA-2024-7',
      creditLine: 'Gift of Marguerite Ollis, 2024',
      provenance: 'The maker (c. 1905 to 1931); Edith Ollis (1931 to 1998)',
      rightsStatement: IN_COPYRIGHT,
      rightsHolder: 'Estate of J. Tait',
      rightsNote: 'Ask first',
      inscriptions:
        'verso, pencil inscription: Lerwick, Aug. 1907 | verso, ink stamp: J. TAIT LERWICK',
    });
    expect(exported.text).not.toMatch(/insured 90|\b90\b/);

    // The same file under a new accession number, its columns mapped as the import guesses.
    const again = exported.text.replace('REG.0001', 'REG.0002');
    const inspection = await archivist
      .post('/api/imports/inspection')
      .attach('file', Buffer.from(again), 'export.csv')
      .expect(200);
    for (const column of ['source', 'provenance', 'rightsStatement', 'inscriptions'])
      expect(inspection.body.mapping[column], column).toBe(column);
    const job = await importCsv(archivist, again, { mapping: inspection.body.mapping });
    expect(job, JSON.stringify(job.failed)).toMatchObject({ status: 'done', imported: 1 });
    const found = await archivist.get('/api/prints?q=REG.0002');
    const print = (await archivist.get(`/api/prints/${found.body.items[0].id}`)).body;
    expect(print.acquisition).toMatchObject({
      method: 'gift',
      source: { name: 'Marguerite Ollis' },
      creditLine: 'Gift of Marguerite Ollis, 2024',
    });
    expect(print.provenance).toEqual([
      { owner: 'The maker', from: 'c. 1905', to: '1931', evidence: null },
      { owner: 'Edith Ollis', from: '1931', to: '1998', evidence: null },
    ]);
    expect(print.rights).toMatchObject({ statement: IN_COPYRIGHT, holder: 'Estate of J. Tait' });
    expect(print.marks.map((mark: { transcription: string }) => mark.transcription)).toEqual([
      'Lerwick, Aug. 1907',
      'J. TAIT LERWICK',
    ]);
  });

  it('names a rights statement by URI or label; anything else is a clear row error', async () => {
    const headers = ['Accession', 'Title', 'Process', 'Rights', 'Donor', 'Method', 'Acquired on'];
    const mapping = {
      Accession: 'accessionNumber',
      Title: 'title',
      Process: 'process',
      Rights: 'rightsStatement',
      Donor: 'source',
      Method: 'acquisitionMethod',
      'Acquired on': 'acquiredOn',
    };
    const csv = buildCsv(
      [
        ['RI.1', 'By label', 'cyanotype', 'No Known Copyright', '', '', ''],
        ['RI.2', 'By URI', 'cyanotype', IN_COPYRIGHT, '', '', ''],
        ['RI.3', 'Unknown', 'cyanotype', 'Public domain, probably', '', '', ''],
        ['RI.4', 'No such donor', 'cyanotype', '', 'Nobody Known', 'gift', '2020'],
        ['RI.5', 'Bad method', 'cyanotype', '', 'Marguerite Ollis', 'barter', '2020'],
      ],
      headers,
    );
    const job = await importCsv(archivist, csv, { mapping });
    expect(job.imported).toBe(2);
    expect(job.failed).toEqual([
      {
        row: 4,
        errors: [
          {
            field: 'rightsStatement',
            message: expect.stringMatching(
              /^“Public domain, probably” is not a RightsStatements\.org statement/,
            ),
          },
        ],
      },
      { row: 5, errors: [{ field: 'source', message: 'No source “Nobody Known”; add it first' }] },
      { row: 6, errors: [{ field: 'acquisitionMethod', message: expect.any(String) }] },
    ]);
    const byLabel = await archivist.get(
      `/api/prints?rightsStatement=${encodeURIComponent(NO_KNOWN_COPYRIGHT)}`,
    );
    expect(
      byLabel.body.items.map((item: { accessionNumber: string }) => item.accessionNumber),
    ).toEqual(['RI.1']);
  });

  it('an import changes the rights of an existing print and leaves its marks alone', async () => {
    const csv = buildCsv(
      [['REG.0001', 'Mill pond at dusk', 'salt print', NO_KNOWN_COPYRIGHT, '']],
      ['Accession', 'Title', 'Process', 'Rights', 'Marks'],
    );
    const job = await importCsv(archivist, csv, {
      mapping: {
        Accession: 'accessionNumber',
        Title: 'title',
        Process: 'process',
        Rights: 'rightsStatement',
        Marks: 'inscriptions',
      },
    });
    expect(job, JSON.stringify(job.failed)).toMatchObject({ updated: 1 });
    const print = (await archivist.get(`/api/prints/${printId}`)).body;
    expect(print.rights).toEqual({
      statement: NO_KNOWN_COPYRIGHT,
      label: 'No Known Copyright',
      holder: null,
      note: null,
    });
    expect(print.marks).toHaveLength(3);
  });
});
