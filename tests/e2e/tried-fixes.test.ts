import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import sharp from 'sharp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Print, ToneCheck } from '../../server/models';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { flatRgb } from '../support/images';
import { readPdf } from '../support/read-pdf';

const live = useLiveServerAndBrowser();
let dir: string;
let prints: Array<{ id: number; title: string }>;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'pw-tried-'));
  prints = await Print.findAll({ order: [['id', 'ASC']], limit: 2 });
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const PHONE = { width: 390, height: 844 };

describe('the print form on a 390 px phone', () => {
  it("a step's buttons scrolled to the bottom edge stay above the sticky save bar", async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist', PHONE, '/prints/new');
    await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
    await page.getByRole('button', { name: '+ Add step' }).click();
    const remove = page.getByRole('button', { name: 'Remove step 1' });
    await remove.waitFor();
    // What a browser does when it brings a focused control into view at the bottom edge
    // (the smallest scroll that shows it); the scroll margin is what keeps it clear.
    await remove.evaluate((button) => button.scrollIntoView({ block: 'end' }));
    const bar = page.getByRole('button', { name: 'Create print' }).locator('xpath=..');
    const buttonBox = await remove.boundingBox();
    const barBox = await bar.boundingBox();
    expect(buttonBox && barBox).toBeTruthy();
    expect(buttonBox!.y + buttonBox!.height).toBeLessThanOrEqual(barBox!.y);
    await page.close();
  }, 60_000);

  it('a field tabbed to while half under the save bar is brought above it', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist', PHONE, '/prints/new');
    await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
    const description = page.getByLabel('Description');
    const bar = page.locator('[data-save-bar]');
    // Put Description's lower half under the bar, as a person scrolling down would.
    await description.evaluate((field) => {
      const box = field.getBoundingClientRect();
      window.scrollBy(0, box.bottom - window.innerHeight + box.height / 2);
    });
    const covered = (await description.boundingBox())!;
    expect(covered.y + covered.height).toBeGreaterThan((await bar.boundingBox())!.y);
    await description.focus();
    await expect
      .poll(async () => {
        const field = (await description.boundingBox())!;
        return field.y + field.height <= (await bar.boundingBox())!.y;
      })
      .toBe(true);
    await page.close();
  }, 60_000);
});

/** Brown of the test scan: flat, so any part of it shown reads the same. */
const SCAN_RGB: [number, number, number] = [150, 110, 80];

/**
 * Uploads a flat 1000 × 760 scan as the recto of the `which`th print and waits for its
 * deep-zoom viewer to draw.
 */
async function openRectoViewer(page: Page, which: number) {
  const { id, title } = prints[which]!;
  const path = join(dir, `recto-${which}.jpg`);
  writeFileSync(path, await flatRgb(1000, 760, SCAN_RGB).jpeg({ quality: 95 }).toBuffer());
  await page.goto(`${live.server.url}/prints/${id}`);
  await page.getByRole('heading', { name: 'Add images' }).waitFor();
  await page.getByLabel('choose files').setInputFiles([path]);
  await page.getByLabel(`View of recto-${which}.jpg`).selectOption('recto');
  await page.getByRole('button', { name: /^Upload 1 file/ }).click();
  const canvas = page.getByRole('img', { name: new RegExp(`^Recto of ${title}: deep zoom`) });
  await canvas.waitFor({ timeout: 30_000 });
  await expect.poll(() => canvas.locator('canvas').count(), { timeout: 15_000 }).toBeGreaterThan(0);
  return canvas;
}

describe('the deep-zoom viewer on a 390 px phone', () => {
  it('keeps its control bar inside its box, right and bottom edges', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist', PHONE);
    const canvas = await openRectoViewer(page, 0);
    const figure = canvas.locator('xpath=..');
    const bar = figure.locator('figcaption');
    const [figureBox, barBox] = [await figure.boundingBox(), await bar.boundingBox()];
    // At 390 px the bar wraps to two lines; the image above it must give way, not the box.
    expect(barBox!.x + barBox!.width).toBeLessThanOrEqual(figureBox!.x + figureBox!.width);
    expect(barBox!.y + barBox!.height).toBeLessThanOrEqual(figureBox!.y + figureBox!.height);
    await page.close();
  }, 90_000);

  it('fits the image again after entering and after leaving full screen', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist', PHONE);
    const canvas = await openRectoViewer(page, 1);
    const zoomIn = page.getByRole('button', { name: 'Zoom in' });
    const fullScreen = page.getByRole('button', { name: 'Full screen', exact: true });
    // Zoomed in, the scan fills the viewer; fitted, the dark ground shows above it (the
    // scan is wider than tall, the viewer here taller than wide). Read from the screen.
    const cornerIsScan = async () => {
      const box = (await canvas.boundingBox())!;
      return isScan(await pixelAt(page, box.x + 3, box.y + 3));
    };
    const zoomWellIn = async () => {
      for (let i = 0; i < 3; i += 1) await zoomIn.click();
      await expect.poll(cornerIsScan, { timeout: 10_000 }).toBe(true);
    };

    await zoomWellIn();
    await fullScreen.click();
    await expect.poll(() => page.evaluate(() => document.fullscreenElement !== null)).toBe(true);
    await expect.poll(cornerIsScan, { timeout: 10_000 }).toBe(false);

    await zoomWellIn();
    // In full screen the button says how to leave it.
    await page.getByRole('button', { name: 'Leave full screen' }).click();
    await expect.poll(() => page.evaluate(() => document.fullscreenElement === null)).toBe(true);
    await fullScreen.waitFor();
    await expect.poll(cornerIsScan, { timeout: 10_000 }).toBe(false);
    await page.close();
  }, 90_000);
});

/** The record of the first print on Tone watch, which has checks and so trend charts. */
async function openTonedRecord(page: Page) {
  await page.goto(`${live.server.url}/tone-watch`);
  await page.locator('tbody tr a, [role="list"] a').first().waitFor();
  await page.locator('main a[href^="/prints/"]').first().click();
  await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
}

/** Scrolls to each trend chart and waits until all are drawn; answers how many there are. */
async function drawEveryChart(page: Page): Promise<number> {
  const charts = page.locator('figure').filter({ hasText: 'ΔE00 at each check' });
  for (const chart of await charts.all()) await chart.scrollIntoViewIfNeeded();
  const count = await charts.count();
  await expect.poll(() => page.locator('svg.recharts-surface').count()).toBe(count);
  return count;
}

describe('the tone charts of a print record, printed', () => {
  /** A tone-watch print's record on a phone, its charts far below the fold and not drawn. */
  async function openRecordWithCharts(page: Page) {
    await openTonedRecord(page);
    const charts = page.locator('figure').filter({ hasText: 'dmax' });
    await charts.first().waitFor({ state: 'attached' });
    await page.waitForLoadState('networkidle');
    const top = await charts.first().evaluate((el) => el.getBoundingClientRect().top);
    expect(top).toBeGreaterThan(PHONE.height + 400);
    expect(await page.locator('svg.recharts-surface').count()).toBe(0);
    return page.locator('figure:has(svg.recharts-surface) .recharts-line-curve');
  }

  it('draw every chart, lines and all, when the page is about to print', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', PHONE);
    const lines = await openRecordWithCharts(page);
    const figures = await page.locator('figure').filter({ hasText: 'ΔE00 at each check' }).count();
    expect(figures).toBeGreaterThan(0);
    // What Ctrl+P and window.print() announce to the page, without scrolling.
    await page.evaluate(() => window.dispatchEvent(new Event('beforeprint')));
    await expect.poll(() => lines.count()).toBe(figures);
    await page.close();
  }, 60_000);

  it('draw them too when the page is shown as print media', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', PHONE);
    const lines = await openRecordWithCharts(page);
    const figures = await page.locator('figure').filter({ hasText: 'ΔE00 at each check' }).count();
    await page.emulateMedia({ media: 'print' });
    await expect.poll(() => lines.count()).toBe(figures);
    await page.close();
  }, 60_000);

  it('are on the paper of the first print, as on a print made after scrolling to them', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', PHONE);
    await openRecordWithCharts(page);
    // The chart code arrives while a person reads the page, before any chart draws.
    await expect
      .poll(() =>
        page.evaluate(() =>
          performance
            .getEntriesByType('resource')
            .some((entry) => /\/trend-line-[^/]*\.js$/.test(entry.name)),
        ),
      )
      .toBe(true);
    // Chromium's own printing (the path of Ctrl+P): the charts' threshold labels are text.
    const labels = (text: string) => text.match(/\b(watch|noticeable)\b/g)?.length ?? 0;
    const first = (await readPdf(await page.pdf())).text;
    const charts = await drawEveryChart(page);
    const later = (await readPdf(await page.pdf())).text;
    expect(labels(later)).toBeGreaterThanOrEqual(2 * charts);
    expect(labels(first)).toBe(labels(later));
    await page.close();
  }, 60_000);
});

describe('the tone charts of a print record, on narrower paper', () => {
  it('fit their boxes before the charts have measured themselves again', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', {
      width: 1400,
      height: 900,
    });
    await openTonedRecord(page);
    expect(await drawEveryChart(page)).toBeGreaterThan(0);
    await page.emulateMedia({ media: 'print' });
    // Paper is narrower than this screen; printing lays the page out at once, before any
    // ResizeObserver callback, so the narrowing and the measuring happen in one task here.
    const misfits = await page.evaluate(() => {
      document.body.style.width = '640px';
      return (
        [...document.querySelectorAll('figure')]
          .filter((figure) => figure.querySelector('svg.recharts-surface'))
          .map((figure) => {
            const box = figure.getBoundingClientRect();
            const drawing = figure.querySelector('svg.recharts-surface')!.getBoundingClientRect();
            return {
              over: Math.round(drawing.right - box.right),
              width: Math.round(drawing.width),
              box: Math.round(box.width),
            };
          })
          // Inside its box, and still most of its width (a drawing squeezed to nothing also fits).
          .filter(({ over, width, box }) => over > 0 || width < box * 0.75)
      );
    });
    expect(misfits).toEqual([]);
    await page.close();
  }, 60_000);
});

/** The colour on the screen at one CSS pixel, from a screenshot. */
async function pixelAt(page: Page, x: number, y: number): Promise<number[]> {
  const png = await page.screenshot({
    clip: { x: Math.round(x), y: Math.round(y), width: 1, height: 1 },
  });
  const { data } = await sharp(png).removeAlpha().raw().toBuffer({ resolveWithObject: true });
  return [...data.subarray(0, 3)];
}

/** Within JPEG error of the scan's brown; the viewer's ground is near black. */
const isScan = (rgb: number[]) => rgb.every((value, i) => Math.abs(value - SCAN_RGB[i]!) <= 12);

describe('a save clicked twice', () => {
  it('a double click on Create print makes one print', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'archivist',
      undefined,
      '/prints/new',
    );
    await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
    const title = `Clicked twice ${Date.now()}`;
    await page.getByLabel('Title').fill(title);
    await page.getByRole('button', { name: 'Create print' }).dblclick();
    await page.getByRole('heading', { name: title, level: 1 }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(await Print.count({ where: { title } })).toBe(1);
    await page.close();
  }, 60_000);

  it('a double click on Log check logs one check', async () => {
    const { id } = prints[1]!;
    const before = await ToneCheck.count({ where: { printId: id } });
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      undefined,
      `/prints/${id}`,
    );
    const form = page.getByRole('form', { name: 'Log a tone check' });
    await form.waitFor();
    await form.getByLabel('Checked on').fill('2026-11-29');
    await form.getByLabel('dmax L*').fill('30.5');
    await form.getByLabel('dmax a*').fill('6.0');
    await form.getByLabel('dmax b*').fill('10.0');
    await form.getByRole('button', { name: 'Log check' }).dblclick();
    await page.getByRole('status').filter({ hasText: 'logged' }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(await ToneCheck.count({ where: { printId: id } })).toBe(before + 1);
    await page.close();
  }, 60_000);
});

describe('the threshold labels of the tone charts', () => {
  /** Each drawn chart's threshold labels that overlap one of its point markers. */
  const labelsOnPoints = (page: Page) =>
    page.evaluate(() => {
      const meets = (a: DOMRect, b: DOMRect) =>
        a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
      return [...document.querySelectorAll('svg.recharts-surface')].flatMap((chart, i) => {
        const dots = [...chart.querySelectorAll('.recharts-dot')];
        return [...chart.querySelectorAll('text')]
          .filter((text) => /^(watch|noticeable)$/.test(text.textContent ?? ''))
          .filter((label) =>
            dots.some((dot) => meets(label.getBoundingClientRect(), dot.getBoundingClientRect())),
          )
          .map((label) => `chart ${i + 1}: ${label.textContent}`);
      });
    });

  it('sit clear of every point at 390 px and, the same page widened, at 1400 px', async () => {
    // A watch print whose last checks sit just above the watch line at the right edge
    // (found by opening every toned demo record with the labels at the top right).
    const { id } = (await Print.findOne({ where: { accessionNumber: '2021.0003' } }))!;
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      PHONE,
      `/prints/${id}`,
    );
    await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
    let drawnWidth = 0;
    for (const viewport of [PHONE, { width: 1400, height: 900 }]) {
      await page.setViewportSize(viewport);
      const charts = await drawEveryChart(page);
      expect(charts).toBeGreaterThan(0);
      // Widened: wait until the charts have drawn themselves again at the new width.
      const width = () =>
        page
          .locator('svg.recharts-surface')
          .first()
          .evaluate((svg) => svg.clientWidth);
      await expect.poll(width).not.toBe(drawnWidth);
      drawnWidth = await width();
      // Both labels drawn in every chart, so an empty answer below is not for want of labels.
      const drawn = await page.evaluate(() =>
        [...document.querySelectorAll('svg.recharts-surface')].map((chart) => [
          [...chart.querySelectorAll('text')].filter((text) =>
            /^(watch|noticeable)$/.test(text.textContent ?? ''),
          ).length,
          chart.querySelectorAll('.recharts-dot').length > 0,
        ]),
      );
      expect(drawn, `${viewport.width} px`).toEqual(
        Array.from({ length: charts }, () => [2, true]),
      );
      expect(await labelsOnPoints(page), `${viewport.width} px`).toEqual([]);
    }
    await page.close();
  }, 60_000);
});
