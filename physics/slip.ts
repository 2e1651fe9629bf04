/** Longitudinal slip ratio, SAE J670 (2008) / ISO 8855:2011 definition, with a standstill rule. */
import { SLIP_SPEED_FLOOR_MPS } from './constants'
import { requireFinite, requirePositive } from './errors'

/**
 * Longitudinal slip κ = (ΩR − V) / max(|V|, vFloor), dimensionless.
 * `wheelSurfaceSpeed` = ΩR (m/s, tread speed from wheel spin × effective rolling radius),
 * `vehicleSpeed` = V (m/s, wheel-centre speed over ground). Positive κ: driving (wheel spins
 * faster), negative: braking, κ = −1: locked wheel.
 * Standstill rule (common-practice regularisation, not part of SAE J670 / ISO 8855):
 * the denominator is floored at `vFloor` = 0.5 m/s by default, so slip stays finite at V = 0.
 * @example slipRatio(11, 10) // 0.1
 * @example slipRatio(0, 10) // −1 (locked)
 */
export function slipRatio(wheelSurfaceSpeed: number, vehicleSpeed: number, vFloor: number = SLIP_SPEED_FLOOR_MPS): number {
  requireFinite('wheelSurfaceSpeed', wheelSurfaceSpeed)
  requireFinite('vehicleSpeed', vehicleSpeed)
  requirePositive('vFloor', vFloor)
  return (wheelSurfaceSpeed - vehicleSpeed) / Math.max(Math.abs(vehicleSpeed), vFloor)
}
