import { withRole } from '@/app/_lib/http/access'
import { checkReportTarget } from '@/app/_lib/reports/access'
import { readJson } from '@/app/_lib/http/request'
import { createdResponse, createOnce } from '@/app/_lib/http/idempotency'
import { reportInputSchema } from '@/app/_schemas/report'
import { flagParam, idFilter, parseQuery } from '@/app/_schemas/query'
import { z } from 'zod'
import { createReport, getReport, listReports } from '@/db/queries/reports'
import { nudgeMail, safetyMailFor } from '@/app/_lib/reports/mail'

const listSchema = z.strictObject({
  setId: idFilter('setId').optional(),
  programId: idFilter('programId').optional(),
  revisionId: idFilter('revisionId').optional(),
  mapId: idFilter('mapId').optional(),
  driverId: idFilter('driverId').optional(),
  mine: flagParam('mine'),
  openSafety: flagParam('openSafety'),
})

// GET /api/reports?setId=&programId=&revisionId=&mapId=&mine=1&openSafety=1 — drive reports, newest first
// (revisionId and mapId: reports on sets that hold that revision or a revision of that map)
export const GET = withRole('signed-in', async (req, { user }) => {
  const q = parseQuery(req, listSchema)
  const reports = await listReports({
    setId: q.setId,
    programId: q.programId,
    revisionId: q.revisionId,
    mapId: q.mapId,
    driverId: q.mine === '1' ? user.id : q.driverId,
    openSafety: q.openSafety === '1',
  })
  return Response.json({ reports })
})

// POST /api/reports — a test driver files a drive report against the set the truck was flashed with.
// Idempotency-Key (the draft's id): filing the same draft again answers with the first report.
export const POST = withRole(['test_driver'], async (req, { user }) => {
  const input = await readJson(req, reportInputSchema)
  const set = await checkReportTarget(input)
  const mail = await safetyMailFor(input, set, user)
  const { id, replayed } = await createOnce(req, { userId: user.id, scope: 'report', what: 'report', request: input }, (conn) => createReport(input, user.id, mail, conn))
  if (!replayed) nudgeMail()
  return createdResponse({ report: await getReport(id) }, replayed)
})
