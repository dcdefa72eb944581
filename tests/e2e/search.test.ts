import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

async function signIn(role: string): Promise<Page> {
  const page = await signInAs(live.browser, live.server.url, role);
  await page.setViewportSize({ width: 1024, height: 900 });
  return page;
}

const countOf = async (page: Page, paper: string) => {
  const text = await page.getByRole('button', { name: new RegExp(`^${paper}`) }).innerText();
  return Number(text.match(/(\d+)\s*$/)![1]);
};

describe('the curator', () => {
  it('finds "cotton rag, fixed ≥ 10 minutes", saves it, builds a checklist, reorders it and prints it', async () => {
    const page = await signIn('curator');
    await openArea(page, 'Search');
    await page.getByRole('heading', { name: 'Search', level: 1 }).waitFor();

    await page.getByLabel('Words').fill('cotton rag');
    await page.waitForURL(/q=cotton\+rag/);
    // The answer to the whole query (words and filter), whenever the page asks for it.
    const whole = page.waitForResponse(
      (r) =>
        r.url().includes('/api/prints?') &&
        r.url().includes('q=cotton') &&
        /fixingMinutesMin=10(&|$)/.test(r.url()),
    );
    await page.getByLabel('Fixing: at least (minutes)').fill('10');
    await page.waitForURL(/fixingMinutesMin=10/);
    const answer = (await (await whole).json()) as { total: number };
    const total = answer.total;
    expect(total).toBeGreaterThan(1);
    // The page shows that answer, not an earlier one (the total and facets arrive together).
    const status = page.getByRole('region', { name: 'Results' }).locator('p[aria-live]');
    await expect.poll(() => status.innerText()).toMatch(new RegExp(`^${total} prints?$`));

    // The paper facet says how many of each paper: the two cotton rags hold every match.
    const papers = async () =>
      (await countOf(page, 'Hot-pressed cotton rag 300')) +
      (await countOf(page, 'Cold-pressed cotton rag 250'));
    await expect.poll(papers).toBe(total);
    await expect.poll(() => countOf(page, 'Kozo tissue 45')).toBe(0);
    // Every row shown was fixed at least 10 minutes, and a matched word is marked.
    const fixes = () => page.locator('tbody tr td:nth-child(6)').allInnerTexts();
    await expect.poll(async () => (await fixes()).length).toBe(Math.min(total, 25));
    await expect.poll(async () => (await fixes()).every((value) => Number(value) >= 10)).toBe(true);
    await expect
      .poll(() => page.locator('mark', { hasText: /cotton/i }).count())
      .toBeGreaterThan(0);
    await expectAccessible(page);

    // The query is in the address: a fresh load shows the same search.
    const url = page.url();
    await page.goto(url);
    await expect.poll(() => page.getByLabel('Words').inputValue()).toBe('cotton rag');

    await page.getByLabel('Name this search').fill('Rag, fixed 10+');
    const savedAnswer = page.waitForResponse(
      (r) => r.url().endsWith('/api/saved-searches') && r.request().method() === 'POST',
    );
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    expect((await savedAnswer).status()).toBe(201);
    await page.getByRole('link', { name: 'Rag, fixed 10+' }).waitFor();

    // Keyboard: focus the first row, arrow down, Space picks; then pick the first by click.
    const rows = page.locator('tbody tr');
    await rows.first().focus();
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press(' ');
    await page.keyboard.press('ArrowDown');
    await page.keyboard.press(' ');
    await rows.first().getByRole('checkbox').check();
    await page.getByText('3 prints picked').waitFor();
    const pickedAccessions = (await rows.locator('td:nth-child(2)').allInnerTexts()).slice(0, 3);

    await page.getByLabel('Name of the new checklist').fill('Rag loan, spring');
    await page.getByRole('button', { name: 'Add to checklist' }).click();
    await page.getByRole('link', { name: 'Open “Rag loan, spring”' }).click();
    await page.getByRole('heading', { name: 'Rag loan, spring', level: 1 }).waitFor();
    const order = () => page.locator('ol li span.font-mono').allInnerTexts();
    const before = await order();
    expect([...before].sort()).toEqual([...pickedAccessions].sort());

    // Move the first print down one place with the keyboard.
    await page.getByRole('button', { name: new RegExp(`^Move ${before[0]} .*Alt`) }).focus();
    await page.keyboard.press('Alt+ArrowDown');
    await expect.poll(order).toEqual([before[1], before[0], before[2]]);
    await page.reload();
    await expect.poll(order).toEqual([before[1], before[0], before[2]]);
    await expectAccessible(page);

    await page.getByRole('link', { name: 'Printable page' }).click();
    await page.getByRole('table', { name: 'Prints on the checklist, in order' }).waitFor();
    const printed = await page.locator('tbody tr td:nth-child(3) div.font-mono').allInnerTexts();
    expect(printed).toEqual([before[1], before[0], before[2]]);
    await page.emulateMedia({ media: 'print' });
    await expect.poll(() => page.getByRole('navigation', { name: 'Main' }).isVisible()).toBe(false);
    await page.emulateMedia({ media: 'screen' });
    await expectAccessible(page);
    await page.close();
    // A long path (three pages, four axe scans): room for a busy machine.
  }, 150_000);

  it('a viewer searches but has no saved searches or checklists', async () => {
    const page = await signIn('viewer');
    await page.goto(`${live.server.url}/search?q=weir&view=grid`);
    await page.getByRole('list', { name: /Search results/ }).waitFor();
    await expect.poll(() => page.getByRole('heading', { name: 'Saved searches' }).count()).toBe(0);
    await expect.poll(() => page.getByRole('link', { name: 'Checklists' }).count()).toBe(0);
    await expectAccessible(page);
    await page.close();
  });
});
