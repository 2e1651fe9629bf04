/**
 * Motor and battery torque envelope at the motor shaft.
 * Motor: T_max(ω) = T_peak up to the base speed ω_b = P_peak/T_peak, P_peak/ω above it,
 * 0 above the motor speed limit. Battery: |T| ≤ P_batt/ω (discharge in drive, charge in regen);
 * motor and inverter losses are neglected (shaft power = terminal power), so the battery cap is optimistic in drive.
 */
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

/** Motor torque limit (N·m, ≥ 0) at shaft speed ω (rad/s, sign ignored). Internal, unvalidated. */
export function motorLimitAtShaft(v: VehicleParams, omegaRadS: number): number {
  const w = Math.abs(omegaRadS)
  if (w > rpmToRadS(v.motorMaxSpeedRpm)) return 0
  return Math.min(v.motorPeakTorqueNm, w > 0 ? v.motorPeakPowerW / w : Infinity)
}

/** Deliverable |torque| (N·m) at shaft speed ω in drive or regen: motor envelope and battery power. Internal, unvalidated. */
export function deliverableAtShaft(v: VehicleParams, omegaRadS: number, mode: 'drive' | 'regen'): number {
  const w = Math.abs(omegaRadS)
  const p = mode === 'drive' ? v.batteryDischargePowerW : v.batteryChargePowerW
  return Math.min(motorLimitAtShaft(v, w), w > 0 ? p / w : Infinity)
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
export function deliverableTorqueLimit(vehicle: VehicleParams, roadSpeedKmh: number, mode: 'drive' | 'regen', gearIndex = 0): number {
  return deliverableAtShaft(vehicle, motorShaftSpeedRadS(vehicle, roadSpeedKmh, gearIndex), mode)
}
