import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { expectAccessible, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

const signIn = (role: string) => signInAs(live.browser, live.server.url, role);
const thisMonth = () => `${new Date().toISOString().slice(0, 7)}-01`;

/** Types one print's four readings (L*, a*, b* per patch) into the round's form. */
async function typeReadings(page: Page, form: ReturnType<Page['getByRole']>) {
  const readings: Array<[string, number[]]> = [
    ['dmax', [33.0, 6.9, 12.1]],
    ['mid', [58.0, 5.0, 17.0]],
    ['highlight', [84.0, 1.4, 12.0]],
    ['dmin', [89.5, 0.4, 9.6]],
  ];
  for (const [patch, values] of readings) {
    for (const [i, channel] of ['L', 'a', 'b'].entries())
      await form.getByLabel(`${patch} ${channel}*`).fill(String(values[i]));
  }
}

describe('the tone watch after a threshold change', () => {
  it('still lists the alerts once an admin has changed a threshold and prints were re-evaluated', async () => {
    const admin = await signIn('admin');
    await admin.goto(`${live.server.url}/settings`);
    await admin.getByLabel(/Yellowing: b\* gain/).fill('2.5');
    await admin.getByRole('button', { name: /Save and re-evaluate/ }).click();
    await admin.getByText(/Every print re-evaluated/).waitFor();

    const page = await signIn('conservator');
    await page.goto(`${live.server.url}/tone-watch`);
    const alerts = page.getByRole('region', { name: /Alerts/ });
    await alerts.getByText(/\(\d+ open\)/).waitFor();
    await expect.poll(() => alerts.getByRole('alert').count()).toBe(0);
    await expect
      .poll(() => alerts.getByRole('button', { name: /Acknowledge alert/ }).count())
      .toBeGreaterThan(0);
  });

  it('says so, with a retry, when the alerts cannot be loaded', async () => {
    const page = await signIn('conservator');
    // The server no longer fails here; the browser is made to see a failing answer.
    await page.route('**/api/alerts', (route) =>
      route.fulfill({
        status: 500,
        contentType: 'application/problem+json',
        body: JSON.stringify({ title: 'Server error', status: 500 }),
      }),
    );
    await page.goto(`${live.server.url}/tone-watch`);
    const alerts = page.getByRole('region', { name: /Alerts/ });
    await alerts.getByRole('alert').filter({ hasText: 'The alerts could not be loaded' }).waitFor();
    await page.unroute('**/api/alerts');
    await alerts.getByRole('button', { name: 'Try again' }).click();
    await alerts.getByText(/\(\d+ open\)/).waitFor();
  });
});

describe('the check round on a phone (390 px)', () => {
  it('offers every print in turn, keeps drafts, keeps patch names readable and focus on the next print', async () => {
    const page = await signIn('conservator');
    await page.setViewportSize({ width: 390, height: 844 });
    await page.goto(`${live.server.url}/tone-watch/rounds`);
    await page.getByRole('heading', { name: 'Check round', level: 1 }).waitFor();
    // What is due now: this month, overdue checks included.
    await expect.poll(() => page.getByLabel('Due from').inputValue()).toBe(thisMonth());
    await page.getByRole('button', { name: 'Enter readings' }).click();
    const current = page.getByRole('region', { name: 'Current print' });
    const position = current.getByText(/^Print \d+ of \d+/);
    await position.waitFor();
    const total = Number((await position.textContent())!.match(/of (\d+)/)![1]);
    expect(total).toBeGreaterThan(2);
    const form = current.getByRole('form', { name: 'Log a tone check' });

    // Patch names are not cut to two letters.
    const name = form.getByLabel('Patch 3 name');
    await expect.poll(() => name.inputValue()).toBe('highlight');
    const fits = await name.evaluate(
      (input: HTMLInputElement) => input.scrollWidth <= input.clientWidth,
    );
    expect(fits).toBe(true);

    // A draft stays with its print while moving on and back.
    await form.getByLabel('dmax L*').fill('31.7');
    await current.getByRole('button', { name: 'Next print →' }).click();
    await current.getByText(`Print 2 of ${total}`).waitFor();
    await current.getByRole('button', { name: '← Previous print' }).click();
    await current.getByText(`Print 1 of ${total}`).waitFor();
    await expect.poll(() => form.getByLabel('dmax L*').inputValue()).toBe('31.7');

    // Each patch's three numbers sit side by side, wide enough for their "last:" lines,
    // which never run into each other (the remove button once squeezed them).
    const boxes = await form
      .locator('tbody tr')
      .first()
      .evaluate((row) =>
        [...row.querySelectorAll('input[inputmode="decimal"]')].map((input) => {
          const hint = document.getElementById(input.getAttribute('aria-describedby') ?? '');
          const box = input.getBoundingClientRect();
          const last = hint!.getBoundingClientRect();
          return { left: box.left, width: box.width, hintLeft: last.left, hintRight: last.right };
        }),
      );
    expect(boxes).toHaveLength(3);
    for (const [i, box] of boxes.entries()) {
      expect(box.width).toBeGreaterThan(80);
      if (i > 0) expect(box.hintLeft).toBeGreaterThanOrEqual(boxes[i - 1]!.hintRight);
    }

    // Logging moves on by one, the round keeps its length, and the cursor is in the next form.
    await typeReadings(page, form);
    await form.getByRole('button', { name: 'Log check' }).click();
    await current.getByText(`Print 2 of ${total}`).waitFor();
    // The logged print's comparison stacks as every table does: each value under its name,
    // the last column's (ΔD) included.
    const comparison = page.getByRole('table', { name: /against its baseline/ });
    const unlabelled = await comparison
      .locator('tbody tr')
      .first()
      .evaluate((row) =>
        [...row.querySelectorAll('td')]
          .filter((cell) => {
            const label = getComputedStyle(cell, '::before');
            return label.display === 'none' || !label.content.includes('"');
          })
          .map((cell) => cell.textContent),
      );
    expect(unlabelled).toEqual([]);
    await form.getByLabel('dmax L*').waitFor();
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-label')))
      .toBe('dmax L*');
    await expectAccessible(page, 'e2e-round-390');
  });
});

describe('past checks and condition reports on the record', () => {
  it('opens a past check to read it, corrects it and makes it the baseline', async () => {
    const page = await signIn('conservator');
    await page.goto(`${live.server.url}/tone-watch`);
    await page.locator('tbody tr a').first().click();
    await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
    await page.getByText(/^Past checks \(\d+\)$/).click();
    const checks = page.locator('details details');
    const oldest = checks.last();
    await oldest.locator('summary').click();
    await oldest.getByRole('table', { name: /Readings of the check/ }).waitFor();
    await oldest.getByRole('button', { name: 'Correct' }).click();
    const correction = oldest.getByRole('form', { name: /Correct the check/ });
    await correction.getByLabel('dmin b*').fill('4.5');
    await correction.getByRole('button', { name: 'Save the correction' }).click();
    await oldest.getByRole('cell', { name: '4.5', exact: true }).waitFor();

    const newest = checks.first();
    await newest.locator('summary').click();
    await newest.getByRole('button', { name: 'Make this the baseline' }).click();
    await newest.locator('summary').getByText('baseline', { exact: true }).waitFor();
    await expectAccessible(page);

    // Deleting a check asks in the app's own dialog, as everywhere else.
    const before = await checks.count();
    await oldest.getByRole('button', { name: 'Delete' }).click();
    await page
      .getByRole('dialog', { name: /^Delete the check of / })
      .getByRole('button', { name: 'Delete' })
      .click();
    await expect.poll(() => checks.count()).toBe(before - 1);
  });

  it('refuses a report without a grade, then opens the saved one, corrects and deletes it', async () => {
    const page = await signIn('conservator');
    await page.goto(`${live.server.url}/prints`);
    await page.locator('tbody tr a').first().click();
    await page.getByRole('link', { name: 'Write condition report' }).click();
    await page.getByRole('button', { name: 'Save condition report' }).click();
    await page.getByText('Choose a grade').waitFor();
    await page.getByLabel('settled').check();
    await page.getByLabel('Room temperature (°C)').fill('18.5');
    await page.getByLabel('Relative humidity (%)').fill('47');
    await page.getByLabel('Notes').fill('Looked at under raking light.');
    await page.getByRole('button', { name: 'Save condition report' }).click();

    const report = page.getByRole('article', { name: /^Condition report of / }).first();
    await report.locator('summary').click();
    await report.getByText('Looked at under raking light.').waitFor();
    await report.getByText('18.5 °C, 47 % RH').waitFor();
    await report.getByRole('link', { name: 'Correct' }).click();
    await page.getByLabel('vulnerable').check();
    await page.getByRole('button', { name: 'Save the correction' }).click();
    const corrected = page.getByRole('article', { name: /^Condition report of / }).first();
    await corrected.getByText('vulnerable').first().waitFor();
    await corrected.locator('summary').click();
    const before = await page.getByRole('article', { name: /^Condition report of / }).count();
    await corrected.getByRole('button', { name: 'Delete' }).click();
    // The question is the app's own dialog, as everywhere else, not the browser's.
    await page
      .getByRole('dialog', { name: /^Delete the condition report of / })
      .getByRole('button', { name: 'Delete' })
      .click();
    await expect
      .poll(() => page.getByRole('article', { name: /^Condition report of / }).count())
      .toBe(before - 1);
    await expectAccessible(page);
  });
});
