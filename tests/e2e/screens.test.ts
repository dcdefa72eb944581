import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import {
  DEMO_PASSWORD,
  expectAccessible,
  openInApp,
  signInAs,
  useLiveServerAndBrowser,
} from '../support/e2e';
import { buildJpeg } from '../support/images';
import { signIn as apiSignIn } from '../support/test-app';

const live = useLiveServerAndBrowser();

const PHONE = { width: 390, height: 844 };
const WIDE = { width: 1400, height: 900 };

/** Whether the page itself scrolls sideways (a table may scroll inside its own box). */
async function expectNoSidewaysScroll(page: Page, where: string): Promise<void> {
  const [scrollWidth, innerWidth] = await page.evaluate(() => [
    document.documentElement.scrollWidth,
    window.innerWidth,
  ]);
  expect(scrollWidth, `${where} is ${scrollWidth} px wide on a ${innerWidth} px screen`).toBe(
    innerWidth,
  );
}

/** Signs in through the form and waits for the start page, where everyone lands. */
async function signInToStart(role: string, viewport: { width: number; height: number }) {
  const page = await live.browser.freshPage({ viewport, hasTouch: viewport.width < 768 });
  await page.goto(`${live.server.url}/sign-in`);
  await page.getByLabel('E-mail').fill(`${role}@printwarden.test`);
  await page.getByLabel('Password').fill(DEMO_PASSWORD);
  await page.getByRole('button', { name: 'Sign in' }).click();
  await page.getByRole('heading', { name: 'Today', level: 1 }).waitFor();
  expect(new URL(page.url()).pathname).toBe('/');
  return page;
}

/** One page of every area, opened as the role it serves, with the heading each one shows. */
const AREA_PAGES: Record<string, Array<[string, string]>> = {
  viewer: [
    ['/', 'Today'],
    ['/prints', 'Prints'],
    ['/search?q=weir', 'Search'],
    ['/insights', 'Insights'],
    ['/papers', 'Papers'],
  ],
  curator: [
    ['/checklists', 'Checklists'],
    ['/places', 'Places'],
    ['/prints/1', ''],
  ],
  conservator: [
    ['/tone-watch', 'Tone watch'],
    ['/tone-watch/rounds?from=2026-01-01&to=2027-12-31', 'Check round'],
    ['/settings', 'Settings'],
  ],
  archivist: [
    ['/imports', 'Imports'],
    ['/prints/new', 'New print'],
    ['/negatives', 'Negatives'],
    ['/chemistry', 'Chemistry'],
  ],
  admin: [
    ['/people', 'People'],
    ['/outbox', 'Outbox'],
    ['/fixity', 'Fixity'],
    ['/chemistry/solution-maker', 'Solution maker'],
  ],
};

describe('every area on a 390 px phone', () => {
  for (const [role, pages] of Object.entries(AREA_PAGES)) {
    it(`as the ${role}: no page scrolls sideways and axe finds nothing serious`, async () => {
      const page = await signInAs(live.browser, live.server.url, role, PHONE);
      for (const [path, heading] of pages) {
        await openInApp(page, path);
        const title = heading
          ? page.getByRole('heading', { name: heading, level: 1 })
          : page.getByRole('heading', { name: 'Processing history' });
        await title.waitFor();
        await page.waitForLoadState('networkidle');
        await expectNoSidewaysScroll(page, path);
        await expectAccessible(page, undefined, { contrast: true });
      }
      await page.close();
    }, 120_000);
  }
});

describe('stacked rows on a 390 px phone', () => {
  it('keep a value of several lines in the value column, beside its name, not under it', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator', PHONE);
    await openInApp(page, '/prints');
    const cell = page.locator('tbody tr').first().locator('td[data-label="Title · maker"]');
    await cell.locator('a').waitFor();
    // The title's link and the maker's line under it start at the same left edge, right of
    // the column name (which once took the line and pushed the maker under it).
    const edges = await cell.evaluate((td) => {
      const link = td.querySelector('a')!.getBoundingClientRect();
      const lines = [...td.querySelectorAll('div, span, p')].map((e) => e.getBoundingClientRect());
      const maker = lines.filter((box) => box.top >= link.bottom - 1 && box.width > 0)[0]!;
      return { link: link.left, maker: maker.left, cell: td.getBoundingClientRect().left };
    });
    expect(edges.maker).toBeCloseTo(edges.link, 0);
    expect(edges.link - edges.cell).toBeGreaterThan(100);
    await page.close();
  });
});

describe('navigation by job', () => {
  it('the admin sees four headings, not fourteen links; each opens its areas; Escape closes', async () => {
    const page = await signInToStart('admin', WIDE);
    // The start page's backup item leads to the part of Fixity that shows backups and disk.
    await page.getByRole('link', { name: 'No backup recorded' }).click();
    const backups = page.getByRole('region', { name: 'Backups and disk' });
    await backups.getByText(/^Originals take/).waitFor();
    await expect.poll(() => page.evaluate(() => location.hash)).toBe('#backups');
    await backups.getByText('npm run backup -- FILE').waitFor();
    await page.goBack();
    const nav = page.getByRole('navigation', { name: 'Main' });
    const headings = nav.getByRole('button');
    await expect
      .poll(() => headings.allTextContents())
      .toEqual([
        expect.stringMatching(/^Collection/),
        expect.stringMatching(/^Conservation/),
        expect.stringMatching(/^Darkroom/),
        expect.stringMatching(/^Administration/),
      ]);
    await expect.poll(() => nav.getByRole('link').count()).toBe(0);

    const administration = nav.getByRole('button', { name: /^Administration/ });
    await administration.click();
    await expect.poll(() => administration.getAttribute('aria-expanded')).toBe('true');
    await expect
      .poll(() => nav.getByRole('link').allTextContents())
      .toEqual(['People', 'Outbox', 'Fixity']);
    await page.keyboard.press('Escape');
    await expect.poll(() => nav.getByRole('link').count()).toBe(0);
    // Focus goes back to the heading, not to the top of the page.
    await expect
      .poll(() =>
        page.evaluate(() => document.activeElement?.textContent?.startsWith('Administration')),
      )
      .toBe(true);

    await administration.click();
    await nav.getByRole('link', { name: 'People' }).click();
    await page.getByRole('heading', { name: 'People', level: 1 }).waitFor();
    // The heading that holds the current area says so.
    await expect.poll(() => administration.textContent()).toMatch(/you are here/);
    await expectAccessible(page);
    await page.close();
  });

  it('the viewer sees only the headings of their own areas', async () => {
    const page = await signInToStart('viewer', WIDE);
    const nav = page.getByRole('navigation', { name: 'Main' });
    await expect
      .poll(() => nav.getByRole('button').allTextContents())
      .toEqual([
        expect.stringMatching(/^Collection/),
        expect.stringMatching(/^Conservation/),
        expect.stringMatching(/^Darkroom/),
      ]);
    await nav.getByRole('button', { name: /^Conservation/ }).click();
    await expect.poll(() => nav.getByRole('link').allTextContents()).toEqual(['Insights']);
    await page.close();
  });

  it('on a phone: the skip link comes first, then one menu button naming the current area', async () => {
    const page = await signInToStart('curator', PHONE);
    await page.keyboard.press('Tab');
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.textContent))
      .toBe('Skip to content');
    // Following it puts focus on the page's main part, not back on the page as a whole.
    await page.keyboard.press('Enter');
    await expect.poll(() => page.evaluate(() => document.activeElement?.id)).toBe('main');
    const nav = page.getByRole('navigation', { name: 'Main' });
    const menu = nav.getByRole('button', { name: /^Menu/ });
    await expect.poll(() => nav.getByRole('button').count()).toBe(1);
    await menu.click();
    await nav.getByRole('link', { name: 'Checklists' }).click();
    await page.getByRole('heading', { name: 'Checklists', level: 1 }).waitFor();
    await expect.poll(() => menu.textContent()).toMatch(/Checklists$/);
    // The header takes a strip at the top, not a third of the screen.
    const header = await page.locator('header').first().boundingBox();
    expect(header!.height).toBeLessThan(PHONE.height / 8);
    await expectNoSidewaysScroll(page, 'the checklists');
    await page.close();
  });
});

describe('the conservator at a cabinet, on a 390 px phone', () => {
  it('opens the start page, sees the checks due, and logs readings for three prints', async () => {
    const page = await signInToStart('conservator', PHONE);
    const overdue = page.getByRole('link', { name: /Tone checks overdue/ });
    const count = Number((await overdue.textContent())!.match(/^\d+/)![0]);
    expect(count).toBeGreaterThanOrEqual(3);
    await expectNoSidewaysScroll(page, 'the start page');
    await expectAccessible(page);

    await overdue.click();
    await page.getByRole('heading', { name: 'Check round', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Enter readings' }).click();
    const logged = new Set<string>();
    for (let n = 1; n <= 3; n += 1) {
      const current = page.getByRole('region', { name: 'Current print' });
      await current.getByText(/^Print \d+ of /).waitFor();
      await page.getByLabel('dmax L*').fill(String(30 + n));
      await page.getByLabel('dmax a*').fill('6.5');
      await page.getByLabel('dmax b*').fill('10.2');
      await expectNoSidewaysScroll(page, `print ${n} of the round`);
      // Logging steps on to the next print once the round has been read again.
      await Promise.all([
        page.waitForResponse((r) => r.url().includes('/tone-checks') && r.status() === 201),
        page.waitForResponse((r) => r.url().includes('/api/tone-rounds')),
        page.getByRole('button', { name: 'Log check' }).click(),
      ]);
      // The confirmation names a print not logged before in this round.
      const accession = await page
        .waitForFunction(
          (seen) => {
            const status = [...document.querySelectorAll('[role="status"]')]
              .map((element) => element.textContent?.match(/^Logged (\S+):/)?.[1])
              .find(Boolean);
            return status && !seen.includes(status) ? status : null;
          },
          [...logged],
        )
        .then((handle) => handle.jsonValue());
      logged.add(accession!);
    }
    expect(logged.size).toBe(3);
    await expectAccessible(page);
    await page.close();
  }, 90_000);
});

describe('marking an area on a condition photograph without a pointer', () => {
  it('arrow keys move, Shift and arrows resize, Enter keeps, and each step is announced', async () => {
    const archivist = await apiSignIn(
      live.server.test.app,
      'archivist@printwarden.test',
      DEMO_PASSWORD,
    );
    await archivist
      .post('/api/prints/2/assets')
      .field('view', 'detail')
      .attach('file', await buildJpeg(640, 480), 'corner.jpg')
      .expect(201);
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      PHONE,
      '/prints/2/condition-reports/new',
    );
    await page.getByLabel('Attach detail corner.jpg').check();
    const marker = page.getByRole('application', {
      name: 'Mark an area on Photograph detail corner.jpg',
    });
    await marker.focus();
    const announced = page.locator('[aria-live="polite"]').filter({ hasText: /./ });

    await page.keyboard.press('ArrowRight');
    await announced
      .getByText(
        'Moved: 42 % from the left, 40 % from the top, 20 % wide, 20 % high. Enter keeps it.',
      )
      .waitFor();
    await page.keyboard.press('ArrowRight');
    await page.keyboard.press('Shift+ArrowDown');
    await announced
      .getByText(/^Resized: 44 % from the left, 40 % from the top, 20 % wide, 22 % high/)
      .waitFor();
    // Not kept yet: the form still has no area.
    await page.getByText('No area marked.', { exact: true }).waitFor();
    await page.keyboard.press('Enter');
    await announced
      .getByText('Area kept: 44 % from the left, 40 % from the top, 20 % wide, 22 % high.')
      .waitFor();
    await page.getByText('Area marked.', { exact: true }).waitFor();
    await expectNoSidewaysScroll(page, 'the condition report');
    await expectAccessible(page);
    await page.close();
  }, 60_000);
});
