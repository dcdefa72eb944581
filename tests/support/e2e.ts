import { join } from 'node:path';
import { AxeBuilder } from '@axe-core/playwright';
import type { Page } from 'playwright-core';
import { afterAll, beforeAll, expect } from 'vitest';
import { AREA_GROUPS } from '../../src/components/layout/areas';
import { launchBrowser, type TestBrowser } from './browser';
import { startLiveServer } from './live-server';

/** The demo password of every demo account (contract: demo accounts). */
export const DEMO_PASSWORD = 'printwarden-demo';

/**
 * Signs in as a test's starting point, in a browser context of its own (see `freshPage`):
 * the session comes from the API (`POST /api/session`, the form's own request), then the
 * page at `at` opens — the Prints list unless told, where most tests begin (its heading is
 * awaited; elsewhere the test waits for what it needs). The form itself is driven by the
 * tests of signing in (screens, first run, people).
 */
export async function signInWith(
  browser: TestBrowser,
  baseUrl: string,
  email: string,
  password: string,
  viewport?: { width: number; height: number },
  at = '/prints',
): Promise<Page> {
  const page = await browser.freshPage(
    viewport ? { viewport, hasTouch: viewport.width < 768 } : undefined,
  );
  // The page's own request context shares its cookies, so the session cookie lands in it.
  const answer = await page.request.post(`${baseUrl}/api/session`, {
    data: { email, password },
  });
  if (!answer.ok()) throw new Error(`sign-in as ${email} answered ${answer.status()}`);
  await page.goto(`${baseUrl}${at}`);
  if (at === '/prints') await page.getByRole('heading', { name: 'Prints', level: 1 }).waitFor();
  return page;
}

/**
 * Goes to an area through the header as a person would: on a wide screen opens the heading
 * that holds it, on a narrow one the menu button, then follows the area's link.
 */
export async function openArea(page: Page, label: string): Promise<void> {
  const nav = page.getByRole('navigation', { name: 'Main' });
  const menu = nav.getByRole('button', { name: /^Menu/ });
  if (await menu.isVisible()) {
    await menu.click();
  } else {
    const group = AREA_GROUPS.find((g) => g.areas.some((area) => area.label === label));
    if (!group) throw new Error(`No area called ${label}`);
    await nav.getByRole('button', { name: new RegExp(`^${group.heading}`) }).click();
  }
  await nav.getByRole('link', { name: label, exact: true }).click();
}

/**
 * Signs in as the demo account of a role (on a 1280 px screen unless a viewport is given)
 * and opens `at` (see `signInWith`).
 */
export function signInAs(
  browser: TestBrowser,
  baseUrl: string,
  role: string,
  viewport?: { width: number; height: number },
  at?: string,
): Promise<Page> {
  return signInWith(browser, baseUrl, `${role}@printwarden.test`, DEMO_PASSWORD, viewport, at);
}

/**
 * Opens a path inside the running app as its own links do (history plus the router's popstate),
 * without reloading the page: a reload parses and runs the client's code again, about 0.8 s of
 * the page's main thread each time. For tests about a page's content, not its first load.
 */
export async function openInApp(page: Page, path: string): Promise<void> {
  await page.evaluate((to) => {
    window.history.pushState(null, '', to);
    window.dispatchEvent(new PopStateEvent('popstate', { state: null }));
  }, path);
}

type LiveServer = Awaited<ReturnType<typeof startLiveServer>>;

/**
 * One live server and one Chromium for the test file: started before its tests, stopped
 * after them (background image work finished first). Read them through the getters once the
 * tests run.
 */
export function useLiveServerAndBrowser(): {
  readonly server: LiveServer;
  readonly browser: TestBrowser;
} {
  let server: LiveServer | undefined;
  let browser: TestBrowser | undefined;
  beforeAll(async () => {
    [server, browser] = await Promise.all([startLiveServer(), launchBrowser()]);
  });
  afterAll(async () => {
    await browser?.close();
    await server?.test.ctx.images.jobs.idle(); // uploads finish their web images first
    await server?.stop();
  });
  return {
    get server() {
      if (!server) throw new Error('the live server starts in beforeAll');
      return server;
    },
    get browser() {
      if (!browser) throw new Error('the browser starts in beforeAll');
      return browser;
    },
  };
}

/** A full-page screenshot to $SCREENSHOTS_DIR/<name>.png when that is set; else nothing. */
export async function shot(page: Page, name: string): Promise<void> {
  const dir = process.env.SCREENSHOTS_DIR;
  if (dir) await page.screenshot({ path: join(dir, `${name}.png`), fullPage: true });
}

/**
 * axe-core on the page as it stands; serious and critical findings fail the test. With a
 * name, the page is first kept as a screenshot (see `shot`). axe's colour-contrast rule is the costliest
 * (about 1 s of the page's main thread on the Prints list, over half of a scan), so it runs
 * only where asked: in the sweeps that open one page of every area (`contrast: true`). The
 * palette's pairings are checked on their own in `tests/client/app/palette-contrast.test.ts`.
 */
export async function expectAccessible(
  page: Page,
  name?: string,
  { contrast = false }: { contrast?: boolean } = {},
): Promise<void> {
  if (name) await shot(page, name);
  // Legacy mode runs axe once in the page itself; the default mode also opens a blank page
  // per call to merge results across frames, which took two thirds of each call here. The
  // app has no frames (no <iframe> under src/), so both modes report the same.
  // Only violations are read, so axe is not asked to describe every passing node: a quarter
  // less work in the page for the same rules (measured on the Prints list: 1.3–1.6 s → 1.0–1.2 s).
  const builder = new AxeBuilder({ page })
    .setLegacyMode(true)
    .options({ resultTypes: ['violations'] });
  const results = await (contrast ? builder : builder.disableRules(['color-contrast'])).analyze();
  const serious = results.violations.filter(
    (v) => v.impact === 'serious' || v.impact === 'critical',
  );
  expect(
    serious.map((v) => `${v.id}: ${v.nodes.map((n) => n.target.join(' ')).join(', ')}`),
  ).toEqual([]);
}
