import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser } from '../support/browser';
import { signInAs } from '../support/e2e';
import { startLiveServer } from '../support/live-server';

let server: Awaited<ReturnType<typeof startLiveServer>>;
let browser: Awaited<ReturnType<typeof launchBrowser>>;

beforeAll(async () => {
  [server, browser] = await Promise.all([startLiveServer(), launchBrowser()]);
});
afterAll(async () => {
  await browser?.close();
  await server?.stop();
});

describe('search results after opening one', () => {
  it('keeps the picks and puts focus back on the opened result’s link after Back', async () => {
    const page = await signInAs(browser, server.url, 'curator');
    await page.goto(`${server.url}/search?q=salt`);
    const results = page.getByRole('table').getByRole('row');
    await results.nth(3).waitFor();
    const picks = page.getByRole('checkbox', { name: /^Pick / });
    await picks.nth(0).check();
    await picks.nth(1).check();
    await page.getByText('2 prints picked').waitFor();

    const link = results.nth(3).getByRole('link');
    const href = await link.getAttribute('href');
    await link.click();
    await page.waitForURL((url) => url.pathname === href);
    await page.goBack();
    await page.getByText('2 prints picked').waitFor();
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.getAttribute('href')))
      .toBe(href);
  });
});
