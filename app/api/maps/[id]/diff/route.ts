import { withRole } from '@/app/_lib/http/access'
import { loadMapRevision } from '@/app/_lib/maps/access'
import { tableMemo } from '@/app/_lib/maps/table-memo'
import { diff, type MapDiff } from '@/maps'

/** Diffs of a stored table against the last few revisions it was compared with (both immutable). */
const diffs = tableMemo<MapDiff>(8)

// GET /api/maps/:id/diff?a=N&b=M[&bMap=K] — cell-by-cell changes from revision a to revision b (b may be on another map)
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const q = new URL(req.url).searchParams
  // Both sides at once; when both fail, A's error is the one answered, as when they were read in turn.
  const [ra, rb] = await Promise.allSettled([
    loadMapRevision(params.id, q.get('a') ?? undefined),
    loadMapRevision(q.get('bMap') || params.id, q.get('b') ?? undefined),
  ])
  if (ra.status === 'rejected') throw ra.reason
  if (rb.status === 'rejected') throw rb.reason
  const [a, b] = [ra.value, rb.value]
  const d = diffs(a.revision.table, String(b.revision.id), () => diff(a.revision.table, b.revision.table))
  return Response.json({ a: { mapId: a.map.id, number: a.revision.number }, b: { mapId: b.map.id, number: b.revision.number }, diff: d })
})
