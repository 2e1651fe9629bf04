import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { NotFoundError, ValidationError } from '@/app/_lib/http/errors'
import { readJson } from '@/app/_lib/http/request'
import { createMapSchema } from '@/app/_schemas/map'
import { idFilter, parseQuery } from '@/app/_schemas/query'
import { z } from 'zod'
import { createMap, listMaps } from '@/db/queries/maps'
import { getProgram } from '@/db/queries/programs'

// GET /api/maps?programId= — the maps, with their latest revision number
export const GET = withRole('signed-in', async (req) => {
  const { programId } = parseQuery(req, z.strictObject({ programId: idFilter('programId').optional() }))
  return Response.json({ maps: await listMaps(programId ? { programId } : {}) })
})

// POST /api/maps — create a map with its first revision
export const POST = withRole(EDITORS, async (req, { user }) => {
  const input = await readJson(req, createMapSchema)
  if (input.table.kind !== input.kind) throw new ValidationError(`table.kind: must match the map kind '${input.kind}'`)
  if (!(await getProgram(input.programId))) throw new NotFoundError(`Vehicle program ${input.programId}`)
  const created = await createMap(input, user.id)
  return Response.json(created, { status: 201 })
})
