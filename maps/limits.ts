/**
 * The few numbers of a vehicle program that bound a torque map, collected once so that
 * validation and clamping do not need the whole physics model.
 */
import { kmhToMps, rpmToRadS } from '../physics/units'
import type { VehicleParams } from '../physics/vehicle'
import { MapInputError } from './errors'

export interface MapLimits {
  /** Motor peak torque, N·m (motoring and generating assumed symmetric). */
  motorPeakTorqueNm: number
  /** Motor peak mechanical power, W. */
  motorPeakPowerW: number
  /** Motor speed limit, rpm. */
  motorMaxSpeedRpm: number
  /** Battery charge power limit at the pack terminals, W (bounds regen). */
  batteryChargePowerW: number
  /** Battery discharge power limit at the pack terminals, W (bounds drive). */
  batteryDischargePowerW: number
  /** Motor shaft speed per road speed in the lowest gear, (rad/s) per (km/h). */
  shaftRadPerKmh: number
  /** Road speed at which the motor reaches its speed limit in the top gear, km/h. */
  maxRoadSpeedKmh: number
  /** Motor shaft to wheel efficiency, 0–1 (informational: map torque is already at the shaft). */
  drivelineEfficiency: number
  /** Largest step between neighbouring cells before a warning, N·m (default 25 % of peak torque). */
  maxStepNm?: number
}

/** Default steep-step threshold as a share of motor peak torque. */
export const DEFAULT_STEP_SHARE = 0.25

/**
 * Limits of a vehicle program. The shaft speed uses the lowest gear (gearRatios[0]): it gives the
 * highest shaft speed per km/h, hence the smallest power-limited torque — the conservative side
 * for a multi-speed gearbox, and exact for a single-speed e-axle.
 * @example limitsFromVehicle(v).shaftRadPerKmh // (1/3.6) / wheelRadiusM * gearRatios[0] * finalDriveRatio
 */
export function limitsFromVehicle(vehicle: VehicleParams): MapLimits {
  const positive: [string, number][] = [
    ['wheel radius', vehicle.wheelRadiusM],
    ['final drive ratio', vehicle.finalDriveRatio],
    ['motor peak torque', vehicle.motorPeakTorqueNm],
    ['motor peak power', vehicle.motorPeakPowerW],
    ['motor speed limit', vehicle.motorMaxSpeedRpm],
    ['battery charge power', vehicle.batteryChargePowerW],
    ['battery discharge power', vehicle.batteryDischargePowerW],
    ['driveline efficiency', vehicle.drivelineEfficiency],
    ...vehicle.gearRatios.map((g, i): [string, number] => [`gear ratio ${i + 1}`, g]),
  ]
  if (vehicle.gearRatios.length === 0) throw new MapInputError('bad-vehicle', 'the vehicle program has no gear ratio')
  for (const [label, v] of positive)
    if (!Number.isFinite(v) || v <= 0)
      throw new MapInputError('bad-vehicle', `the vehicle program's ${label} must be a positive number, got ${v}`)
  const radPerKmh = (ratio: number) => (kmhToMps(1) / vehicle.wheelRadiusM) * ratio * vehicle.finalDriveRatio
  const topGear = Math.min(...vehicle.gearRatios)
  return {
    motorPeakTorqueNm: vehicle.motorPeakTorqueNm,
    motorPeakPowerW: vehicle.motorPeakPowerW,
    motorMaxSpeedRpm: vehicle.motorMaxSpeedRpm,
    batteryChargePowerW: vehicle.batteryChargePowerW,
    batteryDischargePowerW: vehicle.batteryDischargePowerW,
    shaftRadPerKmh: radPerKmh(vehicle.gearRatios[0]),
    maxRoadSpeedKmh: rpmToRadS(vehicle.motorMaxSpeedRpm) / radPerKmh(topGear),
    drivelineEfficiency: vehicle.drivelineEfficiency,
  }
}

/**
 * The steep-step threshold in force, N·m.
 * @example stepThresholdNm({ ...limits, motorPeakTorqueNm: 2000 }) // 500
 */
export function stepThresholdNm(limits: MapLimits): number {
  return limits.maxStepNm ?? DEFAULT_STEP_SHARE * limits.motorPeakTorqueNm
}
