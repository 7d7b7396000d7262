// The part of autocannon's programmatic API the load bench uses (the package ships no types).
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  export interface BenchRequest {
    method?: string;
    path?: string;
    headers?: Record<string, string>;
    body?: string;
    /** Called before each request is sent; the returned request is the one sent. */
    setupRequest?: (req: BenchRequest, context: Record<string, unknown>) => BenchRequest;
  }

  export interface Options {
    url: string | string[];
    connections?: number;
    duration?: number;
    amount?: number;
    timeout?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: BenchRequest[];
    title?: string;
  }

  export interface Histogram {
    average: number;
    mean: number;
    stddev: number;
    min: number;
    max: number;
    total: number;
    p50: number;
    p90: number;
    p99: number;
    sent?: number;
  }

  export interface Result {
    title?: string;
    duration: number;
    errors: number;
    timeouts: number;
    non2xx: number;
    '2xx': number;
    statusCodeStats: Record<string, { count: number }>;
    latency: Histogram;
    requests: Histogram;
  }

  export interface Instance extends EventEmitter {
    stop(): void;
  }

  function autocannon(opts: Options, cb: (err: Error | null, result: Result) => void): Instance;
  export default autocannon;
}
