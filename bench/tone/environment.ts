import { spawn } from 'node:child_process';
import { readFileSync } from 'node:fs';
import { createInterface } from 'node:readline';
import { buildLoggerCsv } from '../../tests/support/environment';
import { presentPlaceEnvironment } from '../../server/presenters/environment';
import { placeEnvironment } from '../../server/services/environment/place-environment';
import { openBenchApp } from '../bench-app';
import { SERVER_NODE_FLAGS } from '../../scripts/server-node-flags.mjs';

/**
 * Issue 17: a year of 10-minute readings for 50 places (2.6 million rows) uploaded through
 * `POST /api/locations/:id/readings`, one logger file a place, with the server's peak RSS
 * sampled from /proc; then every place's figures for the year (`GET …/environment`, day
 * summaries, not raw rows), all 50 one after another.
 */
const DAYS = 365;
const INTERVAL_MINUTES = Number(process.env.BENCH_ENV_INTERVAL ?? 10);

function rssMb(pid: number): number {
  const match = /VmRSS:\s+(\d+) kB/.exec(readFileSync(`/proc/${pid}/status`, 'utf8'));
  return match ? Number(match[1]) / 1024 : 0;
}

async function startServer() {
  const child = spawn(
    process.execPath,
    [...SERVER_NODE_FLAGS, '--import', 'tsx', 'bench/tone/environment-serve.ts'],
    {
      stdio: ['ignore', 'pipe', 'inherit'],
      env: process.env,
    },
  );
  const line = await new Promise<string>((resolve, reject) => {
    createInterface({ input: child.stdout }).once('line', resolve);
    child.once('exit', (code) => reject(new Error(`environment bench server exited with ${code}`)));
  });
  return {
    child,
    ...(JSON.parse(line) as { api: string; pid: number; places: number[]; dir: string }),
  };
}

/** A cabinet's year: a seasonal and a daily wave around its own mean. */
function yearFile(place: number): string {
  const meanT = 15 + (place % 10);
  const meanRh = 38 + (place % 20);
  return buildLoggerCsv({
    serial: `BENCH-${place}`,
    start: '2025-01-01',
    days: DAYS,
    intervalMinutes: INTERVAL_MINUTES,
    climate: (i, hour) => {
      const season = Math.sin((2 * Math.PI * i * INTERVAL_MINUTES) / (DAYS * 1440));
      const daily = Math.sin((2 * Math.PI * (hour - 9)) / 24);
      return [meanT + 2 * season + 0.5 * daily, meanRh + 5 * season + 2 * daily];
    },
  });
}

export interface EnvironmentFigures {
  places: number;
  readingsPerPlace: number;
  readingsImported: number;
  readingsImportSeconds: number;
  readingsImportPeakRssMb: number;
  serverIdleRssMb: number;
  /** All 50 places' figures for the year computed in-process: day summaries read, figures, presented. */
  placeYearMetricsMs: number;
  /** The same through `GET /api/locations/:id/environment`, one request after another. */
  placeYearMetricsHttpMs: number;
}

/** Every place's figures for the year in this process, on the server's own database file. */
async function inProcessMetricsMs(dir: string, places: readonly number[]): Promise<number> {
  const { ctx } = await openBenchApp('environment', { keep: dir });
  const query = { from: '2025-01-01', to: '2025-12-31' };
  const may = { seePlaces: true, seeAlerts: true };
  presentPlaceEnvironment(await placeEnvironment(ctx.sequelize, places[0]!, query), may);
  const started = performance.now();
  for (const place of places) {
    presentPlaceEnvironment(await placeEnvironment(ctx.sequelize, place, query), may);
  }
  const ms = performance.now() - started;
  await ctx.mailer.close();
  await ctx.sequelize.close();
  return ms;
}

export async function runEnvironmentBench(): Promise<EnvironmentFigures> {
  const server = await startServer();
  try {
    const signIn = await fetch(`${server.api}/api/session`, {
      method: 'POST',
      headers: { 'content-type': 'application/json' },
      body: JSON.stringify({
        email: 'bench-conservator@printwarden.test',
        password: 'bench-password-123',
      }),
    });
    const cookie = signIn.headers.get('set-cookie')!.split(';')[0]!;
    const { csrfToken } = (await signIn.json()) as { csrfToken: string };
    const headers = { cookie, 'x-csrf-token': csrfToken };
    const idle = rssMb(server.pid);
    let peak = idle;
    const sampler = setInterval(() => (peak = Math.max(peak, rssMb(server.pid))), 50);
    let imported = 0;
    let importMs = 0;
    for (const [index, place] of server.places.entries()) {
      const form = new FormData();
      form.set('file', new Blob([yearFile(index)], { type: 'text/csv' }), `cab-${index}.csv`);
      const started = performance.now();
      const response = await fetch(`${server.api}/api/locations/${place}/readings`, {
        method: 'POST',
        headers,
        body: form,
      });
      importMs += performance.now() - started;
      if (response.status !== 201)
        throw new Error(`upload answered ${response.status}: ${await response.text()}`);
      imported += ((await response.json()) as { accepted: number }).accepted;
    }
    clearInterval(sampler);
    // Every place's figures for the year, warmed once, then timed together.
    const figuresOf = (place: number) =>
      fetch(`${server.api}/api/locations/${place}/environment?from=2025-01-01&to=2025-12-31`, {
        headers,
      }).then(async (r) => {
        if (r.status !== 200) throw new Error(`environment answered ${r.status}`);
        return r.json() as Promise<{ figures: { readings: number } }>;
      });
    await figuresOf(server.places[0]!);
    const started = performance.now();
    for (const place of server.places) await figuresOf(place);
    const metricsHttpMs = performance.now() - started;
    const metricsMs = await inProcessMetricsMs(server.dir, server.places);
    const round = (value: number) => Math.round(value * 100) / 100;
    return {
      places: server.places.length,
      readingsPerPlace: (DAYS * 1440) / INTERVAL_MINUTES,
      readingsImported: imported,
      readingsImportSeconds: round(importMs / 1000),
      readingsImportPeakRssMb: Math.round(peak),
      serverIdleRssMb: Math.round(idle),
      placeYearMetricsMs: round(metricsMs),
      placeYearMetricsHttpMs: round(metricsHttpMs),
    };
  } finally {
    server.child.kill('SIGTERM');
  }
}
