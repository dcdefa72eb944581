/** The parts of autocannon 9 the bench uses (the package ships no types). */
declare module 'autocannon' {
  interface CannonRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string;
    setupRequest?: (request: CannonRequest, context: Record<string, unknown>) => CannonRequest;
    onResponse?: (status: number, body: string, context: Record<string, unknown>) => void;
  }
  interface CannonOptions {
    url: string;
    connections?: number;
    duration?: number;
    headers?: Record<string, string>;
    requests?: CannonRequest[];
  }
  interface Histogram {
    average: number;
    mean: number;
    p50: number;
    p90: number;
    p99: number;
    max: number;
  }
  interface CannonResult {
    requests: Histogram;
    latency: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
    totalCompletedRequests: number;
    duration: number;
    '2xx': number;
  }
  function autocannon(options: CannonOptions): Promise<CannonResult>;
  export default autocannon;
  export type { CannonOptions, CannonRequest, CannonResult };
}
