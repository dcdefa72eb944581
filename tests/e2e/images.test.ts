import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Print } from '../../server/models';
import { expectAccessible, openArea, signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { buildJpeg } from '../support/images';

const live = useLiveServerAndBrowser();
let dir: string;
let printId: number;
let printTitle: string;

beforeAll(async () => {
  dir = mkdtempSync(join(tmpdir(), 'pw-scans-'));
  const print = await Print.findOne({ order: [['id', 'ASC']] });
  printId = print!.id;
  printTitle = print!.title;
});
afterAll(() => {
  rmSync(dir, { recursive: true, force: true });
});

const signIn = (role: string) => signInAs(live.browser, live.server.url, role);

describe('images of a print', () => {
  it('the archivist drops and chooses six scans, picks their views and watches each arrive', async () => {
    const files: string[] = [];
    for (let i = 0; i < 6; i += 1) {
      const path = join(dir, `scan-${i + 1}.jpg`);
      writeFileSync(path, await buildJpeg(1000, 760, [120 + i * 15, 90, 70]));
      files.push(path);
    }
    const page = await signIn('archivist');
    await page.goto(`${live.server.url}/prints/${printId}`);
    await page.getByRole('heading', { name: 'Add images' }).waitFor();

    // One file dropped on the drop zone, as a browser drag-and-drop delivers it.
    const bytes = (await import('node:fs')).readFileSync(files[0]!).toString('base64');
    const dataTransfer = await page.evaluateHandle((base64) => {
      const transfer = new DataTransfer();
      const data = Uint8Array.from(atob(base64), (c) => c.charCodeAt(0));
      transfer.items.add(new File([data], 'scan-1.jpg', { type: 'image/jpeg' }));
      return transfer;
    }, bytes);
    await page.getByText('Drop scans here').locator('..').dispatchEvent('drop', { dataTransfer });
    // Five more through the file chooser.
    await page.getByLabel('choose files').setInputFiles(files.slice(1));

    const rows = page.getByRole('list', { name: 'Files to upload' }).getByRole('listitem');
    await expect.poll(() => rows.count()).toBe(6);
    // The same file chosen again is not queued twice (it would become a second image).
    await page.getByLabel('choose files').setInputFiles(files.slice(1, 2));
    await expect
      .poll(() => page.getByText('Already in the list').textContent())
      .toBe('Already in the list, so not added again: scan-2.jpg.');
    expect(await rows.count()).toBe(6);
    await expect.poll(() => page.getByLabel('View of scan-1.jpg').inputValue()).toBe('recto');
    await expect.poll(() => page.getByLabel('View of scan-2.jpg').inputValue()).toBe('verso');
    await page.getByLabel('View of scan-6.jpg').selectOption('raking');
    await expect
      .poll(() => page.getByLabel('Upload progress of scan-6.jpg').getAttribute('value'))
      .toBe('0');
    await page.getByRole('button', { name: 'Upload 6 files' }).click();

    for (let i = 1; i <= 6; i += 1) {
      const progress = page.getByLabel(`Upload progress of scan-${i}.jpg`);
      await expect.poll(() => progress.getAttribute('value'), { timeout: 30_000 }).toBe('100');
    }
    await expect
      .poll(() => rows.filter({ hasText: 'stored' }).count(), { timeout: 30_000 })
      .toBe(6);

    const strip = page.getByRole('list', { name: 'Images of this print' }).getByRole('button');
    await expect.poll(() => strip.count()).toBe(6);
    await expect.poll(() => page.getByRole('button', { name: /Raking light/ }).count()).toBe(1);
    // The page refreshes itself until the deep-zoom tiles exist, then opens the viewers.
    const recto = page.getByRole('img', { name: new RegExp(`^Recto of ${printTitle}: deep zoom`) });
    await recto.waitFor({ timeout: 30_000 });
    await page
      .getByRole('img', { name: new RegExp(`^Verso of ${printTitle}: deep zoom`) })
      .waitFor();
    await expect
      .poll(() => recto.locator('canvas').count(), { timeout: 15_000 })
      .toBeGreaterThan(0);
    await page.getByRole('button', { name: 'Zoom in' }).first().click();
    await expectAccessible(page);

    // The same scan again, after a reload (the list no longer holds it): refused, and said so,
    // instead of being stored silently as another view.
    await page.reload();
    await page.getByRole('heading', { name: 'Add images' }).waitFor();
    await page.getByLabel('choose files').setInputFiles(files.slice(0, 1));
    await page.getByRole('button', { name: /^Upload 1 file/ }).click();
    await page.getByText(/^Not stored: This image is already on this print as its recto/).waitFor();
    await expect.poll(() => strip.count()).toBe(6);
    await page.close();
  });

  it('a viewer sees the web image but is refused the original', async () => {
    const page = await signIn('viewer');
    await page.goto(`${live.server.url}/prints/${printId}`);
    await page.getByRole('list', { name: 'Images of this print' }).waitFor();
    await expect
      .poll(() => page.getByRole('link', { name: /Download the original/ }).count())
      .toBe(0);
    await expect.poll(() => page.getByRole('heading', { name: 'Add images' }).count()).toBe(0);
    const record = (await (
      await page.request.get(`${live.server.url}/api/prints/${printId}`)
    ).json()) as {
      assets: Array<{ urls: { web: string; original: string } }>;
    };
    const web = await page.request.get(`${live.server.url}${record.assets[0]!.urls.web}`);
    expect(web.status()).toBe(200);
    expect(web.headers()['content-type']).toBe('image/jpeg');
    const original = await page.request.get(`${live.server.url}${record.assets[0]!.urls.original}`);
    expect(original.status()).toBe(403);
    await expectAccessible(page);
    await page.close();
  });

  it('the admin checks fixity and sees every original intact', async () => {
    const page = await signIn('admin');
    await openArea(page, 'Fixity');
    await page.getByRole('heading', { name: 'Fixity', level: 1 }).waitFor();
    await page.getByRole('button', { name: 'Check every original now' }).click();
    await page.getByText('Every original is intact.').waitFor({ timeout: 30_000 });
    await expect.poll(() => page.getByText('6 of 6 files').count()).toBe(1);
    await expectAccessible(page);
  });
});
