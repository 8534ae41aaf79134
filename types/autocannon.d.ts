// The part of autocannon 8's API that scripts/bench-http.ts and scripts/resilience.mts use (the package ships no types).
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
    body?: string;
  }
  /** The running instance (with a callback): "response" gives each answer's status, "reqError" each request that got none. */
  export interface Instance {
    on(event: "response", listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): this;
    on(event: "reqError", listener: (error: Error) => void): this;
    stop(): void;
  }
  function autocannon(opts: Options): Promise<Result>;
  function autocannon(opts: Options, done: (error: Error | null, result: Result) => void): Instance;
  export default autocannon;
}
