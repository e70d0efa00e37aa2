// The slice of autocannon's API the benchmarks use (the package ships no types).
declare module "autocannon" {
  interface Histogram {
    average: number;
    mean: number;
    p50: number;
    p99: number;
    total: number;
  }
  interface RequestSpec {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string;
    setupRequest?: (req: RequestSpec) => RequestSpec;
  }
  export interface Result {
    requests: Histogram;
    latency: Histogram;
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    "2xx": number;
    "4xx": number;
    "5xx": number;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    amount?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: RequestSpec[];
  }
  function autocannon(opts: Options): Promise<Result>;
  export default autocannon;
}
