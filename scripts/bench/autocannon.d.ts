/** The slice of autocannon's programmatic API the API load bench uses (the package ships no types). */
declare module 'autocannon' {
  namespace autocannon {
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (req: Request, context: Record<string, unknown>) => Request;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      pipelining?: number;
      timeout?: number;
      headers?: Record<string, string>;
      requests?: Request[];
    }
    interface Histogram {
      average: number;
      mean: number;
      p50: number;
      p90: number;
      p97_5: number;
      p99: number;
      max: number;
      total: number;
    }
    interface Result {
      requests: Histogram;
      latency: Histogram;
      throughput: Histogram;
      duration: number;
      errors: number;
      timeouts: number;
      non2xx: number;
      '1xx': number;
      '2xx': number;
      '3xx': number;
      '4xx': number;
      '5xx': number;
    }
  }
  interface Instance {
    /** Each answer: its client, status, bytes and latency in ms. */
    on(event: 'response', listener: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): Instance;
  }
  function autocannon(opts: autocannon.Options): Promise<autocannon.Result>;
  function autocannon(opts: autocannon.Options, done: (err: Error | null, result: autocannon.Result) => void): Instance;
  export = autocannon;
}

