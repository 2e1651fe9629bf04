import { Readable } from 'node:stream'
import { withRole } from '@/app/_lib/http/access'
import { NotFoundError } from '@/app/_lib/http/errors'
import { loadReport } from '@/app/_lib/reports/access'
import { intParam } from '@/app/_lib/http/request'
import { getObjectStream } from '@/app/_lib/storage/object-store'
import { getLog } from '@/db/queries/logs'

// GET /api/reports/:id/logs/:logId/file — download the raw log (signed-in users only; streamed from storage)
export const GET = withRole<{ id: string; logId: string }>('signed-in', async (_req, { params }) => {
  const report = await loadReport(params.id)
  const log = await getLog(intParam(params.logId, 'Log id'))
  if (!log || log.reportId !== report.id) throw new NotFoundError(`Log ${params.logId} of report ${report.id}`)
  const stream = await getObjectStream(log.objectKey)
  return new Response(Readable.toWeb(stream) as ReadableStream, {
    headers: {
      'content-type': 'text/csv; charset=utf-8',
      'content-length': String(log.sizeBytes),
      'content-disposition': `attachment; filename="${log.fileName.replace(/[^\w.-]+/g, '_')}"`,
    },
  })
})
