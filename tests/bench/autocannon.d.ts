/** The part of autocannon's API the benchmarks use (the package ships no types). */
declare module 'autocannon' {
  namespace autocannon {
    interface Options {
      url: string;
      method?: string;
      headers?: Record<string, string>;
      body?: string;
      connections?: number;
      duration?: number;
      /** Requests per second across all connections (autocannon spaces them evenly). */
      overallRate?: number;
      /** Changes each request before it is sent (here: a fresh Idempotency-Key on each). */
      requests?: { setupRequest?: (request: RequestParams) => RequestParams }[];
    }
    interface RequestParams {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
    }
    interface Stats {
      average: number;
      p50: number;
      p99: number;
    }
    interface Result {
      requests: Stats;
      latency: Stats;
      non2xx: number;
      errors: number;
    }
  }
  function autocannon(
    options: autocannon.Options,
    done: (error: Error | null, result: autocannon.Result) => void,
  ): unknown;
  export default autocannon;
}
