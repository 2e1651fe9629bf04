import { z } from 'zod'
import { driveTyreSchema, type DriveTyreParams } from './drive-tyre'

/**
 * Parameters of a vehicle program, in SI units (kg, m, N·m, W, rpm for motor speed only).
 * Stored as JSON on the vehicle program row and shared by the API, the forms and the physics.
 * Distances are measured rearwards from the centre of the steer (front) axle; for a 6×4 the
 * "drive axle" is the centre of the tandem group.
 */
export interface VehicleParams {
  /** Wheel arrangement; 6×4 means a tandem drive group. */
  axleLayout: '4x2' | '6x4'
  /** Kerb (empty) mass of the truck or tractor, kg. */
  emptyMassKg: number
  /** Gross vehicle weight rating as a mass, kg. */
  grossMassKg: number
  /** Steer axle to drive axle (tandem centre), m. */
  wheelbaseM: number
  /** Centre of gravity, empty: distance behind the steer axle and height above ground, m. */
  emptyCgToFrontAxleM: number
  emptyCgHeightM: number
  /** Centre of gravity at gross mass (laden), m. */
  ladenCgToFrontAxleM: number
  ladenCgHeightM: number
  /** Dynamic rolling radius of the drive tyres, m. */
  wheelRadiusM: number
  /** Gearbox ratios, lowest gear first (a single-speed e-axle has one). */
  gearRatios: number[]
  /** Final drive (axle) ratio. */
  finalDriveRatio: number
  /** Motor shaft to wheel efficiency, 0–1. */
  drivelineEfficiency: number
  /** Motor peak torque, N·m, and peak power, W. */
  motorPeakTorqueNm: number
  motorPeakPowerW: number
  /** Motor speed limit, rpm. */
  motorMaxSpeedRpm: number
  /** Battery power limits at the pack terminals, W (discharge drives, charge limits regen). */
  batteryDischargePowerW: number
  batteryChargePowerW: number
  /** Resistances: frontal area m², drag coefficient, rolling-resistance coefficient. */
  frontalAreaM2: number
  dragCoefficient: number
  rollingResistanceCoeff: number
  /** Rotating inertia: motor rotor, and all drive wheels together (wheels, tyres, hubs), kg·m². */
  motorInertiaKgM2: number
  driveWheelsInertiaKgM2: number
  /** Tractor only: a semitrailer coupled at the fifth wheel. */
  trailer?: TrailerParams | null
  /** Drive tyre (slip stiffness, shape, load sensitivity); absent = the default truck tyre (physics/drive-tyre.ts). */
  driveTyre?: DriveTyreParams | null
}

/** Semitrailer geometry and masses. Kingpin-to-axle distances are measured rearwards from the kingpin. */
export interface TrailerParams {
  /** Fifth-wheel (kingpin) position behind the tractor steer axle, and its height, m. */
  fifthWheelToFrontAxleM: number
  fifthWheelHeightM: number
  /** Kingpin to the trailer axle group centre, m. */
  kingpinToAxleM: number
  emptyMassKg: number
  grossMassKg: number
  /** Trailer CG behind the kingpin and height, empty and laden, m. */
  emptyCgToKingpinM: number
  emptyCgHeightM: number
  ladenCgToKingpinM: number
  ladenCgHeightM: number
}

const pos = (label: string, unit: string, max: number) =>
  z
    .number({ error: `${label} must be a number (${unit})` })
    .refine(Number.isFinite, `${label} must be finite`)
    .gt(0, `${label} must be greater than 0 ${unit}`)
    .max(max, `${label} must be at most ${max} ${unit}`)

export const trailerParamsSchema = z
  .object({
    fifthWheelToFrontAxleM: pos('Fifth-wheel position', 'm', 12),
    fifthWheelHeightM: pos('Fifth-wheel height', 'm', 2),
    kingpinToAxleM: pos('Kingpin to trailer axle', 'm', 15),
    emptyMassKg: pos('Trailer empty mass', 'kg', 30_000),
    grossMassKg: pos('Trailer gross mass', 'kg', 60_000),
    emptyCgToKingpinM: pos('Trailer empty CG behind kingpin', 'm', 15),
    emptyCgHeightM: pos('Trailer empty CG height', 'm', 4),
    ladenCgToKingpinM: pos('Trailer laden CG behind kingpin', 'm', 15),
    ladenCgHeightM: pos('Trailer laden CG height', 'm', 4),
  })
  .superRefine((t, ctx) => {
    if (t.grossMassKg < t.emptyMassKg)
      ctx.addIssue({ code: 'custom', path: ['grossMassKg'], message: 'Trailer gross mass must not be below its empty mass' })
    for (const k of ['emptyCgToKingpinM', 'ladenCgToKingpinM'] as const)
      if (t[k] >= t.kingpinToAxleM)
        ctx.addIssue({ code: 'custom', path: [k], message: 'Trailer CG must lie between the kingpin and the trailer axle' })
  })

export const vehicleParamsSchema = z
  .object({
    axleLayout: z.enum(['4x2', '6x4'], { error: 'Axle layout must be 4x2 or 6x4' }),
    emptyMassKg: pos('Empty mass', 'kg', 60_000),
    grossMassKg: pos('Gross mass', 'kg', 60_000),
    wheelbaseM: pos('Wheelbase', 'm', 12),
    emptyCgToFrontAxleM: pos('Empty CG behind steer axle', 'm', 12),
    emptyCgHeightM: pos('Empty CG height', 'm', 4),
    ladenCgToFrontAxleM: pos('Laden CG behind steer axle', 'm', 12),
    ladenCgHeightM: pos('Laden CG height', 'm', 4),
    wheelRadiusM: pos('Wheel radius', 'm', 1),
    gearRatios: z.array(pos('Gear ratio', '', 50)).min(1, 'At least one gear ratio is needed').max(16),
    finalDriveRatio: pos('Final drive ratio', '', 50),
    drivelineEfficiency: pos('Driveline efficiency', '', 1),
    motorPeakTorqueNm: pos('Motor peak torque', 'N·m', 50_000),
    motorPeakPowerW: pos('Motor peak power', 'W', 2_000_000),
    motorMaxSpeedRpm: pos('Motor speed limit', 'rpm', 40_000),
    batteryDischargePowerW: pos('Battery discharge power', 'W', 3_000_000),
    batteryChargePowerW: pos('Battery charge power', 'W', 3_000_000),
    frontalAreaM2: pos('Frontal area', 'm²', 20),
    dragCoefficient: pos('Drag coefficient', '', 2),
    rollingResistanceCoeff: pos('Rolling-resistance coefficient', '', 0.05),
    motorInertiaKgM2: z.number().min(0, 'Motor inertia must not be negative').max(50),
    driveWheelsInertiaKgM2: z.number().min(0, 'Drive wheel inertia must not be negative').max(500),
    trailer: trailerParamsSchema.nullish(),
    driveTyre: driveTyreSchema.nullish(),
  })
  .superRefine((v, ctx) => {
    if (v.grossMassKg < v.emptyMassKg)
      ctx.addIssue({ code: 'custom', path: ['grossMassKg'], message: 'Gross mass must not be below the empty mass' })
    for (const k of ['emptyCgToFrontAxleM', 'ladenCgToFrontAxleM'] as const)
      if (v[k] >= v.wheelbaseM)
        ctx.addIssue({ code: 'custom', path: [k], message: 'The CG must lie between the steer axle and the drive axle (less than the wheelbase)' })
    for (const k of ['emptyCgHeightM', 'ladenCgHeightM'] as const)
      if (v[k] >= v.wheelbaseM)
        ctx.addIssue({ code: 'custom', path: [k], message: 'The CG height must be below the wheelbase length' })
    if (v.trailer && v.trailer.fifthWheelToFrontAxleM > v.wheelbaseM + 1.5)
      ctx.addIssue({ code: 'custom', path: ['trailer', 'fifthWheelToFrontAxleM'], message: 'The fifth wheel must sit near the drive axle (within 1.5 m behind it)' })
  })

/** Load cases live in ./load-cases; re-exported for importers of the vehicle contract. */
export type { LoadCase } from './load-cases'
