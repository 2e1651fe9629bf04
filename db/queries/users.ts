import { asc, eq, sql } from 'drizzle-orm'
import { getDb } from '../client'
import { recordAudit, type AuditEntry } from './audit'
import type { Role } from '../../domain/roles'
import { users } from '../schema'

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

export async function listUsers(): Promise<PublicUser[]> {
  const db = await getDb()
  return db.select(publicColumns).from(users).orderBy(asc(users.name))
}

export async function getUserById(id: number): Promise<PublicUser | null> {
  const db = await getDb()
  const rows = await db.select(publicColumns).from(users).where(eq(users.id, id))
  return rows[0] ?? null
}

// The session check re-reads a user at most once a second: a disabled account or a changed role
// still takes effect on the next request, because changes made through updateUser clear the entry
// at once (with several servers on one PostgreSQL, the others see it within the second).
const SESSION_TTL_MS = 1000
const sessionCache = new Map<number, { at: number; user: PublicUser | null }>()

/** The user for a session check, read fresh at most once a second. */
export async function getSessionUser(id: number): Promise<PublicUser | null> {
  const hit = sessionCache.get(id)
  if (hit && Date.now() - hit.at < SESSION_TTL_MS) return hit.user
  const user = await getUserById(id)
  sessionCache.set(id, { at: Date.now(), user })
  return user
}

/** For sign-in only: the one query that reads the hash. */
export async function getUserCredentials(email: string) {
  const db = await getDb()
  const rows = await db
    .select({ ...publicColumns, passwordHash: users.passwordHash })
    .from(users)
    .where(eq(sql`lower(${users.email})`, email.trim().toLowerCase()))
  return rows[0] ?? null
}

export async function createUser(input: {
  email: string
  name: string
  role: Role
  passwordHash: string
}): Promise<PublicUser> {
  const db = await getDb()
  const [row] = await db
    .insert(users)
    .values({ ...input, email: input.email.trim() })
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
  const rows = await db.transaction(async (tx) => {
    const updated = await tx
      .update(users)
      .set({ ...patch, updatedAt: new Date() })
      .where(eq(users.id, id))
      .returning(publicColumns)
    if (updated[0] && audit) await recordAudit(audit, tx)
    return updated
  })
  sessionCache.delete(id)
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
