import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { loadReport } from '@/app/_lib/reports/access'
import { replayReport } from '@/app/_lib/reports/replay'
import { idFilter, parseQuery } from '@/app/_schemas/query'

const querySchema = z.strictObject({ setId: idFilter('setId'), logId: idFilter('logId').optional() })

// GET /api/reports/:id/replay?setId=&logId= — the report's log (its first analysed one unless named) replayed
// through a set of the same program: both sets' torque requests, predicted vs measured slip, where the candidate asks for more
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const report = await loadReport(params.id)
  const q = parseQuery(req, querySchema)
  return Response.json(await replayReport(report, q.setId, q.logId))
})
