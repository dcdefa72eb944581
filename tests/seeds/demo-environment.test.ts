import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { Location } from '../../server/models';
import { signIn } from '../support/test-app';
import { startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
const ids = new Map<string, number>();
beforeAll(async () => {
  t = await startTestApp({ demo: true }, { users: false });
  await seedDemo(t.ctx, { passwordCost: 4 });
  for (const place of await Location.findAll()) ids.set(place.code, place.id);
});
afterAll(() => t.close());

describe('demo environment', () => {
  it('gives each logged place a year of days and two weeks of raw readings', async () => {
    const conservator = await signIn(t.app, 'conservator@printwarden.test', 'printwarden-demo');
    const year = await conservator.get(`/api/locations/${ids.get('SR-C2')}/environment`);
    expect(year.body.days).toHaveLength(365);
    expect(year.body.to).toBe('2026-11-14');
    expect(year.body.figures.readings).toBe(365 * 144);
    const week = await conservator.get(
      `/api/locations/${ids.get('SR-C2')}/environment?from=2026-11-08&to=2026-11-14`,
    );
    expect(week.body.readings).toHaveLength(7 * 144);
    const drawer = await conservator.get(`/api/locations/${ids.get('SR-C1-D1')}/environment`);
    expect(drawer.body.source).toMatchObject({ code: 'SR-C1', inherited: true });
  });

  it('the warm damp cabinet ages faster, and its prints change faster than the cool one’s', async () => {
    const conservator = await signIn(t.app, 'conservator@printwarden.test', 'printwarden-demo');
    const warm = (await conservator.get(`/api/locations/${ids.get('SR-C2')}/environment`)).body;
    const cool = (await conservator.get(`/api/locations/${ids.get('SR-C1')}/environment`)).body;
    expect(warm.figures.relativeRate).toBeGreaterThan(3 * cool.figures.relativeRate);
    expect(warm.figures.meanRh).toBeGreaterThan(50);
    expect(warm.prints.count).toBeGreaterThan(5);
    expect(cool.prints.count).toBeGreaterThan(5);
    expect(warm.prints.meanRatePerYear).toBeGreaterThan(1.5 * cool.prints.meanRatePerYear);
  });

  it('cohorts by place: the warm cabinet’s boxes change faster than the cool cabinet’s drawers', async () => {
    const curator = await signIn(t.app, 'curator@printwarden.test', 'printwarden-demo');
    const { body, status } = await curator.get('/api/cohorts?by=place');
    expect(status).toBe(200);
    type Group = { label: string; prints: number; meanRatePerYear: number | null };
    const mean = (cabinet: string) => {
      const groups = (body.groups as Group[]).filter((g) => g.label.includes(cabinet));
      const prints = groups.reduce((n, g) => n + g.prints, 0);
      return groups.reduce((sum, g) => sum + (g.meanRatePerYear ?? 0) * g.prints, 0) / prints;
    };
    expect(body.groups.map((g: Group) => g.label)).toContain(
      'Store room › Cabinet 2 › Solander box 1',
    );
    expect(mean('Cabinet 2')).toBeGreaterThan(1.5 * mean('Cabinet 1'));
    const viewer = await signIn(t.app, 'viewer@printwarden.test', 'printwarden-demo');
    expect((await viewer.get('/api/cohorts?by=place')).status).toBe(403);
    expect((await viewer.get('/api/cohorts?by=paper')).status).toBe(200);
  });

  it('opens an alert for the damp cabinet', async () => {
    const conservator = await signIn(t.app, 'conservator@printwarden.test', 'printwarden-demo');
    const alerts = await conservator.get('/api/environment-alerts');
    const damp = alerts.body.items.find(
      (a: { place: { code: string }; kind: string }) =>
        a.place.code === 'SR-C2' && a.kind === 'too-damp',
    );
    expect(damp).toBeDefined();
  });
});
