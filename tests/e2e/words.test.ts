import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

/** A colour symbol whose case was changed: "A*", "B*", "E*AB" (a*, b*, ΔE*ab as written). */
const SHOUTED_SYMBOL = /(^|[^A-Za-z])(A\*|B\*)|E\*AB/;

describe('words and notation on the tone screens', () => {
  it('keeps colour symbols in their case, shows the last values as help, one date form', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      undefined,
      '/tone-watch',
    );
    await page.locator('tbody tr a').first().click();
    const caption = page.getByText(/^Latest check \(.*\) against the baseline$/);
    await caption.waitFor();
    // One date form, the date once (it read "(9 May 2026 (2026-05-09))").
    await expect
      .poll(() => caption.innerText())
      .toMatch(/^Latest check \(\d{1,2} [A-Z][a-z]{2} \d{4}\) against the baseline$/);

    // innerText is the text as shown, after any text-transform.
    const headers = await page.locator('main thead th').allInnerTexts();
    expect(headers.join(' | ')).toContain('Δa*');
    for (const header of headers) expect(header).not.toMatch(SHOUTED_SYMBOL);

    // The previous check's values are help beside the field, never grey text inside it.
    const form = page.getByRole('form', { name: 'Log a tone check' });
    await form
      .getByText(/^last: /)
      .first()
      .waitFor();
    const placeholders = await form
      .locator('tbody input')
      .evaluateAll((inputs) => inputs.map((input) => input.getAttribute('placeholder') ?? ''));
    expect(placeholders.filter((text) => text !== '')).toEqual([]);
    const dmaxL = form.getByLabel(/dmax L\*/);
    await expect.poll(() => dmaxL.getAttribute('aria-describedby')).toMatch(/^last-/);

    // On a wide screen the tables stay grids, so no page render walks their cells to label them.
    await expect(page.locator('main td[data-label]').count()).resolves.toBe(0);

    // On a phone the table's cells carry their header as a label; symbols keep their case.
    await page.setViewportSize({ width: 390, height: 844 });
    const cell = page.locator('main td[data-label="Δa*"]').first();
    await cell.waitFor();
    await expect
      .poll(() => cell.evaluate((el) => getComputedStyle(el, '::before').textTransform))
      .toBe('none');
    // A spot's remove button is a button with its own words, not a cell led by "REMOVE".
    const remove = form.getByRole('button', { name: /^Remove / }).first();
    await expect.poll(() => remove.innerText()).toMatch(/Remove this spot/);
    await expect
      .poll(() => remove.evaluate((el) => el.closest('td')!.getAttribute('data-label')))
      .toBe('');
  });

  it('marks an overdue next check on the print record as tone watch does', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      undefined,
      '/tone-watch',
    );
    const row = page.locator('tbody tr', { hasText: 'overdue' }).first();
    await row.waitFor();
    await row.locator('a').first().click();
    const due = page.getByText(/^Next check due \d{4}-\d{2}-\d{2}/);
    await due.waitFor();
    await expect.poll(() => due.innerText()).toMatch(/overdue$/);
  });

  it('writes minus as a minus sign on Insights', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'conservator',
      undefined,
      '/insights?by=paper',
    );
    await page.getByRole('heading', { name: 'Insights', level: 1 }).waitFor();
    await page.locator('main tbody tr').first().waitFor();
    const text = await page.locator('main table').innerText();
    expect(text).not.toMatch(/(^|[\s(])-\d/);
    expect(text).toMatch(/[−+]\d/);
  });
});
