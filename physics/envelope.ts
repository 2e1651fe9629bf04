/**
 * Motor and battery torque envelope at the motor shaft.
 * Motor: T_max(ω) = T_peak up to the base speed ω_b = P_peak/T_peak, P_peak/ω above it,
 * 0 above the motor speed limit. Battery: |T| ≤ P_batt/ω (discharge in drive, charge in regen);
 * motor and inverter losses are neglected (shaft power = terminal power), so the battery cap is optimistic in drive.
 */
import type { MapKind } from './table'
import { requireFinite } from './errors'
import { overallRatio } from './driveline'
import { kmhToMps, rpmToRadS } from './units'
import { validateVehicle } from './validate'
import type { VehicleParams } from './vehicle'

/**
 * Motor shaft speed (rad/s) at a road speed (km/h) when the drive wheels roll without slip: ω = V/R·G.
 * @example motorShaftSpeedRadS(truck, 36) // 10 m/s / 0.5 m × 15 = 300 rad/s
 */
export function motorShaftSpeedRadS(vehicle: VehicleParams, roadSpeedKmh: number, gearIndex = 0): number {
  validateVehicle(vehicle)
  requireFinite('roadSpeedKmh', roadSpeedKmh)
  return (kmhToMps(roadSpeedKmh) / vehicle.wheelRadiusM) * overallRatio(vehicle, gearIndex)
}

/** The ratings that bound torque at a shaft speed; a vehicle program and maps/ MapLimits both carry them. */
export type PowerRatings = Pick<VehicleParams, 'motorPeakTorqueNm' | 'motorPeakPowerW' | 'batteryChargePowerW' | 'batteryDischargePowerW'>

/**
 * Peak-torque / peak-power curve at shaft speed ω (rad/s, sign ignored): min(T_peak, P_peak/ω),
 * T_peak at standstill. No speed cut-off: callers apply the motor speed limit their way.
 * @example peakTorqueAtShaft({ motorPeakTorqueNm: 2000, motorPeakPowerW: 300_000 }, 300) // 1000
 */
export function peakTorqueAtShaft(r: Pick<PowerRatings, 'motorPeakTorqueNm' | 'motorPeakPowerW'>, omegaRadS: number): number {
  const w = Math.abs(omegaRadS)
  return Math.min(r.motorPeakTorqueNm, w > 0 ? r.motorPeakPowerW / w : Infinity)
}

/**
 * Battery-limited |torque| at shaft speed ω: P_batt/ω (discharge in drive, charge in regen),
 * Infinity at standstill. Losses credited as zero, so it over-estimates what the pack accepts.
 * @example batteryTorqueAtShaft(truck, 300, 'regen') // truck.batteryChargePowerW / 300
 */
export function batteryTorqueAtShaft(r: Pick<PowerRatings, 'batteryChargePowerW' | 'batteryDischargePowerW'>, omegaRadS: number, mode: MapKind): number {
  const w = Math.abs(omegaRadS)
  const p = mode === 'drive' ? r.batteryDischargePowerW : r.batteryChargePowerW
  return w > 0 ? p / w : Infinity
}

/** Motor torque limit (N·m, ≥ 0) at shaft speed ω (rad/s, sign ignored), 0 above the motor speed limit. Internal, unvalidated. */
export function motorLimitAtShaft(v: VehicleParams, omegaRadS: number): number {
  if (Math.abs(omegaRadS) > rpmToRadS(v.motorMaxSpeedRpm)) return 0
  return peakTorqueAtShaft(v, omegaRadS)
}

/** Deliverable |torque| (N·m) at shaft speed ω in drive or regen: motor envelope and battery power. Internal, unvalidated. */
export function deliverableAtShaft(v: VehicleParams, omegaRadS: number, mode: MapKind): number {
  return Math.min(motorLimitAtShaft(v, omegaRadS), batteryTorqueAtShaft(v, omegaRadS, mode))
}

/**
 * Motor envelope (N·m, ≥ 0) at a road speed: min(peak torque, peak power / shaft speed), 0 above the motor speed limit.
 * @example motorTorqueLimit(truck, 0) // truck.motorPeakTorqueNm
 */
export function motorTorqueLimit(vehicle: VehicleParams, roadSpeedKmh: number, gearIndex = 0): number {
  return motorLimitAtShaft(vehicle, motorShaftSpeedRadS(vehicle, roadSpeedKmh, gearIndex))
}

/**
 * Motor envelope further limited by battery power (discharge for `'drive'`, charge for `'regen'`), N·m ≥ 0.
 * @example deliverableTorqueLimit(truck, 80, 'regen')
 */
export function deliverableTorqueLimit(vehicle: VehicleParams, roadSpeedKmh: number, mode: MapKind, gearIndex = 0): number {
  return deliverableAtShaft(vehicle, motorShaftSpeedRadS(vehicle, roadSpeedKmh, gearIndex), mode)
}
