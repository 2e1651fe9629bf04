// Fuzzed bodies against the user-management and password routes (admin session, or none for the
// public password routes): never a 500, always the one error shape, nothing saved on a refusal.
import { describe, it } from 'vitest'
import { desc } from 'drizzle-orm'
import * as usersRoute from '@/app/api/users/route'
import * as userRoute from '@/app/api/users/[id]/route'
import * as inviteRoute from '@/app/api/users/invite/route'
import * as forgotRoute from '@/app/api/password/forgot/route'
import * as setRoute from '@/app/api/password/set/route'
import * as adminMailRoute from '@/app/api/admin/mail/route'
import { createUserSchema, updateUserSchema } from '@/app/_schemas/user'
import { getDb } from '@/db/client'
import { mailOutbox } from '@/db/schema'
import { call, makeUser, sessionCookie } from '@/tests/support/api'
import { fuzzRoute } from './harness'

/** The token of the newest one-time link in the outbox (only its hash is stored, the mail has the link). */
async function newestLinkToken(): Promise<string> {
  const db = await getDb()
  const [m] = await db.select({ text: mailOutbox.text }).from(mailOutbox).orderBy(desc(mailOutbox.id)).limit(1)
  const token = /token=([\w-]+)/.exec(m?.text ?? '')?.[1]
  if (!token) throw new Error('no one-time link in the outbox')
  return token
}

describe('fuzz: users and password routes', () => {
  it('POST /api/users, PATCH /api/users/:id, POST /api/users/invite (admin)', async () => {
    const admin = await sessionCookie(await makeUser('admin'))
    const target = await makeUser('calibration_engineer')
    await fuzzRoute({ name: 'POST /api/users', handler: usersRoute.POST, method: 'POST', cookie: admin, schema: createUserSchema, valid: { email: 'new.person@test.example', name: 'New Person', role: 'test_driver', password: 'long enough password' } })
    await fuzzRoute({ name: 'PATCH /api/users/:id', handler: userRoute.PATCH, method: 'PATCH', cookie: admin, params: { id: String(target.id) }, schema: updateUserSchema, valid: { name: 'Renamed', role: 'lead_engineer', disabled: false, password: 'another long password' } })
    await fuzzRoute({ name: 'POST /api/users/invite', handler: inviteRoute.POST, method: 'POST', cookie: admin, schema: createUserSchema.omit({ password: true }), valid: { email: 'invitee@test.example', name: 'Invitee', role: 'calibration_engineer' } })
  }, 120_000)

  it('POST /api/password/forgot, POST /api/password/set (public)', async () => {
    const user = await makeUser('test_driver')
    await fuzzRoute({ name: 'POST /api/password/forgot', handler: forgotRoute.POST, method: 'POST', valid: { email: user.email } })
    const admin = await sessionCookie(await makeUser('admin'))
    await call(inviteRoute.POST, { method: 'POST', cookie: admin, body: { email: `set-${Date.now()}@test.example`, name: 'Setter', role: 'test_driver' } })
    await fuzzRoute({ name: 'POST /api/password/set', handler: setRoute.POST, method: 'POST', valid: { token: await newestLinkToken(), password: 'a brand new password' } })
  }, 120_000)

  it('POST /api/admin/mail (admin)', async () => {
    const admin = await sessionCookie(await makeUser('admin'))
    await call(inviteRoute.POST, { method: 'POST', cookie: admin, body: { email: `mail-${Date.now()}@test.example`, name: 'Mailee', role: 'test_driver' } })
    const db = await getDb()
    const [m] = await db.select({ id: mailOutbox.id }).from(mailOutbox).orderBy(desc(mailOutbox.id)).limit(1)
    await fuzzRoute({ name: 'POST /api/admin/mail', handler: adminMailRoute.POST, method: 'POST', cookie: admin, valid: { id: m.id } })
  }, 120_000)
})
