import { describe, expect, it } from 'vitest';
import { expectAccessible, shot, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

const WIDTHS = [1400, 768, 390] as const;

describe('the one settings page', () => {
  it('shows every area with its sources; an admin fixes a refused value and saves', async () => {
    for (const width of WIDTHS) {
      const page = await signInAs(
        live.browser,
        live.server.url,
        'admin',
        { width, height: 900 },
        '/settings',
      );
      await page.getByRole('heading', { name: 'Settings', level: 1 }).waitFor();
      for (const legend of ['Tone watch thresholds', 'Tone check intervals', 'Chemistry'])
        await page.getByRole('group', { name: legend }).waitFor();
      await page.getByText(/Default 20: Common practice/).waitFor();
      await expectAccessible(page, `settings-admin-${width}`);
      await page.close();
    }

    const page = await signInAs(
      live.browser,
      live.server.url,
      'admin',
      {
        width: 390,
        height: 900,
      },
      '/settings',
    );
    const capacity = page.getByLabel(/Fixer capacity/);
    await capacity.fill('0');
    await page.getByRole('button', { name: /Save/ }).click();
    await page.getByText('At least 1').waitFor();
    await shot(page, 'settings-admin-refused-390');
    await capacity.fill('15');
    const saved = page.waitForResponse(
      (response) =>
        response.url().endsWith('/api/settings') && response.request().method() === 'PATCH',
    );
    await page.getByRole('button', { name: /Save/ }).click();
    expect((await saved).status()).toBe(200);
    await expect.poll(() => page.getByText('At least 1').count()).toBe(0);

    await page.goto(`${live.server.url}/chemistry`);
    const panel = page.getByRole('region', { name: 'Settings' });
    await panel.getByText(/Fixer capacity: 15/).waitFor();
    await panel.getByRole('link', { name: /Settings page/ }).waitFor();
    await shot(page, 'chemistry-admin-390');

    await page.goto(`${live.server.url}/settings`);
    await page.getByLabel(/Fixer capacity/).fill('20');
    await page.getByRole('button', { name: /Save/ }).click();
    await page
      .getByLabel(/Fixer capacity/)
      .and(page.locator('[value="20"]'))
      .waitFor();
  });

  it('while a save is on its way, says so instead of showing the last run as if it were new', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'admin',
      {
        width: 1400,
        height: 900,
      },
      '/settings',
    );
    const watch = page.getByLabel(/^Watch/).first();
    await watch.fill('0.9');
    await page.getByRole('button', { name: /Save/ }).click();
    await page.getByText(/Every print re-evaluated/).waitFor();
    // Hold the next save on its way to the (real) server until the page has been read.
    let release: () => void = () => {};
    const held = new Promise<void>((resolve) => (release = resolve));
    await page.route('**/api/settings', async (route) => {
      if (route.request().method() === 'PATCH') await held;
      await route.continue();
    });
    await watch.fill('1');
    await page.getByRole('button', { name: /Save/ }).click();
    await page.getByText('Saving the settings…').waitFor();
    await expect.poll(() => page.getByText(/Every print re-evaluated/).count()).toBe(0);
    release();
    await page.getByText(/Every print re-evaluated/).waitFor();
    await page.unroute('**/api/settings');

    // A refused save: the status line says so, not the last run's state.
    await page.getByLabel(/Fixer capacity/).fill('0');
    await page.getByRole('button', { name: /Save/ }).click();
    await page.getByText('At least 1').waitFor();
    await page
      .getByRole('status')
      .filter({ hasText: /^Not saved/ })
      .waitFor();
    await expect.poll(() => page.getByText(/Every print re-evaluated/).count()).toBe(0);
    await page.close();
  });

  it('a conservator reads the settings as read-only fields that look it', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      { width: 390, height: 900 },
      '/settings',
    );
    await page.getByText(/Only an administrator may change these/).waitFor();
    const capacity = page.getByLabel(/Fixer capacity/);
    await expect.poll(() => capacity.getAttribute('readonly')).not.toBeNull();
    // Not the white box of a field that takes typing.
    expect(await capacity.evaluate((el) => getComputedStyle(el).borderStyle)).toBe('dashed');
    expect(await capacity.evaluate((el) => getComputedStyle(el).backgroundColor)).not.toBe(
      'rgb(255, 255, 255)',
    );
    expect(await page.getByRole('button', { name: /Save/ }).count()).toBe(0);
    await page.close();
  });

  it('a viewer gets no settings on the chemistry page and works at the default coverage', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'viewer',
      {
        width: 768,
        height: 900,
      },
      '/chemistry',
    );
    await page.getByRole('heading', { level: 1 }).first().waitFor();
    await expect.poll(() => page.getByRole('region', { name: 'Settings' }).count()).toBe(0);
    await shot(page, 'chemistry-viewer-768');
    await page.goto(`${live.server.url}/chemistry/solution-maker`);
    await page.getByText(/per coat \(the default\)/).waitFor();
    await shot(page, 'solution-maker-viewer-768');
  });
});
