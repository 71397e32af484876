// The parts of autocannon the load benchmark uses; the package ships no types.
declare module 'autocannon' {
  interface Request {
    method?: string;
    path?: string;
    body?: string;
    headers?: Record<string, string>;
    setupRequest?: (req: Request, context: Record<string, unknown>) => Request;
  }
  interface Options {
    url: string;
    connections?: number;
    duration?: number;
    method?: string;
    headers?: Record<string, string>;
    body?: string;
    requests?: Request[];
    overallRate?: number;
  }
  interface Histogram {
    average: number;
    p50: number;
    p90: number;
    p99: number;
    max: number;
  }
  export interface Result {
    requests: Histogram & { total: number };
    latency: Histogram;
    non2xx: number;
    errors: number;
    timeouts: number;
  }
  function autocannon(opts: Options): Promise<Result>;
  export default autocannon;
}
