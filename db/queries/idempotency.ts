import { and, eq } from 'drizzle-orm'
import { getDb, type Db } from '../client'
import { idempotencyKeys } from '../schema'

export interface KeyClaim {
  userId: number
  scope: string
  key: string
  requestHash: string
}

export type OnceResult = { resultId: number; replayed: boolean } | { mismatch: true; resultId: number | null }

/**
 * Run `create` once per (user, scope, key). The key is claimed in the creation's own transaction,
 * so the claim and what it created commit or roll back together (a failed creation frees the key).
 * A concurrent repeat waits on the unique index until the first commits, then finds its row.
 */
export async function runOnce(claim: KeyClaim, create: (tx: Db) => Promise<number>): Promise<OnceResult> {
  const db = await getDb()
  const created = await db.transaction(async (tx) => {
    const [row] = await tx.insert(idempotencyKeys).values(claim).onConflictDoNothing().returning({ id: idempotencyKeys.id })
    if (!row) return null
    const resultId = await create(tx)
    await tx.update(idempotencyKeys).set({ resultId }).where(eq(idempotencyKeys.id, row.id))
    return resultId
  })
  if (created !== null) return { resultId: created, replayed: false }
  const [first] = await db
    .select({ requestHash: idempotencyKeys.requestHash, resultId: idempotencyKeys.resultId })
    .from(idempotencyKeys)
    .where(and(eq(idempotencyKeys.userId, claim.userId), eq(idempotencyKeys.scope, claim.scope), eq(idempotencyKeys.key, claim.key)))
  // Gone again: the first request's transaction rolled back after ours found it; claim it afresh.
  if (!first) return runOnce(claim, create)
  if (first.resultId === null || first.requestHash !== claim.requestHash) return { mismatch: true, resultId: first.resultId }
  return { resultId: first.resultId, replayed: true }
}
