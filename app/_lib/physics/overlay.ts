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

/** Overlays of a stored table for the last few choices of load case, surface and grade (the pages flip between them). */
const memo = tableMemo<MapOverlay>(16)

/** Overlay of `table` on the given load case, surface and grade; 400 for a load case the program lacks. */
export function overlayFor(vehicle: VehicleParams, table: MapTable, q: OverlayQuery): MapOverlay {
  checkLoadCase(vehicle, q.loadCase)
  const key = JSON.stringify([vehicle, q.loadCase, q.surface, q.gradePct])
  return memo(table, key, () => physics(() => mapOverlay({ vehicle, loadCase: q.loadCase, surface: q.surface, gradeRad: gradeRad(q.gradePct), map: table })))
}
