import { asc, eq, sql } from 'drizzle-orm'
import { getDb } from '../client'
import { recordAudit, type AuditEntry } from './audit'
import type { Role } from '../../domain/roles'
import { revokedSessions, users } from '../schema'

/** The columns safe to return anywhere: never the password hash. */
const publicColumns = {
  id: users.id,
  email: users.email,
  name: users.name,
  role: users.role,
  disabled: users.disabled,
  createdAt: users.createdAt,
}

export type PublicUser = {
  id: number
  email: string
  name: string
  role: Role
  disabled: boolean
  createdAt: Date
}

/** Every user, with whether they were invited and have not set a password yet (for the admin's list). */
export async function listUsers(): Promise<(PublicUser & { invited: boolean })[]> {
  const db = await getDb()
  return db
    .select({ ...publicColumns, invited: sql<boolean>`${users.invitedAt} is not null` })
    .from(users)
    .orderBy(asc(users.name))
}

/** Whether the user was invited and has not set a password yet. */
export async function isInvited(id: number): Promise<boolean> {
  const db = await getDb()
  const rows = await db.select({ invitedAt: users.invitedAt }).from(users).where(eq(users.id, id))
  return rows[0]?.invitedAt != null
}

export async function getUserById(id: number): Promise<PublicUser | null> {
  const db = await getDb()
  const rows = await db.select(publicColumns).from(users).where(eq(users.id, id))
  return rows[0] ?? null
}

// The session check re-reads a user at most once a second: a disabled account, a changed role or an
// ended session still takes effect on the next request, because changes made here and in sessions.ts
// clear the entries at once (with several servers on one PostgreSQL, the others see it within the second).
const SESSION_TTL_MS = 1000
export type SessionRow = PublicUser & { sessionVersion: number; revoked: boolean }
const sessionCache = new Map<string, { at: number; row: SessionRow | null }>()

/** The user behind a session id, with its session version and whether that session was signed out. */
export async function getSessionUser(id: number, sid: string): Promise<SessionRow | null> {
  const key = `${id}:${sid}`
  const hit = sessionCache.get(key)
  if (hit && Date.now() - hit.at < SESSION_TTL_MS) return hit.row
  const db = await getDb()
  const rows = await db
    .select({ ...publicColumns, sessionVersion: users.sessionVersion, revoked: sql<boolean>`exists (select 1 from ${revokedSessions} where ${revokedSessions.sid} = ${sid})` })
    .from(users)
    .where(eq(users.id, id))
  const row = rows[0] ?? null
  if (sessionCache.size > 10_000) sessionCache.clear()
  sessionCache.set(key, { at: Date.now(), row })
  return row
}

/** Drop the cached session checks of one user, so a change applies on their next request. */
export function forgetSessionChecks(userId: number): void {
  for (const key of sessionCache.keys()) if (key.startsWith(`${userId}:`)) sessionCache.delete(key)
}

/** For sign-in only: the one query that reads the hash. */
export async function getUserCredentials(email: string) {
  const db = await getDb()
  const rows = await db
    .select({ ...publicColumns, passwordHash: users.passwordHash, sessionVersion: users.sessionVersion })
    .from(users)
    .where(eq(sql`lower(${users.email})`, email.trim().toLowerCase()))
  return rows[0] ?? null
}

export async function createUser(input: {
  email: string
  name: string
  role: Role
  passwordHash: string
  /** Made by invitation: shown as invited until a password is set. */
  invited?: boolean
}): Promise<PublicUser> {
  const db = await getDb()
  const { invited, ...fields } = input
  const [row] = await db
    .insert(users)
    .values({ ...fields, email: fields.email.trim(), invitedAt: invited ? new Date() : null })
    .returning(publicColumns)
  return row
}

/** Change a user; with `audit`, the audit row is written in the same transaction (both or neither). */
export async function updateUser(
  id: number,
  patch: Partial<{ name: string; role: Role; disabled: boolean; passwordHash: string }>,
  audit?: AuditEntry,
): Promise<PublicUser | null> {
  const db = await getDb()
  // A new password or disabling ends every session the user has (a copied cookie stops working).
  const endSessions = patch.passwordHash !== undefined || patch.disabled === true
  const rows = await db.transaction(async (tx) => {
    const updated = await tx
      .update(users)
      // A password set by an admin ends the invitation as setting it through the link does.
      .set({ ...patch, updatedAt: new Date(), ...(endSessions ? { sessionVersion: sql`${users.sessionVersion} + 1` } : {}), ...(patch.passwordHash !== undefined ? { invitedAt: null } : {}) })
      .where(eq(users.id, id))
      .returning(publicColumns)
    if (updated[0] && audit) await recordAudit(audit, tx)
    return updated
  })
  forgetSessionChecks(id)
  return rows[0] ?? null
}

export async function countActiveAdmins(): Promise<number> {
  const db = await getDb()
  const [row] = await db
    .select({ n: sql<number>`count(*)::int` })
    .from(users)
    .where(sql`${users.role} = 'admin' and not ${users.disabled}`)
  return row.n
}
