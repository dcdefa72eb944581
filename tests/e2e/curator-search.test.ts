import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

describe('search results after opening one', () => {
  it('keeps the picks and puts focus back on the opened result’s link after Back', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'curator',
      undefined,
      '/search?q=salt',
    );
    const results = page.getByRole('table').getByRole('row');
    await results.nth(3).waitFor();
    const picks = page.getByRole('checkbox', { name: /^Pick / });
    await picks.nth(0).check();
    await picks.nth(1).check();
    await page.getByText('2 prints picked').waitFor();

    const link = results.nth(3).getByRole('link');
    const href = await link.getAttribute('href');
    await link.click();
    await page.waitForURL((url) => url.pathname === href);
    await page.goBack();
    await page.getByText('2 prints picked').waitFor();
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.getAttribute('href')))
      .toBe(href);
  });
});

describe('checklist order by keyboard', () => {
  it('keeps focus on the moved print, and a removed print can be put back', async () => {
    const page = await signInAs(live.browser, live.server.url, 'curator');
    const session = (await (await page.request.get(`${live.server.url}/api/session`)).json()) as {
      csrfToken: string;
    };
    const list = (await (
      await page.request.get(`${live.server.url}/api/prints?pageSize=3&sort=accession`)
    ).json()) as { items: Array<{ id: number; accessionNumber: string }> };
    const [first, second, third] = list.items;
    const created = await page.request.post(`${live.server.url}/api/checklists`, {
      headers: { 'X-CSRF-Token': session.csrfToken },
      data: { name: 'Keyboard order', printIds: [first!.id, second!.id, third!.id] },
    });
    const { id } = (await created.json()) as { id: number };
    await page.goto(`${live.server.url}/checklists/${id}`);

    const rows = page.getByRole('listitem').filter({ has: page.getByText(/^\d+$/) });
    const handle = page.getByRole('button', {
      name: new RegExp(`^Move ${first!.accessionNumber} .*Alt and arrow keys`),
    });
    await handle.focus();
    await page.keyboard.press('Alt+ArrowDown');
    await rows.nth(1).getByText(first!.accessionNumber, { exact: true }).waitFor();
    await expect
      .poll(() => page.evaluate(() => document.activeElement?.getAttribute('aria-label') ?? ''))
      .toMatch(new RegExp(`^Move ${first!.accessionNumber} .*position 2 of 3`));

    await page
      .getByRole('button', { name: `Remove ${third!.accessionNumber} from the checklist` })
      .click();
    const undo = page.getByRole('status').getByRole('button', { name: 'Undo' });
    await undo.waitFor();
    await expect.poll(() => rows.count()).toBe(2);
    await undo.click();
    await expect.poll(() => rows.count()).toBe(3);
    await rows.nth(2).getByText(third!.accessionNumber, { exact: true }).waitFor();
  });
});

describe('folder labels for picked prints', () => {
  it('an archivist picks two prints, chooses the sheet, and gets that PDF', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'archivist',
      undefined,
      '/search?q=salt',
    );
    await page.getByRole('table').getByRole('row').nth(2).waitFor();
    const picks = page.getByRole('checkbox', { name: /^Pick / });
    await picks.nth(0).check();
    await picks.nth(1).check();
    const labels = page.getByRole('region', { name: 'Folder labels' });
    await labels.getByLabel('Label sheet').selectOption('letter-3x10');
    const link = labels.getByRole('link', { name: 'Folder labels for 2 prints (PDF)' });
    const href = new URL((await link.getAttribute('href'))!, live.server.url);
    expect(href.pathname).toBe('/api/prints/labels.pdf');
    expect(href.searchParams.get('layout')).toBe('letter-3x10');
    expect(href.searchParams.get('ids')!.split(',')).toHaveLength(2);
    const pdf = await page.request.get(href.toString());
    expect(pdf.status()).toBe(200);
    expect(pdf.headers()['content-type']).toMatch(/^application\/pdf/);
    expect((await pdf.body()).subarray(0, 5).toString()).toBe('%PDF-');
  });
});
