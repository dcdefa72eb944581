import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { OutboxMessage, PasswordReset, User } from '../../../server/models';
import { lastMailTo, mailSettled, tokenIn } from '../../support/mail';
import { expectProblem } from '../../support/problem';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const NEW_PASSWORD = 'another long password';

describe('resetting a forgotten password', () => {
  it('mails a one-hour link; it sets the password once and ends every session', async () => {
    const before = await signIn(t.app, 'curator@test.example', TEST_PASSWORD);
    const asked = await t
      .anonymous()
      .post('/api/password-resets')
      .send({ email: 'Curator@Test.example' });
    expect(asked.status).toBe(202);
    const mail = await lastMailTo(t.ctx, 'curator@test.example');
    expect(mail?.subject).toBe('Reset your Printwarden password');
    const token = tokenIn(mail?.textBody);
    const reset = await PasswordReset.findOne({ order: [['id', 'DESC']] });
    const minutes = (reset!.expiresAt.getTime() - Date.now()) / 60_000;
    expect(minutes).toBeGreaterThan(59);
    expect(minutes).toBeLessThanOrEqual(60);

    expect(
      (await t.anonymous().post(`/api/password-resets/${token}`).send({ password: NEW_PASSWORD }))
        .status,
    ).toBe(204);
    expectProblem(await before.get('/api/session'), 401);
    await expect(signIn(t.app, 'curator@test.example', TEST_PASSWORD)).rejects.toThrow();
    await signIn(t.app, 'curator@test.example', NEW_PASSWORD);
    expectProblem(
      await t
        .anonymous()
        .post(`/api/password-resets/${token}`)
        .send({ password: 'yet another password' }),
      404,
    );
  });

  it('gives an unknown address the same answer and sends nothing', async () => {
    const messagesBefore = await OutboxMessage.count();
    const known = await t
      .anonymous()
      .post('/api/password-resets')
      .send({ email: 'viewer@test.example' });
    const unknown = await t
      .anonymous()
      .post('/api/password-resets')
      .send({ email: 'nobody@test.example' });
    expect(unknown.status).toBe(known.status);
    expect(unknown.body).toEqual(known.body);
    await mailSettled(t.ctx);
    expect(await OutboxMessage.count()).toBe(messagesBefore + 1);
    expect(await lastMailTo(t.ctx, 'nobody@test.example')).toBeNull();
  });

  it('refuses an expired link, a short password and a malformed address', async () => {
    await t.anonymous().post('/api/password-resets').send({ email: 'archivist@test.example' });
    const token = tokenIn((await lastMailTo(t.ctx, 'archivist@test.example'))?.textBody);
    const short = await t
      .anonymous()
      .post(`/api/password-resets/${token}`)
      .send({ password: 'short' });
    expectProblem(short, 422);
    await PasswordReset.update({ expiresAt: new Date(Date.now() - 1) }, { where: {} });
    expectProblem(
      await t.anonymous().post(`/api/password-resets/${token}`).send({ password: NEW_PASSWORD }),
      404,
    );
    expectProblem(
      await t.anonymous().post('/api/password-resets').send({ email: 'not an address' }),
      422,
    );
    expectProblem(await t.anonymous().post('/api/password-resets').send({}), 422);
  });

  it('needs no CSRF token, even from a signed-in browser (contract)', async () => {
    const viewer = await signIn(t.app, 'viewer@test.example', TEST_PASSWORD);
    expect(
      (await viewer.agent.post('/api/password-resets').send({ email: 'viewer@test.example' }))
        .status,
    ).toBe(202);
  });

  it('sends nothing to a deactivated account', async () => {
    await User.update({ active: false }, { where: { email: 'conservator@test.example' } });
    await t.anonymous().post('/api/password-resets').send({ email: 'conservator@test.example' });
    expect(await lastMailTo(t.ctx, 'conservator@test.example')).toBeNull();
    await User.update({ active: true }, { where: { email: 'conservator@test.example' } });
  });
});
