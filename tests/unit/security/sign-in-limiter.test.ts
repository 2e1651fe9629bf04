// The sign-in limiter's policy, from counts alone (the counting itself is in the database:
// tests/integration/security/shared-limits.test.ts).
import { describe, expect, it } from 'vitest'
import { LIMITS, verdict } from '@/app/_lib/auth/sign-in-limiter'

const n = (count: number, oldestAgeMs = 0) => ({ count, oldestAgeMs })

describe('sign-in limiter verdict', () => {
  it('lets the first attempts through at once, then slows them by a step per failure up to the cap, then refuses', () => {
    expect(verdict([n(0)])).toEqual({ allowed: true, delayMs: 0 })
    expect(verdict([n(LIMITS.slowAfter - 1)])).toEqual({ allowed: true, delayMs: 0 })
    expect(verdict([n(LIMITS.slowAfter)])).toEqual({ allowed: true, delayMs: LIMITS.stepMs })
    expect(verdict([n(LIMITS.slowAfter + 1)])).toEqual({ allowed: true, delayMs: 2 * LIMITS.stepMs })
    expect(verdict([n(LIMITS.refuseAt - 1)])).toEqual({ allowed: true, delayMs: Math.min(LIMITS.maxDelayMs, (LIMITS.refuseAt - LIMITS.slowAfter) * LIMITS.stepMs) })
    expect(verdict([n(LIMITS.refuseAt, 1000)])).toEqual({ allowed: false, retryAfterS: LIMITS.windowMs / 1000 - 1 })
  })

  it('slow-only counts slow down, capped, but never refuse', () => {
    expect(verdict([n(0)], [n(LIMITS.slowAfter)])).toEqual({ allowed: true, delayMs: LIMITS.stepMs })
    expect(verdict([n(0)], [n(LIMITS.refuseAt * 10)])).toEqual({ allowed: true, delayMs: LIMITS.maxDelayMs })
    expect(verdict([], [n(LIMITS.refuseAt * 10)]).allowed).toBe(true)
  })

  it('any refusing key at the limit refuses; the wait runs from the oldest failure of the worst one', () => {
    expect(verdict([n(1, 5000), n(LIMITS.refuseAt, 60_000)])).toEqual({ allowed: false, retryAfterS: (LIMITS.windowMs - 60_000) / 1000 })
    expect(verdict([n(LIMITS.refuseAt + 2, 600_000), n(LIMITS.refuseAt, 1000)])).toEqual({ allowed: false, retryAfterS: (LIMITS.windowMs - 600_000) / 1000 })
    // On a tie the first key's oldest failure decides; part seconds round up.
    expect(verdict([n(LIMITS.refuseAt, 1500), n(LIMITS.refuseAt, 9000)])).toEqual({ allowed: false, retryAfterS: Math.ceil((LIMITS.windowMs - 1500) / 1000) })
  })
})
