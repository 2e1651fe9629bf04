import { withRole } from '@/app/_lib/http/access'
import { loadMapRevision } from '@/app/_lib/maps/access'
import { queryObject } from '@/app/_lib/physics/query'
import { simulate, simulateQuerySchema } from '@/app/_lib/physics/simulate'

// GET /api/maps/:id/revisions/:number/simulate?mode=launch|liftoff&surface=&loadCase=&pedalPct=&rampS=&initialSpeedKmh=&gradePct=&durationS= — time series and summary of a launch (drive map) or lift-off (regen map)
export const GET = withRole<{ id: string; number: string }>('signed-in', async (req, { params }) => {
  const q = simulateQuerySchema.parse(queryObject(req))
  const { map, revision } = await loadMapRevision(params.id, params.number)
  return Response.json({ mapId: map.id, number: revision.number, paramVersion: map.programParamVersion, query: q, ...simulate(map.programParams, revision.table, q) })
})
