import { withRole } from '@/app/_lib/http/access'
import { PROGRAM_EDITORS } from '@/app/_lib/auth/roles'
import { readJson } from '@/app/_lib/http/request'
import { DEFAULT_RELEASE_CONDITIONS, programInputSchema } from '@/app/_schemas/program'
import { createProgram, listPrograms } from '@/db/queries/programs'

// GET /api/programs — list vehicle programs (any signed-in user)
export const GET = withRole('signed-in', async () => Response.json({ programs: await listPrograms() }))

// POST /api/programs — create a vehicle program (its parameter version 1)
export const POST = withRole(PROGRAM_EDITORS, async (req, { user }) => {
  const input = await readJson(req, programInputSchema)
  return Response.json({ program: await createProgram({ ...input, releaseConditions: input.releaseConditions ?? DEFAULT_RELEASE_CONDITIONS }, user.id) }, { status: 201 })
})
