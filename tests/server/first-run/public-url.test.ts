import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../../../server/app';
import { lastMailTo, mailSettled } from '../../support/mail';
import { signIn, startTestApp, TEST_PASSWORD, type TestApp } from '../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('links in e-mail', () => {
  it('are built from PUBLIC_URL alone, whatever Host the request names', async () => {
    const behindProxy = createApp({
      ...t.ctx,
      config: { ...t.ctx.config, publicUrl: 'https://prints.example.org' },
    });
    try {
      const admin = await signIn(behindProxy.app, 'admin@test.example', TEST_PASSWORD);
      const invited = await admin
        .post('/api/users/invitations')
        .set('Host', 'evil.example')
        .send({ email: 'new.curator@example.org', role: 'curator' });
      expect(invited.status).toBe(201);
      await request(behindProxy.app)
        .post('/api/password-resets')
        .set('Host', 'evil.example')
        .send({ email: 'viewer@test.example' })
        .expect(202);
      await mailSettled(t.ctx);
      for (const address of ['new.curator@example.org', 'viewer@test.example']) {
        const mail = await lastMailTo(t.ctx, address);
        expect(mail?.textBody, address).toContain('https://prints.example.org/');
        expect(mail?.textBody, address).not.toContain('evil.example');
      }
    } finally {
      await behindProxy.close();
    }
  });
});
