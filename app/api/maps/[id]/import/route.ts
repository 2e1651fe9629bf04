import { withRole } from '@/app/_lib/http/access'
import { EDITORS } from '@/app/_lib/auth/roles'
import { loadMap, saveOnMap } from '@/app/_lib/maps/access'
import { readJson } from '@/app/_lib/http/request'
import { IMPORT_BODY_LIMIT, importCsvSchema } from '@/app/_schemas/map'
import { fromCsv, limitsFromVehicle, validate } from '@/maps'

// POST /api/maps/:id/import — save a CSV table as a new revision (bad CSV: 400 naming line and column)
export const POST = withRole<{ id: string }>(EDITORS, async (req, { user, params }) => {
  const map = await loadMap(params.id)
  const input = await readJson(req, importCsvSchema, { maxBytes: IMPORT_BODY_LIMIT })
  const table = fromCsv(input.csv, map.kind) // a MapFormatError becomes a 400 naming the line and column
  const revision = await saveOnMap(map, { ...input, table, authorId: user.id, action: 'revision.import' })
  return Response.json({ revision, findings: validate(table, limitsFromVehicle(map.programParams)) }, { status: 201 })
})
