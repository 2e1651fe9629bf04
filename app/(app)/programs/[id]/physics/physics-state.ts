/** The physics page's choices (kept in the URL), shared by the server page and its client body. */
import type { OverlayChoice } from '@/app/_components/plots/overlay-controls'
import { unitSystem } from '@/maps'
import type { MapTable } from '@/maps'
import { SURFACE_IDS, type LoadCase } from '@/physics'
import type { MapOverlay } from '@/physics/overlay'

export interface ProgramMap { id: number; name: string; kind: 'drive' | 'regen'; latestNumber: number }

export type PhysicsState = OverlayChoice & { map: number; rev: number }

/** The first paint's revision table and overlay, worked out on the server for the state in the URL. */
export interface InitialPlots { map: number; rev: number; choice: Pick<OverlayChoice, 'loadCase' | 'surface' | 'gradePct'>; table: MapTable; overlay: MapOverlay }

export function initialState(q: Record<string, string | string[] | undefined>, maps: ProgramMap[], loadCases: LoadCase[]): PhysicsState {
  const s = (k: string) => (typeof q[k] === 'string' ? (q[k] as string) : undefined)
  const map = maps.find((m) => m.id === Number(s('map'))) ?? maps.find((m) => m.kind === 'drive') ?? maps[0]
  const rev = Number(s('rev'))
  const g = Number(s('gradePct') ?? 0)
  return {
    map: map?.id ?? 0,
    rev: map && Number.isInteger(rev) && rev >= 1 && rev <= map.latestNumber ? rev : (map?.latestNumber ?? 0),
    loadCase: loadCases.find((l) => l === s('loadCase')) ?? loadCases[0],
    surface: SURFACE_IDS.find((x) => x === s('surface')) ?? 'wet-asphalt',
    gradePct: Number.isFinite(g) && Math.abs(g) <= 30 ? g : 0,
    units: unitSystem(s('units')),
  }
}
