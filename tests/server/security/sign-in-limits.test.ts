import bcrypt from 'bcryptjs';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { User } from '../../../server/models';
import { resetRequestsSettled } from '../../../server/services/people/password-resets';
import { expectProblem } from '../../support/problem';
import { startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({
    signInAttempts: 3,
    signInAttemptsPerAccount: 5,
    resetRequests: 2,
    resetRequestsPerAccount: 4,
  });
});
afterAll(async () => {
  await resetRequestsSettled();
  await t.close();
});

/** A sign-in from a given client address (the test app trusts loopback proxies). */
const signIn = (email: string, password: string, client = '203.0.113.1') =>
  t.anonymous().post('/api/session').set('X-Forwarded-For', client).send({ email, password });
const resetRequest = (email: string, client = '203.0.113.1') =>
  t.anonymous().post('/api/password-resets').set('X-Forwarded-For', client).send({ email });

describe('sign-in limits', () => {
  it('count an address with spaces and capitals as the same address', async () => {
    for (let i = 0; i < 3; i += 1)
      expectProblem(await signIn('archivist@test.example', 'wrong wrong'), 401);
    expectProblem(await signIn('  Archivist@Test.Example ', 'wrong wrong'), 429);
    expectProblem(await signIn('archivist@test.example\t', TEST_PASSWORD), 429);
  });

  it('count failures per account from every client together', async () => {
    for (let i = 0; i < 5; i += 1)
      expectProblem(await signIn('curator@test.example', 'wrong wrong', `198.51.100.${i}`), 401);
    const fresh = await signIn(' curator@test.example', TEST_PASSWORD, '198.51.100.200');
    expectProblem(fresh, 429);
    // Another account is not held back by it.
    expect((await signIn('viewer@test.example', TEST_PASSWORD, '198.51.100.200')).status).toBe(200);
  });
});

describe('password-reset limits', () => {
  it('count an address with spaces and capitals as the same address', async () => {
    expect((await resetRequest('viewer@test.example')).status).toBe(202);
    expect((await resetRequest('VIEWER@test.example')).status).toBe(202);
    expectProblem(await resetRequest(' viewer@test.example  '), 429);
  });

  it('count requests per address from every client together', async () => {
    for (let i = 0; i < 4; i += 1)
      expect((await resetRequest('nobody@test.example', `192.0.2.${i}`)).status).toBe(202);
    expectProblem(await resetRequest('Nobody@test.example', '192.0.2.200'), 429);
  });
});

describe('password hashes', () => {
  it('are scrypt for a new password, at the configured cost', async () => {
    const conservator = await t.as('conservator');
    const newPassword = 'a new password of some length';
    const changed = await conservator
      .post('/api/session/password')
      .send({ currentPassword: TEST_PASSWORD, newPassword });
    expect(changed.status).toBe(204);
    const user = await User.findOne({ where: { email: 'conservator@test.example' } });
    expect(user?.passwordHash).toMatch(
      /^\$scrypt\$ln=4,r=8,p=3\$[A-Za-z0-9+/]{22}\$[A-Za-z0-9+/]{43}$/,
    );
    expect((await signIn('conservator@test.example', newPassword, '192.0.2.60')).status).toBe(200);
  });

  it('made with bcrypt still sign in, and become scrypt at the next successful sign-in only', async () => {
    const legacy = await User.create({
      email: 'legacy@example.org',
      name: 'Legacy reader',
      role: 'viewer',
      passwordHash: await bcrypt.hash(TEST_PASSWORD, 4),
    });
    expectProblem(await signIn('legacy@example.org', 'not the password', '192.0.2.50'), 401);
    await legacy.reload();
    expect(legacy.passwordHash).toMatch(/^\$2[aby]\$04\$/);
    expect((await signIn('legacy@example.org', TEST_PASSWORD, '192.0.2.50')).status).toBe(200);
    await legacy.reload();
    expect(legacy.passwordHash).toMatch(/^\$scrypt\$ln=4,r=8,p=3\$/);
    expect((await signIn('legacy@example.org', TEST_PASSWORD, '192.0.2.51')).status).toBe(200);
    expectProblem(await signIn('legacy@example.org', 'not the password', '192.0.2.52'), 401);
  });
});
