import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import type { PrintListResponse } from '../../shared/types/catalogue';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

describe('a show of salt prints and their light', () => {
  it('a curator plans it and sees who would pass the limit; a conservator signs and sees the dose', async () => {
    const base = live.server.url;
    const curator = await signInAs(live.browser, base, 'curator');
    const conservator = await signInAs(live.browser, base, 'conservator');
    const salt = (await (
      await curator.request.get(`${base}/api/prints?process=salt%20print&pageSize=5&sort=accession`)
    ).json()) as PrintListResponse;
    expect(salt.items).toHaveLength(5);
    const first = salt.items[0]!;

    // Already shown this year: March, 50 lx × 6 h × 31 days = 9,300 lx·h, agreed.
    const march = await curator.request.post(`${base}/api/loans`, {
      headers: { 'X-CSRF-Token': await csrf(curator, base) },
      data: {
        title: 'Spring wall',
        kind: 'exhibition',
        venue: 'Reading room',
        startsOn: '2026-03-01',
        endsOn: '2026-03-31',
        hoursPerDay: 6,
        maxLux: 50,
        printIds: [first.id],
      },
    });
    expect(march.status()).toBe(201);
    const marchId = ((await march.json()) as { id: number }).id;
    const signed = await conservator.request.patch(`${base}/api/loans/${marchId}`, {
      headers: { 'X-CSRF-Token': await csrf(conservator, base) },
      data: { conditionsSigned: true },
    });
    expect(signed.status()).toBe(200);
    const agreed = await curator.request.patch(`${base}/api/loans/${marchId}`, {
      headers: { 'X-CSRF-Token': await csrf(curator, base) },
      data: { stage: 'agreed' },
    });
    expect(agreed.status()).toBe(200);

    // The curator plans June: 50 lx × 8 h × 30 days = 12,000 lx·h a print; the first print
    // would reach 21,300, past the 15,000 lx·h limit for salt prints by 6,300.
    await openArea(curator, 'Loans and shows');
    const form = curator.getByRole('form', { name: 'Plan a loan or show' });
    await form.getByLabel('Title').fill('River prints in June');
    await form.getByLabel('Venue or borrower').fill('County museum, east gallery');
    await form.getByLabel('Opens').fill('2026-06-01');
    await form.getByLabel('Closes').fill('2026-06-30');
    await form.getByLabel('Hours open a day').fill('8');
    await form.getByLabel(/Maximum illuminance/).fill('50');
    await form
      .getByLabel('Accession numbers of the prints, one a line')
      .fill(salt.items.map((item) => item.accessionNumber).join('\n'));
    await form.getByRole('button', { name: 'Plan it' }).click();
    await curator.getByRole('heading', { name: 'River prints in June', level: 1 }).waitFor();
    await curator.getByText('1 of 5 prints would pass their annual light limit.').waitFor();
    await curator.getByText('over by 6,300 lx·h in 2026').waitFor();
    await expectAccessible(curator, 'loan-page');
    const loanUrl = curator.url();

    // The conservator writes the condition at departure, signs the conditions and links it.
    const report = await conservator.request.post(
      `${base}/api/prints/${first.id}/condition-reports`,
      {
        headers: { 'X-CSRF-Token': await csrf(conservator, base) },
        data: {
          reportedOn: new Date().toISOString().slice(0, 10),
          grade: 'settled',
          observations: [],
        },
      },
    );
    expect(report.status()).toBe(201);
    await conservator.goto(loanUrl);
    await conservator.getByRole('button', { name: 'Sign the conditions' }).click();
    await conservator.getByText(/^Signed by .* on \d{4}-\d{2}-\d{2}\.$/).waitFor();
    await conservator
      .getByLabel(`Condition at departure of ${first.accessionNumber}`)
      .selectOption({ index: 1 });
    await conservator.getByRole('button', { name: 'Link' }).first().click();
    await expect
      .poll(() =>
        conservator
          .getByText(/, settled$/)
          .first()
          .isVisible(),
      )
      .toBe(true);

    // Back from the loan: a second report, linked as the condition on return; each linked
    // report opens from the loan's page.
    const back = await conservator.request.post(
      `${base}/api/prints/${first.id}/condition-reports`,
      {
        headers: { 'X-CSRF-Token': await csrf(conservator, base) },
        data: {
          reportedOn: new Date().toISOString().slice(0, 10),
          grade: 'vulnerable',
          observations: [],
        },
      },
    );
    expect(back.status()).toBe(201);
    await conservator.reload();
    await conservator
      .getByLabel(`Condition on return of ${first.accessionNumber}`)
      .selectOption(String(((await back.json()) as { id: number }).id));
    await conservator
      .getByRole('button', { name: `Link return report of ${first.accessionNumber}` })
      .click();
    await conservator.getByRole('link', { name: /, vulnerable$/ }).waitFor();
    await conservator.getByRole('link', { name: /, settled$/ }).waitFor();

    // The conservator tightens the humidity band: half a band is refused before sending; a
    // saved change takes the signature off until the conditions are signed again.
    await conservator.getByText('Change the conditions').click();
    const conditions = conservator.getByRole('form', { name: 'Agreed conditions' });
    await conditions.getByLabel('Relative humidity from (%)').fill('45');
    await conditions.getByLabel('Relative humidity to (%)').fill('');
    await conditions.getByRole('button', { name: 'Save the conditions' }).click();
    await conditions.getByText('Give both ends of a band, or leave both empty.').waitFor();
    await conditions.getByLabel('Relative humidity to (%)').fill('55');
    await conditions.getByRole('button', { name: 'Save the conditions' }).click();
    await conservator.getByText('Relative humidity 45–55 %').waitFor();
    await conservator.getByText(/^Not signed yet/).waitFor();
    await conservator.getByRole('button', { name: 'Sign the conditions' }).click();
    await conservator.getByText(/^Signed by .* on \d{4}-\d{2}-\d{2}\.$/).waitFor();

    // The record shows the light received beside the tone trend.
    await conservator.getByRole('link', { name: first.title }).first().click();
    const light = conservator.getByRole('region', { name: 'Light received' });
    await light.getByText('9,300 lx·h').waitFor();
    await expectAccessible(conservator, 'record-light');
  });
});

/** The CSRF token of a signed-in page's session. */
async function csrf(page: Page, base: string): Promise<string> {
  const session = (await (await page.request.get(`${base}/api/session`)).json()) as {
    csrfToken: string;
  };
  return session.csrfToken;
}
