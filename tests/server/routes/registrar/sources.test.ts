import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { startTestApp, type TestApp } from '../../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('/api/sources', () => {
  it('archivists add and change sources; the change is audited', async () => {
    const archivist = await t.as('archivist');
    const created = await archivist
      .post('/api/sources')
      .send({ name: 'Ada Fenwick', kind: 'person', contact: 'Mill Lane 4, Eastbridge' });
    expect(created.status).toBe(201);
    expect(created.headers.location).toBe(`/api/sources/${created.body.id}`);
    expect(created.body).toMatchObject({ name: 'Ada Fenwick', kind: 'person', prints: 0 });
    const changed = await archivist
      .patch(`/api/sources/${created.body.id}`)
      .send({ contact: 'Quay Street 9, Eastbridge' });
    expect(changed.status).toBe(200);
    expect(changed.body.contact).toBe('Quay Street 9, Eastbridge');
    const audit = await archivist.get(`/api/audit?entity=source&entityId=${created.body.id}`);
    expect(audit.body.events.map((event: { action: string }) => event.action)).toEqual([
      'update',
      'create',
    ]);
  });

  it('refuses a source without a name or with an unknown kind (422 naming the fields)', async () => {
    const archivist = await t.as('archivist');
    const response = await archivist.post('/api/sources').send({ name: ' ', kind: 'club' });
    expect(response.status).toBe(422);
    expect(response.body.errors.map((error: { path: string }) => error.path).sort()).toEqual([
      'kind',
      'name',
    ]);
    expect((await archivist.get('/api/sources/9999')).status).toBe(404);
    expect((await archivist.patch('/api/sources/9999').send({ name: 'X' })).status).toBe(404);
  });

  it('curators read sources without contacts; archivists and admins with them', async () => {
    const archivist = await t.as('archivist');
    const created = await archivist
      .post('/api/sources')
      .send({ name: 'Harbour Camera Club', kind: 'organisation', contact: 'secretary@club.test' });
    for (const role of ['curator', 'conservator'] as const) {
      const signedIn = await t.as(role);
      const one = await signedIn.get(`/api/sources/${created.body.id}`);
      expect(one.status).toBe(200);
      expect(one.body.name).toBe('Harbour Camera Club');
      expect(one.body).not.toHaveProperty('contact');
      const list = await signedIn.get('/api/sources');
      expect(JSON.stringify(list.body)).not.toContain('secretary@club.test');
    }
    for (const role of ['archivist', 'admin'] as const) {
      const one = await (await t.as(role)).get(`/api/sources/${created.body.id}`);
      expect(one.body.contact).toBe('secretary@club.test');
    }
    expect((await (await t.as('viewer')).get('/api/sources')).status).toBe(403);
  });
});
