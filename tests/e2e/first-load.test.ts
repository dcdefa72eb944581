import { describe, expect, it } from 'vitest';
import { useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

describe('the first load of a page', () => {
  it('draws with the stylesheet written into the page, which the security policy lets apply', async () => {
    const page = await live.browser.freshPage();
    // Recorded from the first byte: a style the policy refused would show here. (A library's
    // test for `eval`, refused by `script-src`, is expected and not about styles.)
    await page.addInitScript(() => {
      const refused: string[] = [];
      (window as unknown as { refused: string[] }).refused = refused;
      document.addEventListener('securitypolicyviolation', (event) => {
        if (event.effectiveDirective.startsWith('style-src')) {
          refused.push(`${event.effectiveDirective} ${event.blockedURI}`);
        }
      });
    });
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByRole('heading', { level: 1 }).waitFor();
    const found = await page.evaluate(() => ({
      refused: (window as unknown as { refused: string[] }).refused,
      linked: document.querySelectorAll('link[rel="stylesheet"]').length,
      background: getComputedStyle(document.documentElement).backgroundColor,
    }));
    expect(found.refused).toEqual([]);
    expect(found.linked).toBe(0);
    // The paper colour of tailwind.config.ts (#f7f2e8), which only the stylesheet sets.
    expect(found.background).toBe('rgb(247, 242, 232)');
    await page.close();
  }, 60_000);
});
