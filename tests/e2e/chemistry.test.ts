import { describe, expect, it } from 'vitest';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';

// A long path through five pages with four axe scans: on a loaded machine it needs more than
// the project's 60 s default.
const live = useLiveServerAndBrowser();

const signIn = (role: string) => signInAs(live.browser, live.server.url, role);

describe('the archivist and the chemistry', () => {
  it('makes a fixer batch, uses it in a print, and sees warnings for a short fix and an exhausted batch', async () => {
    const page = await signIn('archivist');
    await openArea(page, 'Chemistry');
    await page.getByRole('heading', { name: 'Chemistry', level: 1 }).waitFor();
    await expectAccessible(page);

    // The solution maker: 15 % sodium thiosulfate, one litre → 150 g (15 g per 100 ml).
    await page.getByRole('link', { name: 'Solution maker' }).click();
    await page.getByLabel('Chemical', { exact: true }).selectOption('sodium thiosulfate');
    await page.getByLabel('Concentration (% w/v)').fill('15');
    await page.getByLabel('Volume to make').fill('1000');
    await page.getByRole('button', { name: 'Work it out' }).click();
    const result = page.getByRole('region', { name: 'Result' });
    await result.getByText('Weigh 150.00 g of sodium thiosulfate').waitFor();
    await expect.poll(() => result.getByText('158.11 g/mol').isVisible()).toBe(true);
    await expect
      .poll(() => result.getByText(/does not replace the chemical’s safety data sheet/).isVisible())
      .toBe(true);
    await page.setViewportSize({ width: 768, height: 1000 });
    await expectAccessible(page);
    await page.setViewportSize({ width: 1280, height: 860 });

    await page.getByLabel('Batch code').fill('FIX-E2E');
    await page.getByLabel('Made on').fill('2026-01-05');
    await page.getByRole('button', { name: 'Save as a batch' }).click();
    await page.getByRole('status').getByText('Saved as batch').waitFor();

    // A print fixed only 6 minutes in the new batch; picking the batch fills the chemistry.
    await openArea(page, 'Prints');
    await page.getByRole('link', { name: 'New print' }).click();
    await page.getByLabel('Title').fill('Weir in the new fixer');
    await page.getByLabel('Made', { exact: true }).fill('2026-05-14');
    for (const [stage, minutes] of [
      ['salting', 3],
      ['sensitizing', null],
      ['exposure', 40],
      ['prewash', 2],
      ['fixing', 6],
      ['washing', 20],
    ] as const) {
      await page.getByRole('button', { name: '+ Add step' }).click();
      const step = page.getByRole('listitem').last();
      await step.getByLabel('Stage').selectOption(stage);
      if (minutes !== null) await step.getByLabel('Minutes').fill(String(minutes));
    }
    const fixing = page.getByRole('listitem', { name: 'Step 5' });
    await fixing
      .getByLabel('Solution batch')
      .selectOption({ label: 'FIX-E2E · sodium thiosulfate 15 %' });
    await expect.poll(() => fixing.getByLabel('Chemical').inputValue()).toBe('sodium thiosulfate');
    await expect.poll(() => fixing.getByLabel('Concentration (% w/v)').inputValue()).toBe('15');
    await page.getByRole('listitem', { name: 'Step 2' }).getByLabel('Coats').fill('1');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByRole('heading', { name: 'Weir in the new fixer', level: 1 }).waitFor();
    await page.getByText('Fixed 6 min; 10 min or more is usual.').waitFor();
    const printUrl = page.url();

    // The batch is marked exhausted before the print was made: the record says so.
    await page.getByRole('link', { name: 'FIX-E2E' }).click();
    await page.getByRole('heading', { name: 'FIX-E2E' }).waitFor();
    await page.getByRole('link', { name: 'Weir in the new fixer' }).waitFor();
    await expectAccessible(page);
    await page.getByRole('link', { name: 'All batches' }).click();
    const row = page.getByRole('row').filter({ hasText: 'FIX-E2E' });
    await row.getByRole('button', { name: 'Edit' }).click();
    await page.getByLabel('Exhausted on').fill('2026-03-01');
    await page.getByRole('button', { name: 'Save', exact: true }).click();
    await row.getByText('2026-03-01').waitFor();

    await page.goto(printUrl);
    await page
      .getByText(
        'Fixer batch FIX-E2E was marked exhausted on 2026-03-01, before the print was made.',
      )
      .waitFor();
    await expect
      .poll(() => page.getByText('Fixed 6 min; 10 min or more is usual.').isVisible())
      .toBe(true);
  }, 120_000);

  it('opens a negative and sees a suggested exposure, marked as a starting point', async () => {
    const page = await signIn('curator');
    await openArea(page, 'Negatives');
    await page.getByRole('link', { name: 'GP-001' }).click();
    await page.getByRole('heading', { name: /GP-001/, level: 1 }).waitFor();
    const rows = page.getByRole('table').getByRole('row');
    await expect.poll(() => rows.count()).toBeGreaterThan(1);
    const suggestion = page.getByRole('region', { name: 'Suggested exposure' }).getByRole('status');
    await expect.poll(() => suggestion.textContent()).toMatch(/\d+(\.\d+)? min/);
    await expect
      .poll(() => page.getByText(/A starting point drawn from past prints/).isVisible())
      .toBe(true);
    // A light never used with this negative: no number, a test strip instead.
    await page.getByLabel('Light source').fill('candle');
    await suggestion.getByText('make a test strip').waitFor();
    await page.setViewportSize({ width: 768, height: 1000 });
    await expectAccessible(page);

    // A fixer batch says where its capacity comes from in words a curator can act on: the
    // setting is an admin's (a curator cannot open Settings), and one sheet is "1 sheet".
    await page.goto(`${live.server.url}/chemistry`);
    await page.getByRole('link', { name: 'FIX-25A' }).first().click();
    await page
      .getByText(/volume in litres × 20 sheets per litre, a chemistry setting an admin changes\./)
      .waitFor();
  }, 120_000);
});
