import 'server-only'
import { clearScope, rateKey, takeEvent } from '@/db/queries/rate-events'

/**
 * A fixed budget of requests per key within a sliding window, counted in the shared database
 * (rate_events, by its clock) so the budget holds across every app server. Used for the
 * forgot-password route, per account and per address. `scope` names the limiter: two limiters
 * with different scopes never share counts.
 */
export class RequestLimiter {
  constructor(
    private readonly scope: string,
    private readonly max: number,
    private readonly windowMs: number,
  ) {}

  /**
   * Seconds until the keys may ask again, or 0 if they may now (and then the request is counted for
   * each key). Check and count are one step: two servers cannot both take the last slot.
   */
  async take(keys: string[]): Promise<number> {
    const { taken, counts } = await takeEvent(
      keys.map((k) => rateKey(this.scope, k)),
      this.max,
      this.windowMs,
    )
    if (taken) return 0
    let wait = 0
    for (const c of counts) if (c.count >= this.max) wait = Math.max(wait, Math.ceil((this.windowMs - c.oldestAgeMs) / 1000))
    return Math.max(1, wait)
  }

  /** For tests: forget this limiter's counts. */
  async reset(): Promise<void> {
    await clearScope(this.scope)
  }
}
