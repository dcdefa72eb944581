import request from 'supertest';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../../seeds/demo';
import { DEMO_PASSWORD, DEMO_USERS } from '../../../seeds/demo-reference';
import { createApp } from '../../../server/app';
import { countDemoAccounts, removeDemoAccounts } from '../../../server/auth/demo-accounts';
import { ConfigError, loadConfig } from '../../../server/config';
import { AuditEvent, User } from '../../../server/models';
import { startTestApp, type TestApp } from '../../support/test-app';

const PRODUCTION = {
  NODE_ENV: 'production',
  PUBLIC_URL: 'https://prints.example.org/',
  SESSION_SECRET: 'a secret from the environment',
};

describe('production settings', () => {
  it('stop the start with one line when the demo is asked for', () => {
    expect(() => loadConfig({ ...PRODUCTION, DEMO: '1' })).toThrow(ConfigError);
    expect(() => loadConfig({ ...PRODUCTION, DEMO: '1' })).toThrow(/DEMO must be 0/);
  });

  it('stop the start when PUBLIC_URL is missing or not an origin', () => {
    expect(() => loadConfig({ ...PRODUCTION, PUBLIC_URL: undefined })).toThrow(
      /PUBLIC_URL must be set/,
    );
    expect(() => loadConfig({ ...PRODUCTION, PUBLIC_URL: 'prints.example.org' })).toThrow(
      /http\(s\) origin/,
    );
  });

  it('run without the demo by default and keep PUBLIC_URL without its trailing slash', () => {
    const config = loadConfig(PRODUCTION);
    expect(config.demo).toBe(false);
    expect(config.publicUrl).toBe('https://prints.example.org');
  });
});

describe('a database once seeded as a demo, run with the demo off', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({ demo: true }, { users: false });
    await seedDemo(t.ctx, { passwordCost: 4 });
  });
  afterAll(() => t.close());

  const signInAsDemoAdmin = (app: TestApp['app']) =>
    request(app)
      .post('/api/session')
      .send({ email: ' Admin@printwarden.test ', password: DEMO_PASSWORD });

  it('lets the demo accounts in while the demo is on', async () => {
    expect((await signInAsDemoAdmin(t.app)).status).toBe(200);
  });

  it('refuses every demo account with 401 once the demo is off', async () => {
    const off = createApp({ ...t.ctx, config: { ...t.ctx.config, demo: false } });
    try {
      for (const { email } of DEMO_USERS) {
        const response = await request(off.app)
          .post('/api/session')
          .send({ email, password: DEMO_PASSWORD });
        expect(response.status, email).toBe(401);
      }
      expect((await signInAsDemoAdmin(off.app)).status).toBe(401);
      // The sign-in page is not told to show the first-run help: accounts exist.
      expect((await request(off.app).get('/api/demo')).body).toEqual({
        demo: false,
        firstRun: false,
      });
    } finally {
      await off.close();
    }
  });

  it('removes the demo accounts, keeping the names that records cite', async () => {
    expect(await countDemoAccounts()).toBe(5);
    const archivist = await User.findOne({ where: { email: 'archivist@printwarden.test' } });
    const audited = await AuditEvent.count({ where: { userId: archivist!.id } });
    expect(audited).toBeGreaterThan(0);

    const removal = await removeDemoAccounts(t.ctx.sequelize);

    expect(removal.deleted + removal.retired).toBe(5);
    expect(await countDemoAccounts()).toBe(0);
    const kept = await User.findByPk(archivist!.id);
    expect(kept).toMatchObject({ name: 'Ines Wetherall', active: false });
    expect(kept!.email).not.toContain('printwarden.test');
    expect(await AuditEvent.count({ where: { userId: archivist!.id } })).toBe(audited);
    // Even the demo switched back on cannot bring them back.
    expect((await signInAsDemoAdmin(t.app)).status).toBe(401);
  });
});

describe('an empty database with the demo off', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await startTestApp({}, { users: false });
  });
  afterAll(() => t.close());

  it('tells the sign-in page that the first admin is still to be made', async () => {
    expect((await t.anonymous().get('/api/demo')).body).toEqual({ demo: false, firstRun: true });
  });

  it('holds no accounts and no prints', async () => {
    expect(await User.count()).toBe(0);
    const [[{ prints }]] = (await t.ctx.sequelize.query(
      'SELECT COUNT(*) AS prints FROM prints',
    )) as [[{ prints: number }], unknown];
    expect(prints).toBe(0);
  });
});
