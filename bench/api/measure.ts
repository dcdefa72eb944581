import autocannon, { type CannonRequest, type CannonResult } from 'autocannon';
import { buildPrint } from '../../tests/support/factories';
import { BENCH_ARCHIVIST } from '../bench-app';

/** The load every `api` measurement uses: autocannon, 8 connections, `BENCH_SECONDS` each. */
export const SECONDS = Number(process.env.BENCH_SECONDS ?? 8);
export const CONNECTIONS = 8;
const CREATE_BODY = JSON.stringify(buildPrint());

export async function signIn(api: string): Promise<Record<string, string>> {
  const response = await fetch(`${api}/api/session`, {
    method: 'POST',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify(BENCH_ARCHIVIST),
  });
  const cookie = response.headers.get('set-cookie')!.split(';')[0]!;
  const { csrfToken } = (await response.json()) as { csrfToken: string };
  return { cookie, 'x-csrf-token': csrfToken, 'content-type': 'application/json' };
}

export interface Figure {
  reqPerSec: number;
  p50Ms: number;
  p99Ms: number;
  errors: number;
  non2xx: number;
  requests: number;
}

function figure(result: CannonResult): Figure {
  return {
    reqPerSec: Math.round(result.requests.average * 10) / 10,
    p50Ms: result.latency.p50,
    p99Ms: result.latency.p99,
    errors: result.errors + result.timeouts,
    non2xx: result.non2xx,
    requests: (result.requests as unknown as { total: number }).total,
  };
}

export const cannon = async (
  url: string,
  headers: Record<string, string>,
  requests: CannonRequest[],
): Promise<Figure> =>
  figure(await autocannon({ url, connections: CONNECTIONS, duration: SECONDS, headers, requests }));

export const randomPage = (pages: number): CannonRequest => ({
  method: 'GET',
  setupRequest: (request) => ({
    ...request,
    path: `/api/prints?page=${1 + Math.floor(Math.random() * pages)}`,
  }),
});
export const SEARCH: CannonRequest = {
  method: 'GET',
  path: '/api/prints?q=orchard&fixingMinutesMin=10',
};
export const randomRecord = (prints: number): CannonRequest => ({
  method: 'GET',
  setupRequest: (request) => ({
    ...request,
    path: `/api/prints/${1 + Math.floor(Math.random() * prints)}`,
  }),
});
export const create = (onCreated?: () => void): CannonRequest => ({
  method: 'POST',
  path: '/api/prints',
  body: CREATE_BODY,
  onResponse: (status) => {
    if (status === 201) onCreated?.();
  },
});

/** 90/10: one create, then nine reads (a page, the search, a record, in turn). */
export const mixRequests = (prints: number, onCreated?: () => void): CannonRequest[] => {
  const reads = [randomPage(Math.ceil(prints / 25)), SEARCH, randomRecord(prints)];
  return [create(onCreated), ...Array.from({ length: 9 }, (_, i) => reads[i % 3]!)];
};

export async function totalPrints(api: string, headers: Record<string, string>): Promise<number> {
  const response = await fetch(`${api}/api/prints?pageSize=1`, { headers });
  return ((await response.json()) as { total: number }).total;
}
