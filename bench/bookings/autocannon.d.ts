// autocannon ships no types; this is the part of its programmatic API the bench uses.
declare module "autocannon" {
  export type Histogram = { average: number; mean: number; stddev: number; min: number; max: number; total: number; p50: number; p90: number; p99: number; p99_9?: number };
  export type Result = {
    title?: string;
    url: string;
    duration: number;
    connections: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    mismatches: number;
    latency: Histogram;
    requests: Histogram & { sent: number };
    throughput: Histogram;
    "2xx": number;
  };
  export type Request = { method?: string; path?: string; headers?: Record<string, string> };
  export type Options = {
    url: string;
    connections?: number;
    duration?: number;
    timeout?: number;
    headers?: Record<string, string>;
    requests?: Request[];
    title?: string;
  };
  export type Instance = PromiseLike<Result> & { stop(): void };
  export default function autocannon(options: Options): Instance;
}
