import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { Print, ToneCheck } from '../../server/models';
import { signIn } from '../support/test-app';
import { startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ demo: true }, { users: false });
  await seedDemo(t.ctx, { passwordCost: 4 });
});
afterAll(() => t.close());

describe('demo tone histories', () => {
  it('give at least 30 prints 3–10 checks each, none with a baseline on the day the print was made', async () => {
    const checks = await ToneCheck.findAll();
    const perPrint = new Map<number, number>();
    for (const check of checks) perPrint.set(check.printId, (perPrint.get(check.printId) ?? 0) + 1);
    const withHistory = [...perPrint.values()].filter((n) => n >= 3 && n <= 10);
    expect(withHistory.length).toBeGreaterThanOrEqual(30);
    expect(Math.max(...perPrint.values())).toBeLessThanOrEqual(10);
    const early = await Print.findAll();
    expect(early.filter((p) => p.riskReasons.some((r) => r.code === 'early-baseline'))).toEqual([]);
  });

  it('the briefly washed prints change faster than the well-washed ones, and head the tone watch', async () => {
    const curator = await signIn(t.app, 'curator@printwarden.test', 'printwarden-demo');
    const { body } = await curator.get('/api/cohorts?by=washing');
    const rate = (key: string) => body.groups.find((g: { key: string }) => g.key === key);
    expect(rate('lt5').meanRatePerYear).toBeGreaterThan(3 * rate('10-30').meanRatePerYear);
    const conservator = await signIn(t.app, 'conservator@printwarden.test', 'printwarden-demo');
    const watch = await conservator.get('/api/tone-watch');
    const top = watch.body.items.slice(0, 3).map((item: { status: string }) => item.status);
    for (const status of top) expect(['yellowing', 'fading', 'darkening']).toContain(status);
    const statuses = new Set(watch.body.items.map((item: { status: string }) => item.status));
    expect(statuses.has('yellowing') || statuses.has('fading')).toBe(true);
  });
});
