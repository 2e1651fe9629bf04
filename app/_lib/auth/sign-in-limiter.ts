/**
 * Slows down and then refuses repeated failed sign-ins: the caller says which counts only slow down
 * (the account's, so nobody elsewhere can lock its owner out) and which may refuse (one address on
 * one account, and one address across accounts).
 * Kept in process memory: enough for one server; behind several servers, put the counts in the
 * shared database or the proxy in front (docs/security.md).
 */
import 'server-only'

export const LIMITS = {
  /** Failures counted within this window, ms. */
  windowMs: 15 * 60_000,
  /** From this many failures on, each attempt waits a little longer. */
  slowAfter: 3,
  /** At this many failures, attempts are refused until the window has passed. */
  refuseAt: 8,
  /** Added wait per failure beyond slowAfter, ms (capped). */
  stepMs: 500,
  maxDelayMs: 4000,
}

const failures = new Map<string, number[]>()

function recent(key: string, now: number): number[] {
  const list = (failures.get(key) ?? []).filter((t) => now - t < LIMITS.windowMs)
  if (list.length) failures.set(key, list)
  else failures.delete(key)
  return list
}

export type Verdict = { allowed: true; delayMs: number } | { allowed: false; retryAfterS: number }

/**
 * May an attempt for these keys go ahead now, and after how long a pause? Every key's failures slow
 * the attempt down; only `keys` can refuse it, `slowOnly` keys never do (see credentials.ts).
 */
export function checkAttempt(keys: string[], now = Date.now(), slowOnly: string[] = []): Verdict {
  let worst = 0
  let worstRefusing = 0
  let oldest = now
  for (const k of keys) {
    const list = recent(k, now)
    if (list.length > worstRefusing) {
      worstRefusing = list.length
      oldest = list[0]
    }
  }
  for (const k of [...keys, ...slowOnly]) worst = Math.max(worst, recent(k, now).length)
  if (worstRefusing >= LIMITS.refuseAt) return { allowed: false, retryAfterS: Math.ceil((oldest + LIMITS.windowMs - now) / 1000) }
  return { allowed: true, delayMs: Math.min(LIMITS.maxDelayMs, Math.max(0, worst - LIMITS.slowAfter + 1) * LIMITS.stepMs) }
}

export function recordFailure(keys: string[], now = Date.now()): void {
  for (const k of keys) failures.set(k, [...recent(k, now), now])
}

export function clearFailures(keys: string[]): void {
  for (const k of keys) failures.delete(k)
}

/** For tests. */
export function resetLimiter(): void {
  failures.clear()
}
