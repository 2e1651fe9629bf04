import { withRole } from '@/app/_lib/http/access'
import { assertOwner, assertSameSet, assertUnread, checkReportTarget, loadReport } from '@/app/_lib/reports/access'
import { readJson } from '@/app/_lib/http/request'
import { reportInputSchema } from '@/app/_schemas/report'
import { getReport, updateReport } from '@/db/queries/reports'
import { nudgeMail, safetyMailFor } from '@/app/_lib/reports/mail'
import { listLogs } from '@/db/queries/logs'

// GET /api/reports/:id — one drive report with its set's parts named, and its logs (status and progress, no analysis)
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const report = await loadReport(params.id)
  return Response.json({ report, logs: await listLogs(report.id) })
})

// PUT /api/reports/:id — the driver who filed it corrects the report, until a lead has read it.
// The set is fixed at filing: a body naming another set is refused (409); a lead corrects it (POST …/set).
export const PUT = withRole<{ id: string }>(['test_driver'], async (req, { user, params }) => {
  const report = await loadReport(params.id)
  assertOwner(report, user)
  assertUnread(report, 'edit')
  const input = await readJson(req, reportInputSchema)
  const { setId, ...fields } = input
  assertSameSet(report, setId)
  const set = await checkReportTarget(input)
  await updateReport(report.id, fields, user.id, await safetyMailFor(input, set, user))
  nudgeMail()
  return Response.json({ report: await getReport(report.id) })
})
