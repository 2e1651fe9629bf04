import 'server-only'

/**
 * A fixed budget of requests per key within a sliding window, in process memory (one server; see
 * docs/security.md for several). Used for the forgot-password route, per account and per address.
 */
export class RequestLimiter {
  private readonly hits = new Map<string, number[]>()

  constructor(
    private readonly max: number,
    private readonly windowMs: number,
  ) {}

  /** Seconds until the key may ask again, or 0 if it may now (and then the request is counted). */
  take(keys: string[], now = Date.now()): number {
    let wait = 0
    for (const k of keys) {
      const list = (this.hits.get(k) ?? []).filter((t) => now - t < this.windowMs)
      this.hits.set(k, list)
      if (list.length >= this.max) wait = Math.max(wait, Math.ceil((list[0] + this.windowMs - now) / 1000))
    }
    if (wait === 0) for (const k of keys) this.hits.get(k)!.push(now)
    if (this.hits.size > 50_000) this.hits.clear() // a flood of distinct keys must not grow memory for ever
    return wait
  }

  reset(): void {
    this.hits.clear()
  }
}
