import { withRole } from '@/app/_lib/http/access'
import { intParam } from '@/app/_lib/http/request'
import { gateFor, loadRevisionContext } from '@/app/_lib/review/service'

// GET /api/revisions/:revisionId/gate — the release conditions, each met or not, with the evidence
export const GET = withRole<{ revisionId: string }>('signed-in', async (_req, { params }) => {
  const ctx = await loadRevisionContext(intParam(params.revisionId, 'Revision id'))
  return Response.json({ gate: await gateFor(ctx) })
})
