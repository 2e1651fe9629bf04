import { withRole } from '@/app/_lib/access'
import { loadMap } from '@/app/_lib/map-access'
import { getRevision } from '@/db/queries/revisions'
import { limitsFromVehicle, validate } from '@/maps'

// GET /api/maps/:id — a map, its vehicle program, its latest revision and that revision's findings
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const map = await loadMap(params.id)
  const latest = await getRevision(map.id)
  const findings = latest ? validate(latest.table, limitsFromVehicle(map.programParams)) : []
  return Response.json({ map, latest, findings })
})
