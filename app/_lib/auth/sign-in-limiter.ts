/**
 * Slows down and then refuses repeated failed sign-ins: the caller says which counts only slow down
 * (the account's, so nobody elsewhere can lock its owner out) and which may refuse (one address on
 * one account, and one address across accounts).
 * The failures are rows of rate_events in the shared database, timed by its clock, so every app
 * server counts the same failures (docs/security.md).
 */
import 'server-only'
import { clearEvents, clearScope, countEvents, rateKey, recordEvents, type KeyCount } from '@/db/queries/rate-events'

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

const SCOPE = 'sign-in-fail'
const stored = (keys: string[]) => keys.map((k) => rateKey(SCOPE, k))

export type Verdict = { allowed: true; delayMs: number } | { allowed: false; retryAfterS: number }

/**
 * The verdict from the counts within the window (pure): every key's failures slow the attempt down;
 * only the `refusing` keys can refuse it. The wait is counted from the oldest failure of the refusing
 * key with the most failures (the first such key on a tie).
 */
export function verdict(refusing: KeyCount[], slowOnly: KeyCount[] = []): Verdict {
  let worstRefusing = 0
  let oldestAgeMs = 0
  for (const c of refusing) {
    if (c.count > worstRefusing) {
      worstRefusing = c.count
      oldestAgeMs = c.oldestAgeMs
    }
  }
  const worst = Math.max(0, ...[...refusing, ...slowOnly].map((c) => c.count))
  if (worstRefusing >= LIMITS.refuseAt) return { allowed: false, retryAfterS: Math.max(1, Math.ceil((LIMITS.windowMs - oldestAgeMs) / 1000)) }
  return { allowed: true, delayMs: Math.min(LIMITS.maxDelayMs, Math.max(0, worst - LIMITS.slowAfter + 1) * LIMITS.stepMs) }
}

/**
 * May an attempt for these keys go ahead now, and after how long a pause? Every key's failures slow
 * the attempt down; only `keys` can refuse it, `slowOnly` keys never do (see credentials.ts).
 */
export async function checkAttempt(keys: string[], slowOnly: string[] = []): Promise<Verdict> {
  const counts = await countEvents(stored([...keys, ...slowOnly]), LIMITS.windowMs)
  return verdict(counts.slice(0, keys.length), counts.slice(keys.length))
}

export async function recordFailure(keys: string[]): Promise<void> {
  await recordEvents(stored(keys))
}

export async function clearFailures(keys: string[]): Promise<void> {
  await clearEvents(stored(keys))
}

/** For tests: forget every failed sign-in. */
export async function resetLimiter(): Promise<void> {
  await clearScope(SCOPE)
}
