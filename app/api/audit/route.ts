import Papa from 'papaparse'
import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { listAudit } from '@/db/queries/audit'
import { dateFilter, idFilter, limitParam, parseQuery } from '@/app/_schemas/query'

/** Cells starting like this are formulas to a spreadsheet (=, +, -, @, tab, carriage return). */
const CSV_FORMULA_START = /^[=+\-@\t\r]/

const filterSchema = z.strictObject({
  entityType: z.string().max(40, 'entityType must be at most 40 characters').optional(),
  action: z.string().max(60, 'action must be at most 60 characters').optional(),
  actorId: idFilter('actorId').optional(),
  since: dateFilter('since').optional(),
  until: dateFilter('until').optional(),
  format: z.enum(['json', 'csv'], { error: 'format must be json or csv' }).default('json'),
  limit: limitParam(10_000, 500),
})

// GET /api/audit?entityType=&action=&actorId=&since=&until=&format=csv — the audit trail (admin, lead engineer)
export const GET = withRole(['admin', 'lead_engineer'], async (req) => {
  const q = parseQuery(req, filterSchema)
  const rows = await listAudit(q)
  if (q.format === 'json') return Response.json({ entries: rows })
  const csv = Papa.unparse(
    rows.map((r) => ({ at: r.at.toISOString(), actor: r.actorName ?? '', action: r.action, entity: r.entityType, entityId: r.entityId ?? '', ip: r.ip ?? '', details: JSON.stringify(r.details) })),
    // A cell a spreadsheet would run as a formula gets a leading ' (papaparse's own pattern stops at a newline).
    { escapeFormulae: CSV_FORMULA_START },
  )
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': 'attachment; filename="mapwright-audit.csv"' } })
})
