import { and, eq, gt, isNull, sql } from 'drizzle-orm'
import { getDb } from '../client'
import { authTokens, users } from '../schema'
import { recordAudit } from './audit'
import { forgetSessionChecks } from './users'
import { enqueueMail, type OutgoingMail } from './mail'
import type { LinkKind } from '../../domain/one-time-links'

/** Store a one-time link's hash and queue its e-mail in one transaction; older links of the user stop working. */
export async function createAuthToken(t: { userId: number; kind: LinkKind; tokenHash: string; expiresAt: Date; mail: OutgoingMail; actorId: number | null }) {
  const db = await getDb()
  await db.transaction(async (tx) => {
    // Only the newest link works: older unused ones (invite or reset) are marked used.
    await tx.update(authTokens).set({ usedAt: new Date() }).where(and(eq(authTokens.userId, t.userId), isNull(authTokens.usedAt)))
    await tx.insert(authTokens).values({ userId: t.userId, kind: t.kind, tokenHash: t.tokenHash, expiresAt: t.expiresAt })
    await enqueueMail([t.mail], tx)
    await recordAudit({ actorId: t.actorId, action: `auth.${t.kind}-link`, entityType: 'user', entityId: t.userId }, tx)
  })
}

/**
 * Use a one-time link: if the hash names an unused, unexpired token, mark it used and set the
 * password, atomically (a second use, even at the same instant, finds it used). Returns the user id.
 */
export async function consumeAuthToken(tokenHash: string, passwordHash: string): Promise<number | null> {
  const db = await getDb()
  const userId = await db.transaction(async (tx) => {
    const [tok] = await tx
      .update(authTokens)
      .set({ usedAt: new Date() })
      .where(and(eq(authTokens.tokenHash, tokenHash), isNull(authTokens.usedAt), gt(authTokens.expiresAt, new Date())))
      .returning({ userId: authTokens.userId, kind: authTokens.kind })
    if (!tok) return null
    // A link for an account disabled since it was sent sets nothing (the token stays used).
    const [owner] = await tx.select({ disabled: users.disabled }).from(users).where(eq(users.id, tok.userId))
    if (!owner || owner.disabled) return null
    // The new password ends every session the account had (someone may have had the old one).
    await tx.update(users).set({ passwordHash, updatedAt: new Date(), invitedAt: null, sessionVersion: sql`${users.sessionVersion} + 1` }).where(eq(users.id, tok.userId))
    await recordAudit({ actorId: tok.userId, action: `auth.${tok.kind}-used`, entityType: 'user', entityId: tok.userId }, tx)
    return tok.userId
  })
  if (userId) forgetSessionChecks(userId)
  return userId
}
