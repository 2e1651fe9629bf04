/**
 * The traction table of a vehicle program: for every surface and load case, the largest tractive
 * and regen (braking) force the drive axle can transmit with load transfer (docs/physics.md §4–5),
 * and the motor-shaft torque that reaches it. Pure; the traction route and the physics page share it.
 */
import 'server-only'
import { axleLoadsFor, cellSlip, deliverableTorqueLimit, driveCurveFor, loadCasesFor, peakSlip, SURFACE_IDS, SURFACES, type LoadCase, type SurfaceId, type VehicleParams } from '@/physics'

export interface TractionRow {
  surface: SurfaceId
  surfaceLabel: string
  peakMu: number
  loadCase: LoadCase
  /** Peak μ of the program's drive tyre at this load case's static tyre load (differs from peakMu with load sensitivity). */
  tyreMu: number
  /** Slip ratio at the drive tyre's peak on this surface and load. */
  tyrePeakSlip: number
  /** Largest tractive force of the drive axle, kN. */
  driveLimitKN: number
  /** Motor-shaft torque that just reaches it (gear 0), N·m. */
  driveTorqueAtLimitNm: number
  /** What the motor and battery can give at low speed (5 km/h), N·m, so the reader sees whether the limit is reachable. */
  lowSpeedEnvelopeNm: number
  driveLimitedBy: 'tyre' | 'steer-axle-lift'
  /** Largest braking force of the drive axle before lock-up, kN, and the regen motor torque that reaches it, N·m (magnitudes). */
  regenLimitKN: number
  regenTorqueAtLimitNm: number
}

/** Low speed at which the table reads the envelope: above standstill, below any base speed. */
export const LOW_SPEED_KMH = 5

/** One row per surface × load case, surfaces in display order. @example tractionTable(tipper)[0].driveLimitKN */
export function tractionTable(vehicle: VehicleParams): TractionRow[] {
  const envelope = deliverableTorqueLimit(vehicle, LOW_SPEED_KMH, 'drive')
  return SURFACE_IDS.flatMap((surface) =>
    loadCasesFor(vehicle).map((loadCase) => {
      const drive = cellSlip({ vehicle, loadCase, surface, motorTorqueNm: 1, roadSpeedKmh: LOW_SPEED_KMH })
      const regen = cellSlip({ vehicle, loadCase, surface, motorTorqueNm: -1, roadSpeedKmh: LOW_SPEED_KMH })
      const curve = driveCurveFor(vehicle, axleLoadsFor(vehicle, loadCase).model, surface, 1)
      return {
        surface,
        surfaceLabel: SURFACES[surface].label,
        peakMu: SURFACES[surface].peakMu,
        loadCase,
        tyreMu: curve.D,
        tyrePeakSlip: peakSlip(curve),
        driveLimitKN: drive.limitForceN / 1000,
        driveTorqueAtLimitNm: drive.motorTorqueAtLimitNm,
        lowSpeedEnvelopeNm: envelope,
        driveLimitedBy: drive.limitedBy,
        regenLimitKN: regen.limitForceN / 1000,
        regenTorqueAtLimitNm: Math.abs(regen.motorTorqueAtLimitNm),
      }
    }),
  )
}
