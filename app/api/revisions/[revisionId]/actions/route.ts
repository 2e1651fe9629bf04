import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { intParam, readJson } from '@/app/_lib/http/request'
import { applyReviewAction, loadRevisionContext } from '@/app/_lib/review/service'
import { reviewActionSchema } from '@/app/_schemas/review'

// POST /api/revisions/:revisionId/actions — submit, approve, send back, release or withdraw (state machine + release gate)
export const POST = withRole<{ revisionId: string }>(EDITORS, async (req, { user, params }) => {
  const ctx = await loadRevisionContext(intParam(params.revisionId, 'Revision id'))
  const input = await readJson(req, reviewActionSchema)
  const result = await applyReviewAction(ctx, user, input.action, input)
  return Response.json(result)
})
