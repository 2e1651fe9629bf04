import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { loadMap, saveOnMap } from '@/app/_lib/maps/access'
import { readJson } from '@/app/_lib/http/request'
import { createdResponse, createOnce } from '@/app/_lib/http/idempotency'
import { saveRevisionSchema } from '@/app/_schemas/map'
import { idFilter, limitParam, parseQuery } from '@/app/_schemas/query'
import { z } from 'zod'
import { countRevisions, getSavedRevision, listRevisions } from '@/db/queries/revisions'
import { limitsFromVehicle, validate } from '@/maps'

// GET /api/maps/:id/revisions?before=&limit= — the history, newest first, without tables
export const GET = withRole<{ id: string }>('signed-in', async (req, { params }) => {
  const map = await loadMap(params.id)
  const { before, limit } = parseQuery(req, z.strictObject({ before: idFilter('before').optional(), limit: limitParam(500, 50) }))
  const [revisions, total] = await Promise.all([listRevisions(map.id, { before, limit }), countRevisions(map.id)])
  return Response.json({ revisions, total })
})

// POST /api/maps/:id/revisions — save a new revision on top of parentNumber (409 if a newer one exists).
// Idempotency-Key (the draft's id): the same save sent again answers with the revision it made.
export const POST = withRole<{ id: string }>(EDITORS, async (req, { user, params }) => {
  const map = await loadMap(params.id)
  const input = await readJson(req, saveRevisionSchema)
  const { id, replayed } = await createOnce(req, { userId: user.id, scope: 'revision', what: 'revision', request: { mapId: map.id, ...input } }, async (conn) => {
    const revision = await saveOnMap(map, { ...input, authorId: user.id }, conn)
    return revision.id
  })
  return createdResponse({ revision: await getSavedRevision(id), findings: validate(input.table, limitsFromVehicle(map.programParams)) }, replayed)
})
