import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../../support/factories';
import { IN_COPYRIGHT, NO_KNOWN_COPYRIGHT } from '../../../support/registrar';
import { startTestApp, type SignedIn, type TestApp } from '../../../support/test-app';

let t: TestApp;
let archivist: SignedIn;
beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
});
afterAll(() => t.close());

describe('rights', () => {
  it('keeps a RightsStatements.org statement with its label, holder and note', async () => {
    const created = await archivist.post('/api/prints').send(
      buildPrint({
        rights: { statement: IN_COPYRIGHT, holder: 'Estate of the maker', note: 'Ask first' },
      }),
    );
    expect(created.status).toBe(201);
    expect(created.body.rights).toEqual({
      statement: IN_COPYRIGHT,
      label: 'In Copyright',
      holder: 'Estate of the maker',
      note: 'Ask first',
    });
  });

  it('refuses anything but a statement URI (422 on rights.statement)', async () => {
    for (const statement of [
      'In Copyright',
      'http://rightsstatements.org/vocab/InC/2.0/',
      'http://rightsstatements.org/vocab/XYZ/1.0/',
      'https://creativecommons.org/publicdomain/zero/1.0/',
    ]) {
      const response = await archivist
        .post('/api/prints')
        .send(buildPrint({ rights: { statement } }));
      expect(response.status, statement).toBe(422);
      expect(response.body.errors[0].path).toBe('rights.statement');
    }
    expect((await archivist.get('/api/prints?rightsStatement=In%20Copyright')).status).toBe(422);
  });

  it('filters and counts prints by rights statement', async () => {
    const ids: number[] = [];
    for (const statement of [IN_COPYRIGHT, IN_COPYRIGHT, NO_KNOWN_COPYRIGHT]) {
      const created = await archivist
        .post('/api/prints')
        .send(buildPrint({ title: 'Rights facet', rights: { statement } }));
      ids.push(created.body.id);
    }
    const curator = await t.as('curator');
    const filtered = await curator.get(
      `/api/prints?rightsStatement=${encodeURIComponent(NO_KNOWN_COPYRIGHT)}`,
    );
    expect(filtered.status).toBe(200);
    expect(filtered.body.items.map((item: { id: number }) => item.id)).toEqual([ids[2]]);
    const all = await curator.get('/api/prints?q=facet');
    const counts = Object.fromEntries(
      all.body.facets.rightsStatement.map((f: { value: string; count: number }) => [
        f.value,
        f.count,
      ]),
    );
    expect(counts).toEqual({ [IN_COPYRIGHT]: 2, [NO_KNOWN_COPYRIGHT]: 1 });
  });
});
