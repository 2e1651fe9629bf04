import { describe, expect, it, beforeEach } from 'vitest'
import { encode } from 'next-auth/jwt'
import * as usersRoute from '@/app/api/users/route'
import { checkCredentials, SignInLockedError } from '@/app/_lib/auth/credentials'
import { env } from '@/app/_lib/config/env'
import { LIMITS, recordFailure, resetLimiter } from '@/app/_lib/auth/sign-in-limiter'
import { call, makeUser } from '@/tests/support/api'

describe('sessions and sign-in', () => {
  beforeEach(resetLimiter)

  it('an expired session token is refused with 401', async () => {
    const admin = await makeUser('admin')
    const token = await encode({ token: { sub: String(admin.id), role: 'admin' }, secret: env().authSecret, maxAge: -60 })
    const res = await call(usersRoute.GET, { cookie: `next-auth.session-token=${encodeURIComponent(token)}` })
    expect(res.status).toBe(401)
  })

  it('repeated failed sign-ins are slowed for the account and refused from that address, but the owner elsewhere still signs in', async () => {
    const user = await makeUser('test_driver', { password: 'the right password' })
    const started = Date.now()
    for (let i = 0; i < LIMITS.refuseAt; i++) expect(await checkCredentials(user.email, `wrong ${i}`, '127.0.0.9')).toBeNull()
    expect(Date.now() - started).toBeGreaterThanOrEqual(LIMITS.stepMs) // the later attempts waited
    // The attacker's address is locked out of this account, even with the right password...
    await expect(checkCredentials(user.email, 'the right password', '127.0.0.9')).rejects.toBeInstanceOf(SignInLockedError)
    await expect(checkCredentials(user.email, 'the right password', '127.0.0.9')).rejects.toThrow(/Too many failed sign-ins/)
    // ...but cannot lock the owner out from their own address: slowed down, not refused.
    const t = Date.now()
    expect(await checkCredentials(user.email, 'the right password', '127.0.0.10')).toMatchObject({ id: user.id })
    expect(Date.now() - t).toBeGreaterThanOrEqual(LIMITS.stepMs)
  }, 60_000)

  it('many addresses failing on one account never lock it; the account stays slowed, not refused', async () => {
    const user = await makeUser('test_driver', { password: 'the right password' })
    for (let i = 0; i < LIMITS.refuseAt * 2; i++) await recordFailure([`account:${user.email}`, `pair:${user.email}|10.1.0.${i}`, `ip:10.1.0.${i}`])
    expect(await checkCredentials(user.email, 'the right password', '10.2.0.1')).toMatchObject({ id: user.id })
  }, 60_000)
})
