import { describe, expect, it, beforeEach } from 'vitest'
import { encode } from 'next-auth/jwt'
import * as usersRoute from '@/app/api/users/route'
import { checkCredentials, SignInLockedError } from '@/app/_lib/auth/credentials'
import { env } from '@/app/_lib/config/env'
import { LIMITS, resetLimiter } from '@/app/_lib/auth/sign-in-limiter'
import { call, makeUser } from '@/tests/support/api'

describe('sessions and sign-in', () => {
  beforeEach(resetLimiter)

  it('an expired session token is refused with 401', async () => {
    const admin = await makeUser('admin')
    const token = await encode({ token: { sub: String(admin.id), role: 'admin' }, secret: env().authSecret, maxAge: -60 })
    const res = await call(usersRoute.GET, { cookie: `next-auth.session-token=${encodeURIComponent(token)}` })
    expect(res.status).toBe(401)
  })

  it('repeated failed sign-ins for one account are slowed and then refused, even with the right password', async () => {
    const user = await makeUser('test_driver', { password: 'the right password' })
    const started = Date.now()
    for (let i = 0; i < LIMITS.refuseAt; i++) expect(await checkCredentials(user.email, `wrong ${i}`, '127.0.0.9')).toBeNull()
    expect(Date.now() - started).toBeGreaterThanOrEqual(LIMITS.stepMs) // the later attempts waited
    await expect(checkCredentials(user.email, 'the right password', '127.0.0.10')).rejects.toBeInstanceOf(SignInLockedError)
    await expect(checkCredentials(user.email, 'the right password', '127.0.0.10')).rejects.toThrow(/Too many failed sign-ins/)
  }, 60_000)
})
