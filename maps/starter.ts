/**
 * A first table for a new map, so an engineer starts from something sensible rather than a
 * grid of zeros: drive maps rise linearly with pedal up to the motor envelope at each speed;
 * regen maps start at zero (no lift-off regen until someone decides how much).
 */
import { motorEnvelopeAt, chargeLimitTorqueAt } from './envelope'
import type { MapLimits } from './limits'
import type { MapKind, MapTable } from './table'

/** Default breakpoints: dense at low pedal and low speed, where launches and tip-in happen. */
export const STARTER_PEDAL_AXIS = [0, 5, 10, 20, 30, 40, 50, 60, 70, 80, 90, 100]
export const STARTER_SPEED_AXIS = [0, 3, 6, 10, 15, 20, 30, 40, 50, 60, 70, 80, 90]

/**
 * @example starterTable('drive', limits).values[11][0] // limits.motorPeakTorqueNm (100 % pedal, 0 km/h)
 */
export function starterTable(kind: MapKind, limits: MapLimits): MapTable {
  const rowAxis = [...STARTER_PEDAL_AXIS]
  const colAxis = [...STARTER_SPEED_AXIS]
  const values = rowAxis.map((p) =>
    colAxis.map((s) => {
      if (kind === 'regen') return 0
      // Floor to whole N·m so a value at the envelope never rounds above it.
      return Math.floor((p / 100) * motorEnvelopeAt(limits, s))
    }),
  )
  return { kind, rowAxis, colAxis, values }
}

/** The largest regen torque the battery accepts at each speed breakpoint (for the regen starter hint). */
export function regenCeilingBySpeed(limits: MapLimits, colAxis: readonly number[]): number[] {
  return colAxis.map((s) => Math.min(motorEnvelopeAt(limits, s), chargeLimitTorqueAt(limits, s)))
}
