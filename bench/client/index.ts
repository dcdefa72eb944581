import { spawn, spawnSync } from 'node:child_process';
import { createInterface } from 'node:readline';
import { mkdirSync, writeFileSync } from 'node:fs';
import { loadavg } from 'node:os';
import { join } from 'node:path';
import { gzipSync } from 'node:zlib';
import * as chromeLauncher from 'chrome-launcher';
import lighthouse from 'lighthouse';
import type { SuiteResult } from '../suite';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

/** Chromium flags for this closed network, as in tests/support/browser.ts. */
const FLAGS = [
  '--headless=new',
  '--no-sandbox',
  '--disable-gpu',
  '--disable-quic',
  '--no-first-run',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
];
const GOALS = { initialJsKb: 150, performance: 90, accessibility: 100 };

/** The pages issue 20 names; all but sign-in are opened signed in as the conservator. */
const ONLY = process.env.BENCH_CLIENT_PAGES?.split(',');
const PAGES: Array<{ name: string; path: string; signedIn: boolean }> = [
  { name: 'signIn', path: '/sign-in', signedIn: false },
  { name: 'prints', path: '/prints', signedIn: true },
  { name: 'search', path: '/search?q=weir', signedIn: true },
  { name: 'record', path: '/prints/1', signedIn: true },
  { name: 'toneWatch', path: '/tone-watch', signedIn: true },
  { name: 'start', path: '/', signedIn: true },
];

async function startServer() {
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, '--import', 'tsx', 'bench/client/serve.ts'],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: process.env,
    },
  );
  const line = await new Promise<string>((resolve, reject) => {
    createInterface({ input: child.stdout }).once('line', resolve);
    child.once('exit', (code) => reject(new Error(`client bench server exited with ${code}`)));
  });
  return { child, url: (JSON.parse(line) as { url: string }).url };
}

async function sessionCookie(url: string): Promise<string> {
  const response = await fetch(`${url}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'conservator@printwarden.test', password: 'printwarden-demo' }),
  });
  if (!response.ok) throw new Error(`sign-in failed: ${response.status}`);
  return response.headers.get('set-cookie')!.split(';')[0]!;
}

interface NetworkItem {
  url?: string;
  resourceType?: string;
  transferSize?: number;
}

/**
 * The scripts' size gzipped at level 9 (what Vite reports as "gzip"), whatever the server
 * sent: the measure issue 20 sets its 150 kB goal in, comparable across servers.
 */
async function gzippedSize(urls: string[]): Promise<number> {
  let total = 0;
  for (const url of new Set(urls)) {
    const body = Buffer.from(await (await fetch(url)).arrayBuffer());
    total += gzipSync(body, { level: 9 }).length;
  }
  return total;
}

const round = (value: number, places = 1) => Math.round(value * 10 ** places) / 10 ** places;

/**
 * Each page is audited RUNS times and the run with the median performance score is kept:
 * one Lighthouse run on this 2-core machine swung by up to 10 points between identical runs,
 * and Lighthouse's own guidance on variability is to take the median of several (3 or 5).
 */
const RUNS = Number(process.env.BENCH_CLIENT_RUNS ?? 3);
type Result = NonNullable<Awaited<ReturnType<typeof lighthouse>>>['lhr'];

async function audit(url: string, cookie: string | undefined): Promise<Result> {
  // A fresh browser for each run: a second run in the same one lost its trace (NO_NAVSTART).
  const chrome = await chromeLauncher.launch({
    chromePath: process.env.CHROME_PATH ?? '/usr/bin/chromium',
    chromeFlags: FLAGS,
  });
  const result = await lighthouse(url, {
    port: chrome.port,
    output: 'json',
    logLevel: 'error',
    onlyCategories: ['performance', 'accessibility'],
    extraHeaders: cookie ? { Cookie: cookie } : undefined,
  }).finally(() => chrome.kill());
  return result!.lhr;
}

/**
 * A run Lighthouse could not finish (a lost trace, no paint seen) has no performance score
 * and counted as 0: it is run again, twice at most, so the median is taken over real runs.
 */
async function scoredAudit(url: string, cookie: string | undefined): Promise<Result> {
  const failed = (lhr: Result) =>
    Boolean(lhr.runtimeError) || typeof lhr.categories.performance?.score !== 'number';
  let lhr = await audit(url, cookie);
  for (let retry = 0; retry < 2 && failed(lhr); retry += 1) {
    console.log(`    a run failed (${lhr.runtimeError?.code ?? 'no score'}); running it again`);
    lhr = await audit(url, cookie);
  }
  return lhr;
}

function medianRun(runs: Result[]): Result {
  const score = (lhr: Result) => lhr.categories.performance?.score ?? 0;
  const sorted = [...runs].sort((a, b) => score(a) - score(b));
  return sorted[Math.floor((sorted.length - 1) / 2)]!;
}

/**
 * Issue 20: Lighthouse 12 (its default mobile run, simulated slow 4G and a 4× slower CPU)
 * on six pages, each the median of RUNS runs, in Debian's Chromium; the script each page
 * fetched (gzipped, and as sent), the lowest performance and accessibility scores. BENCH_CLIENT_DIR serves another build (e.g. main's).
 */
export async function run(): Promise<SuiteResult> {
  const loadAtStart = loadavg()[0]!;
  if (!process.env.BENCH_CLIENT_DIR) {
    console.log('Building the client…');
    const build = spawnSync('npx', ['vite', 'build'], { stdio: 'ignore' });
    if (build.status !== 0) throw new Error('vite build failed');
  }
  const server = await startServer();
  const cookie = await sessionCookie(server.url);
  const pages: Record<string, Record<string, number>> = {};
  try {
    // BENCH_CLIENT_PAGES=record,toneWatch runs only those (a look at one page, not a figure).
    for (const page of PAGES.filter((p) => !ONLY || ONLY.includes(p.name))) {
      console.log(`  ${page.path}…`);
      const runs: Result[] = [];
      for (let run = 0; run < RUNS; run += 1)
        runs.push(
          await scoredAudit(`${server.url}${page.path}`, page.signedIn ? cookie : undefined),
        );
      const lhr = medianRun(runs);
      // BENCH_CLIENT_REPORTS=dir keeps each page's whole Lighthouse report, to see why.
      if (process.env.BENCH_CLIENT_REPORTS) {
        mkdirSync(process.env.BENCH_CLIENT_REPORTS, { recursive: true });
        writeFileSync(
          join(process.env.BENCH_CLIENT_REPORTS, `${page.name}.json`),
          JSON.stringify(lhr),
        );
      }
      if (lhr.runtimeError) {
        throw new Error(`Lighthouse on ${page.path}: ${lhr.runtimeError.message}`);
      }
      const items = (lhr.audits['network-requests']?.details as { items?: NetworkItem[] })?.items;
      const scripts = (items ?? []).filter((item) => item.resourceType === 'Script');
      const scriptBytes = scripts.reduce((sum, item) => sum + (item.transferSize ?? 0), 0);
      const gzipBytes = await gzippedSize(scripts.map((item) => item.url!));
      const metric = (id: string) => round(lhr.audits[id]?.numericValue ?? Number.NaN, 0);
      pages[page.name] = {
        performance: round((lhr.categories.performance?.score ?? 0) * 100, 0),
        // Every run's score, lowest first, to show the spread the median was taken from.
        ...Object.fromEntries(
          [...runs]
            .map((run) => round((run.categories.performance?.score ?? 0) * 100, 0))
            .sort((a, b) => a - b)
            .map((value, index) => [`performanceRun${index + 1}`, value]),
        ),
        accessibility: round((lhr.categories.accessibility?.score ?? 0) * 100, 0),
        scriptGzipKb: round(gzipBytes / 1000),
        scriptTransferKb: round(scriptBytes / 1000),
        firstContentfulPaintMs: metric('first-contentful-paint'),
        largestContentfulPaintMs: metric('largest-contentful-paint'),
        totalBlockingTimeMs: metric('total-blocking-time'),
        speedIndexMs: metric('speed-index'),
        cumulativeLayoutShift: round(lhr.audits['cumulative-layout-shift']?.numericValue ?? NaN, 3),
      };
      console.log(`    ${JSON.stringify(pages[page.name])}`);
    }
  } finally {
    server.child.kill('SIGTERM');
  }
  const all = Object.values(pages);
  const initialJsKb = Math.max(pages.signIn?.scriptGzipKb ?? 0, pages.prints?.scriptGzipKb ?? 0);
  const performanceMin = Math.min(...all.map((page) => page.performance!));
  const accessibilityMin = Math.min(...all.map((page) => page.accessibility!));
  return {
    figures: {
      initialJsKb,
      lighthousePerformanceMin: performanceMin,
      lighthouseAccessibilityMin: accessibilityMin,
      goals: GOALS,
      // Lighthouse's simulated throttling scales with how busy the machine is: figures taken
      // under load are not comparable. The 1-minute load average at the start and the end.
      loadAverage: { atStart: round(loadAtStart, 2), atEnd: round(loadavg()[0]!, 2) },
      lighthouse: `12.2.3, default mobile settings (simulated throttling); the median of ${RUNS} runs per page`,
      client:
        process.env.BENCH_CLIENT_DIR ??
        'dist/client (built by the suite), served by the app with gzipped assets as `npm start` serves it',
      pages,
    },
    ratios: {
      initialJsOverGoal: round(initialJsKb / GOALS.initialJsKb, 2),
      performanceGoalOverMin: round(GOALS.performance / performanceMin, 2),
      accessibilityGoalOverMin: round(GOALS.accessibility / accessibilityMin, 2),
    },
  };
}
