import { describe, expect, it } from 'vitest';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

const signIn = (role: string) => signInAs(live.browser, live.server.url, role);

describe('the conservator', () => {
  it('sees yellowing and fading prints first on the tone watch, with reasons', async () => {
    const page = await signIn('conservator');
    await openArea(page, 'Tone watch');
    await page.getByRole('heading', { name: 'Tone watch', level: 1 }).waitFor();
    const rows = page.locator('tbody tr');
    await rows.first().waitFor();
    const firstStatuses = await rows.evaluateAll((trs) =>
      trs.slice(0, 3).map((tr) => tr.children[1]?.textContent?.trim()),
    );
    for (const status of firstStatuses)
      expect(['yellowing', 'fading', 'darkening']).toContain(status);
    expect(firstStatuses.some((s) => s === 'yellowing' || s === 'fading')).toBe(true);
    await expect
      .poll(() =>
        rows
          .first()
          .getByText(/since \d{4}-\d{2}-\d{2}/)
          .first()
          .isVisible(),
      )
      .toBe(true);
    await expectAccessible(page);
  });

  it('logs a check on a demo print and sees the comparison with the baseline', async () => {
    const page = await signIn('conservator');
    await page.goto(`${live.server.url}/tone-watch`);
    await page.locator('tbody tr a').first().click();
    await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
    await page.getByText('against the baseline').first().waitFor();
    const form = page.getByRole('form', { name: 'Log a tone check' });
    await form.getByLabel('Checked on').fill('2026-11-30');
    // Keyboard-fast: in each row L*, Tab, a*, Tab, b*; Enter logs the check.
    const readings: Array<[string, number[]]> = [
      ['dmax', [36.1, 6.9, 12.9]],
      ['mid', [60.3, 5.1, 18.3]],
      ['highlight', [81.0, 1.6, 15.0]],
      ['dmin', [87.0, 0.5, 13.1]],
    ];
    for (const [patch, values] of readings) {
      await form.getByLabel(`${patch} L*`).click();
      for (const [i, value] of values.entries()) {
        if (i > 0) await page.keyboard.press('Tab');
        await page.keyboard.type(String(value));
      }
    }
    await expect.poll(() => form.getByLabel('dmin b*').inputValue()).toBe('13.1');
    await page.keyboard.press('Enter');
    const result = page
      .getByRole('status')
      .filter({ hasText: 'Check of 30 Nov 2026 (2026-11-30) logged' });
    await result.waitFor().catch(async (error: unknown) => {
      await page.screenshot({ path: '/tmp/tone-e2e-failure.png', fullPage: true });
      throw error;
    });
    const table = result.getByRole('table', { name: /Comparison of the new check/ });
    await expect.poll(() => table.getByRole('row').count()).toBe(5);
    await expect
      .poll(() => table.getByRole('rowheader', { name: 'bare paper (dmin)' }).isVisible())
      .toBe(true);
    await expectAccessible(page);
    // A refused attempt after it: the earlier "logged" message goes, the refusal stays.
    await form.getByLabel('Checked on').fill('2099-01-01');
    await form.getByRole('button', { name: 'Log check' }).click();
    await form.getByText('The date cannot be in the future').waitFor();
    await expect.poll(() => result.count()).toBe(0);
  });

  it('says in plain words that a check needs a reading, without the field name', async () => {
    const page = await signIn('conservator');
    await page.goto(`${live.server.url}/tone-watch`);
    await page.locator('tbody tr a').first().click();
    const form = page.getByRole('form', { name: 'Log a tone check' });
    await form.waitFor();
    const refused = page.waitForResponse(
      (response) => response.url().includes('/tone-checks') && response.status() === 422,
    );
    await form.getByRole('button', { name: 'Log check' }).click();
    await refused;
    const problem = form.getByRole('listitem').filter({ hasText: 'Give at least one reading' });
    await problem.waitFor();
    expect(await problem.innerText()).toBe('Give at least one reading');

    // Letters in a box are named as not a number before anything is sent (sent, they arrived
    // empty and the answer said "Fill this in."), under the channel's own name.
    let sent = 0;
    page.on('request', (request) => {
      if (request.method() === 'POST' && request.url().includes('/tone-checks')) sent += 1;
    });
    await form.getByLabel('dmax L*').fill('31.2');
    await form.getByLabel('dmax a*').fill('abc');
    await form.getByLabel('dmax b*').fill('11');
    await form.getByRole('button', { name: 'Log check' }).click();
    await form.getByRole('listitem').filter({ hasText: 'dmax a*: Type a number' }).waitFor();
    expect(sent).toBe(0);
    await expect.poll(() => form.getByLabel('dmax a*').getAttribute('aria-invalid')).toBe('true');

    // With the first patch left empty, the server's answer about the second reading sent is
    // put beside the second patch of the form, not the first.
    for (const channel of ['L', 'a', 'b']) await form.getByLabel(`dmax ${channel}*`).fill('');
    await form.getByLabel('mid L*').fill('140');
    await form.getByLabel('mid a*').fill('5');
    await form.getByLabel('mid b*').fill('14');
    await form.getByRole('button', { name: 'Log check' }).click();
    await form
      .getByRole('listitem')
      .filter({ hasText: /^mid L\*: / })
      .waitFor();
    await expect.poll(() => form.getByLabel('mid L*').getAttribute('aria-invalid')).toBe('true');
    expect(await form.getByLabel('dmax L*').getAttribute('aria-invalid')).toBeNull();
  });

  it('prints a check round in shelf order and opens Insights and Settings', async () => {
    const page = await signIn('conservator');
    await page.goto(`${live.server.url}/tone-watch/rounds?from=2026-01-01&to=2027-12-31`);
    await page.getByRole('heading', { name: 'Check round', level: 1 }).waitFor();
    await page.locator('main section h2').first().waitFor();
    const places = await page.locator('main section h2').allTextContents();
    const named = places.filter((p) => p !== 'No place recorded');
    expect(named).toEqual([...named].sort((a, b) => a.localeCompare(b, 'en', { numeric: true })));
    await expectAccessible(page);
    await page.goto(`${live.server.url}/insights`);
    await page.getByRole('heading', { name: 'Insights', level: 1 }).waitFor();
    await page.getByRole('rowheader', { name: 'Washed under 5 min' }).waitFor();
    await expectAccessible(page);
    await page.goto(`${live.server.url}/settings`);
    await page
      .getByText(/^Only an administrator may change these; they are shown read-only\.$/)
      .waitFor();
    await expectAccessible(page);
  });
});
