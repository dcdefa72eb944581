import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

const PHONE = { width: 390, height: 844 };
const TABLET = { width: 768, height: 1024 };

describe('the tone charts of a print record', () => {
  it('draw only when they come near the screen, in the space kept for them', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', PHONE, '/tone-watch');
    await page.locator('tbody tr a, [role="list"] a').first().waitFor();
    await page.locator('main a[href^="/prints/"]').first().click();
    await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
    const figure = page.locator('figure').filter({ hasText: 'dmax' }).first();
    await figure.waitFor({ state: 'attached' });
    await page.waitForLoadState('networkidle');
    // Far below the fold on a phone: its words are there, its drawing not yet.
    expect(await figure.isVisible()).toBe(true);
    expect(await figure.evaluate((el) => el.getBoundingClientRect().top > innerHeight + 400)).toBe(
      true,
    );
    expect(await page.locator('svg.recharts-surface').count()).toBe(0);
    const before = await figure.boundingBox();
    await figure.scrollIntoViewIfNeeded();
    await expect.poll(() => figure.locator('svg.recharts-surface').count()).toBe(1);
    // The chart drew into its kept height: the figure did not grow.
    expect((await figure.boundingBox())?.height).toBe(before?.height);
    await page.close();
  }, 60_000);
});

describe('search on a 768 px tablet', () => {
  it('folds the filters under one button, and the page does not scroll sideways', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator', TABLET, '/search?q=weir');
    const results = page.getByRole('region', { name: 'Results' });
    await results.getByText(/^\d+ prints?/).waitFor();
    await page.getByRole('table').first().waitFor();
    const filters = page.getByRole('complementary', { name: 'Filters' });
    await expect.poll(() => filters.isVisible()).toBe(false);
    // Folded filters are not drawn at all until first opened (their date fields cost a
    // first-use task on a slow phone's load).
    expect(await page.locator('#search-filters input').count()).toBe(0);
    const toggle = page.getByRole('button', { name: 'Filters, saved searches and picks' });
    await toggle.click();
    await filters.getByText('Process').first().waitFor();
    expect(await filters.locator('input[type="date"]').count()).toBe(2);
    // Folded again and reopened, what was typed is still there.
    await filters.getByLabel('Name this search').fill('Weir prints');
    await page.getByRole('button', { name: 'Hide filters and picks' }).click();
    await expect.poll(() => filters.isVisible()).toBe(false);
    await toggle.click();
    expect(await filters.getByLabel('Name this search').inputValue()).toBe('Weir prints');
    await expect
      .poll(() => page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth))
      .toBe(true);
    // The results keep the page's width: they are not squeezed beside the filters.
    const [resultsBox, filtersBox] = [await results.boundingBox(), await filters.boundingBox()];
    expect(resultsBox!.width).toBeGreaterThan(600);
    expect(filtersBox!.y + filtersBox!.height).toBeLessThanOrEqual(resultsBox!.y + 1);
    await page.close();
  }, 60_000);

  it('keeps the filter column beside the results from 1024 px', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'curator',
      {
        width: 1024,
        height: 900,
      },
      '/search?q=weir',
    );
    const filters = page.getByRole('complementary', { name: 'Filters' });
    await filters.getByText('Process').first().waitFor();
    await expect
      .poll(() =>
        page.getByRole('button', { name: 'Filters, saved searches and picks' }).isVisible(),
      )
      .toBe(false);
    await page.close();
  }, 60_000);
});

/**
 * Layout shifts as the browser reports them (the Layout Instability API, the measure behind
 * Lighthouse's CLS), each with what moved; shifts right after input do not count.
 */
async function watchShifts(
  page: Page,
): Promise<() => Promise<Array<{ value: number; moved: string }>>> {
  await page.addInitScript(() => {
    const found: Array<{ value: number; moved: string }> = [];
    (window as unknown as { shifts: typeof found }).shifts = found;
    new PerformanceObserver((list) => {
      for (const entry of list.getEntries() as unknown as Array<{
        value: number;
        hadRecentInput: boolean;
        sources?: Array<{ node?: Node }>;
      }>) {
        if (entry.hadRecentInput) continue;
        const moved = (entry.sources ?? [])
          .map((source) => {
            const node = source.node;
            if (!(node instanceof Element)) return node?.nodeName ?? '?';
            return `${node.tagName.toLowerCase()}${node.className ? `.${String(node.className).split(' ').slice(0, 3).join('.')}` : ''} "${(node.textContent ?? '').slice(0, 30)}"`;
          })
          .join(' | ');
        found.push({ value: entry.value, moved });
      }
    }).observe({ type: 'layout-shift', buffered: true });
  });
  return () =>
    page.evaluate(
      () => (window as unknown as { shifts: Array<{ value: number; moved: string }> }).shifts,
    );
}

const total = (shifts: Array<{ value: number }>) => shifts.reduce((sum, s) => sum + s.value, 0);

describe('pages hold still while they load', () => {
  for (const viewport of [PHONE, { width: 1400, height: 900 }]) {
    it(`the sign-in page at ${viewport.width} px: the demo accounts arrive below, nothing moves`, async () => {
      const page = await live.browser.freshPage({ viewport });
      const shifts = await watchShifts(page);
      await page.goto(`${live.server.url}/sign-in`);
      await page.getByRole('heading', { name: 'Demo accounts' }).waitFor();
      await page.evaluate(() => document.fonts.ready);
      await page.waitForLoadState('networkidle');
      const found = await shifts();
      expect(total(found), JSON.stringify(found)).toBeLessThan(0.01);
      await page.close();
    }, 60_000);

    for (const [path, ready] of [
      ['/tone-watch', 'tbody tr'],
      ['/search?q=weir', 'nav[aria-label="Pages"]'],
      ['/prints', 'nav[aria-label="Pages"]'],
    ] as const) {
      it(`${path} at ${viewport.width} px`, async () => {
        const page = await signInAs(
          live.browser,
          live.server.url,
          'conservator',
          viewport,
          '/account',
        );
        const shifts = await watchShifts(page);
        await page.goto(`${live.server.url}${path}`);
        await page.locator(ready).first().waitFor();
        await page.evaluate(() => document.fonts.ready);
        await page.waitForLoadState('networkidle');
        const found = await shifts();
        expect(total(found), JSON.stringify(found)).toBeLessThan(0.01);
        await page.close();
      }, 60_000);
    }
  }
});

describe('the check round on a 390 px phone', () => {
  it('puts each print’s patch list beside its short status chip, not under it', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      PHONE,
      '/tone-watch/rounds?from=2026-01-01&to=2026-12-31',
    );
    const rows = page.locator('main ol > li');
    await rows.first().waitFor();
    const count = await rows.count();
    expect(count).toBeGreaterThan(2);
    for (let i = 0; i < count; i += 1) {
      const row = rows.nth(i);
      const chip = row.locator('span.rounded-full').first();
      const patches = row.getByText(/^(dmax|mid|highlight|dmin)(, \w+)*$/).first();
      const [chipBox, patchBox] = [await chip.boundingBox(), await patches.boundingBox()];
      const centre = (box: { y: number; height: number }) => box.y + box.height / 2;
      expect(
        Math.abs(centre(chipBox!) - centre(patchBox!)),
        `row ${i}: chip at ${chipBox!.y}, patches at ${patchBox!.y}`,
      ).toBeLessThan(4);
      expect(patchBox!.x).toBeGreaterThan(chipBox!.x + chipBox!.width);
    }
    expect(
      await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth),
    ).toBe(true);
    await page.close();
  }, 60_000);
});

describe('search words changed just before a result is opened', () => {
  it('the opened result wins: the search waiting to be sent does not take the address back', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator', TABLET, '/account');
    // The page's clock is the test's: the box's pause after typing runs out when told to.
    await page.clock.install();
    await page.goto(`${live.server.url}/search?q=weir`);
    const link = page.locator('main a[data-print-link]').first();
    await link.waitFor();
    const href = await link.getAttribute('href');
    // The record's code is held, so the click's navigation is still on its way when the
    // pause runs out.
    let release: () => void = () => undefined;
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route(/\/assets\/print-record-page-[^/]+\.js$/, async (route) => {
      await held;
      await route.continue();
    });
    await page.getByLabel('Words').fill('weir below');
    await link.click();
    await page.clock.runFor(2_000);
    release();
    await page
      .getByRole('heading', { name: 'Tone watch', level: 2 })
      .or(page.getByRole('heading', { name: 'Images', level: 2 }))
      .first()
      .waitFor();
    expect(new URL(page.url()).pathname).toBe(href);
    await page.close();
  }, 60_000);
});

describe('entering readings on the check round', () => {
  it('has the next print’s last check fetched before stepping on, and asks for it once', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      PHONE,
      '/tone-watch/rounds?from=2026-01-01&to=2026-12-31',
    );
    const asked: string[] = [];
    page.on('request', (request) => {
      const id = /\/api\/prints\/(\d+)\/tone-checks$/.exec(new URL(request.url()).pathname)?.[1];
      if (id && request.method() === 'GET') asked.push(id);
    });
    await page.getByRole('button', { name: 'Enter readings' }).click();
    const current = page.getByRole('region', { name: 'Current print' });
    await current.getByText(/^Print 1 of /).waitFor();
    await page.getByLabel('dmax L*').waitFor();
    // This print's checks and the next one's, before any step.
    await expect.poll(() => new Set(asked).size).toBe(2);
    const [first, second] = [...new Set(asked)];
    await page.getByRole('button', { name: 'Next print →' }).click();
    await current.getByText(/^Print 2 of /).waitFor();
    await page.getByLabel('dmax L*').waitFor();
    // Stepping on read the cache: the second print's checks were asked for once, not again.
    expect(asked.filter((id) => id === second)).toHaveLength(1);
    expect(asked.filter((id) => id === first)).toHaveLength(1);
    await page.close();
  }, 60_000);
});

describe('a page’s first data', () => {
  for (const [path, chunk, data] of [
    ['/prints', 'prints-list-page', '/api/prints?'],
    ['/tone-watch', 'tone-watch-page', '/api/tone-watch'],
    ['/search?q=weir', 'search-page', 'q=weir'],
  ] as const) {
    it(`is asked for beside the page’s code, not after it: ${path}`, async () => {
      const page = await signInAs(live.browser, live.server.url, 'conservator', TABLET, '/account');
      await page.getByRole('heading', { name: 'Your password', level: 1 }).waitFor();
      let release: () => void = () => undefined;
      const held = new Promise<void>((resolve) => (release = resolve));
      await page.route(new RegExp(`/assets/${chunk}-[^/]+\\.js$`), async (route) => {
        await held;
        await route.continue();
      });
      const asked = page.waitForRequest(
        (request) => request.url().includes('/api/') && request.url().includes(data),
      );
      // A fresh load, as when the address is opened: the page's code is held back, and its
      // data is asked for all the same.
      await page.goto(`${live.server.url}${path}`, { waitUntil: 'commit' });
      await asked;
      release();
      await page.locator('main h1').first().waitFor();
      await page.close();
    }, 60_000);
  }
});

describe('mistakes people make', () => {
  for (const viewport of [PHONE, TABLET]) {
    it(`Back in the middle of entering a round asks first, and staying keeps the readings (${viewport.width} px)`, async () => {
      const page = await signInAs(
        live.browser,
        live.server.url,
        'conservator',
        viewport,
        '/tone-watch',
      );
      await page.getByRole('heading', { name: 'Tone watch', level: 1 }).waitFor();
      // Into the round within the app, as a person goes (Back then stays in the app).
      await page.getByRole('link', { name: 'Check round' }).first().click();
      await page.getByRole('heading', { name: 'Check round', level: 1 }).waitFor();
      await page.getByRole('button', { name: 'Enter readings' }).click();
      await page.getByLabel('dmax L*').fill('31.5');
      await page.goBack();
      const dialog = page.getByRole('dialog', { name: 'Leave without saving?' });
      await dialog.waitFor();
      await dialog.getByRole('button', { name: 'Stay and keep editing' }).click();
      await expect.poll(() => page.getByLabel('dmax L*').inputValue()).toBe('31.5');
      expect(new URL(page.url()).pathname).toBe('/tone-watch/rounds');
      await page.close();
    }, 60_000);
  }

  it('showing the round for a longer period keeps the readings typed for a print due in both', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      PHONE,
      '/tone-watch/rounds',
    );
    await page.getByRole('heading', { name: 'Check round', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Enter readings' }).click();
    const current = page.getByRole('region', { name: 'Current print' });
    await page.getByLabel('dmax L*').fill('31.5');
    const accession = await current.locator('h2 .font-mono').innerText();
    // A month longer: every print due before is still due, so the typed print stays.
    const to = page.getByLabel('Due by');
    const until = new Date(`${await to.inputValue()}T00:00:00Z`);
    until.setUTCMonth(until.getUTCMonth() + 1);
    await to.fill(until.toISOString().slice(0, 10));
    await page.getByRole('button', { name: 'Show', exact: true }).click();
    await expect
      .poll(() => new URL(page.url()).searchParams.get('to'))
      .toBe(until.toISOString().slice(0, 10));
    await current.getByText(/^Print 1 of /).waitFor();
    const count = Number(
      (await current.getByText(/^Print 1 of /).innerText()).match(/of (\d+)/)![1],
    );
    for (let step = 0; step < count; step += 1) {
      if ((await current.locator('h2 .font-mono').innerText()) === accession) break;
      await page.getByRole('button', { name: 'Next print →' }).click();
      await current.getByText(new RegExp(`^Print ${step + 2} of `)).waitFor();
    }
    expect(await current.locator('h2 .font-mono').innerText()).toBe(accession);
    await expect.poll(() => page.getByLabel('dmax L*').inputValue()).toBe('31.5');
    await page.close();
  }, 60_000);

  it('a page past the end of the list says so and offers the last page', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'viewer',
      TABLET,
      '/prints?page=999',
    );
    const pages = page.getByRole('navigation', { name: 'Pages' });
    await pages.getByText(/^There is no page 999: the list has \d+ pages?\.$/).waitFor();
    await expect.poll(() => pages.getByText(/Page 999 of/).count()).toBe(0);
    const last = pages.getByRole('button', { name: /^Go to page \d+$/ });
    const number = (await last.innerText()).replace(/\D/g, '');
    await last.click();
    await expect.poll(() => new URL(page.url()).searchParams.get('page')).toBe(number);
    await pages.getByText(`Page ${number} of ${number}`).waitFor();
    await page.locator('main a[data-print-link]').first().waitFor();
    await page.close();
  }, 60_000);
});

describe('titles in the print tables at 768 px', () => {
  for (const path of ['/search?q=weir', '/prints?q=weir']) {
    it(`keep room for a few words a line: ${path}`, async () => {
      const page = await signInAs(live.browser, live.server.url, 'curator', TABLET, path);
      const link = page.locator('main a[data-print-link]').filter({ hasText: 'footbridge (IV)' });
      await link.first().waitFor();
      const lines = await link.first().evaluate((element) => {
        const style = getComputedStyle(element);
        const lineHeight = parseFloat(style.lineHeight) || parseFloat(style.fontSize) * 1.5;
        return Math.round(element.getBoundingClientRect().height / lineHeight);
      });
      // "Weir below the footbridge (IV)" in two lines at most, not one word a line.
      expect(lines).toBeLessThanOrEqual(2);
      expect(
        await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth),
      ).toBe(true);
      await page.close();
    }, 60_000);
  }
});

describe('a print record’s code', () => {
  it('brings no validation library (zod and its messages) to read a record', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', TABLET, '/account');
    await page.getByRole('heading', { name: 'Your password', level: 1 }).waitFor();
    const scripts: string[] = [];
    page.on('request', (request) => {
      if (request.resourceType() === 'script') scripts.push(new URL(request.url()).pathname);
    });
    await page.goto(`${live.server.url}/prints/1`);
    await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
    await page.getByRole('form', { name: 'Log a tone check' }).waitFor();
    await page.waitForLoadState('networkidle');
    expect(scripts.length).toBeGreaterThan(3);
    expect(scripts.filter((path) => /\/assets\/(messages|zod)-[^/]+\.js$/.test(path))).toEqual([]);
    await page.close();
  }, 60_000);
});
