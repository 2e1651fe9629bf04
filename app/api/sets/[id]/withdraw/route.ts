import { withRole } from '@/app/_lib/http/access'
import { intParam, readJson } from '@/app/_lib/http/request'
import { loadSet, withdrawSet } from '@/app/_lib/sets/service'
import { withdrawSetSchema } from '@/app/_schemas/set'

// POST /api/sets/:id/withdraw — withdraw the set's current release (lead engineer, reason required)
export const POST = withRole<{ id: string }>(['lead_engineer'], async (req, { user, params }) => {
  const set = await loadSet(intParam(params.id, 'Set id'))
  const { reason } = await readJson(req, withdrawSetSchema)
  return Response.json(await withdrawSet(set, user, reason))
})
