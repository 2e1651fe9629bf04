import { withRole } from '@/app/_lib/http/access'
import { ValidationError } from '@/app/_lib/http/errors'
import { loadMap, loadRevision } from '@/app/_lib/maps/access'
import { exportRevision, EXPORT_FORMATS, type ExportFormat } from '@/app/_lib/maps/export-revision'

// GET /api/maps/:id/revisions/:number/export?format=csv|json|c — download a revision
export const GET = withRole<{ id: string; number: string }>('signed-in', async (req, { params }) => {
  const format = new URL(req.url).searchParams.get('format') ?? 'csv'
  if (!EXPORT_FORMATS.includes(format as ExportFormat)) throw new ValidationError(`format must be one of ${EXPORT_FORMATS.join(', ')}`)
  const map = await loadMap(params.id)
  const revision = await loadRevision(map.id, params.number)
  const file = exportRevision(map, revision, format as ExportFormat)
  return new Response(file.body, {
    headers: { 'content-type': file.contentType, 'content-disposition': `attachment; filename="${file.filename}"` },
  })
})
