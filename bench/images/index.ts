import { fork } from 'node:child_process';
import { existsSync, mkdtempSync, openAsBlob, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import sharp from 'sharp';
import { DerivativeStore } from '../../server/services/images/derivative-store';
import { writeDerivative } from '../../server/services/images/derivatives';
import { probeImage } from '../../server/services/images/probe';
import { writeTiles } from '../../server/services/images/tiles';
import type { SuiteResult } from '../suite';
import { FIXTURE_DIR, jpeg24, tiff200mb, tiff29 } from './fixtures';

const ROUNDS = Number(process.env.BENCH_IMAGE_ROUNDS ?? 3);
const mb = (bytes: number) => Math.round((bytes / 2 ** 20) * 10) / 10;
const round = (value: number, places = 3) => Math.round(value * 10 ** places) / 10 ** places;

/** Wall time and this process's peak RSS while `work` runs (sampled every 20 ms). */
async function measure(
  work: () => Promise<unknown>,
): Promise<{ seconds: number; peakRssMb: number }> {
  let peak = process.memoryUsage.rss();
  const timer = setInterval(() => (peak = Math.max(peak, process.memoryUsage.rss())), 20);
  const start = process.hrtime.bigint();
  await work();
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  clearInterval(timer);
  return { seconds: round(seconds), peakRssMb: mb(Math.max(peak, process.memoryUsage.rss())) };
}

const median = (values: number[]) =>
  [...values].sort((a, b) => a - b)[Math.floor(values.length / 2)]!;

/** The same two JPEGs with sharp called directly: oriented, fitted, sRGB, no metadata. */
async function bareSharp(input: string, out: string): Promise<void> {
  for (const [side, quality, name] of [
    [400, 80, 'thumbnail'],
    [2048, 86, 'web'],
  ] as const) {
    await sharp(input)
      .rotate()
      .resize(side, side, { fit: 'inside', withoutEnlargement: true })
      .toColourspace('srgb')
      .jpeg({ quality })
      .toFile(join(out, `bare-${name}.jpg`));
  }
}

/** Printwarden's derivative step as the upload and the background queue run it. */
async function ours(input: string, out: string): Promise<void> {
  const image = await probeImage(input);
  await writeDerivative(input, image, 'thumbnail', join(out, 'ours-thumbnail.jpg'));
  await writeDerivative(input, image, 'web', join(out, 'ours-web.jpg'));
}

async function derivatives(out: string) {
  const rows: Record<string, unknown> = {};
  let bareTotal = 0;
  let oursTotal = 0;
  for (const [label, file] of [
    ['29 MP 16-bit TIFF', await tiff29()],
    ['24 MP JPEG', await jpeg24()],
  ] as const) {
    const bare: Array<{ seconds: number; peakRssMb: number }> = [];
    const mine: Array<{ seconds: number; peakRssMb: number }> = [];
    // Alternate, so a busy moment on the shared machine falls on both sides.
    for (let round = 0; round < ROUNDS; round += 1) {
      bare.push(await measure(() => bareSharp(file, out)));
      mine.push(await measure(() => ours(file, out)));
    }
    const bareSeconds = median(bare.map((r) => r.seconds));
    const oursSeconds = median(mine.map((r) => r.seconds));
    bareTotal += bareSeconds;
    oursTotal += oursSeconds;
    rows[label] = {
      bareSeconds,
      oursSeconds,
      barePeakRssMb: Math.max(...bare.map((r) => r.peakRssMb)),
      oursPeakRssMb: Math.max(...mine.map((r) => r.peakRssMb)),
    };
    console.log(`  derivatives, ${label}:`, rows[label]);
  }
  return { rows, ratio: round(bareTotal / oursTotal) };
}

async function tilePyramid(out: string) {
  const file = await tiff29();
  const store = new DerivativeStore(out);
  const sha = 'a'.repeat(64);
  await store.prepare(sha);
  const result = await measure(() => writeTiles(file, { hasProfile: false }, store, sha));
  console.log('  IIIF tiles, 29 MP TIFF:', result);
  return result;
}

/** A 200 MB body that is not an image: the route streams and hashes it, then refuses it (415). */
async function streamOnlyBody(): Promise<string> {
  const path = join(FIXTURE_DIR, 'not-an-image-200mb.bin');
  if (!existsSync(path)) writeFileSync(path, Buffer.alloc(200_000_000, 0x5a));
  return path;
}

/** RSS of a separate Printwarden process while a 200 MB file goes in through the route. */
async function uploadRss(file: string) {
  const child = fork('bench/images/upload-server.ts', [], {
    execArgv: ['--import', 'tsx', '--expose-gc'],
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
  });
  const next = <T>() => new Promise<T>((resolve) => child.once('message', (m) => resolve(m as T)));
  const { url, printId } = await next<{ url: string; printId: number }>();
  const signIn = await fetch(`${url}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email: 'bench@printwarden.test', password: 'bench-password-123' }),
  });
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await signIn.json()) as { csrfToken: string };
  child.send('reset');
  await next();
  const form = new FormData();
  form.append('view', 'recto');
  form.append('file', await openAsBlob(file, { type: 'image/tiff' }), 'big.tif');
  const start = process.hrtime.bigint();
  const response = await fetch(`${url}/api/prints/${printId}/assets`, {
    method: 'POST',
    headers: { cookie, 'x-csrf-token': csrfToken },
    body: form,
  });
  const seconds = Number(process.hrtime.bigint() - start) / 1e9;
  const status = response.status;
  await response.arrayBuffer();
  child.send('report');
  const { baseline, peak } = await next<{ baseline: number; peak: number }>();
  child.send('stop');
  await new Promise((resolve) => child.once('exit', resolve));
  const result = {
    status,
    fileMb: mb((await openAsBlob(file)).size),
    seconds: round(seconds),
    serverBaselineRssMb: mb(baseline),
    serverPeakRssMb: mb(peak),
    rssGrowthMb: mb(peak - baseline),
  };
  console.log(`  upload, ${file}:`, result);
  return result;
}

/** Derivatives against bare sharp, the IIIF tile pyramid, and server memory during a big upload. */
export async function run(): Promise<SuiteResult> {
  const out = mkdtempSync(join(tmpdir(), 'printwarden-bench-out-'));
  try {
    console.log('Preparing inputs (cached in .tmp/bench-images)…');
    await Promise.all([tiff29(), jpeg24(), tiff200mb()]);
    const derived = await derivatives(out);
    const tiles = await tilePyramid(out);
    // Streaming alone (refused by type afterwards, so no decode), then a real 200 MB TIFF
    // whose thumbnail libvips decodes before the answer.
    const streaming = await uploadRss(await streamOnlyBody());
    const upload = await uploadRss(await tiff200mb());
    return {
      figures: {
        derivatives: derived.rows,
        tilePyramidSeconds: tiles.seconds,
        tilePyramidPeakRssMb: tiles.peakRssMb,
        uploadStreamingOnly: streaming,
        uploadWithThumbnail: upload,
        uploadRssGrowthMb: streaming.rssGrowthMb,
        uploadWithThumbnailRssGrowthMb: upload.rssGrowthMb,
        rounds: ROUNDS,
        note: 'Medians of alternating rounds.',
      },
      ratios: { derivativesVsBareSharp: derived.ratio },
    };
  } finally {
    rmSync(out, { recursive: true, force: true });
  }
}
