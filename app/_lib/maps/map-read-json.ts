import { readMapWithLatest, type MapWithLatest } from '@/db/queries/maps'
import { SnapshotCache } from '@/db/snapshot-cache'
import { revisionFindingsJson } from './revision-findings'
import { tableMemo } from './table-memo'

/** The JSON text of a stored table, kept beside the cached table object (both immutable). */
const tableJson = tableMemo<string>(1)

/**
 * The body of GET /api/maps/:id, `{map, latest, findings}`, as JSON.stringify would write it. What
 * can change (the map, its program, the revision's state and author name) is written each time; the
 * revision's table and its findings under these parameters are written once per table and spliced
 * in, so a read does not serialise the same immutable grid again.
 */
export function mapReadJson({ map, latest }: MapWithLatest): string {
  const { table, ...summary } = latest
  const head = JSON.stringify(summary) // `{…,"createdAt":"…"}`: the table goes in as its last member
  const tableText = tableJson(table, '', () => JSON.stringify(table))
  return `{"map":${JSON.stringify(map)},"latest":${head.slice(0, -1)},"table":${tableText}},"findings":${revisionFindingsJson(table, map.programParams)}}`
}

/**
 * Answers of GET /api/maps/:id, kept until the database changes (db/snapshot-cache.ts): reading a
 * map nobody has touched costs one snapshot query, not the four-table read and its JSON. About
 * 6–40 kB each (the table and findings texts are shared with the memos above).
 */
const MAP_READS_KEPT = 256
export const mapReads = new SnapshotCache<number, string>('map-read-json', MAP_READS_KEPT)

/** The body of GET /api/maps/:id as of now, or null when there is no such map. */
export function mapReadBody(mapId: number): Promise<string | null> {
  return mapReads.get(mapId, async () => {
    const read = await readMapWithLatest(mapId)
    return read && { snapshot: read.snapshot, value: mapReadJson(read.value) }
  })
}
