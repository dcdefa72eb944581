import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { demoImagePlan, drawVerso, VERSO_MARK_AREAS } from '../../seeds/demo-images';
import { hasVersoImage } from '../../seeds/demo-registrar';
import { seededRandom } from '../../seeds/random';
import { Print, Source } from '../../server/models';
import { startTestApp, type TestApp } from '../support/test-app';

let t: TestApp;
let prints: Print[];
beforeAll(async () => {
  t = await startTestApp({ demo: true }, { users: false });
  await seedDemo(t.ctx, { passwordCost: 4 });
  prints = await Print.findAll({ order: [['id', 'ASC']] });
});
afterAll(() => t.close());

describe('the demo registrar record', () => {
  it('has donors, a purchase, a bequest with a two-link chain and a spread of rights', async () => {
    const sources = await Source.findAll();
    const kinds = new Map(sources.map((source) => [source.id, source.kind]));
    const methods = prints.map((print) => print.acquisition?.method);
    expect(methods.every(Boolean)).toBe(true);
    const gifts = prints.filter((print) => print.acquisition?.method === 'gift');
    expect(new Set(gifts.map((print) => print.sourceId)).size).toBeGreaterThanOrEqual(2);
    expect(gifts.some((print) => kinds.get(print.sourceId!) === 'person')).toBe(true);
    const purchases = prints.filter((print) => print.acquisition?.method === 'purchase');
    expect(purchases.length).toBeGreaterThan(0);
    expect(purchases.every((print) => (print.acquisition?.price ?? 0) > 0)).toBe(true);
    const bequests = prints.filter((print) => print.acquisition?.method === 'bequest');
    expect(bequests.length).toBeGreaterThan(0);
    expect(bequests.every((print) => print.provenance.length === 2)).toBe(true);
    expect(new Set(prints.map((print) => print.rightsStatement)).size).toBeGreaterThanOrEqual(6);
  });

  it('writes inscriptions on most versos, and on every photographed one the marks it shows', () => {
    const versoMarked = prints.filter((print) =>
      print.marks.some((mark) => mark.position === 'verso'),
    );
    expect(versoMarked.length / prints.length).toBeGreaterThan(0.6);
    prints.forEach((print, index) => {
      if (!hasVersoImage(index)) return;
      const pencil = print.marks.filter(
        (mark) => mark.position === 'verso' && mark.kind === 'pencil inscription',
      );
      expect(pencil.map((mark) => mark.transcription)[0], print.accessionNumber).toBe(
        print.accessionNumber,
      );
      expect(pencil, print.accessionNumber).toHaveLength(2);
    });
  });

  it("marks' areas hold the pencil the generated versos show (and the pencil lies in them)", () => {
    const versos = demoImagePlan(prints.length).flatMap(({ images }) =>
      images.filter((plan) => plan.view === 'verso'),
    );
    expect(versos.length).toBeGreaterThan(10);
    const areas = Object.values(VERSO_MARK_AREAS);
    for (const plan of versos.slice(0, 8)) {
      const pixels = drawVerso(seededRandom(plan.seed), plan.width, plan.height);
      const inside = new Array<number>(areas.length).fill(0);
      let outside = 0;
      for (let y = 0; y < plan.height; y += 1) {
        for (let x = 0; x < plan.width; x += 1) {
          const at = (y * plan.width + x) * 3;
          // Paper sits near 229 (± its fibres); pencil darkens it to 200 or below.
          if (pixels[at]! > 200) continue;
          const area = areas.findIndex(
            (a) =>
              x >= a.x * plan.width &&
              x < (a.x + a.width) * plan.width &&
              y >= a.y * plan.height &&
              y < (a.y + a.height) * plan.height,
          );
          if (area === -1) outside += 1;
          else inside[area]! += 1;
        }
      }
      const total = inside.reduce((sum, n) => sum + n, 0) + outside;
      expect(total, plan.file).toBeGreaterThan(100);
      expect(outside / total, plan.file).toBeLessThan(0.02);
      for (const count of inside) expect(count, plan.file).toBeGreaterThan(total * 0.1);
    }
  });
});
