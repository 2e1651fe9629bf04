import { randomUUID } from 'node:crypto'
import { withRole } from '@/app/_lib/http/access'
import { env } from '@/app/_lib/config/env'
import { ConflictError, ValidationError } from '@/app/_lib/http/errors'
import { AFTER_READ, assertOwner, assertUnread, loadReport } from '@/app/_lib/reports/access'
import { nudgeLogWorker } from '@/app/_lib/reports/log-jobs'
import { deleteObject, putObjectStream } from '@/app/_lib/storage/object-store'
import { CsvUploadGuard, guardedBody, PayloadTooLargeError, UnsupportedFileError, uploadFailure } from '@/app/_lib/http/upload-guard'
import { addLogUnlessRead, listLogs } from '@/db/queries/logs'
import { logColumnMappingSchema } from '@/app/_schemas/report'

// GET /api/reports/:id/logs — the report's logs with status and progress
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const report = await loadReport(params.id)
  return Response.json({ logs: await listLogs(report.id) })
})

// POST /api/reports/:id/logs?name=&mapping= — the filing driver uploads a CSV data log (raw body), streamed to
// storage, until a lead has read the report (409 after); audited. Analysed in the background against the report's set,
// by whichever server's log worker claims it first.
export const POST = withRole<{ id: string }>(['test_driver'], async (req, { user, params }) => {
  const report = await loadReport(params.id)
  assertOwner(report, user)
  // Refused before a byte is read; checked again, with the report row locked, when the log is recorded.
  assertUnread(report, 'add-log')
  const q = new URL(req.url).searchParams
  const fileName = (q.get('name') ?? 'log.csv').slice(0, 200)
  if (!/\.(csv|txt)$/i.test(fileName)) throw new UnsupportedFileError(`${fileName} is not a .csv file`)
  let mapping: Record<string, string> = {}
  if (q.get('mapping')) {
    try {
      mapping = logColumnMappingSchema.parse(JSON.parse(q.get('mapping') ?? '{}'))
    } catch {
      throw new ValidationError('mapping must be a JSON object of our column name → your header name')
    }
  }
  const limit = env().LOG_MAX_BYTES
  const declared = Number(req.headers.get('content-length') ?? NaN)
  // Refuse an oversize file before reading a byte of it when the client says how large it is.
  if (declared > limit) throw new PayloadTooLargeError(limit)
  if (!req.body) throw new UnsupportedFileError('The file is empty')

  const objectKey = `logs/report-${report.id}/${randomUUID()}.csv`
  const guard = new CsvUploadGuard(limit)
  const body = guardedBody(req.body as import('node:stream/web').ReadableStream<Uint8Array>, guard)
  try {
    // A failed multipart upload is aborted by the store client, which removes the parts stored so far.
    await putObjectStream(objectKey, body, 'text/csv')
  } catch (e) {
    await deleteObject(objectKey).catch(() => {})
    throw uploadFailure(guard, e)
  }
  const log = await addLogUnlessRead({ reportId: report.id, objectKey, fileName, sizeBytes: guard.bytes, mapping }, user.id)
  if (!log) {
    // A lead read the report while the file was arriving: keep nothing.
    await deleteObject(objectKey).catch(() => {})
    throw new ConflictError(AFTER_READ['add-log'])
  }
  // Stored as 'uploaded': a worker (this server's, or any other's) claims and analyses it.
  nudgeLogWorker()
  return Response.json({ log }, { status: 201 })
}, { accepts: ['text/csv'] })
