import { withRole } from '@/app/_lib/http/access'
import { assertOwner, checkReportTarget, loadReport } from '@/app/_lib/reports/access'
import { readJson } from '@/app/_lib/http/request'
import { ConflictError } from '@/app/_lib/http/errors'
import { reportInputSchema } from '@/app/_schemas/report'
import { getReport, updateReport } from '@/db/queries/reports'
import { nudgeMail, safetyMailFor } from '@/app/_lib/reports/mail'
import { listLogs } from '@/db/queries/logs'

// GET /api/reports/:id — one drive report with its logs (status and progress, no analysis)
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const report = await loadReport(params.id)
  return Response.json({ report, logs: await listLogs(report.id) })
})

// PUT /api/reports/:id — the driver who filed it corrects the report
export const PUT = withRole<{ id: string }>(['test_driver'], async (req, { user, params }) => {
  const report = await loadReport(params.id)
  assertOwner(report, user)
  if (report.leadReadAt) throw new ConflictError('A lead engineer has read this report; it can no longer be edited. Add a comment instead.')
  const input = await readJson(req, reportInputSchema)
  await checkReportTarget(input)
  await updateReport(report.id, input, user.id, await safetyMailFor(input, user))
  nudgeMail()
  return Response.json({ report: await getReport(report.id) })
})
