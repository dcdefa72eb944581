import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { seedDemo } from '../../seeds/demo';
import { hasVersoImage } from '../../seeds/demo-registrar';
import { Asset, Print } from '../../server/models';
import { startTestApp, type TestApp } from '../support/test-app';

// The demo with its generated images attached (as `npm start` does): each photographed
// verso's pencil marks are marked on that verso photograph, through the one write path.
let t: TestApp;
beforeAll(async () => {
  t = await startTestApp({ demo: true }, { users: false });
});
afterAll(async () => {
  await t.ctx.images.jobs.idle();
  await t.close();
});

describe('demo verso marks with images attached', () => {
  it('point every photographed verso pencil mark at that print’s verso image', async () => {
    await seedDemo(t.ctx, { passwordCost: 4, images: 'await' });
    const prints = await Print.findAll({ order: [['id', 'ASC']] });
    const versos = await Asset.findAll({ where: { view: 'verso' } });
    const versoOf = new Map(versos.map((asset) => [asset.printId, asset.id]));
    let photographed = 0;
    prints.forEach((print, index) => {
      const marked = print.marks.filter((mark) => mark.area !== null);
      if (!hasVersoImage(index)) {
        expect(marked, print.accessionNumber).toEqual([]);
        return;
      }
      photographed += 1;
      expect(marked.map((mark) => mark.transcription)[0], print.accessionNumber).toBe(
        print.accessionNumber,
      );
      expect(marked, print.accessionNumber).toHaveLength(2);
      for (const mark of marked) expect(mark.assetId).toBe(versoOf.get(print.id));
    });
    expect(photographed).toBe(versos.length);
    // A photograph's file name names its own print: a condition report offers the print's
    // photographs by name, and "print-2-recto.jpg" on print 3 read as the wrong print's.
    const assets = await Asset.findAll();
    expect(assets.length).toBeGreaterThan(versos.length);
    for (const asset of assets)
      expect(asset.originalName).toMatch(new RegExp(`^print-${asset.printId}-${asset.view}\\.`));
  }, 300_000);
});
