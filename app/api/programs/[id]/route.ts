import { withRole } from '@/app/_lib/http/access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { NotFoundError, ValidationError } from '@/app/_lib/http/errors'
import { intParam, readJson } from '@/app/_lib/http/request'
import { programInputSchema } from '@/app/_schemas/program'
import { getProgram, updateProgram } from '@/db/queries/programs'

// GET /api/programs/:id — one vehicle program (params and release conditions of its latest parameter version)
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const id = intParam(params.id, 'Program id')
  const program = await getProgram(id)
  if (!program) throw new NotFoundError(`Vehicle program ${id}`)
  return Response.json({ program })
})

// PUT /api/programs/:id — change name and description; a change to parameters or release conditions makes a new parameter version (reason required)
export const PUT = withRole<{ id: string }>(PROGRAM_EDITORS, async (req, { user, params }) => {
  const id = intParam(params.id, 'Program id')
  const input = await readJson(req, programInputSchema)
  const current = await getProgram(id)
  if (!current) throw new NotFoundError(`Vehicle program ${id}`)
  const result = await updateProgram(id, { ...input, releaseConditions: input.releaseConditions ?? current.releaseConditions }, user.id)
  if (!result.ok && result.reason === 'missing') throw new NotFoundError(`Vehicle program ${id}`)
  if (!result.ok) throw new ValidationError('reason: say why the parameters or release conditions change; the change makes a new parameter version')
  return Response.json({ program: result.program, newParamVersion: result.newVersion })
})
