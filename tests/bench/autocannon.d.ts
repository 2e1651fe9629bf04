// The small part of autocannon 9's programmatic API the API benchmark uses (the package ships no types).
declare module 'autocannon' {
  namespace autocannon {
    interface Histogram { average: number; min: number; max: number; p50: number; p90: number; p97_5: number; p99: number; total: number }
    interface RawRequest { method?: string; path?: string; headers?: Record<string, string>; body?: string }
    interface RequestSpec extends RawRequest {
      setupRequest?: (req: RawRequest, context: Record<string, unknown>) => RawRequest | null
      onResponse?: (status: number, body: string, context: Record<string, unknown>, headers: Record<string, string>) => void
  }
  interface Options {
    url: string
    connections?: number
    pipelining?: number
    amount?: number
    duration?: number
    timeout?: number
    method?: string
    headers?: Record<string, string>
    body?: string
    requests?: RequestSpec[]
  }
  interface Result {
    requests: Histogram
    latency: Histogram
    duration: number
    errors: number
    timeouts: number
    non2xx: number
    '2xx': number
    statusCodeStats: Record<string, { count: number }>
  }
  interface Instance { stop(): void }
  }
  function autocannon(opts: autocannon.Options, cb: (err: Error | null, result: autocannon.Result) => void): autocannon.Instance
  export = autocannon
}
