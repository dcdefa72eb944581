import type { Locator } from 'playwright-core';
import { beforeAll, describe, expect, it } from 'vitest';
import { UNREADABLE_DATE_MESSAGE } from '../../shared/domain/calendar';
import { Print, Treatment } from '../../server/models';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();
let printId: number;

beforeAll(async () => {
  printId = (await Print.findOne({ order: [['id', 'ASC']] }))!.id;
});

/**
 * Types a date into Chromium's own date field segment by segment, as a person does: the
 * headless browser's locale shows month / day / year, and each segment moves on when full.
 */
async function typeDate(field: Locator, monthDayYear: string) {
  await field.page().waitForLoadState('networkidle'); // the page done moving under the click
  const box = (await field.boundingBox())!;
  await field.click({ position: { x: 10, y: box.height / 2 } });
  // Back to the month, the leftmost segment, wherever the click put the cursor.
  await field.press('ArrowLeft');
  await field.press('ArrowLeft');
  await field.page().keyboard.type(monthDayYear);
}

describe('a date that does not exist, typed into a date field', () => {
  it('is named on the treatment form (checked by its schema), and nothing is saved', async () => {
    const before = await Treatment.count({ where: { printId } });
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      undefined,
      `/prints/${printId}/treatments/new`,
    );
    const date = page.getByLabel('Treated on');
    await date.waitFor();
    await typeDate(date, '02312025'); // 31 February 2025
    await page.getByLabel('Action').fill('Surface cleaned');
    await page.getByRole('button', { name: 'Save treatment' }).click();
    // What Chromium keeps for it: no value, and its own "bad input" mark.
    expect(await date.evaluate((el: HTMLInputElement) => [el.value, el.validity.badInput])).toEqual(
      ['', true],
    );
    await page.getByText(UNREADABLE_DATE_MESSAGE).waitFor();
    expect(await date.getAttribute('aria-invalid')).toBe('true');
    // Not the empty field's "required", and the date field is where the cursor goes back to.
    await expect.poll(() => date.evaluate((el) => el === document.activeElement)).toBe(true);
    await page.waitForLoadState('networkidle');
    expect(await Treatment.count({ where: { printId } })).toBe(before);
    expect(page.url()).toContain('/treatments/new');
    await page.close();
  }, 60_000);

  it('is named on the Made filter of Search as soon as the person tabs on (no form to send)', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator', undefined, '/search');
    const from = page.getByLabel('From', { exact: true }).and(page.locator('input[type=date]'));
    await from.waitFor();
    await typeDate(from, '02312025');
    await page.keyboard.press('Tab');
    await page.getByText(UNREADABLE_DATE_MESSAGE).waitFor();
    expect(await from.getAttribute('aria-invalid')).toBe('true');
    await page.close();
  }, 60_000);
});
