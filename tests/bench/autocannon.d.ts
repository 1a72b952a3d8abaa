// The part of autocannon's API that api.bench.ts uses (the package ships no types).
declare module 'autocannon' {
  import type { EventEmitter } from 'node:events';

  namespace autocannon {
    interface Request {
      method?: string;
      path?: string;
      headers?: Record<string, string>;
      body?: string;
      setupRequest?: (request: Request, context: Record<string, unknown>) => Request;
      onResponse?: (status: number, body: string, context: Record<string, unknown>) => void;
    }
    interface Options {
      url: string;
      connections?: number;
      duration?: number;
      pipelining?: number;
      headers?: Record<string, string>;
      method?: string;
      body?: string;
      requests?: Request[];
    }
    interface Histogram {
      average: number;
      total: number;
    }
    interface Result {
      requests: Histogram;
      errors: number;
      timeouts: number;
      non2xx: number;
    }
    type Instance = EventEmitter & PromiseLike<Result>;
  }

  function autocannon(options: autocannon.Options): autocannon.Instance;
  export default autocannon;
}
