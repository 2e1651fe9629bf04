import { withRole } from '@/app/_lib/http/access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { NotFoundError } from '@/app/_lib/http/errors'
import { intParam, readJson } from '@/app/_lib/http/request'
import { programInputSchema } from '@/app/_schemas/program'
import { getProgram, updateProgram } from '@/db/queries/programs'

// GET /api/programs/:id — one vehicle program
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const id = intParam(params.id, 'Program id')
  const program = await getProgram(id)
  if (!program) throw new NotFoundError(`Vehicle program ${id}`)
  return Response.json({ program })
})

// PUT /api/programs/:id — replace a vehicle program's name, description and parameters
export const PUT = withRole<{ id: string }>(PROGRAM_EDITORS, async (req, { user, params }) => {
  const id = intParam(params.id, 'Program id')
  const input = await readJson(req, programInputSchema)
  const program = await updateProgram(id, input, user.id)
  if (!program) throw new NotFoundError(`Vehicle program ${id}`)
  return Response.json({ program })
})
