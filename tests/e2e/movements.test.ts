import { describe, expect, it } from 'vitest';
import type { LocationView, PrintListResponse } from '../../shared/types/catalogue';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { qrCodesInPdf } from '../support/pdf-qr';

const live = useLiveServerAndBrowser();

describe('the archivist and the boxes', () => {
  it('prints box labels, scans one on a phone and moves three prints into that box', async () => {
    const base = live.server.url;
    const desk = await signInAs(live.browser, base, 'archivist');
    const places = (await (await desk.request.get(`${base}/api/locations`)).json()) as {
      items: LocationView[];
    };
    const box = places.items.find((place) => place.parentId !== null)!;

    // At the desk: Places → the box's page → its label sheet.
    await openArea(desk, 'Places');
    await desk.getByRole('link', { name: box.name, exact: true }).first().click();
    await desk.getByRole('heading', { name: box.name, level: 1 }).waitFor();
    await expectAccessible(desk, 'place-page');
    const sheetLink = desk.getByRole('link', { name: /A4, 3 × 8/ });
    const href = await sheetLink.getAttribute('href');
    const sheet = await desk.request.get(`${base}${href}`);
    expect(sheet.headers()['content-type']).toBe('application/pdf');
    const codes = await qrCodesInPdf(Buffer.from(await sheet.body()));
    const boxUrl = codes
      .map((code) => code.text)
      .find((text) => text.endsWith(`/places/${box.id}`));
    expect(boxUrl).toBe(`${base}/places/${box.id}`);

    // On the phone: the scanned address opens the box, with "move here".
    const list = (await (
      await desk.request.get(`${base}/api/prints?pageSize=3&sort=accession`)
    ).json()) as PrintListResponse;
    const numbers = list.items.map((item) => item.accessionNumber);
    const phone = await signInAs(
      live.browser,
      base,
      'archivist',
      { width: 390, height: 844 },
      new URL(boxUrl!).pathname,
    );
    await phone.getByRole('heading', { name: box.name, level: 1 }).waitFor();
    await phone
      .getByLabel(`Accession numbers of the prints to move into ${box.code}, one a line`)
      .fill(numbers.join('\n'));
    await phone.getByLabel('Why').selectOption('storage');
    await phone.getByRole('button', { name: 'Move 3 prints here' }).click();
    await phone.getByRole('status').getByText(`Moved 3 prints to ${box.code}`).waitFor();
    const holdings = phone.getByRole('region', { name: 'Holds now' });
    for (const number of numbers) {
      await expect.poll(() => holdings.getByText(number, { exact: true }).isVisible()).toBe(true);
    }
    const scrollWidth = await phone.evaluate(() => document.documentElement.scrollWidth);
    expect(scrollWidth).toBeLessThanOrEqual(390);
    await expectAccessible(phone, 'place-page-phone');

    // The record tells where the print has been.
    await phone.getByRole('link', { name: list.items[0]!.title }).first().click();
    const history = phone.getByRole('region', { name: 'Where it has been' });
    await expect
      .poll(() => history.getByRole('link', { name: box.code }).first().isVisible())
      .toBe(true);
  });
});
