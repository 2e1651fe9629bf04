import { eq, lt } from 'drizzle-orm'
import { getDb } from '../client'
import { revokedSessions, users } from '../schema'
import { forgetSessionChecks } from './users'

/** End one session (sign-out): its tokens are refused until they would have expired anyway. */
export async function revokeSession(sid: string, userId: number, until: Date): Promise<void> {
  const db = await getDb()
  await db.delete(revokedSessions).where(lt(revokedSessions.expiresAt, new Date()))
  await db.insert(revokedSessions).values({ sid, userId, expiresAt: until }).onConflictDoNothing()
  forgetSessionChecks(userId)
}

/** The session version a new token for this user must carry. */
export async function currentSessionVersion(userId: number): Promise<number | null> {
  const db = await getDb()
  const [row] = await db.select({ v: users.sessionVersion }).from(users).where(eq(users.id, userId))
  return row?.v ?? null
}
