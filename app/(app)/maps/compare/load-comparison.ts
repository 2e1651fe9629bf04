/**
 * First-paint data of the compare page: both revisions, their maps, the cell diff and the
 * overlays for the choice in the URL. Refuses pairs that cannot be compared, with the reason.
 */
import 'server-only'
import { overlayFor } from '@/app/_lib/physics/overlay'
import { getMapWithRevision } from '@/db/queries/maps'
import { diff } from '@/maps'
import { loadCasesFor } from '@/physics'
import { initialChoice, type CompareViewData, type Side } from './compare-data'
import type { RevisionRef } from './revision-ref'

export type Comparison = { ok: true; view: CompareViewData } | { ok: false; problem: string }

/** A map and one of its revisions in one query (the table from the revision-table cache); null when either is missing. */
async function side(ref: RevisionRef) {
  const found = await getMapWithRevision(ref.mapId, ref.number)
  return found && { map: found.map, rev: found.revision }
}

export async function loadComparison(a: RevisionRef, b: RevisionRef, q: Record<string, string | string[] | undefined>): Promise<Comparison> {
  const [sa, sb] = await Promise.all([side(a), side(b)])
  if (!sa) return { ok: false, problem: `Revision ${a.number} of map ${a.mapId} was not found.` }
  if (!sb) return { ok: false, problem: `Revision ${b.number} of map ${b.mapId} was not found.` }
  if (sa.map.programId !== sb.map.programId)
    return { ok: false, problem: `These revisions belong to different vehicle programs (${sa.map.programName} and ${sb.map.programName}); a comparison only makes sense on one vehicle.` }
  if (sa.map.kind !== sb.map.kind)
    return { ok: false, problem: `“${sa.map.name}” is a ${sa.map.kind} map and “${sb.map.name}” is a ${sb.map.kind} map; compare drive with drive or regen with regen.` }
  const vehicle = sa.map.programParams
  const loadCases = loadCasesFor(vehicle)
  const choice = initialChoice(q, loadCases)
  const design = sa.map.programReleaseConditions?.designLateralAccelMps2
  const toSide = (s: NonNullable<typeof sa>): Side => ({ mapId: s.map.id, mapName: s.map.name, number: s.rev.number, message: s.rev.message, checksum: s.rev.checksum, table: s.rev.table })
  return {
    ok: true,
    view: {
      programId: sa.map.programId,
      programName: sa.map.programName,
      kind: sa.map.kind,
      loadCases,
      a: toSide(sa),
      b: toSide(sb),
      diff: diff(sa.rev.table, sb.rev.table),
      initialChoice: choice,
      initialOverlays: { a: overlayFor(vehicle, sa.rev.table, choice, design), b: overlayFor(vehicle, sb.rev.table, choice, design) },
    },
  }
}
