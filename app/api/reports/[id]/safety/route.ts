import { withRole } from '@/app/_lib/http/access'
import { ConflictError } from '@/app/_lib/http/errors'
import { loadReport } from '@/app/_lib/reports/access'
import { readJson } from '@/app/_lib/http/request'
import { resolveSafetySchema } from '@/app/_schemas/report'
import { getReport, resolveSafety } from '@/db/queries/reports'

// POST /api/reports/:id/safety — a lead engineer resolves an open safety concern, with a comment
export const POST = withRole<{ id: string }>(['lead_engineer'], async (req, { user, params }) => {
  const report = await loadReport(params.id)
  const { comment } = await readJson(req, resolveSafetySchema)
  if (!(await resolveSafety(report.id, user.id, comment))) throw new ConflictError('This report has no open safety concern')
  return Response.json({ report: await getReport(report.id) })
})
