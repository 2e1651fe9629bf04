import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { NotFoundError } from '@/app/_lib/http/errors'
import { intParam, readJson } from '@/app/_lib/http/request'
import { rampVersionInputSchema } from '@/app/_schemas/ramps'
import { getProgram } from '@/db/queries/programs'
import { getRampVersion, insertRampVersion, listRampVersions } from '@/db/queries/ramp-versions'

// GET /api/programs/:id/ramp-versions — every torque ramp version of the program, newest first
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const id = intParam(params.id, 'Program id')
  if (!(await getProgram(id))) throw new NotFoundError(`Vehicle program ${id}`)
  return Response.json({ versions: await listRampVersions(id) })
})

// POST /api/programs/:id/ramp-versions — a new ramp version (engineers); versions never change, sets name the one they hold
export const POST = withRole<{ id: string }>(EDITORS, async (req, { user, params }) => {
  const id = intParam(params.id, 'Program id')
  const input = await readJson(req, rampVersionInputSchema)
  if (!(await getProgram(id))) throw new NotFoundError(`Vehicle program ${id}`)
  const made = await insertRampVersion({ programId: id, limits: input.limits, reason: input.reason, createdBy: user.id })
  return Response.json({ version: await getRampVersion(made.id) }, { status: 201 })
})
