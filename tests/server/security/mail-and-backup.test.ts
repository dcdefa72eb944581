import { statSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { backupDatabase } from '../../../server/db/backup';
import { up } from '../../../server/db/migrations/0010-delivered-mail-links';
import { QueuedMail } from '../../../server/models';
import { LINK_REMOVED } from '../../../server/services/mail/one-time-links';
import { lastMailTo, tokenIn } from '../../support/mail';
import { startTestApp, type TestApp } from '../../support/test-app';
import { testDatabaseDialect } from '../../support/test-database';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp();
});
afterAll(() => t.close());

describe('the mail queue after delivery', () => {
  it('keeps an invitation without its one-time link; the built-in outbox keeps what it received', async () => {
    const admin = await t.as('admin');
    const sent = await admin
      .post('/api/users/invitations')
      .send({ email: 'new.hand@example.org', role: 'viewer' });
    expect(sent.status).toBe(201);
    const received = await lastMailTo(t.ctx, 'new.hand@example.org');
    const token = tokenIn(received?.textBody);
    const queued = await QueuedMail.findOne({ where: { recipients: 'new.hand@example.org' } });
    expect(queued?.status).toBe('sent');
    expect(queued?.textBody).not.toContain(token);
    expect(queued?.htmlBody).not.toContain(token);
    expect(queued?.textBody).toContain('link removed once delivered');
    expect(queued?.textBody).toContain('has invited you');
  });

  it('keeps a password reset without its one-time link', async () => {
    await t.anonymous().post('/api/password-resets').send({ email: 'curator@test.example' });
    const received = await lastMailTo(t.ctx, 'curator@test.example');
    const token = tokenIn(received?.textBody);
    const queued = await QueuedMail.findOne({
      where: { recipients: 'curator@test.example' },
      order: [['id', 'DESC']],
    });
    expect(queued?.status).toBe('sent');
    expect(`${queued?.textBody}${queued?.htmlBody}`).not.toContain(token);
  });
});

describe('migration 0010', () => {
  it('takes the one-time links out of mail delivered before it', async () => {
    const link = `http://127.0.0.1:3000/reset-password#${'A1b2_-'.repeat(7)}x`;
    const row = await QueuedMail.create({
      recipients: 'old@example.org',
      subject: 'Reset your Printwarden password',
      textBody: `Open the link below.\n\n${link}\n`,
      htmlBody: `<p><a href="${link}">Choose a new password</a></p>`,
      nextAttemptAt: new Date(),
      status: 'sent',
    });
    await up({ context: t.ctx.sequelize.getQueryInterface() });
    await row.reload();
    expect(row.textBody).toBe(`Open the link below.\n\n${LINK_REMOVED}\n`);
    expect(row.htmlBody).not.toContain('#A1b2');
  });
});

// PostgreSQL is backed up with its own tools (README, several instances).
describe.runIf(testDatabaseDialect() === 'sqlite')('npm run backup', () => {
  it('writes the copy readable by its owner only (0600)', async () => {
    const file = join(t.dir, 'backup.sqlite');
    const umask = process.umask(0o022);
    try {
      await backupDatabase(t.ctx.config.databaseUrl, file);
    } finally {
      process.umask(umask);
    }
    expect(statSync(file).mode & 0o777).toBe(0o600);
  });
});
