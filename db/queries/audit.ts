import { desc, eq, and } from 'drizzle-orm'
import { getDb, type Db } from '../client'
import { auditLog } from '../schema'

export interface AuditEntry {
  actorId: number | null
  action: string
  entityType: string
  entityId?: number | null
  details?: Record<string, unknown>
}

/** Record who did what; pass `tx` to write it in the same transaction as the change itself. */
export async function recordAudit(entry: AuditEntry, tx?: Pick<Db, 'insert'>): Promise<void> {
  const db = tx ?? (await getDb())
  await db.insert(auditLog).values({ ...entry, entityId: entry.entityId ?? null, details: entry.details ?? {} })
}

export async function listAudit(filter: { entityType?: string; entityId?: number; limit?: number } = {}) {
  const db = await getDb()
  const conds = []
  if (filter.entityType) conds.push(eq(auditLog.entityType, filter.entityType))
  if (filter.entityId !== undefined) conds.push(eq(auditLog.entityId, filter.entityId))
  return db
    .select()
    .from(auditLog)
    .where(conds.length ? and(...conds) : undefined)
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(filter.limit ?? 200)
}
