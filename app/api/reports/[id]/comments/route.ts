import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { loadReport } from '@/app/_lib/reports/access'
import { ForbiddenError } from '@/app/_lib/http/errors'
import { readJson } from '@/app/_lib/http/request'
import { createdResponse, createOnce } from '@/app/_lib/http/idempotency'
import { addReportComment, getReportComment, listReportComments } from '@/db/queries/reports'
import { recordAudit } from '@/db/queries/audit'
import { reportCommentSchema } from '@/app/_schemas/report'

// GET /api/reports/:id/comments — engineers' comments on a drive report
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const report = await loadReport(params.id)
  return Response.json({ comments: await listReportComments(report.id) })
})

// POST /api/reports/:id/comments — an engineer comments on a drive report, or the driver who filed it answers, before
// or after a lead has read it (a comment does not change what the report says) (Idempotency-Key: the draft's id)
export const POST = withRole<{ id: string }>([...EDITORS, 'test_driver'], async (req, { user, params }) => {
  const report = await loadReport(params.id)
  if (user.role === 'test_driver' && report.driverId !== user.id) throw new ForbiddenError('Only the driver who filed this report may comment on it')
  const { body } = await readJson(req, reportCommentSchema)
  const { id, replayed } = await createOnce(req, { userId: user.id, scope: 'report-comment', what: 'comment', request: { reportId: report.id, body } }, async (conn) => {
    const comment = await addReportComment(report.id, user.id, body, conn)
    await recordAudit({ actorId: user.id, action: 'report.comment', entityType: 'drive_report', entityId: report.id }, conn)
    return comment.id
  })
  return createdResponse({ comment: await getReportComment(id) }, replayed)
})
