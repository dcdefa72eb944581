import { describe, expect, it } from 'vitest';
import { signInAs, useLiveServerAndBrowser } from '../support/e2e';

const live = useLiveServerAndBrowser();

const PHONE = { width: 390, height: 844 };

describe('the print form on a 390 px phone', () => {
  it("a step's buttons scrolled to the bottom edge stay above the sticky save bar", async () => {
    const page = await signInAs(live.browser, live.server.url, 'archivist', PHONE, '/prints/new');
    await page.getByRole('heading', { name: 'New print', level: 1 }).waitFor();
    await page.getByRole('button', { name: '+ Add step' }).click();
    const remove = page.getByRole('button', { name: 'Remove step 1' });
    await remove.waitFor();
    // What a browser does when it brings a focused control into view at the bottom edge
    // (the smallest scroll that shows it); the scroll margin is what keeps it clear.
    await remove.evaluate((button) => button.scrollIntoView({ block: 'end' }));
    const bar = page.getByRole('button', { name: 'Create print' }).locator('xpath=..');
    const buttonBox = await remove.boundingBox();
    const barBox = await bar.boundingBox();
    expect(buttonBox && barBox).toBeTruthy();
    expect(buttonBox!.y + buttonBox!.height).toBeLessThanOrEqual(barBox!.y);
    await page.close();
  }, 60_000);
});
