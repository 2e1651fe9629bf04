import { withRole } from '@/app/_lib/http/access'
import { NotFoundError } from '@/app/_lib/http/errors'
import { intParam } from '@/app/_lib/http/request'
import { mapReadBody } from '@/app/_lib/maps/map-read-json'

// GET /api/maps/:id — a map, its vehicle program, its latest revision and that revision's findings
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const id = intParam(params.id, 'Map id')
  const body = await mapReadBody(id)
  if (body === null) throw new NotFoundError(`Map ${id}`)
  return new Response(body, { headers: { 'content-type': 'application/json' } })
})
