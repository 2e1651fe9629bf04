import { eq } from 'drizzle-orm'
import type { MapTable } from '../../maps'
import { getDb } from '../client'
import { lruFor } from '../lru'
import { mapRevisions } from '../schema'

/**
 * A revision's table never changes after it is written (a save makes a new revision), so tables
 * are cached by revision id. At most this many per process: a 64 × 64 table is about 40 kB in
 * memory, so the cache stays near 10 MB at worst and a few hundred kB with typical grids.
 */
export const REVISION_TABLE_CACHE_SIZE = 256

const tablesOf = (db: object) => lruFor<number, MapTable>(db, 'revision-tables', REVISION_TABLE_CACHE_SIZE)

/** Every caller shares the cached object, so a stray in-place edit throws instead of changing what others read. */
function freezeTable(t: MapTable): MapTable {
  for (const row of t.values) Object.freeze(row)
  Object.freeze(t.values)
  Object.freeze(t.rowAxis)
  Object.freeze(t.colAxis)
  return Object.freeze(t)
}

/** The table of a revision by its row id, from the cache or one query; null when there is no such revision. */
export async function revisionTable(revisionId: number): Promise<MapTable | null> {
  const db = await getDb()
  const t = await tablesOf(db).getOrLoad(revisionId, async () => {
    const [row] = await db.select({ table: mapRevisions.table }).from(mapRevisions).where(eq(mapRevisions.id, revisionId))
    return row && freezeTable(row.table)
  })
  return t ?? null
}

/** Whether a revision's table is in this process's cache (for tests). */
export async function revisionTableCached(revisionId: number): Promise<boolean> {
  return tablesOf(await getDb()).get(revisionId) !== undefined
}
