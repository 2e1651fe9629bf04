import { withRole } from '@/app/_lib/http/access'
import { loadMapRevision } from '@/app/_lib/maps/access'
import { limitsFromVehicle, validate } from '@/maps'

// GET /api/maps/:id/revisions/:number — one revision (or `latest`) with its table and findings
export const GET = withRole<{ id: string; number: string }>('signed-in', async (_req, { params }) => {
  const { map, revision } = await loadMapRevision(params.id, params.number)
  return Response.json({ revision, paramVersion: map.programParamVersion, findings: validate(revision.table, limitsFromVehicle(map.programParams)) })
})
