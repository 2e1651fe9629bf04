import { withRole } from '@/app/_lib/http/access'
import { intParam, readJson } from '@/app/_lib/http/request'
import { loadSet, releaseSet } from '@/app/_lib/sets/service'
import { releaseSetSchema } from '@/app/_schemas/set'

// POST /api/sets/:id/release — release the set to its program (lead engineer; gate, acknowledgements with reasons, frozen package)
export const POST = withRole<{ id: string }>(['lead_engineer'], async (req, { user, params }) => {
  const set = await loadSet(intParam(params.id, 'Set id'))
  const { acknowledgements } = await readJson(req, releaseSetSchema)
  return Response.json(await releaseSet(set, user, acknowledgements))
})
