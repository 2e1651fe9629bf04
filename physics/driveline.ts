/**
 * Driveline between motor shaft and drive wheels: overall ratio G = gear ratio × final drive ratio,
 * efficiency η (0–1) applied in the direction of power flow:
 *   drive (motor → wheel):  T_wheel = T_motor·G·η
 *   regen (wheel → motor):  T_motor = T_wheel·η/G, i.e. T_wheel = T_motor·G/η
 * so losses always cost tractive force in drive and add to the wheel braking torque in regen.
 */
import { PhysicsInputError, requireFinite } from './errors'
import type { VehicleParams } from './vehicle'

type Driveline = Pick<VehicleParams, 'gearRatios' | 'finalDriveRatio' | 'drivelineEfficiency'>

/** Overall motor-to-wheel ratio G for a gear (0 = lowest). @example overallRatio({ gearRatios: [2.5], finalDriveRatio: 6, drivelineEfficiency: 0.95 }) // 15 */
export function overallRatio(v: Pick<VehicleParams, 'gearRatios' | 'finalDriveRatio'>, gearIndex = 0): number {
  if (!Number.isInteger(gearIndex) || gearIndex < 0 || gearIndex >= v.gearRatios.length)
    throw new PhysicsInputError('gearIndex', `must be an integer from 0 to ${v.gearRatios.length - 1} (got ${gearIndex})`)
  return v.gearRatios[gearIndex] * v.finalDriveRatio
}

/**
 * Wheel torque (N·m, all drive wheels together) from motor-shaft torque (N·m; negative = regen).
 * @example wheelTorqueFromMotor(dl, 1000) // 1000·15·0.95 = 14 250
 * @example wheelTorqueFromMotor(dl, -1000) // −1000·15/0.95 ≈ −15 789
 */
export function wheelTorqueFromMotor(v: Driveline, motorTorqueNm: number, gearIndex = 0): number {
  requireFinite('motorTorqueNm', motorTorqueNm)
  const G = overallRatio(v, gearIndex)
  return motorTorqueNm >= 0 ? motorTorqueNm * G * v.drivelineEfficiency : (motorTorqueNm * G) / v.drivelineEfficiency
}

/**
 * Motor-shaft torque (N·m) that produces a wheel torque (N·m); inverse of {@link wheelTorqueFromMotor}.
 * @example motorTorqueFromWheel(dl, 14250) // 1000
 */
export function motorTorqueFromWheel(v: Driveline, wheelTorqueNm: number, gearIndex = 0): number {
  requireFinite('wheelTorqueNm', wheelTorqueNm)
  const G = overallRatio(v, gearIndex)
  return wheelTorqueNm >= 0 ? wheelTorqueNm / (G * v.drivelineEfficiency) : (wheelTorqueNm * v.drivelineEfficiency) / G
}
