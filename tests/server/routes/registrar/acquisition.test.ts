import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../../support/factories';
import { IN_COPYRIGHT, makeSource } from '../../../support/registrar';
import { startTestApp, type SignedIn, type TestApp } from '../../../support/test-app';

let t: TestApp;
let archivist: SignedIn;
let donor: number;
let seller: number;

beforeAll(async () => {
  t = await startTestApp();
  archivist = await t.as('archivist');
  donor = await makeSource(archivist, {
    name: 'Marguerite Ollis',
    kind: 'person',
    contact: 'marguerite@ollis.test',
  });
  seller = await makeSource(archivist, { name: 'Quayside Books', kind: 'organisation' });
});
afterAll(() => t.close());

const gift = () => ({
  method: 'gift' as const,
  sourceId: donor,
  acquiredOn: '2024-03-02',
  reference: 'DA-2024-7',
  creditLine: 'Gift of Marguerite Ollis, 2024',
  price: null,
});

describe('acquisition and provenance', () => {
  it('keeps how a print came in and its chain of owners, oldest first', async () => {
    const created = await archivist.post('/api/prints').send(
      buildPrint({
        acquisition: gift(),
        provenance: [
          { owner: 'The maker', from: 'c. 1905', to: '1931', evidence: 'Studio stamp on verso' },
          { owner: 'Edith Ollis', from: '1931', to: '1990s', evidence: 'Family letters' },
        ],
      }),
    );
    expect(created.status, JSON.stringify(created.body)).toBe(201);
    expect(created.body.acquisition).toMatchObject({
      method: 'gift',
      sourceId: donor,
      source: { id: donor, name: 'Marguerite Ollis', kind: 'person' },
      acquiredOn: '2024-03-02',
      creditLine: 'Gift of Marguerite Ollis, 2024',
    });
    expect(created.body.provenance.map((link: { owner: string }) => link.owner)).toEqual([
      'The maker',
      'Edith Ollis',
    ]);
    const read = await archivist.get(`/api/prints/${created.body.id}`);
    expect(read.body.provenance[0]).toEqual({
      owner: 'The maker',
      from: 'c. 1905',
      to: '1931',
      evidence: 'Studio stamp on verso',
    });
  });

  it('a PATCH replaces only the parts it names, and null clears one', async () => {
    const created = await archivist
      .post('/api/prints')
      .send(buildPrint({ acquisition: gift(), rights: { statement: IN_COPYRIGHT } }));
    const id = created.body.id as number;
    const purchase = { ...gift(), method: 'purchase', sourceId: seller, price: 240 };
    const patched = await archivist.patch(`/api/prints/${id}`).send({ acquisition: purchase });
    expect(patched.status).toBe(200);
    expect(patched.body.acquisition).toMatchObject({ method: 'purchase', price: 240 });
    expect(patched.body.rights.statement).toBe(IN_COPYRIGHT);
    const cleared = await archivist.patch(`/api/prints/${id}`).send({ acquisition: null });
    expect(cleared.body.acquisition).toBeNull();
    const audit = await archivist.get(`/api/audit?entity=print&entityId=${id}`);
    expect(audit.body.events[0].before.acquisition.price).toBe(240);
    expect(audit.body.events[0].after.acquisition).toBeNull();
  });

  it('refuses an unknown source, an unknown method and unreadable or future dates', async () => {
    const bad = await archivist.post('/api/prints').send(
      buildPrint({
        acquisition: { ...gift(), sourceId: 9999 },
      }),
    );
    expect(bad.status).toBe(422);
    expect(bad.body.errors).toEqual([
      { path: 'acquisition.sourceId', message: 'No source with id 9999' },
    ]);
    const wrong = await archivist.post('/api/prints').send({
      ...buildPrint(),
      acquisition: { ...gift(), method: 'swap', acquiredOn: 'last spring' },
      provenance: [{ owner: 'A', from: '2999' }],
    });
    expect(wrong.status).toBe(422);
    expect(wrong.body.errors.map((error: { path: string }) => error.path).sort()).toEqual([
      'acquisition.acquiredOn',
      'acquisition.method',
      'provenance.0.from',
    ]);
  });

  it('finds every print from one source through the list filter', async () => {
    const fromDonor = await archivist
      .post('/api/prints')
      .send(buildPrint({ title: 'Donor filter one', acquisition: gift() }));
    const fromSeller = await archivist.post('/api/prints').send(
      buildPrint({
        title: 'Seller filter one',
        acquisition: { ...gift(), method: 'purchase', sourceId: seller },
      }),
    );
    const curator = await t.as('curator');
    const listed = await curator.get(`/api/prints?sourceId=${seller}&pageSize=100`);
    expect(listed.status).toBe(200);
    expect(listed.body.items.map((item: { id: number }) => item.id)).toEqual([fromSeller.body.id]);
    const donors = await curator.get(`/api/prints?sourceId=${donor}&pageSize=100`);
    expect(donors.body.items.map((item: { id: number }) => item.id)).toContain(fromDonor.body.id);
    expect(donors.body.items.map((item: { id: number }) => item.id)).not.toContain(
      fromSeller.body.id,
    );
    const sources = await curator.get('/api/sources');
    const seen = sources.body.items.find((source: { id: number }) => source.id === seller);
    expect(seen.prints).toBe(1);
  });

  it('a curator may not change the registrar fields', async () => {
    const created = await archivist.post('/api/prints').send(buildPrint());
    const curator = await t.as('curator');
    const response = await curator
      .patch(`/api/prints/${created.body.id}`)
      .send({ acquisition: gift() });
    expect(response.status).toBe(403);
  });
});
