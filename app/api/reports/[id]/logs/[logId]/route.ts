import { withRole } from '@/app/_lib/http/access'
import { NotFoundError } from '@/app/_lib/http/errors'
import { assertOwner, loadReport } from '@/app/_lib/reports/access'
import { intParam } from '@/app/_lib/http/request'
import { startLogAnalysis } from '@/app/_lib/reports/log-jobs'
import { getLog } from '@/db/queries/logs'
import { getRevisionWithMap } from '@/db/queries/maps'
import { predictEvents } from '@/app/_lib/reports/log-prediction'

async function loadLog(reportParam: string, logParam: string) {
  const report = await loadReport(reportParam)
  const log = await getLog(intParam(logParam, 'Log id'))
  if (!log || log.reportId !== report.id) throw new NotFoundError(`Log ${logParam} of report ${report.id}`)
  return { report, log }
}

// GET /api/reports/:id/logs/:logId — a log's status, parse progress and (when done) its analysis, with the
// physics prediction at each logged event for the report's revision, load case and surface
export const GET = withRole<{ id: string; logId: string }>('signed-in', async (_req, { params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  const analysis = log.analysis
  let predictions = null
  if (log.status === 'done' && analysis) {
    const target = await getRevisionWithMap(report.revisionId)
    if (target) predictions = predictEvents(analysis.events, { table: target.revision.table, vehicle: target.map.programParams, loadCase: report.loadCase, surface: report.surface })
  }
  return Response.json({ log, predictions })
})

// POST /api/reports/:id/logs/:logId — the filing driver re-runs the analysis (e.g. after a failed parse)
export const POST = withRole<{ id: string; logId: string }>(['test_driver'], async (_req, { user, params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  assertOwner(report, user)
  startLogAnalysis(log.id)
  return Response.json({ log: { ...log, status: 'analysing' } }, { status: 202 })
})
