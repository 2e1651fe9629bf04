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

/**
 * Pending mail whose next attempt is due, oldest first: candidates only — a sender claims each one
 * (claimMail) before sending it. Times here are the database's clock, as the claim's are.
 */
export async function dueMail(limit = 20) {
  const db = await getDb()
  return db
    .select()
    .from(mailOutbox)
    .where(and(eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, sql`now()`)))
    .orderBy(asc(mailOutbox.id))
    .limit(limit)
}

/**
 * How long a claim holds a message: longer than one send can take (nodemailer's own timeouts: 2 min
 * to connect, 10 min of silence on the socket), so a claim never runs out while its send is under
 * way. A process that dies holding a claim leaves its message to be tried again when the lease ends.
 */
export const MAIL_CLAIM_LEASE_MINUTES = 15

/**
 * Claim a due message for one send: a single conditional UPDATE that pushes its next attempt past
 * the lease. Of several senders (processes, or runs in one process) that try at once exactly one gets
 * the row back; the others get null and must not send. PostgreSQL re-checks the WHERE on the row a
 * concurrent claim has just changed, so the loser sees next_attempt_at in the future.
 */
export async function claimMail(id: number, leaseMinutes = MAIL_CLAIM_LEASE_MINUTES) {
  const db = await getDb()
  const [row] = await db
    .update(mailOutbox)
    .set({ nextAttemptAt: sql`now() + make_interval(mins => ${leaseMinutes})` })
    .where(and(eq(mailOutbox.id, id), eq(mailOutbox.status, 'pending'), lte(mailOutbox.nextAttemptAt, sql`now()`)))
    .returning()
  return row ?? null
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

/**
 * Send a failed message again (the admin's retry): only a 'failed' message goes back to pending, due
 * now, in one conditional UPDATE — a message already sent, or still pending, is left alone and
 * null is returned (see mailById for why).
 */
export async function retryMail(id: number) {
  const db = await getDb()
  const [row] = await db
    .update(mailOutbox)
    .set({ status: 'pending', nextAttemptAt: sql`now()` })
    .where(and(eq(mailOutbox.id, id), eq(mailOutbox.status, 'failed')))
    .returning()
  return row ?? null
}

export async function mailById(id: number) {
  const db = await getDb()
  const [row] = await db.select().from(mailOutbox).where(eq(mailOutbox.id, id))
  return row ?? null
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
