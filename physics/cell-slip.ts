/**
 * Quasi-steady slip prediction for one map cell: motor torque → wheel force → drive-axle load
 * (with load transfer) → force ratio Fx/Fz → slip on the rising branch of the program's drive-tyre
 * curve for the surface, and the lateral acceleration the drive axle can still hold (friction ellipse).
 */
import { driveAxleLoadN, steerLiftForceN } from './axle-model'
import { deliverableAtShaft } from './envelope'
import { motorTorqueFromWheel, overallRatio } from './driveline'
import { requireFinite } from './errors'
import { driveCurveFor } from './drive-curve'
import { lateralCapacityMps2 } from './friction-ellipse'
import { axleLoadsFor } from './load-case'
import type { Surface, SurfaceId } from './surfaces'
import { gradeCos } from './traction'
import { peakForceRatio, slipSolverFor } from './tyre'
import { kmhToMps } from './units'
import { criticalAxleLoadN, criticalForceRatio, drivenAxlesFor, drivenLimitN } from './tandem'
import type { LoadCase } from './load-cases'
import type { VehicleParams } from './vehicle'

/** Inputs that stay fixed across the cells of a map. */
export interface CellContext {
  vehicle: VehicleParams
  loadCase: LoadCase
  surface: Surface | SurfaceId
  /** Road grade, rad (uphill > 0). Default 0. */
  gradeRad?: number
  /** Gear, 0 = lowest (default). */
  gearIndex?: number
  /** Clip the requested torque to the motor/battery envelope first (default true). */
  applyEnvelope?: boolean
}

/** Result for one cell. Forces in N, torques in N·m at the motor shaft (negative = regen). */
export interface CellSlipResult {
  requestedTorqueNm: number
  /** Torque after the motor/battery envelope (equals the request when applyEnvelope is false). */
  deliveredTorqueNm: number
  envelopeLimited: boolean
  /** Longitudinal force of the drive axle on the road, driving > 0, braking < 0. */
  wheelForceN: number
  driveAxleLoadN: number
  /** Load on the driven axle that limits (the lighter of an open 6×4, the driven axle of a 6×2; the group otherwise), N. */
  criticalAxleLoadN: number
  /** Traction (drive) or lock-up (regen) force limit, positive. */
  limitForceN: number
  /** What sets the limit: the tyre peak, or (drive only, rare) the steer axle unloading completely. */
  limitedBy: 'tyre' | 'steer-axle-lift'
  /** |wheelForceN| / limitForceN; > 1 means beyond the tyre's peak. */
  utilisation: number
  /** Predicted slip ratio, or null when beyond the peak (spin or lock). */
  slip: number | null
  spin: boolean
  lock: boolean
  /** Motor torque that would just reach the limit (positive drive, negative regen). */
  motorTorqueAtLimitNm: number
  /** Largest steady lateral acceleration the drive axle can still hold with this longitudinal force, m/s² (0 beyond the peak). */
  lateralCapacityMps2: number
}

export { resolveSurface } from './drive-curve'

/**
 * Validates once and returns a fast evaluator (motorTorqueNm, roadSpeedKmh) → {@link CellSlipResult}.
 * @example const at = prepareCellSlip({ vehicle: truck, loadCase: 'laden', surface: 'wet-asphalt' }); at(1500, 20).slip
 */
export function prepareCellSlip(ctx: CellContext): (motorTorqueNm: number, roadSpeedKmh: number) => CellSlipResult {
  const { vehicle, gearIndex = 0, applyEnvelope = true } = ctx
  const { model } = axleLoadsFor(vehicle, ctx.loadCase)
  const cosG = gradeCos(ctx.gradeRad ?? 0)
  const coeffs = driveCurveFor(vehicle, model, ctx.surface, cosG)
  const G = overallRatio(vehicle, gearIndex)
  const R = vehicle.wheelRadiusM
  const mu = peakForceRatio(coeffs)
  const driven = drivenAxlesFor(vehicle)
  const driveLimit = drivenLimitN(model, driven, mu, cosG, 'drive')
  const regenLimit = drivenLimitN(model, driven, mu, cosG, 'regen')
  const driveLimitedBy = driveLimit >= steerLiftForceN(model, cosG) ? 'steer-axle-lift' : 'tyre'
  const atDrive = motorTorqueFromWheel(vehicle, driveLimit * R, gearIndex)
  const atRegen = motorTorqueFromWheel(vehicle, -regenLimit * R, gearIndex)
  // Per cell only the two inputs are validated: the curve, ratio and efficiency were checked above.
  const solve = slipSolverFor(coeffs)
  const eta = vehicle.drivelineEfficiency
  const W0 = model.staticDriveAxleLoadN
  return (motorTorqueNm, roadSpeedKmh) => {
    requireFinite('motorTorqueNm', motorTorqueNm)
    requireFinite('roadSpeedKmh', roadSpeedKmh)
    const regen = motorTorqueNm < 0
    let delivered = motorTorqueNm
    if (applyEnvelope) {
      const cap = deliverableAtShaft(vehicle, (kmhToMps(roadSpeedKmh) / R) * G, regen ? 'regen' : 'drive')
      delivered = Math.max(-cap, Math.min(cap, motorTorqueNm))
    }
    const wheelTorque = delivered >= 0 ? delivered * G * eta : (delivered * G) / eta // wheelTorqueFromMotor, G checked above
    const force = wheelTorque / R
    const load = driveAxleLoadN(model, force, cosG)
    const limit = regen ? regenLimit : driveLimit
    const utilisation = Math.abs(force) / limit
    const ratio = criticalForceRatio(driven, load, force)
    const slip = ratio === null ? null : solve(ratio)
    const beyond = slip === null
    const lateral = beyond ? 0 : lateralCapacityMps2(mu, load, force, W0)
    return {
      requestedTorqueNm: motorTorqueNm,
      deliveredTorqueNm: delivered,
      envelopeLimited: delivered !== motorTorqueNm,
      wheelForceN: force,
      driveAxleLoadN: load,
      criticalAxleLoadN: criticalAxleLoadN(driven, load, force),
      limitForceN: limit,
      limitedBy: regen ? 'tyre' : driveLimitedBy,
      utilisation,
      slip,
      spin: beyond && !regen,
      lock: beyond && regen,
      motorTorqueAtLimitNm: regen ? atRegen : atDrive,
      lateralCapacityMps2: lateral,
    }
  }
}

/**
 * Slip prediction for one cell (validates every call; use {@link prepareCellSlip} or slipGrid for many cells).
 * @example cellSlip({ vehicle: truck, loadCase: 'laden', surface: 'ice', motorTorqueNm: 2000, roadSpeedKmh: 5 }).spin
 */
export function cellSlip(args: CellContext & { motorTorqueNm: number; roadSpeedKmh: number }): CellSlipResult {
  return prepareCellSlip(args)(args.motorTorqueNm, args.roadSpeedKmh)
}
