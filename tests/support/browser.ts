import {
  chromium,
  type Browser,
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
  /** Closes this file's contexts; the browser stays for the worker's next file. */
  close(): Promise<void>;
}

/**
 * One headless Chromium per test worker, shared by the files it runs in turn (the e2e project
 * keeps one module graph per worker, `isolate: false`): starting Chromium cost about 1.7 s of
 * CPU each time, 28 times a run, on a machine whose 2 cores CI keeps busy. Each file still
 * gets contexts of its own, and closes them; playwright ends the browser when the worker exits.
 */
let shared: Promise<Browser> | undefined;

function sharedBrowser(): Promise<Browser> {
  shared ??= chromium
    .launch({
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      headless: true,
      args: CHROMIUM_ARGS,
    })
    .then(
      (browser) => {
        // A crashed browser is started again by the next file, not handed on.
        browser.once('disconnected', () => (shared = undefined));
        return browser;
      },
      (error: unknown) => {
        shared = undefined; // a failed start is tried again by the next file
        throw error;
      },
    );
  return shared;
}

/** The worker's browser (see `sharedBrowser`); contexts are cheap, so every sign-in has its own. */
export async function launchBrowser(): Promise<TestBrowser> {
  const browser = await sharedBrowser();
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
    },
  };
}
