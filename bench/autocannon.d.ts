/** The part of autocannon 9's API that bench/serve.bench.ts uses (the package ships no types). */
declare module 'autocannon' {
  interface RequestParams {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
  }
  interface Options {
    url: string;
    connections: number;
    duration: number;
    pipelining?: number;
    headers?: Record<string, string>;
    requests?: { setupRequest?: (req: RequestParams) => RequestParams }[];
  }
  interface Histogram {
    average: number;
    p50: number;
    p90: number;
    p99: number;
    max: number;
    total: number;
  }
  interface Result {
    latency: Histogram;
    requests: Histogram & { sent: number };
    errors: number;
    timeouts: number;
    non2xx: number;
    '2xx': number;
    duration: number;
  }
  function autocannon(options: Options): Promise<Result>;
  export default autocannon;
}
