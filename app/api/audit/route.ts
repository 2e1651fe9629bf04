import Papa from 'papaparse'
import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { listAudit } from '@/db/queries/audit'

/** Cells starting like this are formulas to a spreadsheet (=, +, -, @, tab, carriage return). */
const CSV_FORMULA_START = /^[=+\-@\t\r]/

const filterSchema = z.object({
  entityType: z.string().max(40).optional(),
  action: z.string().max(60).optional(),
  actorId: z.coerce.number().int().positive().optional(),
  since: z.coerce.date().optional(),
  until: z.coerce.date().optional(),
  format: z.enum(['json', 'csv']).default('json'),
  limit: z.coerce.number().int().min(1).max(10_000).default(500),
})

// GET /api/audit?entityType=&action=&actorId=&since=&until=&format=csv — the audit trail (admin, lead engineer)
export const GET = withRole(['admin', 'lead_engineer'], async (req) => {
  const q = filterSchema.parse(Object.fromEntries(new URL(req.url).searchParams))
  const rows = await listAudit(q)
  if (q.format === 'json') return Response.json({ entries: rows })
  const csv = Papa.unparse(
    rows.map((r) => ({ at: r.at.toISOString(), actor: r.actorName ?? '', action: r.action, entity: r.entityType, entityId: r.entityId ?? '', ip: r.ip ?? '', details: JSON.stringify(r.details) })),
    // A cell a spreadsheet would run as a formula gets a leading ' (papaparse's own pattern stops at a newline).
    { escapeFormulae: CSV_FORMULA_START },
  )
  return new Response(csv, { headers: { 'content-type': 'text/csv; charset=utf-8', 'content-disposition': 'attachment; filename="mapwright-audit.csv"' } })
})
