import { and, asc, desc, eq, lte, sql } from 'drizzle-orm'
import { getDb, type Db } from '../client'
import type { Role } from '../../domain/roles'
import { mailOutbox, users } from '../schema'

export interface OutgoingMail {
  to: string[]
  subject: string
  text: string
}

/** Queue mail; pass the transaction of the change it reports so the two commit together. */
export async function enqueueMail(mails: OutgoingMail[], tx?: Pick<Db, 'insert'>): Promise<void> {
  const list = mails.filter((m) => m.to.length > 0)
  if (!list.length) return
  const db = tx ?? (await getDb())
  await db.insert(mailOutbox).values(list)
}

/** Pending mail whose next attempt is due, oldest first. */
export async function dueMail(limit = 20) {
  const db = await getDb()
  return db
    .select()
    .from(mailOutbox)
    .where(and(eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, new Date())))
    .orderBy(asc(mailOutbox.id))
    .limit(limit)
}

export async function markSent(id: number): Promise<void> {
  const db = await getDb()
  await db.update(mailOutbox).set({ status: 'sent', sentAt: new Date(), attempts: sql`${mailOutbox.attempts} + 1`, lastError: null }).where(eq(mailOutbox.id, id))
}

/** Record a failed attempt: retry later with back-off, or give up after `maxAttempts` (shown to admins). */
export async function markFailed(id: number, attempts: number, error: string, maxAttempts = 6): Promise<void> {
  const db = await getDb()
  const next = new Date(Date.now() + Math.min(60, 2 ** attempts) * 60_000)
  await db
    .update(mailOutbox)
    .set({ attempts: attempts + 1, lastError: error.slice(0, 500), status: attempts + 1 >= maxAttempts ? 'failed' : 'pending', nextAttemptAt: next })
    .where(eq(mailOutbox.id, id))
}

export async function retryMail(id: number): Promise<void> {
  const db = await getDb()
  await db.update(mailOutbox).set({ status: 'pending', nextAttemptAt: new Date() }).where(eq(mailOutbox.id, id))
}

export async function listOutbox(limit = 200) {
  const db = await getDb()
  return db.select().from(mailOutbox).orderBy(desc(mailOutbox.id)).limit(limit)
}

/** E-mail addresses of the active users with a role. */
export async function emailsOfRole(role: Role): Promise<string[]> {
  const db = await getDb()
  const rows = await db.select({ email: users.email }).from(users).where(and(eq(users.role, role), eq(users.disabled, false)))
  return rows.map((r) => r.email)
}

export async function emailOfUser(id: number): Promise<string[]> {
  const db = await getDb()
  const rows = await db.select({ email: users.email, disabled: users.disabled }).from(users).where(eq(users.id, id))
  return rows.filter((r) => !r.disabled).map((r) => r.email)
}
