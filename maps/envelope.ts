/**
 * Speed-dependent torque bounds of a map, from P = T·ω with ω the motor shaft speed in rad/s:
 * the torque/power curves of physics/envelope.ts evaluated on MapLimits (lowest-gear shaft
 * speed, road-speed cut-off of the top gear).
 */
import { batteryTorqueAtShaft, peakTorqueAtShaft } from '../physics/envelope'
import { MapInputError } from './errors'
import type { MapLimits } from './limits'

function checkSpeed(speedKmh: number): number {
  if (!Number.isFinite(speedKmh)) throw new MapInputError('not-finite', `speed must be finite, got ${speedKmh} km/h`)
  // Maps are keyed on speed magnitude; reverse uses the same bound.
  return Math.abs(speedKmh)
}

/**
 * Motor shaft speed at a road speed, rad/s (lowest gear, see limitsFromVehicle).
 * @example shaftSpeedRadS(limits, 36) // 36 × limits.shaftRadPerKmh
 */
export function shaftSpeedRadS(limits: MapLimits, speedKmh: number): number {
  return checkSpeed(speedKmh) * limits.shaftRadPerKmh
}

/**
 * Largest torque magnitude the motor can give at a road speed, N·m: peak torque up to base
 * speed, peak power ÷ shaft speed above it, and 0 beyond the motor speed limit (no gear can
 * reach that road speed, so any request there is meaningless).
 * @example // 2,000 N·m, 300 kW, 10 rad/s per km/h: base speed 15 rad/s = 1.5 km/h
 *          motorEnvelopeAt(limits, 30) // 300000 / 300 = 1000
 */
export function motorEnvelopeAt(limits: MapLimits, speedKmh: number): number {
  const v = checkSpeed(speedKmh)
  if (v > limits.maxRoadSpeedKmh) return 0
  return peakTorqueAtShaft(limits, v * limits.shaftRadPerKmh)
}

/**
 * Largest braking torque the battery can absorb at a road speed, N·m: charge power ÷ shaft
 * speed, Infinity at standstill. It assumes every watt of shaft power reaches the pack
 * (motor, inverter and driveline losses credited as zero), so it over-estimates the charge
 * power and is safe for the battery whatever the real efficiency is.
 * @example chargeLimitTorqueAt(limits, 30) // 200000 / 300 ≈ 666.7 for a 200 kW charge limit
 */
export function chargeLimitTorqueAt(limits: MapLimits, speedKmh: number): number {
  return batteryTorqueAtShaft(limits, shaftSpeedRadS(limits, speedKmh), 'regen')
}

/**
 * Largest drive torque the battery can supply at a road speed, N·m: discharge power ÷ shaft
 * speed. Electrical power is at least the shaft power, so a request above this can never be
 * met; one below it may still be cut by losses (hence only a warning in validate).
 * @example dischargeLimitTorqueAt(limits, 30) // 250000 / 300 ≈ 833.3 for a 250 kW discharge limit
 */
export function dischargeLimitTorqueAt(limits: MapLimits, speedKmh: number): number {
  return batteryTorqueAtShaft(limits, shaftSpeedRadS(limits, speedKmh), 'drive')
}
