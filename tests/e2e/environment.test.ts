import { describe, expect, it } from 'vitest';
import type { Page } from 'playwright-core';
import { buildLoggerCsv } from '../support/environment';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

/** A year of hourly readings up to yesterday (the demo's own year ends 2026-11-14). */
const year = (serial: string, climate: (hour: number, day: number) => [number, number]) =>
  Buffer.from(
    buildLoggerCsv({
      serial,
      start: '2025-12-03',
      days: 365,
      climate: (i, hour) => climate(hour, Math.floor(i / 24)),
    }),
  );

/** The figure shown beside a label in the place's figures list. */
async function figure(page: Page, label: string): Promise<string> {
  return (
    await page
      .locator('dt', { hasText: label })
      .locator('xpath=following-sibling::dd[1]')
      .innerText()
  ).trim();
}

async function openPlace(page: Page, name: string) {
  await openArea(page, 'Places');
  await page.getByRole('link', { name, exact: true }).click();
  await page.getByRole('heading', { name: 'Storage environment' }).waitFor();
}

async function upload(page: Page, file: Buffer, name: string) {
  const form = page.getByRole('form', { name: 'Upload logger readings' });
  await form
    .getByLabel('Logger file (CSV)')
    .setInputFiles({ name, mimeType: 'text/csv', buffer: file });
  await form.getByRole('button', { name: 'Check the file' }).click();
  await form
    .getByRole('status')
    .filter({ hasText: /Checked: [\d,]+ readings would be stored/ })
    .waitFor();
  await form.getByRole('button', { name: 'Upload readings' }).click();
  await form
    .getByRole('status')
    .filter({ hasText: /Stored [\d,]+ readings over \d+ days/ })
    .waitFor();
}

describe('the storage environment', () => {
  it('a conservator uploads a year for two cabinets, sees figures and charts, and the warmer one’s prints change faster', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator');
    await openPlace(page, 'Cabinet 1');
    // Cool and dry: 16–17 °C, 38–42 % RH.
    await upload(
      page,
      year('E2E-C1', (hour) => [16 + (hour >= 12 ? 1 : 0), 38 + (hour >= 12 ? 4 : 0)]),
      'c1.csv',
    );
    await expect.poll(() => page.getByText('2025-12-03 to 2026-12-02').count()).toBeGreaterThan(0);
    await page.getByTestId('temperature-chart').locator('svg path').first().waitFor();
    await page.getByTestId('humidity-chart').locator('svg path').first().waitFor();
    // The demo's last two weeks of 10-minute readings share the year: about 16.5 °C.
    const degrees = async () => Number.parseFloat(await figure(page, 'Mean temperature'));
    await expect.poll(degrees).toBeGreaterThan(16);
    expect(await degrees()).toBeLessThan(17.5);
    const coolSpeed = Number.parseFloat(await figure(page, 'Ageing speed'));
    const coolTone = await page.getByText(/mean tone change/).innerText();
    await expectAccessible(page, 'environment-cabinet-1');

    await openPlace(page, 'Cabinet 2');
    // Warm and damp: 23–25 °C, 58–64 % RH.
    await upload(
      page,
      year('E2E-C2', (hour) => [23 + (hour >= 12 ? 2 : 0), 58 + (hour >= 12 ? 6 : 0)]),
      'c2.csv',
    );
    await expect.poll(degrees).toBeGreaterThan(23);
    const warmSpeed = Number.parseFloat(await figure(page, 'Ageing speed'));
    // Isoperm rates (Sebera 1994 form, Ea 100 kJ/mol, RH^1.3) of the two climates differ ×6–7.
    expect(warmSpeed).toBeGreaterThan(4 * coolSpeed);
    const warmTone = await page.getByText(/mean tone change/).innerText();
    const rate = (text: string) =>
      Number.parseFloat(/([+−-]?\d+\.\d+) ΔE00 a year/.exec(text)![1]!.replace('−', '-'));
    expect(rate(warmTone)).toBeGreaterThan(1.5 * rate(coolTone));
    const alerts = page.getByRole('list', { name: 'Open alerts' });
    await expect
      .poll(() => alerts.innerText())
      .toMatch(/warmer than its band|damper than its band/);
    const before = await alerts.getByRole('listitem').count();
    await alerts
      .getByRole('button', { name: /^Acknowledge/ })
      .first()
      .click();
    await expect
      .poll(() =>
        page
          .getByRole('listitem')
          .filter({ has: page.getByRole('button', { name: /^Acknowledge/ }) })
          .count(),
      )
      .toBe(before - 1);

    // The week view draws the readings themselves.
    await page.getByRole('button', { name: 'One week' }).click();
    await expect.poll(() => page.getByText(/each reading/).count()).toBeGreaterThan(0);
    await expectAccessible(page, 'environment-cabinet-2-week');

    // The tone watch lists the places still outside their band, beside the prints' alerts,
    // and each opens its place.
    await page.goto(`${live.server.url}/tone-watch`);
    const places = page.getByRole('region', { name: /^Places outside their band/ });
    await expect.poll(() => places.getByRole('listitem').count()).toBeGreaterThan(0);
    await places.getByRole('link').first().click();
    await expect.poll(() => new URL(page.url()).pathname).toMatch(/^\/places\/\d+$/);
  });
});
