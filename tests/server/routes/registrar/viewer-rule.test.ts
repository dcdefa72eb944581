import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { ROLES } from '../../../../shared/domain/roles';
import { buildPrint } from '../../../support/factories';
import { makeSource } from '../../../support/registrar';
import { startTestApp, type TestApp } from '../../../support/test-app';

// Issue 19: donors' and sellers' contacts and prices are for archivists and admins only;
// the credit line, the chain of owners and the marks (not private) are for everyone. The
// place rule stays: viewers see no places.
let t: TestApp;
let printId: number;
const CONTACT = 'seller-contact@quayside.test';

beforeAll(async () => {
  t = await startTestApp();
  const archivist = await t.as('archivist');
  const place = await archivist.post('/api/locations').send({ code: 'S1', name: 'Strongroom' });
  const sourceId = await makeSource(archivist, {
    name: 'Quayside Books',
    kind: 'organisation',
    contact: CONTACT,
  });
  const created = await archivist.post('/api/prints').send(
    buildPrint({
      locationId: place.body.id,
      acquisition: {
        method: 'purchase',
        sourceId,
        acquiredOn: '2025',
        creditLine: 'Purchased from Quayside Books',
        price: 315.5,
      },
      provenance: [{ owner: 'A private collector', from: '1970s', to: '2025' }],
      marks: [
        { position: 'verso', kind: 'pencil inscription', transcription: 'No. 14 — proof' },
        {
          position: 'mount',
          kind: 'pencil inscription',
          transcription: 'paid 300 at Quayside',
          private: true,
        },
      ],
    }),
  );
  expect(created.status, JSON.stringify(created.body)).toBe(201);
  printId = created.body.id;
});
afterAll(() => t.close());

describe('who sees prices, contacts, private marks and places', () => {
  it('only archivists and admins get the price and the private mark', async () => {
    for (const role of ROLES) {
      const body = (await (await t.as(role)).get(`/api/prints/${printId}`)).body;
      const trusted = role === 'archivist' || role === 'admin';
      expect(body.acquisition.creditLine, role).toBe('Purchased from Quayside Books');
      expect(body.provenance, role).toHaveLength(1);
      expect('price' in body.acquisition, role).toBe(trusted);
      expect(
        body.marks.map((mark: { transcription: string }) => mark.transcription),
        role,
      ).toEqual(trusted ? ['No. 14 — proof', 'paid 300 at Quayside'] : ['No. 14 — proof']);
      expect(JSON.stringify(body).includes(CONTACT), role).toBe(false);
      expect('location' in body, role).toBe(role !== 'viewer');
    }
  });

  it('a viewer reads the credit line and inscription but never a price or contact', async () => {
    const viewer = await t.as('viewer');
    const body = (await viewer.get(`/api/prints/${printId}`)).body;
    const text = JSON.stringify(body);
    expect(text).toContain('Purchased from Quayside Books');
    expect(text).toContain('No. 14 — proof');
    expect(text).not.toContain('315.5');
    expect(text).not.toContain('paid 300');
    expect(text).not.toContain('Strongroom');
    expect((await viewer.get('/api/sources')).status).toBe(403);
    const jsonld = await viewer.get(`/api/prints/${printId}.jsonld`);
    expect(jsonld.status).toBe(200);
    expect(JSON.stringify(jsonld.body)).not.toMatch(/315\.5|paid 300|seller-contact/);
  });

  it('private marks are searched only by archivists and admins', async () => {
    for (const role of ROLES) {
      const found = await (await t.as(role)).get('/api/prints?q=quayside%20paid');
      const trusted = role === 'archivist' || role === 'admin';
      expect(found.body.total, role).toBe(trusted ? 1 : 0);
      const open = await (await t.as(role)).get('/api/prints?q=proof');
      expect(open.body.total, role).toBe(1);
    }
  });
});
