import { z } from 'zod'
import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { readJson } from '@/app/_lib/http/request'
import { createSetFor } from '@/app/_lib/sets/service'
import { idFilter, parseQuery } from '@/app/_schemas/query'
import { setInputSchema } from '@/app/_schemas/set'
import { getSet, listSets } from '@/db/queries/sets'

const listSchema = z.strictObject({ programId: idFilter('programId').optional(), revisionId: idFilter('revisionId').optional() })

// GET /api/sets?programId=&revisionId= — map sets, newest first, with their parts and status
export const GET = withRole('signed-in', async (req) => {
  const q = parseQuery(req, listSchema)
  return Response.json({ sets: await listSets(q) })
})

// POST /api/sets — make the set of a drive revision, a regen revision and a parameter version (or get the one that holds exactly them)
export const POST = withRole(EDITORS, async (req, { user }) => {
  const input = await readJson(req, setInputSchema)
  const made = await createSetFor(user, input)
  return Response.json({ set: await getSet(made.id), existing: made.existing }, { status: made.existing ? 200 : 201 })
})
