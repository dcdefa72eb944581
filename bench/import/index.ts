import { spawn, type ChildProcess } from 'node:child_process';
import { readFileSync, writeFileSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { createInterface } from 'node:readline';
import { PrintCreateSchema, type PrintCreate } from '../../shared/schemas/print';
import { buildCsv, buildCsvRow, CSV_MAPPING } from '../../tests/support/imports';
import type { SuiteResult } from '../suite';
import { rawInsertRowsPerSecond } from './raw-insert';
import { attachReportImages } from './report-images';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

const ROWS = Number(process.env.BENCH_IMPORT_ROWS ?? 50_000);
const SMALL_ROWS = Math.round(ROWS / 5);
const PASSWORD = 'bench-password-123';

async function startServer(): Promise<{
  child: ChildProcess;
  url: string;
  pid: number;
  dir: string;
}> {
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, '--import', 'tsx', 'bench/import/serve.ts'],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: process.env,
    },
  );
  process.once('exit', () => child.kill('SIGTERM'));
  const line = await new Promise<string>((resolve, reject) => {
    createInterface({ input: child.stdout! }).once('line', resolve);
    child.once('exit', (code) => reject(new Error(`bench server exited with ${code}`)));
  });
  return { child, ...(JSON.parse(line) as { url: string; pid: number; dir: string }) };
}

async function signIn(url: string, email: string) {
  const response = await fetch(`${url}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ email, password: PASSWORD }),
  });
  const cookie = response.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return { cookie, 'x-csrf-token': csrfToken };
}

/** Resident set size of a process in MB, from /proc. */
function rssMb(pid: number): number {
  const match = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return match ? Number(match[1]) / 1024 : 0;
}

/** Imports `csv` and waits, sampling the server's RSS every 50 ms. */
async function timedImport(url: string, headers: Record<string, string>, pid: number, csv: string) {
  const form = new FormData();
  form.set('mapping', JSON.stringify(CSV_MAPPING));
  form.set('file', new Blob([csv], { type: 'text/csv' }), 'bench.csv');
  let peak = rssMb(pid);
  const sampler = setInterval(() => (peak = Math.max(peak, rssMb(pid))), 50);
  const started = performance.now();
  const response = await fetch(`${url}/api/imports`, { method: 'POST', headers, body: form });
  if (response.status !== 202)
    throw new Error(`import refused: ${response.status} ${await response.text()}`);
  const { id } = (await response.json()) as { id: number };
  let job: { status: string; imported: number; failed: unknown[] };
  do {
    await new Promise((resolve) => setTimeout(resolve, 50));
    job = (await (await fetch(`${url}/api/imports/${id}`, { headers })).json()) as typeof job;
  } while (job.status === 'queued' || job.status === 'running');
  const seconds = (performance.now() - started) / 1000;
  clearInterval(sampler);
  if (job.status !== 'done' || job.failed.length) throw new Error(`import ended ${job.status}`);
  return { seconds, imported: job.imported, peakRssMb: Math.round(peak) };
}

const rowsFrom = (from: number, count: number) =>
  Array.from({ length: count }, (_, index) => buildCsvRow(from + index));

/** The same rows as print bodies, for the raw insert. */
function bodiesOf(rows: string[][]): PrintCreate[] {
  return rows.map(([accessionNumber, title, process, maker, madeOn, fixing, washing]) =>
    PrintCreateSchema.parse({
      accessionNumber,
      title,
      process,
      maker,
      madeOn,
      processing: [
        { stage: 'fixing', minutes: Number(fixing) },
        { stage: 'washing', minutes: Number(washing) },
      ],
    }),
  );
}

/** Issue 10: CSV import rate against a raw sqlite3 bulk insert, server RSS, report PDF time. */
export async function run(): Promise<SuiteResult> {
  const server = await startServer();
  const scratch = mkdtempSync(join(tmpdir(), 'printwarden-bench-csv-'));
  try {
    const archivist = await signIn(server.url, 'archivist@bench.test');
    const idleRssMb = Math.round(rssMb(server.pid));
    console.log(`  importing ${SMALL_ROWS} rows…`);
    const small = await timedImport(
      server.url,
      archivist,
      server.pid,
      buildCsv(rowsFrom(1, SMALL_ROWS)),
    );
    const bigRows = rowsFrom(100_000, ROWS);
    const csv = buildCsv(bigRows);
    writeFileSync(join(scratch, 'bench.csv'), csv);
    console.log(`  importing ${ROWS} rows…`);
    const big = await timedImport(server.url, archivist, server.pid, csv);
    console.log(`  raw sqlite3 insert of the same ${ROWS} rows…`);
    const rawPerSecond = await rawInsertRowsPerSecond(bodiesOf(bigRows));

    console.log('  report PDF with images…');
    const conservator = await signIn(server.url, 'conservator@bench.test');
    const printId = 1;
    const images = await attachReportImages(server.url, archivist, conservator, printId);
    const times: number[] = [];
    for (let n = 0; n < 5; n += 1) {
      const started = performance.now();
      const response = await fetch(`${server.url}/api/prints/${printId}/report.pdf`, {
        headers: conservator,
      });
      await response.arrayBuffer();
      if (response.status !== 200) throw new Error(`report.pdf answered ${response.status}`);
      times.push(performance.now() - started);
    }
    times.sort((a, b) => a - b);

    const importPerSecond = big.imported / big.seconds;
    const round = (value: number, digits = 2) => Math.round(value * 10 ** digits) / 10 ** digits;
    return {
      figures: {
        rows: ROWS,
        importSeconds: round(big.seconds),
        importRowsPerSecond: Math.round(importPerSecond),
        rawInsertRowsPerSecond: Math.round(rawPerSecond),
        importPeakRssMb: big.peakRssMb,
        /** The peak of the import of a fifth as many rows (10,000 by default), same server. */
        importPeakRssMb10k: small.peakRssMb,
        smallImportRows: SMALL_ROWS,
        idleRssMb,
        reportPdfMs: Math.round(times[2]!),
        reportPdfImages: images,
      },
      ratios: {
        importVsRawInsert: round(importPerSecond / rawPerSecond, 3),
        // Issue 14's goal: ≤ 1.2 (memory should not grow with the file).
        importPeakRssGrowth50kVs10k: round(big.peakRssMb / small.peakRssMb),
      },
    };
  } finally {
    server.child.kill('SIGTERM');
    rmSync(scratch, { recursive: true, force: true });
    rmSync(server.dir, { recursive: true, force: true });
  }
}
