import Papa from 'papaparse'
import { withRole } from '@/app/_lib/http/access'
import { countAudit, listAudit } from '@/db/queries/audit'
import { auditFilterSchema } from '@/app/_schemas/audit'
import { parseQuery } from '@/app/_schemas/query'
import { AUDIT_READERS } from '@/domain/roles'

/** Cells starting like this are formulas to a spreadsheet (=, +, -, @, tab, carriage return). */
const CSV_FORMULA_START = /^[=+\-@\t\r]/


// GET /api/audit?entityType=&action=&actorId=&since=&until=&limit=&page=&format=csv — the audit trail, newest first, a page at a time (admin, lead engineer)
export const GET = withRole(AUDIT_READERS, async (req) => {
  const q = parseQuery(req, auditFilterSchema)
  const filter = { ...q, offset: (q.page - 1) * q.limit }
  const rows = await listAudit(filter)
  if (q.format === 'json') return Response.json({ entries: rows, page: q.page, pageSize: q.limit, total: await countAudit(filter) })
  const csv = Papa.unparse(
    rows.map((r) => ({ at: r.at.toISOString(), actor: r.actorName ?? '', action: r.action, entity: r.entityType, entityId: r.entityId ?? '', ip: r.ip ?? '', details: JSON.stringify(r.details) })),
    // A cell a spreadsheet would run as a formula gets a leading ' (papaparse's own pattern stops at a newline).
    { escapeFormulae: CSV_FORMULA_START },
  )
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': 'attachment; filename="mapwright-audit.csv"' } })
})
