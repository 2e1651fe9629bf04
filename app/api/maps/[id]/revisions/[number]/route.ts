import { withRole } from '@/app/_lib/http/access'
import { loadMapRevision } from '@/app/_lib/maps/access'
import { revisionFindings } from '@/app/_lib/maps/revision-findings'

// GET /api/maps/:id/revisions/:number — one revision (or `latest`) with its table and findings
export const GET = withRole<{ id: string; number: string }>('signed-in', async (_req, { params }) => {
  const { map, revision } = await loadMapRevision(params.id, params.number)
  return Response.json({ revision, paramVersion: map.programParamVersion, findings: revisionFindings(revision.table, map.programParams) })
})
