import 'server-only'
import { lookup, type MapTable } from '@/maps'
import { prepareCellSlip, type SlipEvent, type SurfaceId } from '@/physics'
import type { LoadCase, VehicleParams } from '@/physics/vehicle'

export interface EventPrediction {
  kind: 'spin' | 'lock'
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
 * For each logged event this map could have caused (spin on a drive map, lock-up on a regen map),
 * what the physics predicts at the same pedal and speed for the report's load case and surface —
 * so the engineer sees whether the model agrees with the truck.
 */
export function predictEvents(events: readonly SlipEvent[], ctx: { table: MapTable; vehicle: VehicleParams; loadCase: LoadCase; surface: SurfaceId }): EventPrediction[] {
  const at = prepareCellSlip({ vehicle: ctx.vehicle, loadCase: ctx.loadCase, surface: ctx.surface })
  const wanted = ctx.table.kind === 'drive' ? 'spin' : 'lock'
  return events
    .filter((e) => e.kind === wanted)
    .slice(0, 200)
    .map((e) => {
      const pedal = ctx.table.kind === 'drive' ? e.start.accelPedalPct : (e.start.brakePedalPct ?? 0)
      const torque = lookup(ctx.table, pedal, e.start.roadSpeedKmh)
      const r = at(ctx.table.kind === 'drive' ? torque : -torque, e.start.roadSpeedKmh)
      return {
        kind: e.kind,
        startS: e.startS,
        pedalPct: pedal,
        speedKmh: e.start.roadSpeedKmh,
        measuredPeakSlip: e.peakSlip,
        mapTorqueNm: torque,
        predictedSlip: r.slip,
        predictedBeyondPeak: r.spin || r.lock,
        utilisation: r.utilisation,
      }
    })
}
