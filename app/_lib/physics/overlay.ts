/**
 * The physics overlay of a stored revision, as the overlay route and the first paint of the
 * compare and physics pages serve it. The maths lives in physics/overlay.ts.
 */
import 'server-only'
import type { MapTable } from '@/maps'
import type { VehicleParams } from '@/physics'
import { mapOverlay, type MapOverlay } from '@/physics/overlay'
import { checkLoadCase, gradeRad, physics, type OverlayQuery } from './query'

export type { MapOverlay }

/**
 * Overlay of `table` on the given load case, surface and grade, judged against the program's design
 * lateral acceleration (absent: the physics default); 400 for a load case the program lacks.
 */
export function overlayFor(vehicle: VehicleParams, table: MapTable, q: OverlayQuery, designLateralAccelMps2?: number): MapOverlay {
  checkLoadCase(vehicle, q.loadCase)
  return physics(() => mapOverlay({ vehicle, loadCase: q.loadCase, surface: q.surface, gradeRad: gradeRad(q.gradePct), map: table, designLateralAccelMps2 }))
}
