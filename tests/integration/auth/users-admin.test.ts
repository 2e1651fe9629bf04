import { describe, expect, it } from 'vitest'
import * as usersRoute from '@/app/api/users/route'
import * as userRoute from '@/app/api/users/[id]/route'
import { checkCredentials } from '@/app/_lib/auth/credentials'
import { getUserCredentials } from '@/db/queries/users'
import { listAudit } from '@/db/queries/audit'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

describe('admin manages users', () => {
  it('creates a user with an argon2id hash who can then sign in, and audits it', async () => {
    const admin = await makeUser('admin')
    const res = await call(usersRoute.POST, {
      method: 'POST',
      cookie: await sessionCookie(admin),
      body: { email: 'new.driver@test.example', name: 'New Driver', role: 'test_driver', password: 'a long enough password' },
    })
    expect(res.status).toBe(201)
    expect(res.body.user).toMatchObject({ email: 'new.driver@test.example', role: 'test_driver', disabled: false })
    expect(res.body.user.passwordHash).toBeUndefined()
    const stored = await getUserCredentials('NEW.DRIVER@test.example')
    expect(stored?.passwordHash.startsWith('$argon2id$')).toBe(true) // PHC string format of argon2id (RFC 9106)
    expect(await checkCredentials('new.driver@test.example', 'a long enough password')).toMatchObject({ role: 'test_driver' })
    expect(await checkCredentials('new.driver@test.example', 'wrong password')).toBeNull()
    const audit = await listAudit({ entityType: 'user', entityId: res.body.user.id })
    expect(audit.map((a) => a.action)).toContain('user.create')
  })

  it('refuses a duplicate email (any case) with 409 and a bad body with 400 naming the field', async () => {
    const admin = await makeUser('admin', { email: 'dupe@test.example' })
    const cookie = await sessionCookie(admin)
    const dupe = await call(usersRoute.POST, { method: 'POST', cookie, body: { email: 'DUPE@test.example', name: 'X', role: 'admin', password: '0123456789' } })
    expect(dupe.status).toBe(409)
    const bad = await call(usersRoute.POST, { method: 'POST', cookie, body: { email: 'x@test.example', name: 'X', role: 'pilot', password: 'short' } })
    expect(bad.status).toBe(400)
    expect(bad.body.error.message).toMatch(/^role: /)
    expect(bad.body.error.details.issues.map((i: { path: string }) => i.path)).toEqual(expect.arrayContaining(['role', 'password']))
    const notJson = await call(usersRoute.POST, { method: 'POST', cookie, rawBody: '{"email":' })
    expect(notJson.status).toBe(400)
    expect(notJson.body.error.message).toMatch(/valid JSON/)
  })

  it('never lets a disabled user sign in', async () => {
    const admin = await makeUser('admin')
    const driver = await makeUser('test_driver', { password: 'driver password 1' })
    await call(userRoute.PATCH, { method: 'PATCH', cookie: await sessionCookie(admin), params: { id: String(driver.id) }, body: { disabled: true } })
    expect(await checkCredentials(driver.email, 'driver password 1')).toBeNull()
  })

  it('keeps the last active admin', async () => {
    const admins = (await call(usersRoute.GET, { cookie: await sessionCookie(await makeUser('admin')) })).body.users.filter(
      (u: { role: string; disabled: boolean }) => u.role === 'admin' && !u.disabled,
    )
    // Disable all admins but one, then try the last.
    const [keep, ...rest] = admins
    const cookie = await sessionCookie(keep)
    for (const a of rest) await call(userRoute.PATCH, { method: 'PATCH', cookie, params: { id: String(a.id) }, body: { disabled: true } })
    const last = await call(userRoute.PATCH, { method: 'PATCH', cookie, params: { id: String(keep.id) }, body: { role: 'test_driver' } })
    expect(last.status).toBe(409)
    expect(last.body.error.message).toMatch(/last active admin/)
  })

  it('answers 404 for a user that does not exist and for a malformed id (it names nothing either)', async () => {
    const cookie = await sessionCookie(await makeUser('admin'))
    expect((await call(userRoute.PATCH, { method: 'PATCH', cookie, params: { id: '999999' }, body: { name: 'Y' } })).status).toBe(404)
    expect((await call(userRoute.PATCH, { method: 'PATCH', cookie, params: { id: 'abc' }, body: { name: 'Y' } })).status).toBe(404)
  })
})
