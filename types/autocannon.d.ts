// The part of autocannon 8's API that scripts/bench-http.ts uses (the package ships no types).
declare module "autocannon" {
  interface Histogram {
    average: number;
    mean: number;
    stddev: number;
    min: number;
    max: number;
    p50: number;
    p90: number;
    p99: number;
    total: number;
  }
  export interface Result {
    url: string;
    duration: number;
    connections: number;
    requests: Histogram;
    latency: Histogram;
    throughput: Histogram;
    errors: number;
    timeouts: number;
    non2xx: number;
    "2xx": number;
  }
  export interface Options {
    url: string;
    connections?: number;
    duration?: number;
    method?: string;
    headers?: Record<string, string>;
    timeout?: number;
  }
  function autocannon(opts: Options): Promise<Result>;
  export default autocannon;
}
