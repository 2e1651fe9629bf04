import { describe, expect, it } from 'vitest'
import { eq } from 'drizzle-orm'
import * as inviteRoute from '@/app/api/users/invite/route'
import * as forgotRoute from '@/app/api/password/forgot/route'
import * as setRoute from '@/app/api/password/set/route'
import { checkCredentials } from '@/app/_lib/auth/credentials'
import { getDb } from '@/db/client'
import { authTokens } from '@/db/schema'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { capturedMail } from '@/tests/support/review-fixtures'

/** The one-time link the capture server received for an address (quoted-printable soft breaks undone). */
async function linkFor(email: string): Promise<string> {
  const mail = (await capturedMail()).filter((m) => m.to.includes(email))
  const body = mail.at(-1)!.raw.replace(/=\r?\n/g, '').replace(/=3D/g, '=')
  return /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(body)![1]
}

describe('invite and reset links', () => {
  it('an admin invites a user by e-mail; the link sets a password once and then never again', async () => {
    const admin = await sessionCookie(await makeUser('admin'))
    const email = `invitee-${Date.now()}@test.example`
    const res = await call(inviteRoute.POST, { method: 'POST', cookie: admin, body: { email, name: 'Invitee', role: 'test_driver' } })
    expect(res.status).toBe(201)
    const token = await linkFor(email)
    expect(await checkCredentials(email, 'my new password')).toBeNull()
    expect((await call(setRoute.POST, { method: 'POST', body: { token, password: 'my new password' } })).status).toBe(200)
    expect(await checkCredentials(email, 'my new password')).toMatchObject({ role: 'test_driver' })
    const again = await call(setRoute.POST, { method: 'POST', body: { token, password: 'another password' } })
    expect(again.status).toBe(400)
    expect(again.body.error.message).toMatch(/expired or has already been used/)
    expect(await checkCredentials(email, 'my new password')).not.toBeNull()
  })

  it('a reset link expires', async () => {
    const user = await makeUser('calibration_engineer', { password: 'old password 123' })
    expect((await call(forgotRoute.POST, { method: 'POST', body: { email: user.email } })).status).toBe(200)
    const token = await linkFor(user.email)
    const db = await getDb()
    await db.update(authTokens).set({ expiresAt: new Date(Date.now() - 1000) }).where(eq(authTokens.userId, user.id))
    expect((await call(setRoute.POST, { method: 'POST', body: { token, password: 'new password 456' } })).status).toBe(400)
    expect(await checkCredentials(user.email, 'old password 123')).not.toBeNull()
  })

  it('answers the same for an unknown address, and only admins invite', async () => {
    const res = await call(forgotRoute.POST, { method: 'POST', body: { email: 'nobody@test.example' } })
    expect(res.status).toBe(200)
    const lead = await sessionCookie(await makeUser('lead_engineer'))
    expect((await call(inviteRoute.POST, { method: 'POST', cookie: lead, body: { email: 'x@test.example', name: 'X', role: 'admin' } })).status).toBe(403)
    expect((await call(setRoute.POST, { method: 'POST', body: { token: 'x'.repeat(43), password: 'whatever 1234' } })).status).toBe(400)
  })
})
