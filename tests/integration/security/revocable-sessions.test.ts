import { describe, expect, it, beforeEach } from 'vitest'
import * as authRoute from '@/app/api/auth/[...nextauth]/route'
import * as usersRoute from '@/app/api/users/route'
import * as userRoute from '@/app/api/users/[id]/route'
import * as forgotRoute from '@/app/api/password/forgot/route'
import * as setRoute from '@/app/api/password/set/route'
import { resetLimiter } from '@/app/_lib/auth/sign-in-limiter'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { capturedMail } from '@/tests/support/review-fixtures'

const BASE = 'http://127.0.0.1:3000'
type Jar = Map<string, string>
const header = (jar: Jar) => [...jar].map(([k, v]) => `${k}=${v}`).join('; ')

/** Call next-auth's route as a browser would, keeping its cookies in `jar`. */
async function auth(jar: Jar, method: 'GET' | 'POST', action: string, form?: Record<string, string>) {
  const req = new Request(`${BASE}/api/auth/${action}`, {
    method,
    headers: { cookie: header(jar), ...(form ? { 'content-type': 'application/x-www-form-urlencoded' } : {}) },
    body: form ? new URLSearchParams(form).toString() : undefined,
  })
  const res = await authRoute.POST(req, { params: Promise.resolve({ nextauth: action.split('/') }) })
  for (const c of res.headers.getSetCookie()) {
    const [pair, ...attrs] = c.split(';')
    const i = pair.indexOf('=')
    const expired = attrs.some((a) => /max-age=0|expires=thu, 01 jan 1970/i.test(a.trim()))
    if (expired) jar.delete(pair.slice(0, i))
    else jar.set(pair.slice(0, i), pair.slice(i + 1))
  }
  const text = await res.text()
  return { status: res.status, body: text ? JSON.parse(text) : null }
}

async function signIn(email: string, password: string): Promise<Jar> {
  const jar: Jar = new Map()
  const { body } = await auth(jar, 'GET', 'csrf')
  const res = await auth(jar, 'POST', 'callback/credentials', { csrfToken: body.csrfToken, email, password, json: 'true' })
  expect(res.status).toBe(200)
  expect([...jar.keys()].some((k) => k.endsWith('next-auth.session-token'))).toBe(true)
  return jar
}

async function signOut(jar: Jar) {
  const { body } = await auth(jar, 'GET', 'csrf')
  await auth(jar, 'POST', 'signout', { csrfToken: body.csrfToken, json: 'true' })
}

/** The session cookie alone (secure or plain name, as the environment chose), as an attacker would copy it. */
const sessionOnly = (jar: Jar): Jar => new Map([...jar].filter(([k]) => k.endsWith('next-auth.session-token')))
const copy = (jar: Jar) => header(sessionOnly(jar))
const listUsers = (cookie: string) => call(usersRoute.GET, { cookie }).then((r) => r.status)

describe('revocable sessions', () => {
  beforeEach(resetLimiter)

  it('signing out ends that session on the server: a copied cookie no longer works, another device stays signed in', async () => {
    const admin = await makeUser('admin', { password: 'admin password 1' })
    const laptop = await signIn(admin.email, 'admin password 1')
    const phone = await signIn(admin.email, 'admin password 1')
    const copied = copy(laptop)
    expect(await listUsers(copied)).toBe(200)
    const copiedJar = sessionOnly(laptop)
    expect((await auth(new Map(copiedJar), 'GET', 'session')).body.user.email).toBe(admin.email)
    await signOut(laptop)
    expect(await listUsers(copied)).toBe(401)
    expect((await auth(new Map(copiedJar), 'GET', 'session')).body).toEqual({})
    expect(await listUsers(copy(phone))).toBe(200)
  })

  it('an admin changing the password ends every session of that user', async () => {
    const target = await makeUser('admin', { password: 'first password 1' })
    const a = copy(await signIn(target.email, 'first password 1'))
    const b = copy(await signIn(target.email, 'first password 1'))
    const otherAdmin = await sessionCookie(await makeUser('admin'))
    const res = await call(userRoute.PATCH, { method: 'PATCH', cookie: otherAdmin, params: { id: String(target.id) }, body: { password: 'second password 2' } })
    expect(res.status).toBe(200)
    expect(await listUsers(a)).toBe(401)
    expect(await listUsers(b)).toBe(401)
    expect(await listUsers(copy(await signIn(target.email, 'second password 2')))).toBe(200)
    // A name change is not a reason to sign anyone out.
    const fresh = copy(await signIn(target.email, 'second password 2'))
    await call(userRoute.PATCH, { method: 'PATCH', cookie: otherAdmin, params: { id: String(target.id) }, body: { name: 'Renamed' } })
    expect(await listUsers(fresh)).toBe(200)
  })

  it('a password reset through a link ends every session of that user', async () => {
    const user = await makeUser('admin', { password: 'before reset 1' })
    const old = copy(await signIn(user.email, 'before reset 1'))
    expect((await call(forgotRoute.POST, { method: 'POST', body: { email: user.email } })).status).toBe(200)
    const mail = (await capturedMail()).filter((m) => m.to.includes(user.email)).at(-1)!
    const token = /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(mail.raw.replace(/=\r?\n/g, '').replace(/=3D/g, '='))![1]
    expect((await call(setRoute.POST, { method: 'POST', body: { token, password: 'after reset 22' } })).status).toBe(200)
    expect(await listUsers(old)).toBe(401)
  })

  it("next-auth's session endpoint does not report a disabled user as signed in", async () => {
    const driver = await makeUser('test_driver', { password: 'driver password 1' })
    const jar = await signIn(driver.email, 'driver password 1')
    expect((await auth(new Map(jar), 'GET', 'session')).body.user.email).toBe(driver.email)
    const admin = await sessionCookie(await makeUser('admin'))
    expect((await call(userRoute.PATCH, { method: 'PATCH', cookie: admin, params: { id: String(driver.id) }, body: { disabled: true } })).status).toBe(200)
    const after = await auth(new Map(jar), 'GET', 'session')
    expect(after.body).toEqual({})
  })
})
