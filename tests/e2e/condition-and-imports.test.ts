import { readFileSync, writeFileSync, mkdtempSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import Papa from 'papaparse';
import { describe, expect, it } from 'vitest';
import { DEMO_IMPORT_FILE } from '../../seeds/demo-import';
import {
  expectAccessible,
  openArea,
  shot,
  signInAs,
  useLiveServerAndBrowser,
} from '../support/e2e';
import { buildJpeg } from '../support/images';
import { readPdf } from '../support/read-pdf';
import { signIn as apiSignIn } from '../support/test-app';

const live = useLiveServerAndBrowser();

const signIn = (role: string) => signInAs(live.browser, live.server.url, role);

describe('the conservator', () => {
  it('writes a condition report and downloads the PDF to hand to a courier', async () => {
    const page = await signIn('conservator');
    const link = page.getByRole('table').getByRole('row').nth(1).getByRole('link'); // one link a row: the title's
    const title = (await link.textContent())!.trim();
    await link.click();
    await page.getByRole('heading', { name: title, level: 1 }).waitFor();
    // Two photographs of this print, uploaded as the archivist would.
    const printId = Number(new URL(page.url()).pathname.split('/').pop());
    const archivist = await apiSignIn(
      live.server.test.app,
      'archivist@printwarden.test',
      'printwarden-demo',
    );
    for (const name of ['shadows.jpg', 'edge.jpg']) {
      await archivist
        .post(`/api/prints/${printId}/assets`)
        .field('view', 'detail')
        .attach('file', await buildJpeg(640, 480), name)
        .expect(201);
    }
    await page.getByRole('link', { name: 'Write condition report' }).click();
    await page.getByRole('heading', { name: `Condition report · ${title}` }).waitFor();

    // After the print was made (a report cannot predate it) and not in the future.
    await page.getByLabel('Examined on').fill('2026-11-30');
    await page.getByLabel('Room temperature (°C)').fill('19');
    await page.getByLabel('Relative humidity (%)').fill('48');
    await page.getByRole('radio', { name: /^vulnerable/ }).check();
    await page.getByRole('button', { name: 'Add observation' }).click();
    const first = page.getByRole('listitem', { name: 'Observation 1' });
    await first.getByLabel('Term').selectOption('silvering');
    await first.getByLabel('Where on the print').fill('image, shadows');
    await first.getByLabel('Severity').selectOption('moderate');
    await page.getByRole('button', { name: 'Add observation' }).click();
    const second = page.getByRole('listitem', { name: 'Observation 2' });
    await second.getByLabel('Term').selectOption('foxing');
    await second.getByLabel('Where on the print').fill('lower edge');
    await page.getByLabel('Recommendation').fill('Rehouse in a four-flap folder before the loan.');
    await page.getByLabel('Attach detail shadows.jpg').check();
    await page.getByLabel('Attach detail edge.jpg').check();
    const photo = page.getByRole('img', { name: 'Photograph detail shadows.jpg' });
    await photo.waitFor();
    const box = (await photo.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.2, box.y + box.height * 0.3);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.6, box.y + box.height * 0.7, { steps: 5 });
    await page.mouse.up();
    await page.getByText('Area marked.', { exact: true }).waitFor();
    await page.getByLabel('Caption for detail shadows.jpg').fill('Silvering in the shadows');
    await page.getByLabel('Caption for detail edge.jpg').fill('Foxing at the lower edge');
    await page.setViewportSize({ width: 820, height: 1100 }); // tablet width
    await shot(page, 'condition-form-tablet');
    await expectAccessible(page);
    await page.getByRole('button', { name: 'Save condition report' }).click();

    const entry = page.getByRole('article', { name: 'Condition report of 30 Nov 2026' });
    await entry.waitFor();
    await expect.poll(() => entry.textContent()).toContain('silvering, moderate — image, shadows');
    // The saved report opens to its photographs with their captions and marked areas.
    await entry.locator('summary').click();
    await entry.getByRole('img', { name: 'Silvering in the shadows' }).waitFor();
    await expect.poll(() => entry.textContent()).toContain('(marked area)');
    await page.setViewportSize({ width: 1280, height: 860 });
    await shot(page, 'record-with-condition');
    await expectAccessible(page);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: 'Report as PDF' }).click(),
    ]);
    const { text, pages } = await readPdf(readFileSync((await download.path())!));
    const words = text.replace(/\s+/g, ' ');
    expect(words).toContain(title);
    expect(words).toContain('vulnerable — Damage that handling');
    expect(words).toContain('foxing, slight — lower edge');
    expect(words).toContain('19 °C, 48 % RH');
    expect(words).toContain('Silvering in the shadows');
    expect(words).toContain('Foxing at the lower edge');
    expect(words).toContain(`Page ${pages} of ${pages}`);
  }, 120_000);
});

describe('the archivist', () => {
  it('imports the demo spreadsheet with a progress bar, fixes the three bad rows and imports them', async () => {
    const page = await signIn('archivist');
    await openArea(page, 'Imports');
    await page.getByRole('heading', { name: 'Imports', level: 1 }).waitFor();
    await page.getByLabel('CSV file').setInputFiles(DEMO_IMPORT_FILE);
    await expect
      .poll(() => page.getByLabel('Field for column Accession no.').inputValue())
      .toBe('accessionNumber');
    await page.getByRole('button', { name: 'Check every row' }).click();
    await page.getByText('497 of 500 rows are ready to import; 3 have problems.').waitFor();
    const problems = page.locator('tr.bg-alert-light\\/60');
    await expect.poll(() => problems.count()).toBe(3);
    await expect
      .poll(() => problems.allTextContents())
      .toEqual([
        expect.stringMatching(/^88.*Process/),
        expect.stringMatching(/^244.*Fixing \(minutes\)/),
        expect.stringMatching(/^412.*Title/),
      ]);
    await shot(page, 'imports-dry-run');
    await expectAccessible(page);

    await page.getByRole('button', { name: 'Import the 497 good rows' }).click();
    await shot(page, 'imports-started');
    const progress = page.getByRole('progressbar', { name: 'Importing rows' });
    await progress.waitFor();
    await page
      .getByText('497 prints added, 0 updated, 0 unchanged; 3 rows not imported.')
      .waitFor();
    await expect.poll(() => progress.getAttribute('aria-valuenow')).toBe('500');
    await page.reload(); // progress and result come from the server, not the page
    await page
      .getByText('497 prints added, 0 updated, 0 unchanged; 3 rows not imported.')
      .waitFor();
    await shot(page, 'imports-done');
    await expectAccessible(page);

    const [download] = await Promise.all([
      page.waitForEvent('download'),
      page.getByRole('link', { name: /Download the 3 rows not imported/ }).click(),
    ]);
    const failed = Papa.parse<string[]>(
      readFileSync((await download.path())!, 'utf8').replace(/^\uFEFF/, ''),
      { skipEmptyLines: true },
    ).data;
    expect(failed).toHaveLength(4);
    const header = failed[0]!;
    const fixed = failed.map((row, index) => {
      if (index === 0) return row;
      const copy = [...row];
      copy[header.indexOf('Process')] = 'salt print';
      copy[header.indexOf('Fixing (min)')] =
        copy[header.indexOf('Fixing (min)')] === 'ten'
          ? '10'
          : copy[header.indexOf('Fixing (min)')]!;
      copy[header.indexOf('Title')] ||= 'Title found on the mount';
      return copy;
    });
    const file = join(mkdtempSync(join(tmpdir(), 'pw-fixed-')), 'fixed-rows.csv');
    writeFileSync(file, Papa.unparse(fixed));
    await page.getByLabel('CSV file').setInputFiles(file);
    await page.getByText('as you mapped this layout last time', { exact: false }).waitFor();
    await page.getByRole('button', { name: 'Import', exact: true }).click();
    await page.getByText('3 prints added, 0 updated, 0 unchanged; 0 rows not imported.').waitFor();
    await shot(page, 'imports-fixed');

    await openArea(page, 'Prints');
    await page.getByRole('searchbox').fill('Title found on the mount');
    await page.getByRole('searchbox').press('Enter');
    await page.getByRole('link', { name: 'Title found on the mount' }).waitFor();
  }, 150_000);
});
