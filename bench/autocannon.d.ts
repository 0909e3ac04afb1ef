/** The part of autocannon 9 used by bench/api.ts (the package ships no types). */
declare module 'autocannon' {
  interface Options {
    url: string;
    method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
    headers?: Record<string, string>;
    body?: string;
    connections?: number;
    amount?: number;
    duration?: number;
  }
  interface Result {
    requests: { average: number; total: number };
    latency: { p50: number; p99: number; average: number };
    errors: number;
    non2xx: number;
  }
  interface Instance extends PromiseLike<Result> {
    on(event: 'response', fn: (client: unknown, statusCode: number, resBytes: number, responseTime: number) => void): void;
  }
  function autocannon(opts: Options): Instance;
  export default autocannon;
}
