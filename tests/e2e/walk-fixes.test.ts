import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

/** A tablet: tables are tables here (not stacked), wider than the screen, scrolling in a box. */
const TABLET = { width: 768, height: 1024 };

async function pageWidth(page: Page): Promise<[number, number]> {
  return page.evaluate(() => [document.documentElement.scrollWidth, window.innerWidth]);
}

describe('wide tables on a 768 px tablet', () => {
  it('scroll inside their own box; the page itself does not scroll sideways', async () => {
    const page = await signInAs(live.browser, live.server.url, 'admin', TABLET);
    for (const [path, heading] of [
      ['/prints', 'Prints'],
      ['/search?q=weir', 'Search'],
      ['/people', 'People'],
    ]) {
      await page.goto(`${live.server.url}${path}`);
      await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
      await page.getByRole('table').first().waitFor();
      await page.waitForLoadState('networkidle');
      // Screen-reader-only words in cells are absolutely placed: without a positioned box
      // around the table they escape its scrolling and widen the whole page.
      const [scrollWidth, innerWidth] = await pageWidth(page);
      expect(scrollWidth, `${path} is ${scrollWidth} px wide`).toBe(innerWidth);
    }
    await page.close();
  }, 120_000);
});

describe('areas a role may not open', () => {
  it('the viewer gets the plain no-access page, not a form they cannot send', async () => {
    const page = await signInAs(live.browser, live.server.url, 'viewer', {
      width: 390,
      height: 844,
    });
    for (const [path, title, notice, who] of [
      ['/people', 'People', 'People and invitations are not open to your role', 'admins'],
      ['/settings', 'Settings', 'Settings are not open to your role', 'conservators and admins'],
      ['/prints/new', 'New print', 'New prints are not open to your role', 'archivists and admins'],
    ]) {
      await page.goto(`${live.server.url}${path}`);
      await page.getByRole('heading', { name: title, level: 1 }).waitFor();
      await page.getByRole('heading', { name: notice, level: 2 }).waitFor();
      // Who may open it, in words read from the role table.
      await page.getByText(` are for ${who}.`).waitFor();
      await expect.poll(() => page.locator('main form').count(), { message: path }).toBe(0);
      await expect
        .poll(() => page.getByRole('link', { name: 'Search the catalogue' }).count())
        .toBe(1);
    }
    await page.close();
  }, 60_000);
});

describe('the check round', () => {
  it('says its period plainly, and not at all when the period cannot be read', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      TABLET,
      '/tone-watch/rounds?from=2026-01-01&to=2026-12-31',
    );
    await page.getByRole('heading', { name: 'Check round', level: 1 }).waitFor();
    await page
      .getByText(
        'Prints whose next check falls due from 2026-01-01 to 2026-12-31, and any still overdue from before.',
      )
      .waitFor();

    await page.goto(`${live.server.url}/tone-watch/rounds?from=2027-03-01&to=2026-01-01`);
    await page.getByText('The period ends before it starts').waitFor();
    await expect.poll(() => page.getByText(/falls due/).count()).toBe(0);
    await page.close();
  }, 60_000);
});

describe('search on a 390 px phone', () => {
  it('shows the results first; the filters fold behind one button that opens them', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator', {
      width: 390,
      height: 844,
    });
    await page.goto(`${live.server.url}/search?q=weir`);
    const results = page.getByRole('region', { name: 'Results' });
    await results.getByText(/^\d+ prints?/).waitFor();
    const filters = page.getByRole('complementary', { name: 'Filters' });
    await expect.poll(() => filters.isVisible()).toBe(false);
    const toggle = page.getByRole('button', { name: 'Filters, saved searches and picks' });
    await expect.poll(() => toggle.getAttribute('aria-expanded')).toBe('false');
    await toggle.click();
    await filters.getByText('Process').first().waitFor();
    await expect.poll(() => filters.isVisible()).toBe(true);
    await page.getByRole('button', { name: 'Hide filters and picks' }).click();
    await expect.poll(() => filters.isVisible()).toBe(false);
    await page.close();
  }, 60_000);
});

describe('the conservator’s alerts on a 390 px phone', () => {
  it('give each message the full width under the number, date and button', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      { width: 390, height: 844 },
      '/tone-watch',
    );
    const list = page.getByRole('region', { name: /^Alerts/ });
    const first = list.getByRole('listitem').first();
    await first.waitFor();
    // The message is the span that is neither the link, the date nor the button.
    const [message, row] = await first.evaluate((item): [number, number] => {
      const message = [...item.children].find(
        (child) => child.tagName === 'SPAN' && !/^\d/.test(child.textContent ?? ''),
      )!;
      return [message.getBoundingClientRect().width, item.getBoundingClientRect().width];
    });
    expect(message, `message ${message} px of ${row} px`).toBeGreaterThan(row * 0.9);
    await page.close();
  }, 60_000);
});

describe('the Prints page', () => {
  it('names its CSV download for what it holds', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator');
    await page.getByRole('link', { name: 'Download this list (CSV)' }).waitFor();
    await page.close();
  }, 60_000);

  it('signing out asks the server for nothing more as the signed-in person', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist');
    await page.getByRole('table').first().waitFor();
    await page.waitForLoadState('networkidle');
    const refused: string[] = [];
    page.on('response', (response) => {
      if (response.status() === 401 && !response.url().endsWith('/api/session'))
        refused.push(response.url());
    });
    const errors: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') errors.push(message.text());
    });
    await page.getByRole('button', { name: 'Sign out' }).click();
    await page.getByRole('button', { name: 'Sign in' }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(refused).toEqual([]);
    expect(errors.filter((text) => /401/.test(text))).toEqual([]);
    await page.close();
  }, 60_000);
});

describe('the conservator’s start page', () => {
  it('keeps tone status changes until they are marked seen', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      { width: 390, height: 844 },
      '/',
    );
    const card = page.getByRole('link', { name: /Prints whose tone status changed/ });
    await card.waitFor();
    await expect.poll(() => card.innerText()).toMatch(/^[1-9]\d*\s/);
    await page.getByRole('button', { name: 'Mark these changes seen' }).click();
    await expect
      .poll(() => card.innerText())
      .toMatch(/^0\s+Prints whose tone status changed since you last marked them seen$/);
    await expect
      .poll(() => page.getByRole('button', { name: 'Mark these changes seen' }).count())
      .toBe(0);
    await page.close();
  }, 60_000);
});

describe("the conservator's start page at 1400 px", () => {
  it("says the week's count leaves out the overdue, and keeps its date on one line", async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', undefined, '/');
    const week = page.getByRole('link', { name: /falling due this week/ });
    await expect.poll(() => week.textContent()).toMatch(/not yet overdue/);
    // At three cards a row the label wrapped inside its date, at a hyphen: "2026-" / "12-11".
    const lines = await week.evaluate((link) => {
      const walker = document.createTreeWalker(link, NodeFilter.SHOW_TEXT);
      for (let node = walker.nextNode(); node; node = walker.nextNode()) {
        const at = node.textContent!.search(/\d{4}-\d{2}-\d{2}/);
        if (at < 0) continue;
        const range = document.createRange();
        range.setStart(node, at);
        range.setEnd(node, at + 10);
        return new Set([...range.getClientRects()].map((rect) => Math.round(rect.top))).size;
      }
      return 0;
    });
    expect(lines).toBe(1);
  });
});
