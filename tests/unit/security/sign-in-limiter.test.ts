import { beforeEach, describe, expect, it } from 'vitest'
import { checkAttempt, LIMITS, recordFailure, resetLimiter } from '@/app/_lib/auth/sign-in-limiter'

describe('sign-in limiter', () => {
  beforeEach(resetLimiter)
  const t0 = 1_000_000

  it('lets the first attempts through at once, then slows them, then refuses for the window', () => {
    const keys = ['account:a@x']
    for (let i = 0; i < LIMITS.slowAfter - 1; i++) recordFailure(keys, t0)
    expect(checkAttempt(keys, t0)).toEqual({ allowed: true, delayMs: 0 })
    recordFailure(keys, t0)
    expect(checkAttempt(keys, t0)).toEqual({ allowed: true, delayMs: LIMITS.stepMs })
    while (((checkAttempt(keys, t0) as { delayMs?: number }).delayMs ?? -1) >= 0 && checkAttempt(keys, t0).allowed) recordFailure(keys, t0)
    const refused = checkAttempt(keys, t0 + 1000)
    expect(refused).toEqual({ allowed: false, retryAfterS: LIMITS.windowMs / 1000 - 1 })
    expect(checkAttempt(keys, t0 + LIMITS.windowMs + 1)).toEqual({ allowed: true, delayMs: 0 })
  })

  it('counts per address across accounts', () => {
    for (let i = 0; i < LIMITS.refuseAt; i++) recordFailure([`account:user${i}@x`, 'ip:10.0.0.9'], t0)
    expect(checkAttempt(['account:fresh@x', 'ip:10.0.0.9'], t0).allowed).toBe(false)
    expect(checkAttempt(['account:fresh@x', 'ip:10.0.0.10'], t0).allowed).toBe(true)
  })
})
