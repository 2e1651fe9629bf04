import { describe, expect, it } from 'vitest'
import * as forgotRoute from '@/app/api/password/forgot/route'
import * as setRoute from '@/app/api/password/set/route'
import * as inviteRoute from '@/app/api/users/invite/route'
import { checkCredentials } from '@/app/_lib/auth/credentials'
import { updateUser } from '@/db/queries/users'
import { PEER_HEADER, PEER_STAMP } from '@/app/_lib/http/client-address'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { capturedMail } from '@/tests/support/review-fixtures'

async function links(email: string): Promise<string[]> {
  const mail = (await capturedMail()).filter((m) => m.to.includes(email))
  return mail.map((m) => /\/set-password\?token=([A-Za-z0-9_-]+)/.exec(m.raw.replace(/=\r?\n/g, '').replace(/=3D/g, '='))![1])
}
const forgot = (email: string, address = '192.0.2.10') => call(forgotRoute.POST, { method: 'POST', body: { email }, headers: { [PEER_HEADER]: address } })
;(globalThis as unknown as Record<symbol, unknown>)[PEER_STAMP] = true

describe('password links', () => {
  it('a new reset link makes the older ones useless', async () => {
    const user = await makeUser('calibration_engineer', { password: 'original pass 1' })
    expect((await forgot(user.email, '192.0.2.11')).status).toBe(200)
    expect((await forgot(user.email, '192.0.2.11')).status).toBe(200)
    const [older, newer] = await links(user.email)
    expect(older).not.toBe(newer)
    const res = await call(setRoute.POST, { method: 'POST', body: { token: older, password: 'from older link' } })
    expect(res.status).toBe(400)
    expect((await call(setRoute.POST, { method: 'POST', body: { token: newer, password: 'from newer link' } })).status).toBe(200)
  })

  it('an invite or reset link for an account disabled since is refused', async () => {
    const admin = await sessionCookie(await makeUser('admin'))
    const email = `invited-${Date.now()}@test.example`
    const invited = await call(inviteRoute.POST, { method: 'POST', cookie: admin, body: { email, name: 'Invited', role: 'test_driver' } })
    expect(invited.status).toBe(201)
    await updateUser(invited.body.user.id, { disabled: true })
    const [token] = await links(email)
    expect((await call(setRoute.POST, { method: 'POST', body: { token, password: 'a password 123' } })).status).toBe(400)
    await updateUser(invited.body.user.id, { disabled: false })
    expect(await checkCredentials(email, 'a password 123')).toBeNull()
  })

  it('forgot-password is throttled per account and per address', async () => {
    const user = await makeUser('test_driver')
    const statuses: number[] = []
    for (let i = 0; i < 6; i++) statuses.push((await forgot(user.email, `192.0.2.${100 + i}`)).status)
    expect(statuses.slice(0, 3)).toEqual([200, 200, 200])
    expect(statuses.slice(3)).toEqual([429, 429, 429])
    expect(await links(user.email)).toHaveLength(3)
    // One address asking for many accounts (known or not) is cut off too.
    const fromOne: number[] = []
    for (let i = 0; i < 12; i++) fromOne.push((await forgot(`someone-${i}@test.example`, '192.0.2.200')).status)
    expect(fromOne.filter((s) => s === 429).length).toBeGreaterThan(0)
    const refused = await forgot('someone-else@test.example', '192.0.2.200')
    expect(refused.body.error.message).toMatch(/Too many/)
  })
})
