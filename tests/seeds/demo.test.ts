import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { Op } from 'sequelize';
import { Paper, Print, ProcessingStep, User } from '../../server/models';
import { signIn, startTestApp, type TestApp } from '../support/test-app';

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
    // Its records agree with one another: no print names a bath mixed after it was made, and
    // the darkroom's batch records do appear (from 2024 on).
    expect(
      prints.filter((print) => print.riskReasons.some((r) => r.code === 'fixer-mixed-after-print')),
    ).toEqual([]);
    const withBatch = await ProcessingStep.count({
      where: { solutionBatchId: { [Op.ne]: null } },
      distinct: true,
      col: 'printId',
    });
    expect(withBatch).toBeGreaterThan(5);
  });

  it('changes nothing when run again', async () => {
    const before = [await Print.count(), await User.count()];
    expect(await seedDemo(t.ctx, { passwordCost: 4 })).toBeNull();
    expect([await Print.count(), await User.count()]).toEqual(before);
  });

  it('start page: prints added in the last 30 days are those catalogued then, not the whole demo', async () => {
    const archivist = await signIn(t.app, 'archivist@printwarden.test', 'printwarden-demo');
    const response = await archivist.get('/api/overview');
    const asked = Date.now();
    const item = (
      response.body.items as Array<{ kind: string; count: number; label: string }>
    ).find((entry) => entry.kind === 'recent-accessions')!;
    expect(item.label).toBe('Prints added to the catalogue in the last 30 days');
    // Counted here from the rows themselves: 30 days of 86 400 000 ms before the question.
    const prints = await Print.findAll({ attributes: ['id', 'createdAt'] });
    const recent = prints.filter((print) => print.createdAt.getTime() > asked - 30 * 86_400_000);
    expect(item.count).toBe(recent.length);
    expect(item.count).toBeLessThan(prints.length);
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
