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

interface Kept<V> extends SnapshotRead<V> {
  /** PGlite's count of committed writes taken before the query that last confirmed this entry. */
  changes: number | undefined
}

/**
 * Answers computed from the database, kept until anything in the database changes: a hit costs one
 * snapshot query instead of the read, and is exact (no time-to-live, no invalidation to forget),
 * on one server or several sharing the database. On PGlite a hit costs no query at all while the
 * database's own count of committed writes (db/change-feed.ts) is where it was when the entry was
 * last confirmed; once it moves, the snapshot decides.
 * A value is kept with the snapshot its own query saw, and with the write count taken before that
 * query was sent, so a write that lands between the check and storing the answer can only make the
 * entry look older than it is (a miss next time), never newer. Bounded per database handle (tests
 * open one per file, and two fresh databases can have equal snapshots): the least recently used key
 * goes first. Never call it inside a transaction: its queries run on their own connection.
 */
export class SnapshotCache<K, V> {
  hits = 0
  misses = 0
  /** Snapshot queries asked (on PGlite, only after a write). */
  checks = 0

  constructor(
    private readonly name: string,
    private readonly maxEntries: number,
  ) {}

  /** The value for `key` as of now: the kept one while nothing was written since, else `read()`'s (kept unless null). */
  async get(key: K, read: () => Promise<SnapshotRead<V> | null>): Promise<V | null> {
    const handle = await getHandle()
    const entries = lruFor<K, Kept<V>>(handle, this.name, this.maxEntries)
    // Taken before any query of this call: a write counted later is one this call's answer may not show.
    const changes = handle.changes?.count
    const kept = entries.get(key)
    if (kept) {
      if (changes !== undefined && kept.changes === changes) {
        this.hits++
        return kept.value
      }
      // Checked on every call, never skipped for a while: a caller that has just written must see its write.
      this.checks++
      if (kept.snapshot === (await currentSnapshot())) {
        kept.changes = changes
        this.hits++
        return kept.value
      }
    }
    this.misses++
    const fresh = await read()
    if (fresh) entries.set(key, { ...fresh, changes })
    return fresh?.value ?? null
  }
}
