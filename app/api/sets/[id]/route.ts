import { withRole } from '@/app/_lib/http/access'
import { intParam } from '@/app/_lib/http/request'
import { loadSet, setFindings, setGateFor } from '@/app/_lib/sets/service'

// GET /api/sets/:id — one set: its parts, parameter version, releases, each map's findings, the cross-map checks and the gate
export const GET = withRole<{ id: string }>('signed-in', async (_req, { params }) => {
  const set = await loadSet(intParam(params.id, 'Set id'))
  return Response.json({ set, findings: setFindings(set), gate: await setGateFor(set) })
})
