import { performance } from 'node:perf_hooks';

export interface LoadResult {
  requests: number;
  errors: number;
  seconds: number;
  perSecond: number;
  p50Ms: number;
  p95Ms: number;
  p99Ms: number;
}

/** The value below which `fraction` of the sorted samples fall (nearest-rank method). */
export function percentile(sorted: number[], fraction: number): number {
  if (sorted.length === 0) return Number.NaN;
  const rank = Math.ceil(fraction * sorted.length);
  return sorted[Math.min(sorted.length, Math.max(1, rank)) - 1]!;
}

/**
 * Sends requests from `concurrency` workers until `seconds` pass or `maxRequests` are sent;
 * every latency is kept, so percentiles are exact.
 */
export async function load(
  send: (n: number) => Promise<Response>,
  options: { seconds: number; concurrency: number; maxRequests?: number; expectStatus: number },
): Promise<LoadResult> {
  const latencies: number[] = [];
  let errors = 0;
  let sent = 0;
  const started = performance.now();
  const deadline = started + options.seconds * 1000;
  const worker = async () => {
    while (performance.now() < deadline && sent < (options.maxRequests ?? Infinity)) {
      const n = sent++;
      const t0 = performance.now();
      const response = await send(n);
      await response.arrayBuffer();
      latencies.push(performance.now() - t0);
      if (response.status !== options.expectStatus) errors += 1;
    }
  };
  await Promise.all(Array.from({ length: options.concurrency }, worker));
  const seconds = (performance.now() - started) / 1000;
  latencies.sort((a, b) => a - b);
  const round = (value: number) => Math.round(value * 100) / 100;
  return {
    requests: latencies.length,
    errors,
    seconds: round(seconds),
    perSecond: round(latencies.length / seconds),
    p50Ms: round(percentile(latencies, 0.5)),
    p95Ms: round(percentile(latencies, 0.95)),
    p99Ms: round(percentile(latencies, 0.99)),
  };
}
