import type { Page } from 'playwright-core';
import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';
import { buildJpeg } from '../support/images';
import { signIn as apiSignIn } from '../support/test-app';

const live = useLiveServerAndBrowser();

/** A JSON request as the signed-in page, with its CSRF header. */
async function post(page: Page, path: string, data: object) {
  const session = (await (await page.request.get(`${live.server.url}/api/session`)).json()) as {
    csrfToken: string;
  };
  const response = await page.request.post(`${live.server.url}${path}`, {
    headers: { 'X-CSRF-Token': session.csrfToken },
    data,
  });
  expect(response.status(), await response.text()).toBeLessThan(300);
  return (await response.json()) as { id: number };
}

describe('the registrar fields of the print form (issue 19)', () => {
  it('an archivist records a gift, a two-link chain, a rights statement and two verso inscriptions', async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist');
    await post(page, '/api/sources', { name: 'Oriel Stanmore', kind: 'person' });
    await page.goto(`${live.server.url}/prints/new`);
    await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
    await page.getByLabel('Title', { exact: true }).fill('Lock gate at dusk');

    await page.getByRole('button', { name: '+ Record how it came in' }).click();
    await page.getByLabel('How', { exact: true }).selectOption('gift');
    await page
      .getByLabel('Source', { exact: true })
      .selectOption({ label: 'Oriel Stanmore (person)' });
    await page.getByLabel('When', { exact: true }).fill('next week');
    await page.getByLabel('Credit line').fill('Gift of Oriel Stanmore, 2025');

    await page.getByRole('button', { name: '+ Add earlier owner' }).click();
    await page.getByRole('button', { name: '+ Add earlier owner' }).click();
    const owner = (n: number) => page.getByRole('listitem', { name: `Owner ${n}`, exact: true });
    // Typed in the wrong order, then moved: the chain is oldest first.
    await owner(1).getByLabel('Owner', { exact: true }).fill('Oriel Stanmore');
    await owner(1).getByLabel('From', { exact: true }).fill('1990s');
    await owner(2).getByLabel('Owner', { exact: true }).fill('Piers Hallam');
    await owner(2).getByLabel('From', { exact: true }).fill('c. 1950');
    await owner(2).getByLabel('To', { exact: true }).fill('1990s');
    await owner(2).getByLabel('Evidence').fill('Stamp on the mount');
    await page.getByRole('button', { name: 'Move owner 2 up' }).click();
    await expect
      .poll(() => owner(1).getByLabel('Owner', { exact: true }).inputValue())
      .toBe('Piers Hallam');

    await page.getByRole('button', { name: '+ Add a rights statement' }).click();
    await page.getByLabel('Rights statement').selectOption({ label: 'In Copyright' });
    await page.getByLabel('Rights holder').fill('Piers Hallam estate');

    for (const words of ['Lock gate, Oct.', 'P. H.']) {
      await page.getByRole('button', { name: '+ Add mark' }).click();
      const marks = await page.getByRole('listitem', { name: /^Mark \d+$/ }).count();
      await page
        .getByRole('listitem', { name: `Mark ${marks}`, exact: true })
        .getByLabel('Transcription')
        .fill(words);
    }

    // A date that cannot be read comes back beside its field; corrected, the print saves.
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByText('Use a date like').first().waitFor();
    await page.getByLabel('When', { exact: true }).fill('2025-10-02');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByRole('heading', { name: 'Lock gate at dusk', level: 1 }).waitFor();

    const cameIn = page.getByRole('definition');
    await expect
      .poll(() => cameIn.filter({ hasText: 'Oriel Stanmore' }).count())
      .toBeGreaterThan(0);
    await expect
      .poll(() =>
        page.getByRole('list', { name: 'Earlier owners' }).getByRole('listitem').allInnerTexts(),
      )
      .toEqual([
        expect.stringContaining('Piers Hallam'),
        expect.stringContaining('Oriel Stanmore'),
      ]);
    await expect.poll(() => cameIn.filter({ hasText: 'In Copyright' }).count()).toBe(1);
    const marks = page.getByRole('list', { name: 'Marks and inscriptions' });
    await expect.poll(() => marks.getByText('Lock gate, Oct.').count()).toBe(1);
    await expect.poll(() => marks.getByText('P. H.').count()).toBe(1);

    // Editing again shows the saved source chosen (the select waits for its options).
    await page.goto(`${page.url()}/edit`);
    const source = page.getByLabel('Source', { exact: true });
    await expect
      .poll(() => source.evaluate((select: HTMLSelectElement) => select.selectedOptions[0]?.text))
      .toBe('Oriel Stanmore (person)');

    // A photograph of the verso: the first inscription is marked where it is seen on it.
    const printId = Number(new URL(page.url()).pathname.split('/')[2]);
    const archivist = await apiSignIn(
      live.server.test.app,
      'archivist@printwarden.test',
      'printwarden-demo',
    );
    const verso = await archivist
      .post(`/api/prints/${printId}/assets`)
      .field('view', 'verso')
      .attach('file', await buildJpeg(640, 480), 'verso.jpg')
      .expect(201);
    await live.server.test.ctx.images.jobs.idle();
    await page.reload();
    const first = page.getByRole('listitem', { name: 'Mark 1', exact: true });
    await first.getByLabel('Seen on photograph').selectOption(String(verso.body.id));
    const photo = first.getByRole('img', { name: /^Photograph verso for mark 1/ });
    await photo.waitFor();
    // The form is long: the photograph may sit below the fold, where a drag would miss it.
    await photo.scrollIntoViewIfNeeded();
    const box = (await photo.boundingBox())!;
    await page.mouse.move(box.x + box.width * 0.2, box.y + box.height * 0.6);
    await page.mouse.down();
    await page.mouse.move(box.x + box.width * 0.5, box.y + box.height * 0.8, { steps: 5 });
    await page.mouse.up();
    await first.getByText('Area marked.').waitFor();
    await page.getByRole('button', { name: 'Save changes' }).click();
    // Saved: the record opens (the edit page's heading holds the title too).
    await expect.poll(() => new URL(page.url()).pathname).toBe(`/prints/${printId}`);
    const saved = await archivist.get(`/api/prints/${printId}`).expect(200);
    const marked = (saved.body.marks as Array<{ assetId: number | null; area: unknown }>).filter(
      (mark) => mark.area !== null,
    );
    expect(marked).toHaveLength(1);
    expect(marked[0]!.assetId).toBe(verso.body.id);
    expect(marked[0]!.area).toMatchObject({
      x: expect.closeTo(0.2, 1),
      y: expect.closeTo(0.6, 1),
      width: expect.closeTo(0.3, 1),
      height: expect.closeTo(0.2, 1),
    });
  });
});
