import { and, desc, eq, gte, ilike, lte, sql } from 'drizzle-orm'
import { getDb, type Db } from '../client'
import { auditLog, users } from '../schema'
import { currentRequestContext } from '../request-context'

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
  await db.insert(auditLog).values({ ...entry, entityId: entry.entityId ?? null, details: entry.details ?? {}, ip: currentRequestContext()?.ip ?? null })
}

export interface AuditFilter {
  entityType?: string
  entityId?: number
  actorId?: number
  action?: string
  since?: Date
  until?: Date
  limit?: number
  /** Rows to skip, newest first (for paging). */
  offset?: number
}

function conditions(filter: AuditFilter) {
  const conds = []
  if (filter.entityType) conds.push(eq(auditLog.entityType, filter.entityType))
  if (filter.entityId !== undefined) conds.push(eq(auditLog.entityId, filter.entityId))
  if (filter.actorId !== undefined) conds.push(eq(auditLog.actorId, filter.actorId))
  if (filter.action) conds.push(ilike(auditLog.action, `${filter.action}%`))
  if (filter.since) conds.push(gte(auditLog.at, filter.since))
  if (filter.until) conds.push(lte(auditLog.at, filter.until))
  return conds.length ? and(...conds) : undefined
}

/** How many rows the filter matches (limit and offset aside), for "page 2 of 7". */
export async function countAudit(filter: AuditFilter = {}): Promise<number> {
  const db = await getDb()
  const [row] = await db.select({ n: sql<number>`count(*)::int` }).from(auditLog).where(conditions(filter))
  return row.n
}

/** Newest first, with the actor's name. */
export async function listAudit(filter: AuditFilter = {}) {
  const db = await getDb()
  return db
    .select({ id: auditLog.id, at: auditLog.at, actorId: auditLog.actorId, actorName: users.name, action: auditLog.action, entityType: auditLog.entityType, entityId: auditLog.entityId, details: auditLog.details, ip: auditLog.ip })
    .from(auditLog)
    .leftJoin(users, eq(users.id, auditLog.actorId))
    .where(conditions(filter))
    .orderBy(desc(auditLog.at), desc(auditLog.id))
    .limit(Math.min(filter.limit ?? 200, 10_000))
    .offset(filter.offset ?? 0)
}
