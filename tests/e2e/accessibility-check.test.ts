import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchBrowser, type TestBrowser } from '../support/browser';
import { expectAccessible } from '../support/e2e';

// The axe check every browser test leans on must still see what it is for: a page with a
// serious finding fails it (image-alt and color-contrast are WCAG 2 A/AA rules of axe-core).
let browser: TestBrowser;
beforeAll(async () => {
  browser = await launchBrowser();
});
afterAll(() => browser.close());

describe('expectAccessible', () => {
  it('fails on an image without a text alternative and on grey text on grey', async () => {
    const page = await browser.freshPage();
    await page.setContent(
      '<html lang="en"><head><title>t</title></head><body><main><h1>t</h1>' +
        '<p style="color:#777;background:#888">faint words</p>' +
        '<img src="data:image/gif;base64,R0lGODlhAQABAAAAACw=">' +
        '</main></body></html>',
    );
    // The assertion's `actual` is the list of findings it refused.
    const findingsOf = (contrast: boolean) =>
      expectAccessible(page, undefined, { contrast }).then(
        () => '',
        (error: { actual?: string[] }) => (error.actual ?? []).join('\n'),
      );
    const swept = await findingsOf(true);
    expect(swept).toMatch(/^image-alt: img$/m);
    expect(swept).toMatch(/^color-contrast: p$/m);
    // Outside the sweeps, contrast is left to the palette's own test; every other rule runs.
    const inFlow = await findingsOf(false);
    expect(inFlow).toMatch(/^image-alt: img$/m);
    expect(inFlow).not.toMatch(/color-contrast/);
  });

  it('passes the same page once both are mended', async () => {
    const page = await browser.freshPage();
    await page.setContent(
      '<html lang="en"><head><title>t</title></head><body><main><h1>t</h1>' +
        '<p style="color:#222;background:#fff">clear words</p>' +
        '<img alt="a dot" src="data:image/gif;base64,R0lGODlhAQABAAAAACw=">' +
        '</main></body></html>',
    );
    await expectAccessible(page);
  });
});
