import type { getMapWithLatest } from '@/db/queries/maps'
import { revisionFindingsJson } from './revision-findings'
import { tableMemo } from './table-memo'

type MapRead = NonNullable<Awaited<ReturnType<typeof getMapWithLatest>>>

/** The JSON text of a stored table, kept beside the cached table object (both immutable). */
const tableJson = tableMemo<string>(1)

/**
 * The body of GET /api/maps/:id, `{map, latest, findings}`, as JSON.stringify would write it. What
 * can change (the map, its program, the revision's state and author name) is written each time; the
 * revision's table and its findings under these parameters are written once per table and spliced
 * in, so a read does not serialise the same immutable grid again.
 */
export function mapReadJson({ map, latest }: MapRead): string {
  const { table, ...summary } = latest
  const head = JSON.stringify(summary) // `{…,"createdAt":"…"}`: the table goes in as its last member
  const tableText = tableJson(table, '', () => JSON.stringify(table))
  return `{"map":${JSON.stringify(map)},"latest":${head.slice(0, -1)},"table":${tableText}},"findings":${revisionFindingsJson(table, map.programParams)}}`
}
