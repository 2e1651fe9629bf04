import { z } from 'zod'
import { driveTyreSchema, type DriveTyreParams } from './drive-tyre'

/**
 * Parameters of a vehicle program, in SI units (kg, m, N·m, W, rpm for motor speed only).
 * Stored as JSON on the vehicle program row and shared by the API, the forms and the physics.
 * Distances are measured rearwards from the centre of the steer (front) axle; for a 6×4 or 6×2 the
 * "drive axle" is the load centre of the tandem group.
 * Optional fields were added after versions were first stored; their documented defaults keep old
 * versions judging exactly as before (docs/physics.md §6a, §7a).
 */
export interface VehicleParams {
  /** Wheel arrangement: 4×2 one drive axle; 6×4 a tandem with both axles driven; 6×2 a tandem with one driven. */
  axleLayout: AxleLayout
  /** Tandem details (6×4 and 6×2 only); absent = locked inter-axle differential, no inter-axle transfer, driven axle forward. */
  tandem?: TandemParams | null
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
  /** Pack power limits over state of charge × temperature; absent = the two constants above at every corner. */
  batteryPowerTable?: BatteryPowerTable | null
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
  /**
   * The speed the controller looks the maps and ramps up on: 'road' = true road speed (a non-driven
   * axle or satellite positioning); 'driven-wheel' = drive-wheel speed from the motor speed, which a
   * wheel spin raises. Absent = 'road', so stored versions judge as before.
   */
  mapSpeedSource?: MapSpeedSource
}

export const MAP_SPEED_SOURCES = ['road', 'driven-wheel'] as const
export type MapSpeedSource = (typeof MAP_SPEED_SOURCES)[number]

export const AXLE_LAYOUTS = ['4x2', '6x4', '6x2'] as const
export type AxleLayout = (typeof AXLE_LAYOUTS)[number]

/**
 * How the tandem group shares drive force. Defaults reproduce the one-axle model of older versions:
 * locked inter-axle differential, no inter-axle load transfer, equal static shares.
 */
export interface TandemParams {
  /** 6×4: 'open' splits torque equally between the axles, 'locked' makes them turn together. Default 'locked'. */
  interAxleDifferential?: 'open' | 'locked'
  /**
   * Inter-axle load transfer ε, N of normal load per N of tandem drive force: while driving the rear
   * tandem axle gains ε·Fx and the forward one loses it (negative ε: the other way; it reverses in regen).
   * Depends on the suspension's torque reaction. Default 0.
   */
  interAxleTransfer?: number
  /** 6×2: which tandem axle is driven. Default 'forward' (tag axle behind). */
  drivenAxle?: 'forward' | 'rear'
  /** 6×2: share of the group's static load on the driven axle, 0–1 (load-shift systems raise it). Default 0.5. */
  drivenLoadShare?: number
}

/**
 * Pack power limits at the terminals, W, over state of charge (%) × cell temperature (°C):
 * chargePowerW[i][j] at socPct[i] and temperatureC[j]; looked up bilinearly, clamped at the edges.
 */
export interface BatteryPowerTable {
  socPct: number[]
  temperatureC: number[]
  chargePowerW: number[][]
  dischargePowerW: number[][]
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

const ascending = (label: string, unit: string, min: number, max: number) =>
  z
    .array(z.number({ error: `${label} must be numbers (${unit})` }).refine(Number.isFinite, `${label} must be finite`).min(min, `${label} must be at least ${min} ${unit}`).max(max, `${label} must be at most ${max} ${unit}`))
    .min(1, `${label} need at least one breakpoint`)
    .max(12, `${label} have at most 12 breakpoints`)
    .refine((a) => a.every((x, i) => i === 0 || x > a[i - 1]), `${label} must ascend strictly`)

const powerGrid = (label: string) =>
  z.array(z.array(z.number({ error: `${label} must be numbers (W)` }).refine(Number.isFinite, `${label} must be finite`).min(0, `${label} must not be negative`).max(3_000_000, `${label} must be at most 3000000 W`)))

export const batteryPowerTableSchema = z
  .object({
    socPct: ascending('State-of-charge breakpoints', '%', 0, 100),
    temperatureC: ascending('Temperature breakpoints', '°C', -40, 80),
    chargePowerW: powerGrid('Charge power'),
    dischargePowerW: powerGrid('Discharge power'),
  })
  .superRefine((t, ctx) => {
    for (const k of ['chargePowerW', 'dischargePowerW'] as const) {
      if (t[k].length !== t.socPct.length)
        ctx.addIssue({ code: 'custom', path: [k], message: `${k === 'chargePowerW' ? 'Charge' : 'Discharge'} power needs one row per state-of-charge breakpoint (${t.socPct.length})` })
      t[k].forEach((row, i) => {
        if (row.length !== t.temperatureC.length)
          ctx.addIssue({ code: 'custom', path: [k, i], message: `${k === 'chargePowerW' ? 'Charge' : 'Discharge'} power row ${i + 1} needs one value per temperature breakpoint (${t.temperatureC.length})` })
      })
    }
  })

export const tandemParamsSchema = z.object({
  interAxleDifferential: z.enum(['open', 'locked'], { error: 'Inter-axle differential must be open or locked' }).optional(),
  interAxleTransfer: z.number({ error: 'Inter-axle load transfer must be a number (N/N)' }).refine(Number.isFinite, 'Inter-axle load transfer must be finite').min(-0.5, 'Inter-axle load transfer must be at least −0.5 N/N').max(0.5, 'Inter-axle load transfer must be at most 0.5 N/N').optional(),
  drivenAxle: z.enum(['forward', 'rear'], { error: 'Driven axle must be forward or rear' }).optional(),
  drivenLoadShare: z.number({ error: 'Driven-axle load share must be a number' }).refine(Number.isFinite, 'Driven-axle load share must be finite').gt(0, 'Driven-axle load share must be greater than 0').max(1, 'Driven-axle load share must be at most 1').optional(),
})

export const vehicleParamsSchema = z
  .object({
    axleLayout: z.enum(AXLE_LAYOUTS, { error: 'Axle layout must be 4x2, 6x4 or 6x2' }),
    tandem: tandemParamsSchema.nullish(),
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
    batteryPowerTable: batteryPowerTableSchema.nullish(),
    frontalAreaM2: pos('Frontal area', 'm²', 20),
    dragCoefficient: pos('Drag coefficient', '', 2),
    rollingResistanceCoeff: pos('Rolling-resistance coefficient', '', 0.05),
    motorInertiaKgM2: z.number().min(0, 'Motor inertia must not be negative').max(50),
    driveWheelsInertiaKgM2: z.number().min(0, 'Drive wheel inertia must not be negative').max(500),
    trailer: trailerParamsSchema.nullish(),
    driveTyre: driveTyreSchema.nullish(),
    mapSpeedSource: z.enum(MAP_SPEED_SOURCES, { error: 'Map lookup speed must be road or driven-wheel' }).optional(),
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
