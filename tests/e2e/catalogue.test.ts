import { describe, expect, it } from 'vitest';
import {
  expectAccessible,
  openArea,
  openInApp,
  signInAs,
  useLiveServerAndBrowser,
} from '../support/e2e';

const live = useLiveServerAndBrowser();

const signIn = (role: string) => signInAs(live.browser, live.server.url, role);

describe('the archivist', () => {
  it('creates a print with six processing steps, finds it in the list and opens it', async () => {
    const page = await signIn('archivist');
    await page.getByRole('link', { name: 'New print' }).click();
    await page.getByLabel('Title').fill('Sluice at first light');
    await page.getByLabel('Maker').fill('Browser Test');
    await page.getByLabel('Made', { exact: true }).fill('2026-05-14');
    await page.getByLabel('Paper').selectOption({ label: 'Hot-pressed cotton rag 300' });

    const steps6 = [
      ['salting', 3],
      ['sensitizing', null],
      ['exposure', 40],
      ['prewash', 2],
      ['fixing', 12],
      ['washing', 20],
    ] as const;
    for (let i = 0; i < steps6.length; i += 1) {
      await page.getByRole('button', { name: '+ Add step' }).click();
      const step = page.getByRole('listitem', { name: `Step ${i + 1}` });
      await step.getByLabel('Stage').selectOption(steps6[i]![0]);
      const minutes = steps6[i]![1];
      if (minutes !== null) await step.getByLabel('Minutes').fill(String(minutes));
    }
    const fixing = page.getByRole('listitem', { name: 'Step 5' });
    await fixing.getByLabel('Chemical').fill('sodium thiosulfate');
    await fixing.getByLabel('Concentration (% w/v)').fill('15');
    await page.getByRole('listitem', { name: 'Step 2' }).getByLabel('Coats').fill('2');

    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByRole('heading', { name: 'Sluice at first light', level: 1 }).waitFor();
    const steps = page.getByRole('list', { name: 'Processing steps' }).getByRole('listitem');
    await expect.poll(() => steps.count()).toBe(6);
    await expect.poll(() => page.getByText('15 % w/v sodium thiosulfate').isVisible()).toBe(true);
    await page.getByText('Catalogued by Ines Wetherall').waitFor();

    await openArea(page, 'Prints');
    await page.getByLabel('Find words').fill('sluice first');
    await page.getByRole('button', { name: 'Find' }).click();
    const link = page.getByRole('link', { name: 'Sluice at first light' });
    await link.waitFor();
    await link.click();
    await page.getByRole('heading', { name: 'Sluice at first light', level: 1 }).waitFor();
    await expect.poll(() => page.getByText('Hot-pressed cotton rag 300').isVisible()).toBe(true);

    // Opened cold (a fresh page load), the edit form starts from the saved record, links included.
    await page.goto(`${page.url()}/edit`);
    const paper = page.getByLabel('Paper');
    await paper.waitFor();
    await expect
      .poll(() =>
        paper.evaluate((select: HTMLSelectElement) => select.selectedOptions[0]?.textContent),
      )
      .toBe('Hot-pressed cotton rag 300');
    await page.close();
  });

  it('sees inline errors for a missing title and a fixing step without minutes', async () => {
    const page = await signIn('archivist');
    await page.goto(`${live.server.url}/prints/new`);
    await page.getByRole('button', { name: '+ Add step' }).click();
    await page.getByRole('listitem', { name: 'Step 1' }).getByLabel('Stage').selectOption('fixing');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByText('A title is required').waitFor();
    await expect
      .poll(() => page.getByText('A fixing step needs its minutes').isVisible())
      .toBe(true);
    await expect.poll(() => page.getByLabel('Title').getAttribute('aria-invalid')).toBe('true');
    await page.close();
  });

  it('is asked to choose the stage of a new step, which is never saved as a stage nobody chose', async () => {
    const page = await signIn('archivist');
    await page.goto(`${live.server.url}/prints/new`);
    await page.getByLabel('Title').fill('Untouched step');
    await page.getByRole('button', { name: '+ Add step' }).click();
    const step = page.getByRole('listitem', { name: 'Step 1' });
    const stage = step.getByLabel('Stage');
    await expect.poll(() => stage.inputValue()).toBe('');
    // The usual order is still offered, as words in the empty choice, not as a value.
    await step.getByText('Choose (usually salting here)').waitFor({ state: 'attached' });
    await page.getByRole('button', { name: 'Create print' }).click();
    await step.getByText('Choose a stage').waitFor();
    await expect.poll(() => stage.getAttribute('aria-invalid')).toBe('true');
    expect(page.url()).toMatch(/\/prints\/new$/);
    await stage.selectOption('salting');
    await page.getByRole('button', { name: 'Create print' }).click();
    await page.getByRole('heading', { name: 'Untouched step', level: 1 }).waitFor();
    const steps = page.getByRole('list', { name: 'Processing steps' }).getByRole('listitem');
    await expect.poll(() => steps.count()).toBe(1);
    await page.close();
  });

  it('reorders steps with the move buttons', async () => {
    const page = await signIn('archivist');
    await page.goto(`${live.server.url}/prints/new`);
    for (const [n, stage] of [
      [1, 'salting'],
      [2, 'sensitizing'],
    ] as const) {
      await page.getByRole('button', { name: '+ Add step' }).click();
      await page
        .getByRole('listitem', { name: `Step ${n}` })
        .getByLabel('Stage')
        .selectOption(stage);
    }
    await page.getByRole('button', { name: 'Move step 2 up' }).click();
    const first = page.getByRole('listitem', { name: 'Step 1' }).getByLabel('Stage');
    await expect.poll(() => first.inputValue()).toBe('sensitizing');
    await page.close();
    // Seven axe scans of full pages: allow for a slow CI machine.
  }, 150_000);
});

describe('the curator', () => {
  it('retitles a print through the short form; the archivist then sees the change in the history', async () => {
    const curator = await signIn('curator');
    await curator.getByRole('table').getByRole('link').nth(1).click();
    await curator.getByRole('link', { name: 'Edit title, description, tags' }).click();
    // Count only once the short form is on screen: the record page has its own "Process".
    await curator.getByRole('heading', { name: /^Edit /, level: 1 }).waitFor();
    await curator.getByLabel('Title').waitFor();
    await expect.poll(() => curator.getByLabel('Process').count()).toBe(0);
    await curator.getByLabel('Title').fill('Retitled by the curator');
    await curator.getByRole('button', { name: 'Save' }).click();
    await curator.getByRole('heading', { name: 'Retitled by the curator', level: 1 }).waitFor();
    const url = curator.url();
    await curator.close();

    const archivist = await signIn('archivist');
    await archivist.goto(url);
    await archivist.getByText('Changed by Tomas Ruddle: title').waitFor();
    await archivist.close();
  });
});

describe('deleting', () => {
  it('moves a print to the deleted prints, from where the archivist restores it', async () => {
    const page = await signIn('archivist');
    // One link a row, the title's: the Prints list and Search share one list.
    const row = page.getByRole('table').getByRole('row').nth(1);
    const title = (await row.getByRole('link').textContent())!;
    await row.getByRole('link').click();
    await page.getByRole('button', { name: 'Delete…' }).click();
    await page.getByRole('button', { name: 'Yes, delete' }).click();
    await page.getByRole('heading', { name: 'Prints', level: 1 }).waitFor();
    await page.getByRole('link', { name: title, exact: true }).waitFor({ state: 'detached' });
    await page.getByRole('link', { name: 'Deleted prints' }).click();
    const deleted = page.getByRole('listitem').filter({ hasText: title });
    await deleted.getByRole('button', { name: 'Restore' }).click();
    await page.getByText('No deleted prints.').waitFor();
    await expectAccessible(page);
    await page.getByRole('link', { name: 'Back to the prints' }).click();
    await page.getByRole('link', { name: title, exact: true }).waitFor();
    await page.close();
    // Seven axe scans of full pages: allow for a slow CI machine.
  }, 150_000);
});

describe('the viewer', () => {
  it('reads a record but finds no way to edit, delete, create or see places', async () => {
    const page = await signIn('viewer');
    await expect.poll(() => page.getByRole('link', { name: 'New print' }).count()).toBe(0);
    // The viewer's Collection heading holds no Places.
    await page
      .getByRole('navigation', { name: 'Main' })
      .getByRole('button', { name: /^Collection/ })
      .click();
    await page.getByRole('link', { name: 'Search', exact: true }).waitFor();
    await expect.poll(() => page.getByRole('link', { name: 'Places' }).count()).toBe(0);
    await page.keyboard.press('Escape');
    await page.getByRole('table').getByRole('link').nth(1).click();
    await page.getByRole('heading', { name: 'Processing history' }).waitFor();
    await expect.poll(() => page.getByRole('link', { name: /Edit/ }).count()).toBe(0);
    await expect.poll(() => page.getByRole('button', { name: /Delete/ }).count()).toBe(0);
    await expect.poll(() => page.getByText('Place', { exact: true }).count()).toBe(0);
    await expect
      .poll(() => page.getByRole('heading', { name: 'History of this record' }).count())
      .toBe(0);
    await page.close();
    // Seven axe scans of full pages: allow for a slow CI machine.
  }, 150_000);
});

describe('accessibility (axe, WCAG 2.2 AA rules)', () => {
  it('finds no serious violations on the sign-in page', async () => {
    const page = await live.browser.freshPage();
    await page.goto(`${live.server.url}/sign-in`);
    await page.getByText('Demo accounts').waitFor();
    await expectAccessible(page, undefined, { contrast: true });
    await page.close();
  });

  it('finds no serious violations on the catalogue pages', async () => {
    const page = await signIn('archivist');
    await expectAccessible(page, undefined, { contrast: true });
    await page.getByRole('table').getByRole('link').nth(1).click();
    await page.getByRole('heading', { name: 'Processing history' }).waitFor();
    await expectAccessible(page, undefined, { contrast: true });
    await page.getByRole('link', { name: 'Edit record' }).click();
    await page.getByRole('button', { name: 'Save changes' }).waitFor();
    await expectAccessible(page, undefined, { contrast: true });
    for (const [path, heading] of [
      ['/prints/new', 'New print'],
      ['/papers', 'Papers'],
      ['/negatives', 'Negatives'],
      ['/places', 'Places'],
    ] as const) {
      await openInApp(page, path);
      await page.getByRole('heading', { name: heading, level: 1 }).waitFor();
      await page.waitForLoadState('networkidle');
      await expectAccessible(page, undefined, { contrast: true });
    }
    await page.close();
    // Seven axe scans of full pages: allow for a slow CI machine.
  }, 150_000);
});
