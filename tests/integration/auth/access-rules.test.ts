import { describe, expect, it } from 'vitest'
import * as usersRoute from '@/app/api/users/route'
import * as userRoute from '@/app/api/users/[id]/route'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

describe('the authorization helper on the users API', () => {
  it('answers 401 with the JSON error shape when nobody is signed in', async () => {
    const res = await call(usersRoute.GET)
    expect(res.status).toBe(401)
    expect(res.body.error.code).toBe('unauthorized')
    expect(typeof res.body.error.message).toBe('string')
  })

  it('answers 403 to a test driver and 200 to an admin', async () => {
    const driver = await makeUser('test_driver')
    const admin = await makeUser('admin')
    const denied = await call(usersRoute.GET, { cookie: await sessionCookie(driver) })
    expect(denied.status).toBe(403)
    expect(denied.body.error.code).toBe('forbidden')
    expect(denied.body.error.message).toMatch(/admin/)
    const ok = await call(usersRoute.GET, { cookie: await sessionCookie(admin) })
    expect(ok.status).toBe(200)
    expect(ok.body.users.map((u: { email: string }) => u.email)).toContain(driver.email)
    expect(JSON.stringify(ok.body)).not.toMatch(/argon2|password/i)
  })

  it('ignores a forged cookie', async () => {
    const res = await call(usersRoute.GET, { cookie: 'next-auth.session-token=not-a-real-token' })
    expect(res.status).toBe(401)
  })

  it('locks a disabled user out on the very next request, with the session they already hold', async () => {
    const admin = await makeUser('admin')
    const lead = await makeUser('lead_engineer')
    const leadCookie = await sessionCookie(lead)
    const before = await call(usersRoute.GET, { cookie: leadCookie })
    expect(before.status).toBe(403) // signed in, but not an admin
    const off = await call(userRoute.PATCH, { method: 'PATCH', cookie: await sessionCookie(admin), params: { id: String(lead.id) }, body: { disabled: true } })
    expect(off.status).toBe(200)
    expect(off.body.user.disabled).toBe(true)
    const after = await call(usersRoute.GET, { cookie: leadCookie })
    expect(after.status).toBe(401)
  })

  it('applies a role change at once, without signing in again', async () => {
    const admin = await makeUser('admin')
    const calib = await makeUser('calibration_engineer')
    const cookie = await sessionCookie(calib)
    expect((await call(usersRoute.GET, { cookie })).status).toBe(403)
    await call(userRoute.PATCH, { method: 'PATCH', cookie: await sessionCookie(admin), params: { id: String(calib.id) }, body: { role: 'admin' } })
    expect((await call(usersRoute.GET, { cookie })).status).toBe(200)
  })
})
