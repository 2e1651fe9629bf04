import { withRole } from '@/app/_lib/http/access'
import { ValidationError } from '@/app/_lib/http/errors'
import { loadMapRevision } from '@/app/_lib/maps/access'
import { exportFormat, exportRevision, EXPORT_FORMATS } from '@/app/_lib/maps/export-revision'

// GET /api/maps/:id/revisions/:number/export?format=csv|json|c — download a revision
export const GET = withRole<{ id: string; number: string }>('signed-in', async (req, { params }) => {
  const format = exportFormat(new URL(req.url).searchParams.get('format') ?? 'csv')
  if (!format) throw new ValidationError(`format must be one of ${EXPORT_FORMATS.join(', ')}`)
  const { map, revision } = await loadMapRevision(params.id, params.number)
  const file = exportRevision(map, revision, format)
  return new Response(file.body, {
    headers: { 'content-type': file.contentType, 'content-disposition': `attachment; filename="${file.filename}"` },
  })
})
