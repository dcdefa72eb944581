import { createServer, type Server } from 'node:net';
import type { AddressInfo } from 'node:net';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createLogger } from '../../../../server/logging/logger';
import request from 'supertest';
import { createApp } from '../../../../server/app';
import { createMailer } from '../../../../server/services/mail';
import { startLocalMailServer } from '../../../../server/services/mail/local-mail-server';
import { Mailer, retryDelayMs } from '../../../../server/services/mail/mailer';
import { OutboxMessage, QueuedMail } from '../../../../server/models';
import { startTestApp, type TestApp } from '../../../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

const message = {
  to: ['ada@example.org', 'ben@example.org'],
  subject: 'Tone check due: 2026.0001',
  text: 'The print 2026.0001 is due for a tone check.',
  html: '<p>The print <strong>2026.0001</strong> is due for a tone check.</p>',
};

describe('Mailer with the built-in SMTP server', () => {
  it('delivers a queued message through SMTP into the outbox, both parts intact', async () => {
    await t.ctx.mailer.send(message);
    await t.ctx.mailer.idle();
    const received = await OutboxMessage.findOne({ where: { subject: message.subject } });
    expect(received?.recipients).toBe('ada@example.org, ben@example.org');
    expect(received?.sender).toBe('no-reply@printwarden.test');
    expect(received?.textBody.trim()).toBe(message.text);
    expect(received?.htmlBody).toContain('<strong>2026.0001</strong>');
    const queued = await QueuedMail.findOne({ where: { subject: message.subject } });
    expect(queued?.status).toBe('sent');
    expect(queued?.attempts).toBe(1);
  });

  it('queues nothing when the caller’s transaction rolls back', async () => {
    const subject = 'Rolled back';
    await t.ctx.sequelize
      .transaction(async (transaction) => {
        await t.ctx.mailer.send({ ...message, subject }, { transaction });
        throw new Error('abort');
      })
      .catch(() => undefined);
    expect(await QueuedMail.count({ where: { subject } })).toBe(0);
  });
});

describe('Mailer with an unreachable server', () => {
  let dead: Server;
  let port: number;
  beforeAll(async () => {
    // A port that accepts and at once drops connections: every attempt fails quickly.
    dead = createServer((socket) => socket.destroy());
    await new Promise<void>((resolve) => dead.listen(0, '127.0.0.1', resolve));
    port = (dead.address() as AddressInfo).port;
  });
  afterAll(() => new Promise<void>((resolve) => dead.close(() => resolve())));

  it('retries with backoff and finally marks the message failed, keeping it', async () => {
    const mailer = new Mailer({
      sequelize: t.ctx.sequelize,
      smtpUrl: `smtp://127.0.0.1:${port}`,
      from: 'Printwarden <no-reply@printwarden.test>',
      logger: createLogger('silent'),
      retryBaseMs: 1,
      maxAttempts: 3,
      pollMs: 60_000,
    });
    const subject = 'Never delivered';
    await mailer.send({ ...message, subject });
    await mailer.idle();
    const first = await QueuedMail.findOne({ where: { subject } });
    expect(first).toMatchObject({ status: 'pending', attempts: 1 });
    expect(first?.lastError).toBeTruthy();
    for (let pass = 0; pass < 2; pass += 1) {
      await new Promise((resolve) => setTimeout(resolve, 5));
      mailer.kick();
      await mailer.idle();
    }
    const last = await QueuedMail.findOne({ where: { subject } });
    expect(last).toMatchObject({ status: 'failed', attempts: 3 });
    await mailer.close();
  });

  it('doubles the wait after each failure, capped at six hours', () => {
    expect([1, 2, 3, 4].map((n) => retryDelayMs(n, 30_000))).toEqual([
      30_000, 60_000, 120_000, 240_000,
    ]);
    expect(retryDelayMs(30, 30_000)).toBe(6 * 3600 * 1000);
  });
});

describe('GET /api/outbox', () => {
  it('shows admins the received messages newest first, and failed ones in the queue', async () => {
    const response = await (await t.as('admin')).get('/api/outbox');
    expect(response.status).toBe(200);
    expect(response.body.messages[0]).toMatchObject({
      to: message.to,
      subject: message.subject,
      sentAt: expect.any(String),
    });
    expect(response.body.queue.map((m: { status: string }) => m.status)).toContain('failed');
  });

  it('is refused to other roles and to nobody', async () => {
    expect((await (await t.as('archivist')).get('/api/outbox')).status).toBe(403);
    expect((await t.anonymous().get('/api/outbox')).status).toBe(401);
  });
});

describe('with SMTP_URL set', () => {
  it('sends there, starts no built-in server, and has no outbox route', async () => {
    // A second SMTP server stands in for the hosted mail service.
    const hosted = await startLocalMailServer(t.ctx.sequelize);
    const config = {
      ...t.ctx.config,
      smtpUrl: hosted.url,
      mailFrom: 'Archive <mail@archive.example>',
    };
    const mailer = await createMailer(config, t.ctx.sequelize, createLogger('silent'));
    expect(mailer.usesLocalServer).toBe(false);
    await mailer.send({ ...message, subject: 'Through SMTP_URL' });
    await mailer.idle();
    const received = await OutboxMessage.findOne({ where: { subject: 'Through SMTP_URL' } });
    expect(received?.sender).toBe('mail@archive.example');
    const app = createApp({ ...t.ctx, config, mailer });
    const admin = request.agent(app.app);
    await admin
      .post('/api/session')
      .send({ email: 'admin@test.example', password: 'correct horse battery staple' });
    expect((await admin.get('/api/outbox')).status).toBe(404);
    await app.close();
    await hosted.close();
  });
});
