import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { Paper, Print, User } from '../../server/models';
import { startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ demo: true }, { users: false });
});
afterAll(() => t.close());

describe('the demo collection', () => {
  it('is a collection worth exploring: 60+ prints over 5+ years, 4+ papers, 3+ processes', async () => {
    const seeded = await seedDemo(t.ctx, { passwordCost: 4 });
    expect(seeded).toEqual({ users: 5, prints: expect.any(Number) });
    const prints = await Print.findAll();
    expect(prints.length).toBeGreaterThanOrEqual(60);
    const years = new Set(prints.map((print) => print.accessionNumber.slice(0, 4)));
    expect(years.size).toBeGreaterThanOrEqual(5);
    expect(await Paper.count()).toBeGreaterThanOrEqual(4);
    const processes = new Set(prints.map((print) => print.process));
    expect(processes.size).toBeGreaterThanOrEqual(3);
    const salt = prints.filter((print) => print.process === 'salt print').length;
    expect(salt / prints.length).toBeGreaterThan(0.5);
    const short = prints.filter((print) =>
      print.riskReasons.some((r) => r.code.startsWith('short-')),
    );
    expect(short.length).toBeGreaterThan(3);
  });

  it('changes nothing when run again', async () => {
    const before = [await Print.count(), await User.count()];
    expect(await seedDemo(t.ctx, { passwordCost: 4 })).toBeNull();
    expect([await Print.count(), await User.count()]).toEqual(before);
  });

  it('lets each demo account sign in with the documented password', async () => {
    for (const role of ['admin', 'archivist', 'curator', 'conservator', 'viewer']) {
      const response = await t
        .anonymous()
        .post('/api/session')
        .send({ email: `${role}@printwarden.test`, password: 'printwarden-demo' });
      expect(response.body.user?.role).toBe(role);
    }
  });
});
