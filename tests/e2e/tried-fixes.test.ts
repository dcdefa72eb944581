import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Print } from '../../server/models';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { buildJpeg } from '../support/images';

const live = useLiveServerAndBrowser();
let dir: string;
let printId: number;
let printTitle: string;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'pw-tried-'));
  const print = await Print.findOne({ order: [['id', 'ASC']] });
  printId = print!.id;
  printTitle = print!.title;
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
});

/** Uploads one scan as the print's recto and waits for its deep-zoom viewer to draw. */
async function openRectoViewer(page: Page) {
  const path = join(dir, 'recto.jpg');
  writeFileSync(path, await buildJpeg(1000, 760));
  await page.goto(`${live.server.url}/prints/${printId}`);
  await page.getByRole('heading', { name: 'Add images' }).waitFor();
  await page.getByLabel('choose files').setInputFiles([path]);
  await page.getByLabel('View of recto.jpg').selectOption('recto');
  await page.getByRole('button', { name: /^Upload 1 file/ }).click();
  const canvas = page.getByRole('img', { name: new RegExp(`^Recto of ${printTitle}: deep zoom`) });
  await canvas.waitFor({ timeout: 30_000 });
  await expect.poll(() => canvas.locator('canvas').count(), { timeout: 15_000 }).toBeGreaterThan(0);
  return canvas;
}

describe('the deep-zoom viewer on a 390 px phone', () => {
  it('keeps its control bar inside its box, right and bottom edges', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist', PHONE);
    const canvas = await openRectoViewer(page);
    const figure = canvas.locator('xpath=..');
    const bar = figure.locator('figcaption');
    const [figureBox, barBox] = [await figure.boundingBox(), await bar.boundingBox()];
    // At 390 px the bar wraps to two lines; the image above it must give way, not the box.
    expect(barBox!.x + barBox!.width).toBeLessThanOrEqual(figureBox!.x + figureBox!.width);
    expect(barBox!.y + barBox!.height).toBeLessThanOrEqual(figureBox!.y + figureBox!.height);
    await page.close();
  }, 90_000);
});
