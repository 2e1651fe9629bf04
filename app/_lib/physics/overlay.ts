/**
 * The physics overlay of a stored revision, as the overlay route and the first paint of the
 * compare and physics pages serve it. The maths lives in physics/overlay.ts.
 */
import 'server-only'
import type { MapTable } from '@/maps'
import type { VehicleParams } from '@/physics'
import { mapOverlay, type MapOverlay } from '@/physics/overlay'
import { tableMemo } from '../maps/table-memo'
import { checkLoadCase, gradeRad, physics, type OverlayQuery } from './query'

export type { MapOverlay }

/** Overlays of a stored table for the last few choices of load case, surface, grade and design acceleration (the pages flip between them). */
const memo = tableMemo<MapOverlay>(16)

/**
 * Overlay of `table` on the given load case, surface and grade, judged against the program's design
 * lateral acceleration (absent: the physics default); 400 for a load case the program lacks.
 * A pure function of its inputs, so it is memoised beside a cached table.
 */
export function overlayFor(vehicle: VehicleParams, table: MapTable, q: OverlayQuery, designLateralAccelMps2?: number): MapOverlay {
  checkLoadCase(vehicle, q.loadCase)
  const key = JSON.stringify([vehicle, q.loadCase, q.surface, q.gradePct, designLateralAccelMps2 ?? null])
  return memo(table, key, () => physics(() => mapOverlay({ vehicle, loadCase: q.loadCase, surface: q.surface, gradeRad: gradeRad(q.gradePct), map: table, designLateralAccelMps2 })))
}
