import 'server-only'
import { lookup, type MapTable } from '@/maps'
import { prepareCellSlip, type MapKind, type SlipEvent, type SurfaceId } from '@/physics'
import type { LoadCase, VehicleParams } from '@/physics/vehicle'

export interface EventPrediction {
  kind: 'spin' | 'lock'
  /** The map of the set the event is judged against: spin on the drive map, lock-up on the regen map. */
  map: MapKind
  startS: number
  pedalPct: number
  speedKmh: number
  measuredPeakSlip: number
  /** Torque the map asks for where the event began, N·m (regen: braking). */
  mapTorqueNm: number
  /** Slip the model predicts there, null beyond the tyre's peak. */
  predictedSlip: number | null
  /** True when the model also predicts spin (drive) or lock-up (regen) there. */
  predictedBeyondPeak: boolean
  utilisation: number
}

/**
 * For each logged event a map of the set could have caused — wheel spin on its drive map, lock-up
 * on its regen map — what the physics predicts at the same pedal and speed with the set's
 * parameter version, the report's load case and surface: so the engineer sees whether the model
 * agrees with the truck. An event whose map the set does not hold is left out. In time order.
 */
export function predictEvents(
  events: readonly SlipEvent[],
  ctx: { drive: MapTable | null; regen: MapTable | null; vehicle: VehicleParams; loadCase: LoadCase; surface: SurfaceId },
): EventPrediction[] {
  const at = prepareCellSlip({ vehicle: ctx.vehicle, loadCase: ctx.loadCase, surface: ctx.surface })
  const out: EventPrediction[] = []
  for (const e of events) {
    if (out.length >= 200) break
    const map: MapKind = e.kind === 'spin' ? 'drive' : 'regen'
    const table = ctx[map]
    if (!table) continue
    const pedal = map === 'drive' ? e.start.accelPedalPct : (e.start.brakePedalPct ?? 0)
    const torque = lookup(table, pedal, e.start.roadSpeedKmh)
    const r = at(map === 'drive' ? torque : -torque, e.start.roadSpeedKmh)
    out.push({
      kind: e.kind,
      map,
      startS: e.startS,
      pedalPct: pedal,
      speedKmh: e.start.roadSpeedKmh,
      measuredPeakSlip: e.peakSlip,
      mapTorqueNm: torque,
      predictedSlip: r.slip,
      predictedBeyondPeak: r.spin || r.lock,
      utilisation: r.utilisation,
    })
  }
  return out
}
