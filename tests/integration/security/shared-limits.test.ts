// Limits that hold across app servers: the sign-in throttle and the forgot-password budgets count in
// rate_events, by the database's clock. A "second server" is a fresh copy of the modules
// (vi.resetModules): it shares nothing with the first but the database, as two processes would.
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { eq, sql } from 'drizzle-orm'
import * as forgotA from '@/app/api/password/forgot/route'
import * as credentialsA from '@/app/_lib/auth/credentials'
import * as limiterA from '@/app/_lib/auth/sign-in-limiter'
import { LIMITS } from '@/app/_lib/auth/sign-in-limiter'
import { PEER_HEADER, PEER_STAMP } from '@/app/_lib/http/client-address'
import { getDb } from '@/db/client'
import { rateEvents } from '@/db/schema'
import { eventsOf, pruneRateEvents, rateKey, RETENTION_MS } from '@/db/queries/rate-events'
import { call, makeUser } from '@/tests/support/api'
import { capturedMail } from '@/tests/support/review-fixtures'
;(globalThis as unknown as Record<symbol, unknown>)[PEER_STAMP] = true

/** The same modules loaded afresh: a second app server with its own memory and the same database. */
async function secondServer() {
  vi.resetModules()
  return {
    credentials: await import('@/app/_lib/auth/credentials'),
    limiter: await import('@/app/_lib/auth/sign-in-limiter'),
    forgot: await import('@/app/api/password/forgot/route'),
  }
}

/** Move a key's events back in time, as if that much had passed on the database's clock. */
async function age(key: string, ms: number) {
  const db = await getDb()
  await db.update(rateEvents).set({ at: sql`${rateEvents.at} - make_interval(secs => ${ms / 1000})` }).where(eq(rateEvents.key, key))
}

const signInKey = (k: string) => rateKey('sign-in-fail', k)

describe('limits shared by every app server', () => {
  beforeEach(() => limiterA.resetLimiter())
  afterEach(() => {
    vi.useRealTimers()
    vi.restoreAllMocks()
  })

  it('failed sign-ins recorded by one server refuse the attempt on another', async () => {
    const user = await makeUser('test_driver', { password: 'the right password' })
    const ip = '198.51.100.7'
    const b = await secondServer()
    expect(b.credentials).not.toBe(credentialsA)
    expect(b.limiter).not.toBe(limiterA)
    const keys = [`account:${user.email}`, `pair:${user.email}|${ip}`, `ip:${ip}`]
    for (let i = 0; i < LIMITS.refuseAt - 1; i++) await limiterA.recordFailure(keys)
    expect(await b.credentials.checkCredentials(user.email, 'wrong', ip)).toBeNull() // server B fails the 8th time
    expect(await eventsOf(signInKey(`pair:${user.email}|${ip}`))).toHaveLength(LIMITS.refuseAt)
    // Server A refuses, even the right password, and so does B.
    await expect(credentialsA.checkCredentials(user.email, 'the right password', ip)).rejects.toThrow(/Too many failed sign-ins/)
    await expect(b.credentials.checkCredentials(user.email, 'the right password', ip)).rejects.toThrow(/Too many failed sign-ins/)
    expect(await b.limiter.checkAttempt([`ip:${ip}`])).toMatchObject({ allowed: false })
    // The owner elsewhere is slowed by the account's count, not refused, on either server.
    expect(await b.limiter.checkAttempt([`pair:${user.email}|203.0.113.1`, 'ip:203.0.113.1'], [`account:${user.email}`])).toEqual({
      allowed: true,
      delayMs: Math.min(LIMITS.maxDelayMs, (LIMITS.refuseAt - LIMITS.slowAfter + 1) * LIMITS.stepMs),
    })
  }, 60_000)

  it('a success on one server clears the account and pair counts for all; the address count stays', async () => {
    const user = await makeUser('test_driver', { password: 'the right password' })
    const ip = '198.51.100.8'
    const b = await secondServer()
    await limiterA.recordFailure([`account:${user.email}`, `pair:${user.email}|${ip}`, `ip:${ip}`])
    expect(await b.credentials.checkCredentials(user.email, 'the right password', ip)).toMatchObject({ id: user.id })
    expect(await eventsOf(signInKey(`account:${user.email}`))).toHaveLength(0)
    expect(await eventsOf(signInKey(`pair:${user.email}|${ip}`))).toHaveLength(0)
    expect(await eventsOf(signInKey(`ip:${ip}`))).toHaveLength(1)
    await b.limiter.resetLimiter()
    expect(await eventsOf(signInKey(`ip:${ip}`))).toHaveLength(0)
  })

  it('the window and the wait are counted from the stored times, by the database clock', async () => {
    const keys = ['pair:clock@test.example|198.51.100.9']
    for (let i = 0; i < LIMITS.refuseAt; i++) await limiterA.recordFailure(keys)
    await age(signInKey(keys[0]), 60_000)
    expect(await limiterA.checkAttempt(keys)).toEqual({ allowed: false, retryAfterS: (LIMITS.windowMs - 60_000) / 1000 })
    // Once the window has passed on the database's clock, the attempt goes ahead at once.
    await age(signInKey(keys[0]), LIMITS.windowMs - 60_000)
    expect(await limiterA.checkAttempt(keys)).toEqual({ allowed: true, delayMs: 0 })
  })

  // PostgreSQL only: PGlite runs inside this process and its now() reads this process's clock (one
  // process, so there is no other server to disagree with).
  it.runIf(process.env.TEST_DATABASE_URL)('an app server whose clock is off by hours sees the same counts and wait', async () => {
    const keys = ['pair:skew@test.example|198.51.100.13']
    for (let i = 0; i < LIMITS.refuseAt; i++) await limiterA.recordFailure(keys)
    await age(signInKey(keys[0]), 60_000)
    const expected = { allowed: false, retryAfterS: (LIMITS.windowMs - 60_000) / 1000 }
    expect(await limiterA.checkAttempt(keys)).toEqual(expected)
    vi.useFakeTimers({ toFake: ['Date'] })
    vi.setSystemTime(Date.now() + 3600_000)
    expect(await limiterA.checkAttempt(keys)).toEqual(expected)
    vi.setSystemTime(Date.now() - 25 * 3600_000)
    expect(await limiterA.checkAttempt(keys)).toEqual(expected)
    await limiterA.recordFailure(keys) // recorded at the database's time, not the server's
    expect(await eventsOf(signInKey(keys[0]))).toHaveLength(LIMITS.refuseAt + 1)
    vi.useRealTimers()
    expect(Math.abs((await eventsOf(signInKey(keys[0]))).at(-1)!.getTime() - Date.now())).toBeLessThan(60_000)
  })

  it('rows older than the retention are pruned, now and then on a record', async () => {
    const db = await getDb()
    const old = signInKey('ip:198.51.100.10')
    const recent = signInKey('ip:198.51.100.11')
    await db.insert(rateEvents).values([{ key: old }, { key: recent }])
    await age(old, RETENTION_MS + 60_000)
    await age(recent, RETENTION_MS - 60_000)
    expect(await pruneRateEvents()).toBe(1)
    expect(await eventsOf(old)).toHaveLength(0)
    expect(await eventsOf(recent)).toHaveLength(1)
    // A record prunes when the dice say so, and only then.
    await db.insert(rateEvents).values({ key: old })
    await age(old, RETENTION_MS + 60_000)
    vi.spyOn(Math, 'random').mockReturnValue(0.999)
    await limiterA.recordFailure(['ip:198.51.100.12'])
    expect(await eventsOf(old)).toHaveLength(1)
    vi.spyOn(Math, 'random').mockReturnValue(0)
    await limiterA.recordFailure(['ip:198.51.100.12'])
    expect(await eventsOf(old)).toHaveLength(0)
    expect(await eventsOf(signInKey('ip:198.51.100.12'))).toHaveLength(2)
  })

  it('forgot-password: three requests for one account are answered across two servers, the fourth is 429, counted in the database', async () => {
    const user = await makeUser('test_driver')
    const b = await secondServer()
    expect(b.forgot).not.toBe(forgotA)
    const servers = [forgotA, b.forgot, forgotA, b.forgot]
    const statuses: number[] = []
    for (const [i, s] of servers.entries()) {
      statuses.push((await call(s.POST, { method: 'POST', body: { email: user.email }, headers: { [PEER_HEADER]: `198.51.100.${20 + i}` } })).status)
    }
    expect(statuses).toEqual([200, 200, 200, 429])
    expect(await eventsOf(rateKey('forgot-account', `account:${user.email}`))).toHaveLength(3)
    expect((await capturedMail()).filter((m) => m.to.includes(user.email))).toHaveLength(3)
    const refused = await call(forgotA.POST, { method: 'POST', body: { email: user.email.toUpperCase() }, headers: { [PEER_HEADER]: '198.51.100.30' } })
    expect(refused.status).toBe(429)
    expect(refused.body.error.message).toMatch(/Too many reset requests. Try again in 60 minute\(s\)/)
  })

  it('forgot-password: concurrent requests on two servers never pass more than the budget', async () => {
    const b = await secondServer()
    const email = 'burst@test.example'
    const statuses = await Promise.all(
      Array.from({ length: 10 }, (_, i) =>
        call((i % 2 ? b.forgot : forgotA).POST, { method: 'POST', body: { email }, headers: { [PEER_HEADER]: `198.51.100.${40 + i}` } }).then((r) => r.status),
      ),
    )
    expect(statuses.filter((s) => s === 200)).toHaveLength(3)
    expect(statuses.filter((s) => s === 429)).toHaveLength(7)
    expect(await eventsOf(rateKey('forgot-account', `account:${email}`))).toHaveLength(3)
  })
})
