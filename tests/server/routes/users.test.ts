import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { AuditEvent, User } from '../../../server/models';
import { expectProblem } from '../../support/problem';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const idOf = async (role: string) =>
  (await User.findOne({ where: { email: `${role}@test.example` } }))!.id;
const sidOf = (response: request.Response) =>
  (response.headers['set-cookie'] as unknown as string[] | undefined)
    ?.find((c) => c.startsWith('printwarden.sid='))
    ?.split(';')[0];

describe('GET /api/users', () => {
  it('lists people with role, active and last sign-in, never a password hash', async () => {
    const response = await (await t.as('admin')).get('/api/users');
    expect(response.status).toBe(200);
    const admin = response.body.items.find(
      (u: { email: string }) => u.email === 'admin@test.example',
    );
    expect(admin).toMatchObject({ role: 'admin', active: true, lastSignInAt: expect.any(String) });
    expect(JSON.stringify(response.body)).not.toMatch(/passwordHash|\$2[aby]\$/);
  });

  it('is refused to other roles and to nobody', async () => {
    expectProblem(await (await t.as('archivist')).get('/api/users'), 403);
    expectProblem(await t.anonymous().get('/api/users'), 401);
  });
});

describe('PATCH /api/users/:id', () => {
  it('deactivating ends the person’s sessions at once and keeps their name in the audit trail', async () => {
    const viewer = await signIn(t.app, 'viewer@test.example', TEST_PASSWORD);
    const id = await idOf('viewer');
    const response = await (await t.as('admin')).patch(`/api/users/${id}`).send({ active: false });
    expect(response.body).toMatchObject({ id, active: false });
    expectProblem(await viewer.get('/api/prints'), 401);
    await expect(signIn(t.app, 'viewer@test.example', TEST_PASSWORD)).rejects.toThrow();
    const audit = await (await t.as('admin')).get(`/api/audit?entity=user&entityId=${id}`);
    expect(audit.body.events[0]).toMatchObject({
      action: 'update',
      before: { active: true, name: 'Test viewer' },
    });
    expect(await AuditEvent.count({ where: { entity: 'user', entityId: id } })).toBe(1);
    await (await t.as('admin')).patch(`/api/users/${id}`).send({ active: true });
  });

  it('a role change takes effect on the next request, under a new session id', async () => {
    const curator = await signIn(t.app, 'curator@test.example', TEST_PASSWORD);
    const id = await idOf('curator');
    expectProblem(await curator.post('/api/papers').send({ name: 'Before promotion' }), 403);
    // The cookie is rolling: every answer repeats the session id in Set-Cookie.
    const beforeSid = sidOf(await curator.get('/api/session'));
    expect(sidOf(await curator.get('/api/session'))).toBe(beforeSid);
    await (await t.as('admin')).patch(`/api/users/${id}`).send({ role: 'archivist' });
    const next = await curator.get('/api/session');
    expect(next.body.user.role).toBe('archivist');
    expect(sidOf(next)).toBeDefined();
    expect(sidOf(next)).not.toBe(beforeSid);
    expect((await curator.post('/api/papers').send({ name: 'After promotion' })).status).toBe(201);
    await (await t.as('admin')).patch(`/api/users/${id}`).send({ role: 'curator' });
  });

  it('nobody can demote or deactivate the last active admin', async () => {
    const admin = await t.as('admin');
    const id = await idOf('admin');
    expectProblem(await admin.patch(`/api/users/${id}`).send({ role: 'viewer' }), 409);
    expectProblem(await admin.patch(`/api/users/${id}`).send({ active: false }), 409);
    const other = await idOf('archivist');
    await admin.patch(`/api/users/${other}`).send({ role: 'admin' });
    expect((await admin.patch(`/api/users/${other}`).send({ role: 'archivist' })).status).toBe(200);
  });

  it('checks its input, and answers 404 for an unknown person', async () => {
    const admin = await t.as('admin');
    expectProblem(await admin.patch('/api/users/1').send({ role: 'owner' }), 422);
    expectProblem(await admin.patch('/api/users/1').send({}), 422);
    expectProblem(await admin.patch('/api/users/abc').send({ active: true }), 422);
    expectProblem(await admin.patch('/api/users/9999').send({ active: true }), 404);
    expectProblem(await (await t.as('curator')).patch('/api/users/1').send({ active: false }), 403);
    expectProblem(await t.anonymous().patch('/api/users/1').send({ active: false }), 401);
  });
});

describe('POST /api/session/password', () => {
  it('checks the current password, then ends the other sessions but not this one', async () => {
    const here = await signIn(t.app, 'conservator@test.example', TEST_PASSWORD);
    const elsewhere = await signIn(t.app, 'conservator@test.example', TEST_PASSWORD);
    const wrong = await here
      .post('/api/session/password')
      .send({ currentPassword: 'wrong one!', newPassword: 'a brand new password' });
    expectProblem(wrong, 422);
    expect(wrong.body.errors[0].path).toBe('currentPassword');
    const short = await here
      .post('/api/session/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'short' });
    expectProblem(short, 422);
    const changed = await here
      .post('/api/session/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword: 'a brand new password' });
    expect(changed.status).toBe(204);
    expect((await here.get('/api/session')).status).toBe(200);
    expectProblem(await elsewhere.get('/api/session'), 401);
    await signIn(t.app, 'conservator@test.example', 'a brand new password');
  });

  it('needs a session and the CSRF header', async () => {
    expectProblem(await t.anonymous().post('/api/session/password').send({}), 401);
    const viewer = await t.as('viewer');
    expectProblem(await viewer.agent.post('/api/session/password').send({}), 403);
  });
});

describe('hardening of the session', () => {
  it('gives a new session id at sign-in', async () => {
    const agent = request.agent(t.app);
    const first = await agent
      .post('/api/session')
      .send({ email: 'archivist@test.example', password: TEST_PASSWORD });
    const second = await agent
      .post('/api/session')
      .send({ email: 'archivist@test.example', password: TEST_PASSWORD });
    expect(sidOf(first)).toBeDefined();
    expect(sidOf(second)).toBeDefined();
    expect(sidOf(second)).not.toBe(sidOf(first));
  });

  it('marks the cookie Secure in production (behind a TLS proxy named by TRUST_PROXY)', async () => {
    const production = createApp({
      ...t.ctx,
      config: { ...t.ctx.config, production: true, trustProxy: '1' },
    });
    const response = await request(production.app)
      .post('/api/session')
      .set('X-Forwarded-Proto', 'https')
      .send({ email: 'archivist@test.example', password: TEST_PASSWORD });
    expect(response.headers['set-cookie']![0]).toMatch(/; Secure/);
  });

  it('refuses a body over the small limit of the people routes', async () => {
    const huge = { email: 'a@b.org', password: 'x'.repeat(20_000) };
    expectProblem(await t.anonymous().post('/api/session').send(huge), 413);
  });
});
