import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { ValidationError } from '@/app/_lib/http/errors'
import { intParam, readJson } from '@/app/_lib/http/request'
import { createdResponse, createOnce } from '@/app/_lib/http/idempotency'
import { loadRevisionContext } from '@/app/_lib/review/service'
import { reviewCommentSchema } from '@/app/_schemas/review'
import { addReviewComment, getReviewComment, listReviewComments } from '@/db/queries/review'
import { recordAudit } from '@/db/queries/audit'

// GET /api/revisions/:revisionId/comments — review comments, some pinned to a cell
export const GET = withRole<{ revisionId: string }>('signed-in', async (_req, { params }) => {
  const ctx = await loadRevisionContext(intParam(params.revisionId, 'Revision id'))
  return Response.json({ comments: await listReviewComments({ revisionId: ctx.revision.id }) })
})

// POST /api/revisions/:revisionId/comments — comment on a revision, or on one of its cells (Idempotency-Key: the draft's id)
export const POST = withRole<{ revisionId: string }>(EDITORS, async (req, { user, params }) => {
  const ctx = await loadRevisionContext(intParam(params.revisionId, 'Revision id'))
  const c = await readJson(req, reviewCommentSchema)
  const t = ctx.revision.table
  if ((c.row === null) !== (c.col === null)) throw new ValidationError('row and col: give both to pin a comment to a cell, or neither')
  if (c.row !== null && c.col !== null && (c.row >= t.rowAxis.length || c.col >= t.colAxis.length))
    throw new ValidationError(`row, col: the map has ${t.rowAxis.length} rows and ${t.colAxis.length} columns`)
  const { id, replayed } = await createOnce(req, { userId: user.id, scope: 'review-comment', what: 'comment', request: { revisionId: ctx.revision.id, ...c } }, async (conn) => {
    const comment = await addReviewComment({ revisionId: ctx.revision.id, authorId: user.id, ...c }, conn)
    await recordAudit({ actorId: user.id, action: 'revision.comment', entityType: 'map', entityId: ctx.map.id, details: { revision: ctx.revision.number, row: c.row, col: c.col } }, conn)
    return comment.id
  })
  return createdResponse({ comment: await getReviewComment(id) }, replayed)
})
