import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { buildPrint } from '../../support/factories';
import { expectProblem } from '../../support/problem';
import { startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('GET /api/audit', () => {
  it('records who created and changed a print, with before and after', async () => {
    const archivist = await t.as('archivist');
    const created = await archivist.post('/api/prints').send(buildPrint({ title: 'First title' }));
    await (
      await t.as('curator')
    )
      .patch(`/api/prints/${created.body.id}`)
      .send({ title: 'Second title' });
    const response = await archivist.get(`/api/audit?entity=print&entityId=${created.body.id}`);
    expect(response.status).toBe(200);
    const [update, create] = response.body.events;
    expect(create).toMatchObject({
      action: 'create',
      entity: 'print',
      // The name beside the contract's e-mail: the record's history shows people by name.
      user: { email: 'archivist@test.example', name: 'Test archivist' },
      before: null,
    });
    expect(create.after.title).toBe('First title');
    expect(update).toMatchObject({ action: 'update', user: { email: 'curator@test.example' } });
    expect([update.before.title, update.after.title]).toEqual(['First title', 'Second title']);
    expect(new Date(update.at).getTime()).not.toBeNaN();
  });

  it('is open to an admin, refused to a curator (403) and without a session (401); 422 for bad input', async () => {
    expect((await (await t.as('admin')).get('/api/audit')).status).toBe(200);
    expectProblem(await (await t.as('curator')).get('/api/audit'), 403);
    expectProblem(await t.anonymous().get('/api/audit'), 401);
    expectProblem(await (await t.as('admin')).get('/api/audit?entityId=abc'), 422);
  });
});
