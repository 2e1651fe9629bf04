import { and, desc, eq, lt, sql } from 'drizzle-orm'
import type { MapTable } from '../../maps'
import { checksum } from '../checksum'
import type { RevisionState } from '../../domain/revision-states'
import { revisionTable } from './revision-tables'
import { getDb, type Db } from '../client'
import { mapRevisions, maps, users } from '../schema'
import { recordAudit } from './audit'

type Tx = Pick<Db, 'insert' | 'select'>

/** Summary columns of a revision (with its author's name): everything but the table itself. */
export const revisionSummaryColumns = {
  id: mapRevisions.id,
  mapId: mapRevisions.mapId,
  number: mapRevisions.number,
  parentId: mapRevisions.parentId,
  authorId: mapRevisions.authorId,
  authorName: users.name,
  message: mapRevisions.message,
  notes: mapRevisions.notes,
  checksum: mapRevisions.checksum,
  state: mapRevisions.state,
  createdAt: mapRevisions.createdAt,
}

export interface RevisionSummary {
  id: number
  mapId: number
  number: number
  parentId: number | null
  authorId: number
  authorName: string
  message: string
  notes: string
  checksum: string
  state: RevisionState
  createdAt: Date
}
export type Revision = RevisionSummary & { table: MapTable }

/** Insert one immutable revision row; the checksum is computed from the canonical content here, never taken from a client. */
export async function insertRevision(
  tx: Tx,
  r: { mapId: number; number: number; parentId: number | null; authorId: number; message: string; notes: string; table: MapTable },
) {
  const [row] = await tx
    .insert(mapRevisions)
    .values({ ...r, table: { kind: r.table.kind, rowAxis: r.table.rowAxis, colAxis: r.table.colAxis, values: r.table.values }, checksum: checksum(r.table) })
    .returning({ id: mapRevisions.id, number: mapRevisions.number, checksum: mapRevisions.checksum, createdAt: mapRevisions.createdAt })
  return row
}

export type SaveResult =
  | { ok: true; revision: { id: number; number: number; checksum: string; createdAt: Date } }
  | { ok: false; reason: 'stale-parent'; latestNumber: number }
  | { ok: false; reason: 'no-map' }

/** Every this many revisions of a map, the save refreshes the planner statistics of the revisions table. */
export const STATS_EVERY = 100

/**
 * PGlite runs no autovacuum, so the planner's idea of the table size goes stale as history grows
 * (PostgreSQL's autovacuum does the same on its own; running it there too is harmless).
 */
export async function refreshRevisionStatistics(conn?: Db): Promise<void> {
  const db = conn ?? (await getDb())
  await db.execute(sql`analyze map_revisions`)
}

/**
 * Save a new revision on top of `parentNumber`. The map row is locked for the transaction, so
 * concurrent saves queue up; a save whose parent is no longer the latest is refused (nothing is
 * written) and told the newer number. The unique (map, number) index is the last line of defence.
 */
export async function saveRevision(input: {
  mapId: number
  parentNumber: number
  authorId: number
  message: string
  notes: string
  table: MapTable
  action?: string
}, conn?: Db): Promise<SaveResult> {
  const result = await saveInTransaction(input, conn)
  if (result.ok && result.revision.number % STATS_EVERY === 0) await refreshRevisionStatistics(conn)
  return result
}

/** `conn`: an enclosing transaction (the save then runs in a savepoint of it). */
async function saveInTransaction(input: Parameters<typeof saveRevision>[0], conn?: Db): Promise<SaveResult> {
  const db = conn ?? (await getDb())
  return db.transaction(async (tx) => {
    const locked = await tx.select({ id: maps.id }).from(maps).where(eq(maps.id, input.mapId)).for('update')
    if (!locked[0]) return { ok: false, reason: 'no-map' } as const
    const [head] = await tx
      .select({ id: mapRevisions.id, number: mapRevisions.number })
      .from(mapRevisions)
      .where(eq(mapRevisions.mapId, input.mapId))
      .orderBy(desc(mapRevisions.number))
      .limit(1)
    const latestNumber = head?.number ?? 0
    if (latestNumber !== input.parentNumber) return { ok: false, reason: 'stale-parent', latestNumber } as const
    const revision = await insertRevision(tx, {
      mapId: input.mapId,
      number: latestNumber + 1,
      parentId: head?.id ?? null,
      authorId: input.authorId,
      message: input.message,
      notes: input.notes,
      table: input.table,
    })
    await recordAudit(
      { actorId: input.authorId, action: input.action ?? 'revision.save', entityType: 'map', entityId: input.mapId, details: { number: revision.number, checksum: revision.checksum, message: input.message } },
      tx,
    )
    return { ok: true, revision } as const
  })
}

/**
 * Newest first, without the tables; `before` pages back from a revision number. The page is cut
 * from map_revisions alone (a backward scan of the (map_id, number) index) before the author
 * join, so the first screen costs the same with ten revisions or ten thousand.
 */
export async function listRevisions(mapId: number, opts: { limit?: number; before?: number } = {}): Promise<RevisionSummary[]> {
  const db = await getDb()
  const page = db
    .select({ id: mapRevisions.id })
    .from(mapRevisions)
    .where(opts.before ? and(eq(mapRevisions.mapId, mapId), lt(mapRevisions.number, opts.before)) : eq(mapRevisions.mapId, mapId))
    .orderBy(desc(mapRevisions.mapId), desc(mapRevisions.number))
    .limit(Math.min(opts.limit ?? 50, 500))
    .as('page')
  return db
    .select(revisionSummaryColumns)
    .from(page)
    .innerJoin(mapRevisions, eq(mapRevisions.id, page.id))
    .innerJoin(users, eq(users.id, mapRevisions.authorId))
    .orderBy(desc(mapRevisions.number))
}

/** How many revisions a map has: numbers run 1…n without gaps (unique, each save takes latest + 1), so n is the count. */
export async function countRevisions(mapId: number): Promise<number> {
  const db = await getDb()
  const [row] = await db.select({ n: sql<number | null>`max(${mapRevisions.number})` }).from(mapRevisions).where(eq(mapRevisions.mapId, mapId))
  return Number(row.n ?? 0)
}

/** One revision with its table; `number` omitted means the latest. */
export async function getRevision(mapId: number, number?: number): Promise<Revision | null> {
  const db = await getDb()
  const rows = await db
    .select(revisionSummaryColumns)
    .from(mapRevisions)
    .innerJoin(users, eq(users.id, mapRevisions.authorId))
    .where(number === undefined ? eq(mapRevisions.mapId, mapId) : and(eq(mapRevisions.mapId, mapId), eq(mapRevisions.number, number)))
    .orderBy(desc(mapRevisions.mapId), desc(mapRevisions.number))
    .limit(1)
  const summary = rows[0]
  // The table never changes once written: it comes from the revision-table cache, not this row.
  const table = summary && (await revisionTable(summary.id))
  return summary && table ? { ...summary, table } : null
}

/** A saved revision as saveRevision returned it (a repeated save answers with the first). */
export async function getSavedRevision(id: number): Promise<{ id: number; number: number; checksum: string; createdAt: Date } | null> {
  const db = await getDb()
  const rows = await db
    .select({ id: mapRevisions.id, number: mapRevisions.number, checksum: mapRevisions.checksum, createdAt: mapRevisions.createdAt })
    .from(mapRevisions)
    .where(eq(mapRevisions.id, id))
  return rows[0] ?? null
}
