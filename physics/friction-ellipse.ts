/**
 * Combined slip on the drive axle by the friction ellipse: a tyre's resultant force stays inside
 *   (F_x/F_x,max)² + (F_y/F_y,max)² ≤ 1
 * (Wong, Theory of Ground Vehicles, ch. 1, "friction ellipse" concept; Pacejka, Tire and Vehicle
 * Dynamics, ch. 3: the isotropic brush model gives a friction circle at full sliding). With equal
 * peak μ in both directions the ellipse is a circle of radius μ·F_z.
 */
import { STANDARD_GRAVITY } from './constants'
import { PhysicsInputError, requireFinite } from './errors'

/**
 * Fraction of the lateral capacity left when a share `longitudinalUse` = |F_x|/F_x,max of the
 * longitudinal grip is in use: √(1 − u²); 0 at or beyond the longitudinal limit.
 * @example remainingLateralFraction(0.9) // ≈ 0.436
 */
export function remainingLateralFraction(longitudinalUse: number): number {
  requireFinite('longitudinalUse', longitudinalUse)
  const u = Math.abs(longitudinalUse)
  return u >= 1 ? 0 : Math.sqrt(1 - u * u)
}

/**
 * Largest steady lateral acceleration (m/s²) the drive axle can still hold while it transmits
 * `wheelForceN`. In a steady turn the drive axle carries the lateral force of its static load share,
 * F_y = W_r0·a_y/g (moments about the steer axle; for a tractor the kingpin's lateral force enters like
 * its vertical load), and it has μ·W_r·√(1 − (F_x/(μ·W_r))²) left, so
 *   a_y,max = g·√((μ·W_r)² − F_x²) / W_r0.
 * @example lateralCapacityMps2(0.3, 100_000, 0, 100_000) // 0.3·g ≈ 2.94
 */
export function lateralCapacityMps2(mu: number, driveAxleLoadN: number, wheelForceN: number, staticDriveAxleLoadN: number): number {
  if (!(mu > 0 && Number.isFinite(mu))) throw new PhysicsInputError('mu', `must be a finite number > 0 (got ${String(mu)})`)
  requireFinite('driveAxleLoadN', driveAxleLoadN)
  requireFinite('wheelForceN', wheelForceN)
  if (!(staticDriveAxleLoadN > 0 && Number.isFinite(staticDriveAxleLoadN))) throw new PhysicsInputError('staticDriveAxleLoadN', 'must be a finite number > 0')
  const cap = mu * Math.max(driveAxleLoadN, 0)
  return cap <= 0 ? 0 : (STANDARD_GRAVITY * cap * remainingLateralFraction(wheelForceN / cap)) / staticDriveAxleLoadN
}
