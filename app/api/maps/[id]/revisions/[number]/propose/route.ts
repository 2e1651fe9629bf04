import { withRole } from '@/app/_lib/http/access'
import { loadMap, loadRevision } from '@/app/_lib/maps/access'
import { proposeBodySchema, proposeFor, type ProposalResponse } from '@/app/_lib/physics/propose'
import { readJson } from '@/app/_lib/http/request'
import { EDITORS } from '@/app/_lib/auth/roles'
import { listRevisions } from '@/db/queries/revisions'

// POST /api/maps/:id/revisions/:number/propose — a traction-safe draft of the revision (not saved): cells above the traction limit less a margin are lowered
export const POST = withRole<{ id: string; number: string }>(EDITORS, async (req, { params }) => {
  const map = await loadMap(params.id)
  const body = await readJson(req, proposeBodySchema)
  const revision = await loadRevision(map.id, params.number)
  const [latest] = await listRevisions(map.id, { limit: 1 })
  const result: ProposalResponse = { mapId: map.id, baseNumber: revision.number, latestNumber: latest?.number ?? revision.number, ...body, ...proposeFor(map.programParams, revision.table, body) }
  return Response.json(result)
})
