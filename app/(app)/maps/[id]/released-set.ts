import 'server-only'
import { getRevisionWithMap } from '@/db/queries/maps'
import { currentSetRelease } from '@/db/queries/sets'

/**
 * The revision of this map that is in the trucks now: the one the program's current released set
 * holds, when that set holds a revision of this map (it may hold another map of the same kind, or
 * none). Null when there is none.
 */
export async function releasedRevisionOfMap(map: { id: number; kind: 'drive' | 'regen'; programId: number }) {
  const current = await currentSetRelease(map.programId)
  if (!current) return null
  const revisionId = map.kind === 'drive' ? current.driveRevisionId : current.regenRevisionId
  if (revisionId === null) return null
  const found = await getRevisionWithMap(revisionId)
  if (!found || found.map.id !== map.id) return null
  return { setId: current.setId, setNumber: current.setNumber, releasedAt: current.releasedAt, releasedByName: current.releasedByName, revision: found.revision }
}

export type ReleasedRevision = NonNullable<Awaited<ReturnType<typeof releasedRevisionOfMap>>>
