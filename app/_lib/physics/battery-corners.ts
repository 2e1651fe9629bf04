/**
 * What the program's declared battery corners leave of lift-off regen and of drive (docs/physics.md §7a):
 * per corner the pack's charge and discharge power, the drive envelope at a reference speed, and for each
 * regen map the lift-off deceleration per load case and speed next to the nominal pack's. Pure.
 */
import 'server-only'
import type { ReleaseConditions } from '@/db/schema'
import { batteryPowerAt, deliverableTorqueLimit, liftOffDecelBySpeed, vehicleAtCorner, type BatteryCorner, type LoadCase, type MapTable, type VehicleParams } from '@/physics'

/** Speed at which the drive side is read: in the constant-power range of a heavy truck, where the pack limits first. */
export const DRIVE_CHECK_KMH = 60

export interface CornerLiftOff {
  mapName: string
  revision: number
  loadCase: LoadCase
  points: { speedKmh: number; nominalDecelMps2: number; decelMps2: number; limitedBy: 'map' | 'motor' | 'battery'; belowMin: boolean }[]
}

export interface CornerRow {
  corner: BatteryCorner
  chargeKW: number
  dischargeKW: number
  /** Drive torque the motor and pack give at DRIVE_CHECK_KMH, N·m, at the corner and nominal. */
  driveEnvelopeNm: number
  nominalDriveEnvelopeNm: number
  liftOff: CornerLiftOff[]
}

/**
 * One row per declared corner; empty when none is declared. A point is `belowMin` where the nominal
 * pack reaches the minimum and the corner does not (the gate's finding).
 * @example batteryCornerRows(program.params, program.releaseConditions, [{ name: 'Site regen', number: 2, table }])
 */
export function batteryCornerRows(vehicle: VehicleParams, c: ReleaseConditions, regenMaps: { name: string; number: number; table: MapTable }[]): CornerRow[] {
  const min = c.minLiftOffDecelMps2
  const nominalDrive = deliverableTorqueLimit(vehicle, DRIVE_CHECK_KMH, 'drive')
  return (c.batteryCorners ?? []).map((corner) => {
    const p = batteryPowerAt(vehicle, corner.socPct, corner.temperatureC)
    return {
      corner,
      chargeKW: p.chargePowerW / 1000,
      dischargeKW: p.dischargePowerW / 1000,
      driveEnvelopeNm: deliverableTorqueLimit(vehicleAtCorner(vehicle, corner), DRIVE_CHECK_KMH, 'drive'),
      nominalDriveEnvelopeNm: nominalDrive,
      liftOff: regenMaps.flatMap((m) =>
        c.loadCases.map((loadCase) => {
          const nominal = liftOffDecelBySpeed(vehicle, m.table, loadCase)
          return {
            mapName: m.name,
            revision: m.number,
            loadCase,
            points: liftOffDecelBySpeed(vehicle, m.table, loadCase, corner).map((pt, i) => ({
              speedKmh: pt.speedKmh,
              nominalDecelMps2: nominal[i].decelMps2,
              decelMps2: pt.decelMps2,
              limitedBy: pt.limitedBy,
              belowMin: min !== undefined && nominal[i].decelMps2 >= min && pt.decelMps2 < min,
            })),
          }
        }),
      ),
    }
  })
}
