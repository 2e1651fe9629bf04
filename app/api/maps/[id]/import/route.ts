import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { loadMap, saveOnMap } from '@/app/_lib/maps/access'
import { readJson } from '@/app/_lib/http/request'
import { createdResponse, createOnce } from '@/app/_lib/http/idempotency'
import { getSavedRevision } from '@/db/queries/revisions'
import { IMPORT_BODY_LIMIT, importCsvSchema } from '@/app/_schemas/map'
import { fromCsv, limitsFromVehicle, validate } from '@/maps'

// POST /api/maps/:id/import — save a CSV table as a new revision (bad CSV: 400 naming line and column).
// Idempotency-Key: the same import sent again answers with the revision it made.
export const POST = withRole<{ id: string }>(EDITORS, async (req, { user, params }) => {
  const map = await loadMap(params.id)
  const input = await readJson(req, importCsvSchema, { maxBytes: IMPORT_BODY_LIMIT })
  const table = fromCsv(input.csv, map.kind) // a MapFormatError becomes a 400 naming the line and column
  const { id, replayed } = await createOnce(req, { userId: user.id, scope: 'revision-import', what: 'revision', request: { mapId: map.id, ...input } }, async (conn) => {
    const revision = await saveOnMap(map, { ...input, table, authorId: user.id, action: 'revision.import' }, conn)
    return revision.id
  })
  return createdResponse({ revision: await getSavedRevision(id), findings: validate(table, limitsFromVehicle(map.programParams)) }, replayed)
})
