import { withRole } from '@/app/_lib/http/access'
import { loadReport } from '@/app/_lib/reports/access'
import { getReport, markReportRead } from '@/db/queries/reports'

// POST /api/reports/:id/read — a lead engineer marks a report as read (the driver's edits end there)
export const POST = withRole<{ id: string }>(['lead_engineer'], async (_req, { user, params }) => {
  const report = await loadReport(params.id)
  await markReportRead(report.id, user.id)
  return Response.json({ report: await getReport(report.id) })
})
