import { withRole } from '@/app/_lib/http/access'
import { intParam } from '@/app/_lib/http/request'
import { loadSet, setGateFor } from '@/app/_lib/sets/service'

// GET /api/sets/:id/gate — the release conditions of the set, each met or not, with the evidence
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const set = await loadSet(intParam(params.id, 'Set id'))
  return Response.json({ gate: await setGateFor(set) })
})
