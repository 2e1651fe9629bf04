import { withRole } from '@/app/_lib/http/access'
import { NotFoundError } from '@/app/_lib/http/errors'
import { intParam } from '@/app/_lib/http/request'
import { getProgram } from '@/db/queries/programs'
import { listParamVersions } from '@/db/queries/param-versions'

// GET /api/programs/:id/param-versions — every parameter version of the program, newest first
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const id = intParam(params.id, 'Program id')
  if (!(await getProgram(id))) throw new NotFoundError(`Vehicle program ${id}`)
  return Response.json({ versions: await listParamVersions(id) })
})
