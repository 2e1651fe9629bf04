// A message is sent once: the admin's retry refuses a message already sent (or still queued), and
// two runs over the outbox at the same time — two server processes on one PostgreSQL — send a due
// message once between them.
import fs from 'node:fs'
import { randomUUID } from 'node:crypto'
import { eq } from 'drizzle-orm'
import { describe, expect, it } from 'vitest'
import * as adminMailRoute from '@/app/api/admin/mail/route'
import { deliverPending, sendDue, type MailTransport } from '@/app/_lib/mail/sender'
import { getDb } from '@/db/client'
import { mailOutbox } from '@/db/schema'
import type { MailStatus } from '@/domain/mail-statuses'
import { call, makeUser, sessionCookie } from '@/tests/support/api'

/** Queue one message with a subject no other test uses. */
async function queued(over: { status?: MailStatus; attempts?: number; nextAttemptAt?: Date } = {}) {
  const subject = `Outbox check ${randomUUID()}`
  const db = await getDb()
  const [row] = await db.insert(mailOutbox).values({ to: ['desk@test.example'], subject, text: 'Body', ...over }).returning()
  return row
}

async function row(id: number) {
  const db = await getDb()
  const [r] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id))
  return r
}

/** How many times the capture server has received a message with this subject. */
function captured(subject: string): number {
  const file = process.env.MAIL_OUTBOX_FILE
  if (!file || !fs.existsSync(file)) return 0
  return fs.readFileSync(file, 'utf8').split('\n').filter((l) => l.includes(subject)).length
}

/** A transport that takes its time, as a real relay does, and counts what it was given. */
function slowTransport(sent: string[]): MailTransport {
  return {
    async sendMail(m) {
      await new Promise((r) => setTimeout(r, 20))
      sent.push(m.subject)
    },
  }
}

async function adminCookie() {
  return sessionCookie(await makeUser('admin'))
}

describe('one delivery per message', () => {
  // First in the file: no run of the in-process sender (and its timer) has started yet.
  it('two runs over the outbox at once send a due message once', async () => {
    const m = await queued()
    const sent: string[] = []
    const [a, b] = await Promise.all([sendDue(slowTransport(sent)), sendDue(slowTransport(sent))])
    const mine = sent.filter((s) => s === m.subject).length + captured(m.subject)
    expect(mine, 'deliveries of one due message by two concurrent runs').toBe(1)
    expect(a.failed + b.failed).toBe(0)
    expect((await row(m.id)).status).toBe('sent')
  })

  it('a sent message retried from the admin page is refused (409) and not delivered again', async () => {
    const m = await queued()
    await deliverPending()
    expect(captured(m.subject)).toBe(1)
    const sentAt = (await row(m.id)).sentAt!
    const res = await call(adminMailRoute.POST, { method: 'POST', cookie: await adminCookie(), body: { id: m.id } })
    // Soft: on a failure the delivery count below is still checked and reported.
    expect.soft(res.status).toBe(409)
    expect.soft(res.body.error?.message).toBe(`message ${m.id} was sent at ${sentAt.toISOString()} and is not sent again`)
    await deliverPending()
    expect(captured(m.subject), 'deliveries after the refused retry').toBe(1)
    expect((await row(m.id)).status).toBe('sent')
  })

  it('a failed message retried from the admin page is delivered once', async () => {
    const m = await queued({ status: 'failed', attempts: 6 })
    const cookie = await adminCookie()
    const res = await call(adminMailRoute.POST, { method: 'POST', cookie, body: { id: m.id } })
    expect(res.status).toBe(200)
    await deliverPending()
    expect(captured(m.subject)).toBe(1)
    expect((await row(m.id)).status).toBe('sent')
    // Asking again (a second click, a stale page) sends nothing more.
    expect((await call(adminMailRoute.POST, { method: 'POST', cookie, body: { id: m.id } })).status).toBe(409)
    expect(captured(m.subject)).toBe(1)
  })

  it('a message still waiting for its next attempt is not retried by hand (409), an unknown id is 404', async () => {
    const later = new Date(Date.now() + 60 * 60_000)
    const m = await queued({ attempts: 2, nextAttemptAt: later })
    const cookie = await adminCookie()
    const res = await call(adminMailRoute.POST, { method: 'POST', cookie, body: { id: m.id } })
    expect(res.status).toBe(409)
    expect(res.body.error.message).toMatch(new RegExp(`^message ${m.id} is still pending`))
    const after = await row(m.id)
    expect(after.status).toBe('pending')
    expect(after.nextAttemptAt.getTime()).toBe(later.getTime())
    expect(captured(m.subject)).toBe(0)
    const missing = await call(adminMailRoute.POST, { method: 'POST', cookie, body: { id: 2_000_000_000 } })
    expect(missing.status).toBe(404)
  })
})
