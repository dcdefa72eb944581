import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { buildJpeg } from '../support/images';

const live = useLiveServerAndBrowser();

interface ListItem {
  id: number;
  accessionNumber: string;
  title: string;
}

/** A demo print that has no tone check yet (its lists say "not yet checked"). */
async function uncheckedPrint(page: Page): Promise<ListItem> {
  const answer = await page.request.get(
    `${live.server.url}/api/prints?toneStatus=unchecked&pageSize=1&sort=accession`,
  );
  const { items } = (await answer.json()) as { items: ListItem[] };
  expect(items.length).toBe(1);
  return items[0]!;
}

/** What a tone badge says (src/components/ui/badges.tsx). */
const TONE_WORDS = ['not yet checked', 'steady', 'watch', 'fading', 'darkening', 'yellowing'];

/** The tone word (the badge) in the list row of this print. */
const toneInRow = (page: Page, item: ListItem) =>
  page
    .getByRole('table')
    .getByRole('row', { name: `${item.accessionNumber} ${item.title}` })
    .getByText(new RegExp(`^(${TONE_WORDS.join('|')})$`));

describe('one catalogue cache: a tone check from colour samples reaches every view', () => {
  it('updates the tone panel, the Prints list and Search without a reload', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator', {
      width: 1400,
      height: 1000,
    });
    const print = await uncheckedPrint(page);

    // A scan of the print, uploaded by the archivist (multipart, CSRF header, as the form does).
    const archivist = await signInAs(live.browser, live.server.url, 'archivist');
    const session = (await (
      await archivist.request.get(`${live.server.url}/api/session`)
    ).json()) as { csrfToken: string };
    const upload = await archivist.request.post(
      `${live.server.url}/api/prints/${print.id}/assets`,
      {
        headers: { 'X-CSRF-Token': session.csrfToken },
        multipart: {
          view: 'recto',
          file: {
            name: 'recto.jpg',
            mimeType: 'image/jpeg',
            buffer: await buildJpeg(900, 700, [160, 120, 90]),
          },
        },
      },
    );
    expect(upload.status()).toBe(201);
    await archivist.close();
    await live.server.test.ctx.images.jobs.idle(); // deep-zoom tiles ready

    // A marker on the window: gone if anything below reloads the page.
    await page.evaluate(() => Object.assign(window, { sameDocument: true }));

    // The Prints list and Search both show the print as not yet checked (and cache that).
    await page.getByLabel('Find words').fill(print.accessionNumber);
    await page.getByRole('button', { name: 'Find' }).click();
    await expect.poll(() => toneInRow(page, print).innerText()).toBe('not yet checked');
    await openArea(page, 'Search');
    await page.getByRole('heading', { name: 'Search', level: 1 }).waitFor();
    await page.getByLabel('Words', { exact: true }).fill(print.accessionNumber);
    await page.waitForFunction(() => new URLSearchParams(location.search).has('q')); // in the address
    await expect.poll(() => toneInRow(page, print).innerText()).toBe('not yet checked');

    // Open the record, draw a region on the scan and record it as a tone check.
    await page.getByRole('link', { name: print.title, exact: true }).first().click();
    await page.getByRole('heading', { name: 'Tone watch', level: 2 }).waitFor();
    await page.getByText('No tone checks yet.').waitFor();
    await page.getByRole('button', { name: 'Sample a region' }).click();
    const viewer = page.locator('.cursor-crosshair').first();
    await viewer.waitFor();
    const box = (await viewer.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.45, box.y + box.height * 0.45);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.5, { steps: 5 });
    await page.mouse.move(box.x + box.width * 0.55, box.y + box.height * 0.55, { steps: 5 });
    await page.mouse.up();
    await page.getByLabel('Patch of sample 1').selectOption('dmax');
    await page.getByRole('button', { name: /^Record as a tone check on / }).click();
    await page.getByRole('status').filter({ hasText: 'Tone check recorded.' }).waitFor();

    // The tone panel of the open record follows at once.
    await page.getByText('Past checks (1)').waitFor();
    const panel = page.getByRole('region', { name: 'Tone watch' });
    await expect.poll(() => panel.getByText('not yet checked').count()).toBe(0);

    // Back to Search, then the Prints list: both show the new state, not the cached one.
    await page.goBack();
    // (Leaving while the region tool is on must not break the app.)
    await page.getByRole('heading', { name: 'Search', level: 1 }).waitFor();
    await expect.poll(() => toneInRow(page, print).innerText()).not.toBe('not yet checked');
    await openArea(page, 'Prints');
    await page.getByRole('heading', { name: 'Prints', level: 1 }).waitFor();
    await page.getByLabel('Find words').fill(print.accessionNumber);
    await page.getByRole('button', { name: 'Find' }).click();
    await expect.poll(() => toneInRow(page, print).innerText()).not.toBe('not yet checked');
    expect(await page.evaluate(() => 'sameDocument' in window)).toBe(true);
    await page.close();
  });
});

/** Holds the Tone watch page's code until `release` is called; `requested` once it is asked for. */
async function holdToneWatchCode(page: Page) {
  let release: () => void = () => undefined;
  const held = new Promise<void>((resolve) => (release = resolve));
  let asked: () => void = () => undefined;
  const requested = new Promise<void>((resolve) => (asked = resolve));
  await page.route(/\/assets\/tone-watch-page-[^/]+\.js$/, async (route) => {
    asked();
    await held;
    await route.continue();
  });
  return { requested, release: () => release() };
}

describe('the shell while the next page loads', () => {
  it('lets no click land on the old page: the page asked for is the one that opens', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator');
    const code = await holdToneWatchCode(page);
    await openArea(page, 'Tone watch');
    await code.requested;
    // A print's link on the Prints list, still on screen, clicked where it is drawn.
    const box = (await page.getByRole('table').getByRole('link').first().boundingBox())!;
    await page.mouse.click(box.x + box.width / 2, box.y + box.height / 2);
    code.release();
    const heading = page.getByRole('heading', { level: 1 }).filter({ hasNotText: /^Prints$/ });
    await heading.waitFor();
    expect(await heading.innerText()).toBe('Tone watch');
    expect(new URL(page.url()).pathname).toBe('/tone-watch');
    await page.close();
  });

  it('says the page is on its way and marks the old one busy until it comes', async () => {
    const page = await signInAs(live.browser, live.server.url, 'conservator');
    const code = await holdToneWatchCode(page);
    await openArea(page, 'Tone watch');
    await code.requested;
    const busy = page.locator('main[aria-busy="true"]');
    await busy.waitFor();
    await page.getByRole('status').filter({ hasText: 'Opening the page…' }).waitFor();
    code.release();
    await page.getByRole('heading', { name: 'Tone watch', level: 1 }).waitFor();
    await expect.poll(() => busy.count()).toBe(0);
    await page.close();
  });
});

describe('dates of making', () => {
  it('the new-print form says at the field that a print cannot be made in the future', async () => {
    const page = await signInAs(
      live.browser,
      live.server.url,
      'archivist',
      undefined,
      '/prints/new',
    );
    await page.getByLabel('Title').fill('Not yet printed');
    await page.getByLabel('Made', { exact: true }).fill('2999-04-01');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByText('The date cannot be in the future').waitFor();
    await expect
      .poll(() => page.getByLabel('Made', { exact: true }).getAttribute('aria-invalid'))
      .toBe('true');
    expect(new URL(page.url()).pathname).toBe('/prints/new');
    await page.close();
  });
});
