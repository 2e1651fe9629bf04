import { withRole } from '@/app/_lib/access'
import { NotFoundError } from '@/app/_lib/errors'
import { assertOwner, loadReport } from '@/app/_lib/report-access'
import { intParam } from '@/app/_lib/request'
import { startLogAnalysis } from '@/app/_lib/log-jobs'
import { getLog } from '@/db/queries/logs'

async function loadLog(reportParam: string, logParam: string) {
  const report = await loadReport(reportParam)
  const log = await getLog(intParam(logParam, 'Log id'))
  if (!log || log.reportId !== report.id) throw new NotFoundError(`Log ${logParam} of report ${report.id}`)
  return { report, log }
}

// GET /api/reports/:id/logs/:logId — a log's status, parse progress and (when done) its analysis
export const GET = withRole<{ id: string; logId: string }>('signed-in', async (_req, { params }) => {
  const { log } = await loadLog(params.id, params.logId)
  return Response.json({ log })
})

// POST /api/reports/:id/logs/:logId — the filing driver re-runs the analysis (e.g. after a failed parse)
export const POST = withRole<{ id: string; logId: string }>(['test_driver'], async (_req, { user, params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  assertOwner(report, user)
  startLogAnalysis(log.id)
  return Response.json({ log: { ...log, status: 'analysing' } }, { status: 202 })
})
