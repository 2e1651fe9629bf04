// An invited user who has not set a password is listed as invited; the admin can send the
// invitation again (a fresh link, the old one dead), audited, at most three times an hour.
import { describe, expect, it } from 'vitest'
import * as usersRoute from '@/app/api/users/route'
import * as userRoute from '@/app/api/users/[id]/route'
import * as inviteRoute from '@/app/api/users/invite/route'
import * as resendRoute from '@/app/api/users/[id]/invite/route'
import * as setRoute from '@/app/api/password/set/route'
import { inviteResendLimiter } from '@/app/_lib/auth/invite-limiter'
import { checkCredentials } from '@/app/_lib/auth/credentials'
import { listAudit } from '@/db/queries/audit'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { capturedMail } from '@/tests/support/review-fixtures'

/** Every one-time token e-mailed to an address, oldest first (quoted-printable soft breaks undone). */
async function tokensFor(email: string): Promise<string[]> {
  const mail = (await capturedMail()).filter((m) => m.to.includes(email))
  return mail.map((m) => /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(m.raw.replace(/=\r?\n/g, '').replace(/=3D/g, '='))![1])
}

async function invite(cookie: string, email: string): Promise<number> {
  const res = await call(inviteRoute.POST, { method: 'POST', cookie, body: { email, name: 'Invitee', role: 'test_driver' } })
  expect(res.status).toBe(201)
  return res.body.user.id
}

const invitedIn = async (cookie: string, id: number) =>
  (await call(usersRoute.GET, { cookie })).body.users.find((u: { id: number }) => u.id === id)?.invited

describe('sending an invitation again', () => {
  it('lists the invitee as invited until the password is set, and a resent link replaces the first', async () => {
    await inviteResendLimiter.reset()
    const admin = await makeUser('admin')
    const cookie = await sessionCookie(admin)
    const email = `resend-${Date.now()}@test.example`
    const id = await invite(cookie, email)
    expect(await invitedIn(cookie, id)).toBe(true)

    const res = await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(id) } })
    expect(res.status).toBe(200)
    expect(res.body.message).toContain(email)
    const [first, second] = await tokensFor(email)
    expect(second).toBeDefined()
    expect(second).not.toBe(first)
    // Only the newest link works.
    expect((await call(setRoute.POST, { method: 'POST', body: { token: first, password: 'first link password' } })).status).toBe(400)
    expect((await call(setRoute.POST, { method: 'POST', body: { token: second, password: 'second link password' } })).status).toBe(200)
    expect(await checkCredentials(email, 'second link password')).not.toBeNull()
    expect(await invitedIn(cookie, id)).toBe(false)

    const audit = await listAudit({ entityType: 'user', entityId: id })
    expect(audit.find((a) => a.action === 'user.invite-resend')).toMatchObject({ actorId: admin.id, details: { email } })

    // Once the password is set there is nothing to send again.
    const after = await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(id) } })
    expect(after.status).toBe(409)
    expect(after.body.error.message).toMatch(/already set a password/)
  })

  it('stops after three sends an hour to one invitee with 429, and leaves other invitees alone', async () => {
    await inviteResendLimiter.reset()
    const cookie = await sessionCookie(await makeUser('admin'))
    const a = await invite(cookie, `limit-a-${Date.now()}@test.example`)
    const b = await invite(cookie, `limit-b-${Date.now()}@test.example`)
    for (let i = 0; i < 3; i++) expect((await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(a) } })).status).toBe(200)
    const fourth = await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(a) } })
    expect(fourth.status).toBe(429)
    expect(fourth.body.error.message).toMatch(/3 times in the last hour; try again in \d+ minute/)
    expect((await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(b) } })).status).toBe(200)
    // The refused send wrote no audit row: three resends of a, not four.
    expect((await listAudit({ entityType: 'user', entityId: a, action: 'user.invite-resend' })).length).toBe(3)
  })

  it('refuses a disabled invitee, a user made with a password, an unknown id, and non-admins', async () => {
    await inviteResendLimiter.reset()
    const cookie = await sessionCookie(await makeUser('admin'))
    const id = await invite(cookie, `disabled-${Date.now()}@test.example`)
    await call(userRoute.PATCH, { method: 'PATCH', cookie, params: { id: String(id) }, body: { disabled: true } })
    expect((await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(id) } })).body.error.message).toMatch(/disabled/)
    const withPassword = await makeUser('test_driver')
    expect((await call(resendRoute.POST, { method: 'POST', cookie, params: { id: String(withPassword.id) } })).status).toBe(409)
    expect((await call(resendRoute.POST, { method: 'POST', cookie, params: { id: '2147483647' } })).status).toBe(404)
    expect((await call(resendRoute.POST, { method: 'POST', cookie, params: { id: '99999999999999999999' } })).status).toBe(404)
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    expect((await call(resendRoute.POST, { method: 'POST', cookie: lead, params: { id: String(id) } })).status).toBe(403)
  })

  it('an admin-set password also ends the invitation', async () => {
    const cookie = await sessionCookie(await makeUser('admin'))
    const id = await invite(cookie, `adminset-${Date.now()}@test.example`)
    await call(userRoute.PATCH, { method: 'PATCH', cookie, params: { id: String(id) }, body: { password: 'set by the admin 1' } })
    expect(await invitedIn(cookie, id)).toBe(false)
  })
})
