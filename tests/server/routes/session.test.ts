import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import request from 'supertest';
import { createApp } from '../../../server/app';
import { startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';
import { expectProblem } from '../../support/problem';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ signInAttempts: 3 });
});
afterAll(() => t.close());

describe('POST /api/session', () => {
  it('signs in with the right password and returns the user and a CSRF token', async () => {
    const response = await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'Curator@Test.Example', password: TEST_PASSWORD });
    expect(response.status).toBe(200);
    expect(response.body.user).toMatchObject({ email: 'curator@test.example', role: 'curator' });
    expect(response.body.user).not.toHaveProperty('passwordHash');
    expect(response.body.csrfToken).toEqual(expect.any(String));
    expect(response.headers['set-cookie']?.[0]).toMatch(/HttpOnly/);
  });

  it('refuses a wrong password with 401', async () => {
    const response = await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'viewer@test.example', password: 'not the password' });
    expectProblem(response, 401);
  });

  it('refuses an unknown address with the same 401', async () => {
    const response = await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'nobody@test.example', password: TEST_PASSWORD });
    expectProblem(response, 401);
  });

  it('answers 422 for an invalid e-mail and 400 for malformed JSON', async () => {
    const invalid = await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'not-an-address', password: 'x' });
    expectProblem(invalid, 422);
    expect(invalid.body.errors[0].path).toBe('email');
    const malformed = await t
      .anonymous()
      .post('/api/session')
      .set('content-type', 'application/json')
      .send('{"email": ');
    expectProblem(malformed, 400);
  });

  it('answers 429 after repeated failures for the same address', async () => {
    const attempt = () =>
      t
        .anonymous()
        .post('/api/session')
        .send({ email: 'archivist@test.example', password: 'wrong wrong' });
    for (let i = 0; i < 3; i += 1) expectProblem(await attempt(), 401);
    expectProblem(await attempt(), 429);
  });
});

describe('GET /api/session', () => {
  it('returns the signed-in user with the same CSRF token', async () => {
    const viewer = await t.as('viewer');
    const response = await viewer.get('/api/session');
    expect(response.status).toBe(200);
    expect(response.body.user.role).toBe('viewer');
    expect(response.body.csrfToken).toBe(viewer.csrf);
    expect(response.body.abilities).toEqual(['catalogue:read']);
  });

  it('answers 401 without a session', async () => {
    expectProblem(await t.anonymous().get('/api/session'), 401);
  });
});

describe('DELETE /api/session', () => {
  it('needs the CSRF token, then signs out', async () => {
    const agent = request.agent(t.app);
    const signIn = await agent
      .post('/api/session')
      .send({ email: 'admin@test.example', password: TEST_PASSWORD });
    expectProblem(await agent.delete('/api/session'), 403);
    const out = await agent.delete('/api/session').set('X-CSRF-Token', signIn.body.csrfToken);
    expect(out.status).toBe(204);
    expectProblem(await agent.get('/api/session'), 401);
  });

  it('answers 401 without a session', async () => {
    expectProblem(await t.anonymous().delete('/api/session'), 401);
  });
});

describe('sessions', () => {
  it('survive a restart of the app, because they live in the database', async () => {
    const first = await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'conservator@test.example', password: TEST_PASSWORD });
    const cookie = first.headers['set-cookie']![0]!.split(';')[0]!;
    const restarted = createApp(t.ctx);
    try {
      const response = await request(restarted.app).get('/api/session').set('Cookie', cookie);
      expect(response.status).toBe(200);
      expect(response.body.user.role).toBe('conservator');
    } finally {
      restarted.close();
    }
  });
});

describe('GET /api/health', () => {
  it('is open to anyone', async () => {
    const response = await t.anonymous().get('/api/health');
    expect(response.body).toEqual({ status: 'ok' });
  });
});

describe('unknown API paths', () => {
  it('answer 404 problem details', async () => {
    expectProblem(await t.anonymous().get('/api/no-such-thing'), 404);
  });
});

describe('GET /api/demo', () => {
  it('names no accounts outside demo mode', async () => {
    expect((await t.anonymous().get('/api/demo')).body).toEqual({ demo: false, firstRun: false });
  });

  it('names the five demo accounts in demo mode', async () => {
    // Same database, demo switched on: a second database would rebind the shared models.
    const demo = createApp({ ...t.ctx, config: { ...t.ctx.config, demo: true } });
    try {
      const response = await request(demo.app).get('/api/demo');
      expect(response.body.accounts.map((a: { role: string }) => a.role)).toEqual([
        'admin',
        'archivist',
        'curator',
        'conservator',
        'viewer',
      ]);
    } finally {
      demo.close();
    }
  });
});

describe('signing in again while signed in', () => {
  it('needs no CSRF token, as the contract exempts POST /api/session', async () => {
    const agent = request.agent(t.app);
    await agent
      .post('/api/session')
      .send({ email: 'viewer@test.example', password: TEST_PASSWORD });
    const again = await agent
      .post('/api/session')
      .send({ email: 'curator@test.example', password: TEST_PASSWORD });
    expect(again.status).toBe(200);
    expect(again.body.user.role).toBe('curator');
  });
});
