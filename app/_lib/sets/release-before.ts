import 'server-only'
import { getRevisionWithMap } from '@/db/queries/maps'
import { releaseBefore } from '@/db/queries/sets'
import { diff, type MapDiff, type MapKind } from '@/maps'

/** One map of a release against the same kind of map in the release before it. */
export type PartChange =
  | { kind: MapKind; change: 'same'; mapName: string; number: number }
  | { kind: MapKind; change: 'changed'; mapId: number; mapName: string; before: { mapId: number; mapName: string; number: number }; number: number; diff: MapDiff }
  | { kind: MapKind; change: 'none-before' }
  | { kind: MapKind; change: 'none-now' }

export interface ReleaseComparison {
  /** `withdrawnAt` set: that release had been withdrawn before this one, so the trucks had no released set between. */
  before: { setId: number; setNumber: number; releasedAt: Date; withdrawnAt: Date | null; paramVersion: number }
  parts: PartChange[]
}

/**
 * What a release changed against the release it followed in the trucks: each map (same revision,
 * or the cell changes) and the parameter version. Null for the program's first release.
 */
export async function compareWithReleaseBefore(set: {
  programId: number
  releasedAt: Date
  drive: { revisionId: number } | null
  regen: { revisionId: number } | null
}): Promise<ReleaseComparison | null> {
  const before = await releaseBefore(set.programId, set.releasedAt)
  if (!before) return null
  const part = async (kind: MapKind, nowId: number | null, beforeId: number | null): Promise<PartChange> => {
    if (nowId === null) return { kind, change: 'none-now' }
    if (beforeId === null) return { kind, change: 'none-before' }
    const [now, then] = await Promise.all([getRevisionWithMap(nowId), getRevisionWithMap(beforeId)])
    if (!now || !then) return { kind, change: 'none-before' }
    if (nowId === beforeId) return { kind, change: 'same', mapName: now.map.name, number: now.revision.number }
    return {
      kind,
      change: 'changed',
      mapId: now.map.id,
      mapName: now.map.name,
      number: now.revision.number,
      before: { mapId: then.map.id, mapName: then.map.name, number: then.revision.number },
      diff: diff(then.revision.table, now.revision.table),
    }
  }
  const parts = await Promise.all([
    part('drive', set.drive?.revisionId ?? null, before.driveRevisionId),
    part('regen', set.regen?.revisionId ?? null, before.regenRevisionId),
  ])
  return { before: { setId: before.setId, setNumber: before.setNumber, releasedAt: before.releasedAt, withdrawnAt: before.withdrawnAt, paramVersion: before.paramVersion }, parts }
}
