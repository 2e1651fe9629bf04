import { executePrepared } from './prepared'
import { getHandle } from './client'
import { lruFor } from './lru'

/**
 * PostgreSQL's snapshot of the moment (`pg_current_snapshot()`, "xmin:xmax:in-progress ids"). What a
 * query sees is decided by its snapshot alone, and a snapshot changes as soon as any transaction that
 * writes starts or ends — in this process, another server process or a psql session alike (a
 * transaction gets an id only when it writes). So two equal snapshots see the same rows.
 */
export const SNAPSHOT_SQL = 'pg_current_snapshot()::text'

export async function currentSnapshot(): Promise<string> {
  const [row] = await executePrepared('current_snapshot', `select ${SNAPSHOT_SQL} as snapshot`, [])
  return row.snapshot as string
}

export interface SnapshotRead<V> {
  /** The snapshot the read ran under: the same statement must select `SNAPSHOT_SQL`. */
  snapshot: string
  value: V
}

/**
 * Answers computed from the database, kept until anything in the database changes: a hit costs one
 * snapshot query instead of the read, and is exact (no time-to-live, no invalidation to forget),
 * on one server or several sharing the database. A value is kept with the snapshot its own query
 * saw, so a write landing between the check and the read can only make the entry look older than
 * it is (a miss next time), never newer. Bounded per database handle (tests open one per file, and
 * two fresh databases can have equal snapshots): the least recently used key goes first.
 */
export class SnapshotCache<K, V> {
  hits = 0
  misses = 0

  constructor(
    private readonly name: string,
    private readonly maxEntries: number,
  ) {}

  /** The value for `key` as of now: the kept one while the snapshot is unchanged, else `read()`'s (kept unless null). */
  async get(key: K, read: () => Promise<SnapshotRead<V> | null>): Promise<V | null> {
    const entries = lruFor<K, SnapshotRead<V>>(await getHandle(), this.name, this.maxEntries)
    const kept = entries.get(key)
    // Checked on every call, never skipped for a while: a caller that has just written must see its write.
    if (kept && kept.snapshot === (await currentSnapshot())) {
      this.hits++
      return kept.value
    }
    this.misses++
    const fresh = await read()
    if (fresh) entries.set(key, fresh)
    return fresh?.value ?? null
  }
}
