import { withRole } from '@/app/_lib/http/access'
import { loadMap, loadRevision } from '@/app/_lib/maps/access'
import { diff } from '@/maps'

// GET /api/maps/:id/diff?a=N&b=M[&bMap=K] — cell-by-cell changes from revision a to revision b (b may be on another map)
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const q = new URL(req.url).searchParams
  const mapA = await loadMap(params.id)
  const mapB = q.get('bMap') ? await loadMap(q.get('bMap') ?? undefined) : mapA
  const [a, b] = await Promise.all([loadRevision(mapA.id, q.get('a') ?? undefined), loadRevision(mapB.id, q.get('b') ?? undefined)])
  return Response.json({ a: { mapId: mapA.id, number: a.number }, b: { mapId: mapB.id, number: b.number }, diff: diff(a.table, b.table) })
})
