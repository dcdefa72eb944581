import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { Page } from 'playwright-core';
import { afterAll, describe, expect, it } from 'vitest';
import { Print } from '../../server/models';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { buildJpeg } from '../support/images';

const live = useLiveServerAndBrowser();
const dir = mkdtempSync(join(tmpdir(), 'pw-forms-'));
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const newPrint = async (page: Page) => {
  await page.getByRole('link', { name: 'New print' }).click();
  await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
};

describe('unsaved changes on the print forms', () => {
  it('asks before a link or Back throws work away, and Forward brings the draft back', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist');
    await newPrint(page);
    await page.getByLabel('Title').fill('Unsaved weir');

    // A link: the question, and staying keeps the work.
    await openArea(page, 'Prints');
    const dialog = page.getByRole('dialog', { name: 'Leave without saving?' });
    await dialog.waitFor();
    await expectAccessible(page);
    await dialog.getByRole('button', { name: 'Stay and keep editing' }).click();
    await dialog.waitFor({ state: 'hidden' });
    await expect.poll(() => page.getByLabel('Title').inputValue()).toBe('Unsaved weir');

    // Back: the same question; leaving goes back, and Forward restores the draft.
    await page.goBack();
    await dialog.waitFor();
    await dialog.getByRole('button', { name: 'Leave this page' }).click();
    await page.getByRole('heading', { name: 'Prints', level: 1 }).waitFor();
    await page.goForward();
    await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
    await page.getByText('Your unsaved changes from earlier are back in the form.').waitFor();
    await expect.poll(() => page.getByLabel('Title').inputValue()).toBe('Unsaved weir');

    // Closing the tab asks the browser's own question.
    const asked = page.waitForEvent('dialog');
    await page.close({ runBeforeUnload: true });
    const question = await asked;
    expect(question.type()).toBe('beforeunload');
    await question.dismiss();
  });

  it('lets a saved print go without asking, and the next new print starts empty', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist');
    await newPrint(page);
    await page.getByLabel('Title').fill('Saved weir');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByRole('heading', { name: 'Saved weir', level: 1 }).waitFor();
    await openArea(page, 'Prints');
    await newPrint(page);
    await expect.poll(() => page.getByLabel('Title').inputValue()).toBe('');
  });
});

describe('numbers and sizes on the print form', () => {
  it('names minutes typed as a word and a sheet smaller than its image', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist');
    await newPrint(page);
    await page.getByLabel('Title').fill('Weir in words');
    await page.getByLabel('Image width (mm)').fill('127');
    await page.getByLabel('Sheet width (mm)').fill('100');
    await page.getByRole('button', { name: '+ Add step' }).click();
    const step = page.getByRole('listitem', { name: 'Step 1' });
    await step.getByLabel('Stage').selectOption('fixing');
    await step.getByLabel('Minutes').fill('ten');
    await expect.poll(() => step.getByLabel('Minutes').inputValue()).toBe('ten');
    await page.getByRole('button', { name: 'Create print' }).click();
    await step.getByText('Enter minutes as a number').waitFor();
    await page.getByText('The sheet must be at least as wide as the image (127 mm)').waitFor();
    await expect.poll(() => page.getByText(/needs its minutes/).count()).toBe(0);
  });
});

describe('an accession number already in use', () => {
  it('is said once, beside the field, and the words go when the number is changed', async () => {
    const taken = (await Print.findOne({ order: [['id', 'ASC']] }))!.accessionNumber;
    const page = await signInAs(live.browser, live.server.url, 'archivist');
    await newPrint(page);
    await page.getByLabel('Title').fill('Second weir');
    await page.getByLabel('Accession number').fill(taken);
    const refused = page.waitForResponse(
      (response) => response.url().endsWith('/api/prints') && response.status() === 409,
    );
    await page.getByRole('button', { name: 'Create print' }).click();
    await refused;
    await page.getByText(`${taken} is already in use`).waitFor();
    const generic = page.getByText('A record with the same unique value exists.');
    expect(await generic.count()).toBe(0);

    // Another mistake after the number is cleared: only what is wrong now is shown.
    await page.getByLabel('Accession number').fill('');
    await page.getByLabel('Made').fill('last spring');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByText(/^Use a date like/).waitFor();
    await expect.poll(() => page.getByText(`${taken} is already in use`).count()).toBe(0);
    expect(await generic.count()).toBe(0);
  });
});

describe('uploads that fail', () => {
  it('shows a failed file in red, sends only waiting files, and offers retry or removal', async () => {
    const print = await Print.findOne({ order: [['id', 'ASC']] });
    const good = join(dir, 'good.jpg');
    const bad = join(dir, 'notes.jpg');
    const later = join(dir, 'later.jpg');
    writeFileSync(good, await buildJpeg(400, 300, [150, 110, 80]));
    writeFileSync(bad, 'not an image at all');
    writeFileSync(later, await buildJpeg(400, 300, [90, 70, 60]));

    const page = await signInAs(live.browser, live.server.url, 'archivist');
    const sent: string[] = [];
    page.on('request', (request) => {
      if (request.method() === 'POST' && /\/api\/prints\/\d+\/assets$/.test(request.url())) {
        sent.push(request.url());
      }
    });
    await page.goto(`${live.server.url}/prints/${print!.id}`);
    await page.getByLabel('choose files').setInputFiles([good, bad]);
    await page.getByRole('button', { name: 'Upload 2 files' }).click();
    const rows = page.getByRole('list', { name: 'Files to upload' }).getByRole('listitem');
    await rows.filter({ hasText: 'good.jpg' }).getByText('stored').waitFor();
    const failed = rows.filter({ hasText: 'notes.jpg' });
    await failed
      .getByRole('alert')
      .getByText(/Not stored/)
      .waitFor();
    await expect.poll(() => page.getByLabel('Upload progress of notes.jpg').count()).toBe(0);
    expect(sent).toHaveLength(2);

    // A new file is sent alone; the failed one waits for Retry.
    await page.getByLabel('choose files').setInputFiles([later]);
    await page.getByRole('button', { name: 'Upload 1 file' }).click();
    await rows.filter({ hasText: 'later.jpg' }).getByText('stored').waitFor();
    expect(sent).toHaveLength(3);
    await expectAccessible(page);

    await failed.getByRole('button', { name: 'Retry notes.jpg' }).click();
    await expect.poll(() => sent.length).toBe(4);
    await failed
      .getByRole('alert')
      .getByText(/Not stored/)
      .waitFor();
    await failed.getByRole('button', { name: 'Remove notes.jpg' }).click();
    await expect.poll(() => rows.filter({ hasText: 'notes.jpg' }).count()).toBe(0);
  });
});
