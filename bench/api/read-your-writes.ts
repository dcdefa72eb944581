import { execFileSync } from 'node:child_process';
import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { buildPrint } from '../../tests/support/factories';
import { BENCH_ARCHIVIST } from '../bench-app';
import { signInOver, startChildServer } from '../../tests/support/child-server';

const WINDOW_MS = 5_000;

/** A word no other print holds, from a number: letters only, so the index keeps it whole. */
const tokenOf = (n: number) =>
  `ryw${n
    .toString(26)
    .split('')
    .map((digit) => String.fromCharCode(97 + parseInt(digit, 26)))
    .join('')}`;

export interface StartFigures {
  creates: number;
  misses: number;
  createP95Ms: number;
}

/**
 * Creates prints one after another for the first five seconds after a start and searches
 * for each with the very next request; counts those not found.
 */
async function afterStart(dir: string, first: number): Promise<StartFigures> {
  const server = await startChildServer({
    DATABASE_URL: `sqlite:${join(dir, 'bench.sqlite')}`,
    DATA_DIR: dir,
    UPLOADS_DIR: join(dir, 'uploads'),
    SESSION_SECRET: 'bench',
    DEMO: '0',
  });
  const started = Date.now();
  try {
    const headers = await signInOver(server.url, BENCH_ARCHIVIST.email, BENCH_ARCHIVIST.password);
    let creates = 0;
    let misses = 0;
    const latencies: number[] = [];
    while (Date.now() - started < WINDOW_MS) {
      const token = tokenOf(first + creates);
      const sent = performance.now();
      const created = await fetch(`${server.url}/api/prints`, {
        method: 'POST',
        headers,
        body: JSON.stringify(buildPrint({ title: `Read back ${token}` })),
      });
      latencies.push(performance.now() - sent);
      if (created.status !== 201) throw new Error(`create answered ${created.status}`);
      await created.arrayBuffer();
      const found = await fetch(`${server.url}/api/prints?q=${token}`, { headers });
      creates += 1;
      if (((await found.json()) as { total: number }).total < 1) misses += 1;
    }
    latencies.sort((a, b) => a - b);
    const p95 = latencies[Math.min(latencies.length - 1, Math.floor(latencies.length * 0.95))];
    return { creates, misses, createP95Ms: Math.round(p95 ?? 0) };
  } finally {
    await server.kill();
  }
}

/**
 * Issue 14's read-your-writes figure: creates in the first 5 s after a start at
 * `BENCH_RYW_PRINTS` (100,000) prints not found by the very next search. Two starts: the
 * first with no saved index (it builds one), the second from the index the first saved
 * when it stopped.
 */
export async function readYourWritesAfterStart() {
  const dir = mkdtempSync(join(tmpdir(), 'printwarden-bench-ryw-'));
  try {
    console.log('  read your writes: filling, then starting the real server twice…');
    execFileSync(process.execPath, ['--import', 'tsx', 'bench/api/fill-dir.ts', dir], {
      stdio: 'inherit',
    });
    const cold = await afterStart(dir, 0);
    const warm = await afterStart(dir, 100_000);
    return { cold, warm, misses: cold.misses + warm.misses };
  } finally {
    rmSync(dir, { recursive: true, force: true });
  }
}
