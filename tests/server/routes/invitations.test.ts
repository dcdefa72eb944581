import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Invitation } from '../../../server/models';
import { lastMailTo, tokenIn } from '../../support/mail';
import { expectProblem } from '../../support/problem';
import { signIn, startTestApp, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const PASSWORD = 'a long new password';

async function invite(email: string, role = 'conservator') {
  const response = await (await t.as('admin')).post('/api/users/invitations').send({ email, role });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  const mail = await lastMailTo(t.ctx, email);
  return { invitation: response.body, mail, token: tokenIn(mail?.textBody) };
}

describe('inviting a colleague', () => {
  it('mails a one-time link that opens an account with the invited role', async () => {
    const { invitation, mail, token } = await invite('Nell@Example.org');
    expect(invitation).toMatchObject({
      email: 'nell@example.org',
      role: 'conservator',
      state: 'open',
    });
    expect(mail?.subject).toBe('Your invitation to Printwarden');
    expect(mail?.htmlBody).toContain(`/accept-invitation#${token}`);
    const days = (Date.parse(invitation.expiresAt) - Date.now()) / 86_400_000;
    expect(days).toBeGreaterThan(6.99);
    expect(days).toBeLessThanOrEqual(7);

    const preview = await t.anonymous().get(`/api/invitations/${token}`);
    expect(preview.body).toMatchObject({ email: 'nell@example.org', role: 'conservator' });
    const accepted = await t
      .anonymous()
      .post(`/api/invitations/${token}`)
      .send({ name: 'Nell Ashdown', password: PASSWORD });
    expect(accepted.status).toBe(201);
    expect(accepted.body.user).toMatchObject({ email: 'nell@example.org', role: 'conservator' });
    expect(accepted.body.user.passwordHash).toBeUndefined();

    const nell = await signIn(t.app, 'nell@example.org', PASSWORD);
    expect((await nell.get('/api/session')).body.user.role).toBe('conservator');
    expectProblem(
      await t
        .anonymous()
        .post(`/api/invitations/${token}`)
        .send({ name: 'Again', password: PASSWORD }),
      404,
    );
  });

  it('refuses a password under 12 characters and an address that has an account', async () => {
    const { token } = await invite('short@example.org');
    const short = await t
      .anonymous()
      .post(`/api/invitations/${token}`)
      .send({ name: 'S', password: 'elevenchars' });
    expectProblem(short, 422);
    expect(short.body.errors[0].path).toBe('password');
    const taken = await (
      await t.as('admin')
    )
      .post('/api/users/invitations')
      .send({ email: 'viewer@test.example', role: 'viewer' });
    expectProblem(taken, 409);
  });

  it('resend replaces the link; revoke ends it', async () => {
    const { invitation, token: first } = await invite('resend@example.org', 'curator');
    const admin = await t.as('admin');
    expect((await admin.post(`/api/users/invitations/${invitation.id}/resend`)).status).toBe(200);
    const second = tokenIn((await lastMailTo(t.ctx, 'resend@example.org'))?.textBody);
    expect(second).not.toBe(first);
    expectProblem(await t.anonymous().get(`/api/invitations/${first}`), 404);
    expect((await t.anonymous().get(`/api/invitations/${second}`)).status).toBe(200);
    expect((await admin.delete(`/api/users/invitations/${invitation.id}`)).status).toBe(204);
    expectProblem(await t.anonymous().get(`/api/invitations/${second}`), 404);
    const list = await admin.get('/api/users/invitations');
    expect(list.body.items.find((i: { id: number }) => i.id === invitation.id).state).toBe(
      'revoked',
    );
  });

  it('an expired link opens nothing', async () => {
    const { invitation, token } = await invite('late@example.org');
    await Invitation.update(
      { expiresAt: new Date(Date.now() - 1000) },
      { where: { id: invitation.id } },
    );
    expectProblem(await t.anonymous().get(`/api/invitations/${token}`), 404);
  });

  it('is for admins only, needs a session, and checks its input', async () => {
    expectProblem(
      await (
        await t.as('archivist')
      )
        .post('/api/users/invitations')
        .send({ email: 'a@b.org', role: 'viewer' }),
      403,
    );
    expectProblem(
      await t.anonymous().post('/api/users/invitations').send({ email: 'a@b.org', role: 'viewer' }),
      401,
    );
    const bad = await (
      await t.as('admin')
    )
      .post('/api/users/invitations')
      .send({ email: 'nope', role: 'owner' });
    expectProblem(bad, 422);
    expect(bad.body.errors.map((e: { path: string }) => e.path).sort()).toEqual(['email', 'role']);
    expectProblem(await t.anonymous().get('/api/invitations/short'), 422);
  });
});
