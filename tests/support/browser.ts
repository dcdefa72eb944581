import {
  chromium,
  type BrowserContext,
  type BrowserContextOptions,
  type Page,
} from 'playwright-core';

/** Flags for Debian's Chromium on a machine with no outside network (see DEVELOPERS.md). */
const CHROMIUM_ARGS = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];

export interface TestBrowser {
  /**
   * A page in a new browser context: no cookie, storage or cache from any earlier page.
   * Each person in a test gets one, so a request still in flight from someone else's page
   * can never hand its session cookie to the next sign-in.
   */
  freshPage(options?: BrowserContextOptions): Promise<Page>;
  close(): Promise<void>;
}

/** One headless Chromium per test file; contexts are cheap, so every sign-in has its own. */
export async function launchBrowser(): Promise<TestBrowser> {
  const browser = await chromium.launch({
    executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
    headless: true,
    args: CHROMIUM_ARGS,
  });
  const contexts: BrowserContext[] = [];
  return {
    freshPage: async (options = {}) => {
      const context = await browser.newContext({
        viewport: { width: 1280, height: 860 },
        ...options,
      });
      contexts.push(context);
      return context.newPage();
    },
    close: async () => {
      await Promise.all(contexts.map((context) => context.close().catch(() => undefined)));
      await browser.close();
    },
  };
}
