/** Shapes shared by the compare page's server loader and its client view. */
import type { OverlayChoice } from '@/app/_components/plots/overlay-controls'
import { unitSystem } from '@/maps'
import type { MapOverlay } from '@/physics/overlay'
import { SURFACE_IDS, type LoadCase, type SurfaceId } from '@/physics'
import type { MapDiff, MapTable } from '@/maps'

export interface Side {
  mapId: number
  mapName: string
  number: number
  message: string
  checksum: string
  table: MapTable
}

export interface CompareViewData {
  programId: number
  programName: string
  kind: 'drive' | 'regen'
  loadCases: LoadCase[]
  a: Side
  b: Side
  diff: MapDiff
  initialChoice: OverlayChoice
  initialOverlays: { a: MapOverlay; b: MapOverlay }
}

/** Default overlay: the first load case on gravel, a loose site surface where grip runs out early. */
export const DEFAULT_SURFACE: SurfaceId = 'gravel'

const one = (v: string | string[] | undefined) => (typeof v === 'string' ? v : undefined)

/** The overlay choice from a URL query; anything unknown or not offered by the program falls back to the default. */
export function initialChoice(q: Record<string, string | string[] | undefined>, loadCases: LoadCase[]): OverlayChoice {
  const lc = one(q.loadCase)
  const s = one(q.surface)
  const g = Number(one(q.gradePct) ?? 0)
  return {
    loadCase: loadCases.find((l) => l === lc) ?? loadCases[0],
    surface: SURFACE_IDS.find((x) => x === s) ?? DEFAULT_SURFACE,
    gradePct: Number.isFinite(g) && Math.abs(g) <= 30 ? g : 0,
    units: unitSystem(one(q.units)),
  }
}
