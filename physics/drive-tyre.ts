/**
 * The program's drive tyre: its longitudinal slip stiffness, shape and the load sensitivity of its
 * peak friction. A road surface only sets the grip (peak μ); the tyre keeps its stiffness on every
 * surface, as the brush model says it does (Pacejka, Tire and Vehicle Dynamics, ch. 3: the slope at
 * zero slip, C_κ = 2·c_p·a², comes from tread stiffness and contact length, not from μ).
 *
 * Magic Formula coefficients for a surface of peak μ_s at tyre load F_z:
 *   D = μ_s·(1 − k·(F_z/F_z,nom − 1))           (peak μ falls with load, k ≥ 0)
 *   B = (C_κ/F_z) / (C·D)                        (so that the slope at zero slip B·C·D = C_κ/F_z)
 * C and E are the tyre's shape, unchanged by the surface.
 */
import { z } from 'zod'
import { PhysicsInputError, requireFinite } from './errors'
import type { MagicFormulaCoeffs } from './tyre'
import type { VehicleParams } from './vehicle'

/** Drive tyre parameters; every field is optional and falls back to {@link DEFAULT_DRIVE_TYRE}. */
export interface DriveTyreParams {
  /** Longitudinal slip stiffness per unit load, C_κ/F_z (N per unit slip per N of load; dimensionless). */
  slipStiffnessPerLoad?: number
  /** Load sensitivity k of peak μ: μ = μ_surface·(1 − k·(F_z/F_z,nom − 1)). 0 = none. */
  peakMuLoadSensitivity?: number
  /** Nominal load of one drive tyre F_z,nom, N: the surface table's μ holds at this load. */
  nominalLoadPerTyreN?: number
  /** Magic Formula shape factor C (1 < C ≤ 2); sets the sliding/peak ratio. */
  shapeC?: number
  /** Magic Formula curvature factor E (< 1); moves the peak along the slip axis. */
  shapeE?: number
  /** Tyres sharing the drive group's load, all together (duals count two per side). Default 4 for 4×2, 8 for 6×4 and 6×2 (the tag axle's too). */
  tyreCount?: number
}

/** A drive tyre with every field filled in. */
export type DriveTyre = Required<DriveTyreParams>

/**
 * The default truck drive tyre, applied to every program that states none (including every
 * parameter version stored before the field existed).
 * - C_κ/F_z = 12: inside the range 8–20 for heavy-truck radial tyres near rated load (recalled
 *   from memory, common practice; not checked against a primary table). Passenger-car tyres sit
 *   higher, about 15–25 (also from memory).
 * - C = 1.5, E = 0.3: chosen so the curve peaks where the parabolic-pressure brush model reaches
 *   full sliding, κ_sl = 3·μ/(C_κ/F_z) (Pacejka ch. 3), and the value at locked wheel (κ = 1) is
 *   about 0.76 of the peak, the sliding/peak ratio of the snow and ice rows of Wong's road-adhesion
 *   table (Theory of Ground Vehicles, ch. 1; recalled from memory).
 * - k = 0: no load sensitivity unless the program states one, so the traction limits of stored
 *   versions stay exactly as they were. Truck tyres do lose μ with load; enter k from tyre data.
 * - F_z,nom = 30 kN: about a 22.5-inch drive tyre's rated load in dual fitment (common practice).
 */
export const DEFAULT_DRIVE_TYRE: Readonly<Omit<DriveTyre, 'tyreCount'>> = Object.freeze({
  slipStiffnessPerLoad: 12,
  peakMuLoadSensitivity: 0,
  nominalLoadPerTyreN: 30_000,
  shapeC: 1.5,
  shapeE: 0.3,
})

const num = (label: string) => z.number({ error: `${label} must be a number` }).refine(Number.isFinite, `${label} must be finite`)

export const driveTyreSchema = z.object({
  slipStiffnessPerLoad: num('Slip stiffness per unit load').min(2, 'Slip stiffness per unit load must be at least 2').max(60, 'Slip stiffness per unit load must be at most 60').optional(),
  peakMuLoadSensitivity: num('Load sensitivity of peak μ').min(0, 'Load sensitivity of peak μ must not be negative').max(0.5, 'Load sensitivity of peak μ must be at most 0.5').optional(),
  nominalLoadPerTyreN: num('Nominal tyre load').gt(0, 'Nominal tyre load must be greater than 0 N').max(200_000, 'Nominal tyre load must be at most 200 000 N').optional(),
  shapeC: num('Shape factor C').gt(1, 'Shape factor C must be greater than 1 (a curve with a peak)').max(2, 'Shape factor C must be at most 2').optional(),
  shapeE: num('Curvature factor E').min(-5, 'Curvature factor E must be at least −5').lt(1, 'Curvature factor E must be below 1').optional(),
  tyreCount: z.number({ error: 'Drive tyre count must be a number' }).int('Drive tyre count must be a whole number').min(2, 'Drive tyre count must be at least 2').max(16, 'Drive tyre count must be at most 16').optional(),
})

/**
 * The program's drive tyre with defaults filled in; validates the stated fields.
 * @example resolveDriveTyre(truck).slipStiffnessPerLoad // 12 unless the program says otherwise
 */
export function resolveDriveTyre(vehicle: Pick<VehicleParams, 'axleLayout' | 'driveTyre'>): DriveTyre {
  const given = vehicle.driveTyre ?? {}
  const parsed = driveTyreSchema.safeParse(given)
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    throw new PhysicsInputError(`driveTyre.${issue.path.join('.')}`, issue.message)
  }
  const p = parsed.data
  return {
    slipStiffnessPerLoad: p.slipStiffnessPerLoad ?? DEFAULT_DRIVE_TYRE.slipStiffnessPerLoad,
    peakMuLoadSensitivity: p.peakMuLoadSensitivity ?? DEFAULT_DRIVE_TYRE.peakMuLoadSensitivity,
    nominalLoadPerTyreN: p.nominalLoadPerTyreN ?? DEFAULT_DRIVE_TYRE.nominalLoadPerTyreN,
    shapeC: p.shapeC ?? DEFAULT_DRIVE_TYRE.shapeC,
    shapeE: p.shapeE ?? DEFAULT_DRIVE_TYRE.shapeE,
    tyreCount: p.tyreCount ?? (vehicle.axleLayout === '4x2' ? 4 : 8), // the rear group's tyres share its load (a 6×2's tag axle too)
  }
}

/** Lowest peak μ the load sensitivity may leave, as a fraction of the surface's μ (keeps D > 0 under any overload). */
const MIN_MU_FRACTION = 0.2

/**
 * Peak μ of the tyre at load F_z on a surface of peak μ_s: μ_s·(1 − k·(F_z/F_z,nom − 1)), floored at 0.2·μ_s.
 * @example peakMuAtLoad({ ...tyre, peakMuLoadSensitivity: 0.1 }, 0.8, 33_000) // 0.8·(1 − 0.1·0.1) = 0.792
 */
export function peakMuAtLoad(tyre: DriveTyre, surfaceMu: number, loadPerTyreN: number): number {
  requireFinite('loadPerTyreN', loadPerTyreN)
  if (!(surfaceMu > 0 && Number.isFinite(surfaceMu))) throw new PhysicsInputError('surface.peakMu', `must be a finite number > 0 (got ${String(surfaceMu)})`)
  const f = 1 - tyre.peakMuLoadSensitivity * (Math.max(loadPerTyreN, 0) / tyre.nominalLoadPerTyreN - 1)
  return surfaceMu * Math.max(f, MIN_MU_FRACTION)
}

/**
 * Magic Formula coefficients of the tyre on a surface of peak μ_s at load F_z per tyre:
 * D = peak μ at that load, C and E from the tyre, B = (C_κ/F_z)/(C·D).
 * @example tyreCurve(resolveDriveTyre(truck), 0.1, 30_000) // { B: 80, C: 1.5, D: 0.1, E: 0.3 }
 */
export function tyreCurve(tyre: DriveTyre, surfaceMu: number, loadPerTyreN: number): MagicFormulaCoeffs {
  const D = peakMuAtLoad(tyre, surfaceMu, loadPerTyreN)
  return { B: tyre.slipStiffnessPerLoad / (tyre.shapeC * D), C: tyre.shapeC, D, E: tyre.shapeE }
}
