import { withRole } from '@/app/_lib/http/access'
import { ConflictError, ForbiddenError, NotFoundError } from '@/app/_lib/http/errors'
import { AFTER_READ, assertOwner, assertUnread, loadReport } from '@/app/_lib/reports/access'
import { intParam } from '@/app/_lib/http/request'
import { nudgeLogWorker, reanalyseLog } from '@/app/_lib/reports/log-jobs'
import { readJson } from '@/app/_lib/http/request'
import { logRemapSchema } from '@/app/_schemas/report'
import { deleteObject } from '@/app/_lib/storage/object-store'
import { getLog, remapLogUnlessRead, removeLogUnlessRead } from '@/db/queries/logs'
import { getSet } from '@/db/queries/sets'
import { predictEvents } from '@/app/_lib/reports/log-prediction'

async function loadLog(reportParam: string, logParam: string) {
  const report = await loadReport(reportParam)
  const log = await getLog(intParam(logParam, 'Log id'))
  if (!log || log.reportId !== report.id) throw new NotFoundError(`Log ${logParam} of report ${report.id}`)
  return { report, log }
}

// GET /api/reports/:id/logs/:logId — a log's status, parse progress and (when done) its analysis, with the
// physics prediction at each logged event for the report's set (spin on its drive map, lock-up on its
// regen map, with its parameter version), load case and surface
export const GET = withRole<{ id: string; logId: string }>('signed-in', async (_req, { params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  const analysis = log.analysis
  let predictions = null
  if (log.status === 'done' && analysis) {
    const set = await getSet(report.setId)
    if (set) predictions = predictEvents(analysis.events, { drive: set.drive?.table ?? null, regen: set.regen?.table ?? null, vehicle: set.paramVersion.params, loadCase: report.loadCase, surface: report.surface })
  }
  return Response.json({ log, predictions })
})

// POST /api/reports/:id/logs/:logId — the filing driver or a lead runs the analysis again (e.g. after a failed parse); audited.
// The log goes back to 'uploaded' for a log worker to claim; a run in progress stops and its result is not written
export const POST = withRole<{ id: string; logId: string }>(['test_driver', 'lead_engineer'], async (_req, { user, params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  if (user.role !== 'lead_engineer') assertOwner(report, user)
  const queued = await reanalyseLog(log, user.id, 'requested')
  if (!queued) throw new NotFoundError(`Log ${params.logId} of report ${report.id}`)
  return Response.json({ log: queued }, { status: 202 })
})

// PATCH /api/reports/:id/logs/:logId { mapping } — the filing driver corrects the column mapping (a failed parse) and the
// log is analysed again from its stored file, until a lead has read the report; audited with the old and new mapping
export const PATCH = withRole<{ id: string; logId: string }>(['test_driver'], async (req, { user, params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  if (report.driverId !== user.id) throw new ForbiddenError('Only the driver who filed this report may change how its logs are read')
  assertUnread(report, 'remap-log')
  const { mapping } = await readJson(req, logRemapSchema)
  const queued = await remapLogUnlessRead(log.id, report.id, mapping, user.id)
  if (queued === 'read') throw new ConflictError(AFTER_READ['remap-log'])
  if (!queued) throw new NotFoundError(`Log ${params.logId} of report ${report.id}`)
  nudgeLogWorker()
  return Response.json({ log: queued }, { status: 202 })
})

// DELETE /api/reports/:id/logs/:logId — the filing driver removes a log (a wrong file), until a lead has read the report; audited
export const DELETE = withRole<{ id: string; logId: string }>(['test_driver'], async (_req, { user, params }) => {
  const { report, log } = await loadLog(params.id, params.logId)
  if (report.driverId !== user.id) throw new ForbiddenError('Only the driver who filed this report may remove its logs')
  assertUnread(report, 'remove-log')
  const removed = await removeLogUnlessRead(log.id, report.id, user.id)
  if (removed === 'read') throw new ConflictError(AFTER_READ['remove-log'])
  if (!removed) throw new ConflictError(`Log ${log.id} was already removed`)
  await deleteObject(log.objectKey).catch((e) => console.error(`log ${log.id}: stored file ${log.objectKey} not deleted`, e))
  return Response.json({ removed: { id: log.id, fileName: log.fileName } })
})
