import { withRole } from '@/app/_lib/http/access'
import { loadMapRevision } from '@/app/_lib/maps/access'
import { overlayFor } from '@/app/_lib/physics/overlay'
import { overlayQuerySchema, queryObject } from '@/app/_lib/physics/query'

// GET /api/maps/:id/revisions/:number/overlay?loadCase=&surface=&gradePct= — traction-limit torque per speed and predicted slip, spin, grip use and lateral capacity per cell
export const GET = withRole<{ id: string; number: string }>('signed-in', async (req, { params }) => {
  const q = overlayQuerySchema.parse(queryObject(req))
  const { map, revision } = await loadMapRevision(params.id, params.number)
  const overlay = overlayFor(map.programParams, revision.table, q, map.programReleaseConditions?.designLateralAccelMps2)
  return Response.json({ mapId: map.id, number: revision.number, paramVersion: map.programParamVersion, ...q, ...overlay })
})
