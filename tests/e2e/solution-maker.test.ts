import { describe, expect, it } from 'vitest';
import { expectAccessible, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

describe('the solution maker', () => {
  it('drops the result when the recipe changes, so an old result cannot be saved', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'archivist',
      undefined,
      '/chemistry/solution-maker',
    );
    await page.getByLabel('Chemical', { exact: true }).selectOption('sodium thiosulfate');
    await page.getByLabel('Concentration (% w/v)').fill('15');
    await page.getByLabel('Volume to make').fill('1000');
    await page.getByRole('button', { name: 'Work it out' }).click();
    const result = page.getByRole('region', { name: 'Result' });
    await result.getByText('Weigh 150.00 g of sodium thiosulfate').waitFor();
    await page.getByRole('button', { name: 'Save as a batch' }).waitFor();

    // A silver nitrate recipe with no strength: invalid, so nothing may stay on screen.
    await page.getByLabel('Chemical', { exact: true }).selectOption('silver nitrate');
    await page.getByLabel('Concentration (% w/v)').fill('');
    await page.getByRole('button', { name: 'Work it out' }).click();
    await page.locator('input[aria-invalid="true"]').waitFor();
    await expect.poll(() => result.count()).toBe(0);
    await expect.poll(() => page.getByRole('button', { name: 'Save as a batch' }).count()).toBe(0);
  });

  // CRC Handbook (from memory): about 31.6 g NaCl per 100 ml of saturated brine at 20 °C.
  it('warns that 40 % w/v sodium chloride is more than water dissolves', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'archivist',
      undefined,
      '/chemistry/solution-maker',
    );
    await page.getByLabel('Chemical', { exact: true }).selectOption('sodium chloride');
    await page.getByLabel('Concentration (% w/v)').fill('40');
    await page.getByLabel('Volume to make').fill('500');
    await page.getByRole('button', { name: 'Work it out' }).click();
    const result = page.getByRole('region', { name: 'Result' });
    await result.getByText('Weigh 200.00 g of sodium chloride').waitFor();
    await result.getByText(/more sodium chloride than water dissolves at 20 °C/).waitFor();
    await expectAccessible(page);
  });
});
