import 'server-only'
import type { Db } from '@/db/client'
import { getMap, getMapWithRevision, getMapWithRevisionPair, type MapWithProgram } from '@/db/queries/maps'
import { getRevision, saveRevision, type Revision } from '@/db/queries/revisions'
import type { MapTable } from '@/maps'
import { ConflictError, NotFoundError, ValidationError } from '../http/errors'
import { intParam } from '../http/request'

/** The map named by a route's `:id`, or a 404. */
export async function loadMap(idParam: string | undefined): Promise<MapWithProgram> {
  const id = intParam(idParam, 'Map id')
  const map = await getMap(id)
  if (!map) throw new NotFoundError(`Map ${id}`)
  return map
}

/** A revision by number, or the latest for 'latest'; 404 when missing. */
export async function loadRevision(mapId: number, numberParam: string | undefined): Promise<Revision> {
  const number = numberParam === 'latest' ? undefined : intParam(numberParam, 'Revision number')
  const rev = await getRevision(mapId, number)
  if (!rev) throw new NotFoundError(number === undefined ? `A revision of map ${mapId}` : `Revision ${number} of map ${mapId}`)
  return rev
}

/**
 * The map and revision a route's `:id` and `:number` name, in one query. A miss goes through
 * loadMap and loadRevision, so the errors and their order (map first, then the number) are theirs.
 */
export async function loadMapRevision(idParam: string | undefined, numberParam: string | undefined): Promise<{ map: MapWithProgram; revision: Revision }> {
  const id = intParam(idParam, 'Map id')
  const number = numberParam === 'latest' ? undefined : optionalInt(numberParam)
  const found = number === null ? null : await getMapWithRevision(id, number)
  if (found) return found
  const map = await loadMap(idParam)
  return { map, revision: await loadRevision(map.id, numberParam) }
}

type MapRevision = Awaited<ReturnType<typeof loadMapRevision>>

/**
 * The two sides of a diff: revision `a` of map `idParam` and revision `b` of map `bMapParam` (the
 * same map when absent). Two numbered revisions of one map come in one query; anything else, and
 * any miss, goes through loadMapRevision for each side, so the errors are its own and A's is the
 * one answered when both sides fail.
 */
export async function loadRevisionPair(idParam: string | undefined, aParam: string | undefined, bParam: string | undefined, bMapParam?: string): Promise<{ a: MapRevision; b: MapRevision }> {
  if (!bMapParam || bMapParam === idParam) {
    const [id, a, b] = [optionalInt(idParam), optionalInt(aParam), optionalInt(bParam)]
    const pair = id !== null && a !== null && b !== null ? await getMapWithRevisionPair(id, a, b) : null
    if (pair) return pair
  }
  const [ra, rb] = await Promise.allSettled([loadMapRevision(idParam, aParam), loadMapRevision(bMapParam || idParam, bParam)])
  if (ra.status === 'rejected') throw ra.reason
  if (rb.status === 'rejected') throw rb.reason
  return { a: ra.value, b: rb.value }
}

function optionalInt(param: string | undefined): number | null {
  try {
    return intParam(param, 'Revision number')
  } catch {
    return null
  }
}

/** Save on top of parentNumber; a stale parent is a 409 that names the newer revision. */
export async function saveOnMap(
  map: MapWithProgram,
  input: { parentNumber: number; message: string; notes: string; table: MapTable; authorId: number; action?: string },
  conn?: Db,
) {
  if (input.table.kind !== map.kind) throw new ValidationError(`table.kind: this is a ${map.kind} map; the table is a ${input.table.kind} table`)
  const result = await saveRevision({ mapId: map.id, ...input }, conn)
  if (result.ok) return result.revision
  if (result.reason === 'no-map') throw new NotFoundError(`Map ${map.id}`)
  throw new ConflictError(
    `Revision ${result.latestNumber} was saved after the revision ${input.parentNumber} you started from. Your edits are kept; compare with revision ${result.latestNumber} and save again on top of it.`,
    { latestNumber: result.latestNumber, parentNumber: input.parentNumber },
  )
}
