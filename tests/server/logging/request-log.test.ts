import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { lastMailTo, tokenIn } from '../../support/mail';
import { startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

const lines: string[] = [];
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp(
    { logLevel: 'info' },
    { logDestination: { write: (line) => void lines.push(line) } },
  );
});
afterAll(() => t.close());

describe('request log', () => {
  it('records each request and holds no password, token, cookie or CSRF value', async () => {
    const secrets: string[] = [TEST_PASSWORD];
    // A sign-in: its cookie and CSRF token.
    const signIn = await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'admin@test.example', password: TEST_PASSWORD });
    const cookie = signIn.headers['set-cookie']![0]!.split(';')[0]!;
    const csrf = signIn.body.csrfToken as string;
    secrets.push(cookie, cookie.split('=')[1]!, decodeURIComponent(cookie.split('=')[1]!), csrf);
    const admin = (method: 'get' | 'post', url: string) =>
      t.anonymous()[method](url).set('Cookie', cookie).set('X-CSRF-Token', csrf);
    await admin('get', '/api/prints?page=1');

    // An invitation, accepted with a password.
    const invited = await admin('post', '/api/users/invitations').send({
      email: 'log@example.org',
      role: 'viewer',
    });
    expect(invited.status).toBe(201);
    const invitation = tokenIn((await lastMailTo(t.ctx, 'log@example.org'))?.textBody);
    const invitedPassword = 'invited person password';
    secrets.push(invitation, invitedPassword);
    await t.anonymous().get(`/api/invitations/${invitation}`);
    expect(
      (
        await t
          .anonymous()
          .post(`/api/invitations/${invitation}`)
          .send({ name: 'Log Test', password: invitedPassword })
      ).status,
    ).toBe(201);

    // A reset, spent with a new password.
    await t.anonymous().post('/api/password-resets').send({ email: 'log@example.org' });
    const reset = tokenIn((await lastMailTo(t.ctx, 'log@example.org'))?.textBody);
    const resetPassword = 'the password after reset';
    secrets.push(reset, resetPassword);
    expect(
      (await t.anonymous().post(`/api/password-resets/${reset}`).send({ password: resetPassword }))
        .status,
    ).toBe(204);
    await t.anonymous().post(`/api/password-resets/${reset}`).send({ password: resetPassword });
    await t
      .anonymous()
      .post('/api/session')
      .send({ email: 'log@example.org', password: 'a wrong password!' });

    const log = lines.join('');
    for (const secret of secrets) expect(log, `log holds ${secret}`).not.toContain(secret);
    expect(log).not.toMatch(/x-csrf-token|set-cookie|"cookie"/i);

    const entries = lines.map((line) => JSON.parse(line) as Record<string, unknown>);
    const requests = entries.filter((entry) => entry.route !== undefined);
    expect(requests.length).toBeGreaterThanOrEqual(9);
    const listed = requests.find((entry) => entry.route === '/api/prints');
    expect(listed).toMatchObject({
      requestId: expect.any(String),
      userId: expect.any(Number),
      method: 'GET',
      res: { status: 200 },
      ms: expect.any(Number),
    });
    const routes = requests.map((entry) => entry.route);
    expect(routes).toContain('/api/invitations/:token');
    expect(routes).toContain('/api/password-resets/:token');
    const refused = requests.find((entry) => (entry.res as { status: number }).status === 404);
    expect(refused?.level).toBe(40);
  });
});
