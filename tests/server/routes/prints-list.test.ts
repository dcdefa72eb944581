import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint, buildSaltSteps } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
let ragId: number;
let kozoId: number;
beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  ragId = (await archivist.post('/api/papers').send({ name: 'Cotton rag 300' })).body.id;
  kozoId = (await archivist.post('/api/papers').send({ name: 'Kozo tissue 45' })).body.id;
  const prints = [
    buildPrint({
      accessionNumber: '2021.0001',
      title: 'Weir below the footbridge',
      paperId: ragId,
      madeOn: '2020-06-01',
      processing: buildSaltSteps({ fixing: 12, washing: 30 }),
    }),
    buildPrint({
      accessionNumber: '2021.0002',
      title: 'Orchard gate in frost',
      paperId: ragId,
      madeOn: 'c. 2019',
      processing: buildSaltSteps({ fixing: 6, washing: 4 }),
    }),
    buildPrint({
      accessionNumber: '2022.0001',
      title: 'Flax field',
      paperId: kozoId,
      madeOn: '2022',
      tags: ['botanical'],
      processing: buildSaltSteps({ fixing: 15, washing: 3 }),
    }),
    buildPrint({
      accessionNumber: '2022.0002',
      title: 'Quarry face',
      process: 'cyanotype',
      madeOn: '2018',
      processing: [
        { stage: 'exposure', minutes: 12 },
        { stage: 'washing', minutes: 15 },
      ],
    }),
  ];
  for (const print of prints)
    expect((await archivist.post('/api/prints').send(print)).status).toBe(201);
});
afterAll(() => t.close());

const accessions = (body: { items: Array<{ accessionNumber: string }> }) =>
  body.items.map((item) => item.accessionNumber);

describe('GET /api/prints', () => {
  it('lists for a viewer with total, paging and list fields', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?pageSize=2&page=2&sort=accession');
    expect(response.status).toBe(200);
    expect(response.body).toMatchObject({ total: 4, page: 2, pageSize: 2 });
    expect(accessions(response.body)).toEqual(['2022.0001', '2022.0002']);
    expect(Object.keys(response.body.items[0]).sort()).toEqual(
      expect.arrayContaining([
        'id',
        'accessionNumber',
        'title',
        'process',
        'paper',
        'fixingMinutes',
        'washingMinutes',
        'toneStatus',
      ]),
    );
  });

  it('filters by paper, fixing and washing minutes: "cotton rag, fixed at least 10, washed at least 5"', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get(
      `/api/prints?paperId=${ragId}&fixingMinutesMin=10&washingMinutesMin=5`,
    );
    expect(accessions(response.body)).toEqual(['2021.0001']);
  });

  it('finds prints fixed at least 10 minutes but washed under 5', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?fixingMinutesMin=10&washingMinutesMax=4.9');
    expect(accessions(response.body)).toEqual(['2022.0001']);
  });

  it('finds prints whose processing breaks a rule of thumb', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?processingRisk=true&sort=accession');
    expect(accessions(response.body)).toEqual(['2021.0002', '2022.0001']);
  });

  it('searches words with prefixes and typos, and by accession number', async () => {
    const viewer = await t.as('viewer');
    expect(accessions((await viewer.get('/api/prints?q=orch')).body)).toEqual(['2021.0002']);
    expect(accessions((await viewer.get('/api/prints?q=footbrigde')).body)).toEqual(['2021.0001']);
    expect(accessions((await viewer.get('/api/prints?q=2022.0002')).body)).toEqual(['2022.0002']);
    expect(accessions((await viewer.get('/api/prints?q=botanical')).body)).toEqual(['2022.0001']);
  });

  it('finds a print created or retitled after the index was built', async () => {
    const viewer = await t.as('viewer');
    expect((await viewer.get('/api/prints?q=heron')).body.total).toBe(0);
    const archivist = await t.as('archivist');
    const created = await archivist
      .post('/api/prints')
      .send(buildPrint({ title: 'Heron at the sluice' }));
    expect(accessions((await viewer.get('/api/prints?q=heron')).body)).toEqual([
      created.body.accessionNumber,
    ]);
    await archivist.patch(`/api/prints/${created.body.id}`).send({ title: 'Egret at the sluice' });
    expect((await viewer.get('/api/prints?q=heron')).body.total).toBe(0);
    expect((await viewer.get('/api/prints?q=egret')).body.total).toBe(1);
    await archivist.delete(`/api/prints/${created.body.id}`);
  });

  it('finds approximate dates by overlap: c. 2019 falls in 2020', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get(
      '/api/prints?madeFrom=2020-01-01&madeTo=2020-12-31&sort=accession',
    );
    expect(accessions(response.body)).toEqual(['2021.0001', '2021.0002']);
  });

  it('sorts by date made, newest first', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?sort=-madeOn');
    // By the middle of each date's range: 2022 (mid-2022), 2020-06-01, c. 2019 (2017–2021,
    // mid-2019), 2018 — "c. 2019" is not newer than a print of June 2020.
    expect(accessions(response.body)).toEqual(['2022.0001', '2021.0001', '2021.0002', '2022.0002']);
  });

  it('counts facets for the current query', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get(`/api/prints?paperId=${ragId}`);
    expect(response.body.facets.process).toEqual([{ value: 'salt print', count: 2 }]);
    expect(response.body.facets.paperId).toEqual([{ value: ragId, count: 2 }]);
    expect(response.body.facets.toneStatus).toEqual([{ value: 'unchecked', count: 2 }]);
  });

  it('refuses an inverted range with a plain message, not an empty list', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/prints?washingMinutesMin=30&washingMinutesMax=10');
    expectProblem(response, 422);
    expect(response.body.errors).toEqual([
      {
        path: 'washingMinutesMax',
        message:
          'The range of washing minutes ends (10) before it starts (30): swap the two values.',
      },
    ]);
    const dates = await viewer.get('/api/prints?madeFrom=2022-01-01&madeTo=2020-01-01');
    expectProblem(dates, 422);
  });

  // Intl.Collator numeric collation (ECMA-402) is the reference: "2" < "10" < "100".
  it('sorts numbers within titles as numbers', async () => {
    const archivist = await t.as('archivist');
    for (const n of [100, 2, 10]) {
      await archivist
        .post('/api/prints')
        .send(buildPrint({ title: `Sluice print ${n}`, processing: [] }))
        .expect(201);
    }
    const response = await archivist.get('/api/prints?q=sluice&sort=title');
    expect(response.body.items.map((item: { title: string }) => item.title)).toEqual([
      'Sluice print 2',
      'Sluice print 10',
      'Sluice print 100',
    ]);
  });

  it('answers 422 for an invalid query and 401 without a session', async () => {
    const viewer = await t.as('viewer');
    const invalid = await viewer.get('/api/prints?pageSize=500&sort=colour&process=tintype');
    expectProblem(invalid, 422);
    expect(invalid.body.errors.map((e: { path: string }) => e.path).sort()).toEqual([
      'pageSize',
      'process',
      'sort',
    ]);
    expectProblem(await t.anonymous().get('/api/prints'), 401);
  });
});

describe('GET /api/prints.csv', () => {
  it('gives a curator every match as CSV', async () => {
    const curator = await t.as('curator');
    const response = await curator.get('/api/prints.csv?processingRisk=true&sort=accession');
    expect(response.status).toBe(200);
    expect(response.headers['content-type']).toMatch(/^text\/csv/);
    // Named for what it holds (not a checklist, which is its own thing) and the day it was made.
    const today = new Date().toISOString().slice(0, 10);
    expect(response.headers['content-disposition']).toBe(
      `attachment; filename=printwarden-prints-${today}.csv`,
    );
    const lines = response.text.trim().split('\n');
    expect(lines[0]).toMatch(/^accessionNumber,title,/);
    expect(lines.slice(1).map((line) => line.split(',')[0])).toEqual(['2021.0002', '2022.0001']);
  });

  it('quotes titles a spreadsheet would run as formulas', async () => {
    const archivist = await t.as('archivist');
    await archivist
      .post('/api/prints')
      .send(buildPrint({ accessionNumber: '2023.0001', title: '=HYPERLINK("x")' }));
    const response = await (await t.as('curator')).get('/api/prints.csv?q=2023.0001');
    expect(response.text.split('\n')[1]).toMatch(/^2023\.0001,"'=HYPERLINK\(""x""\)",/);
  });

  it('is refused to a viewer (403) and without a session (401); 422 for a bad query', async () => {
    expectProblem(await (await t.as('viewer')).get('/api/prints.csv'), 403);
    expectProblem(await t.anonymous().get('/api/prints.csv'), 401);
    expectProblem(await (await t.as('curator')).get('/api/prints.csv?fixingMinutesMin=lots'), 422);
  });
});
