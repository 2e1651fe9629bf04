import { withRole } from '@/app/_lib/http/access'
import { loadRevisionPair } from '@/app/_lib/maps/access'
import { tableMemo } from '@/app/_lib/maps/table-memo'
import { diff, type MapDiff } from '@/maps'

/** Diffs of a stored table against the last few revisions it was compared with (both immutable). */
const diffs = tableMemo<MapDiff>(8)

// GET /api/maps/:id/diff?a=N&b=M[&bMap=K] — cell-by-cell changes from revision a to revision b (b may be on another map)
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const q = new URL(req.url).searchParams
  const { a, b } = await loadRevisionPair(params.id, q.get('a') ?? undefined, q.get('b') ?? undefined, q.get('bMap') || undefined)
  const d = diffs(a.revision.table, String(b.revision.id), () => diff(a.revision.table, b.revision.table))
  return Response.json({ a: { mapId: a.map.id, number: a.revision.number }, b: { mapId: b.map.id, number: b.revision.number }, diff: d })
})
