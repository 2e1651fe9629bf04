/**
 * Traction and regen (braking) limits of a single rear drive axle with quasi-steady longitudinal
 * load transfer (Gillespie, Fundamentals of Vehicle Dynamics, ch. 2, "traction-limited acceleration").
 * Notation: m mass, L wheelbase, a CG behind steer axle, h CG height, θ grade (uphill > 0).
 * Moments about the steer-axle contact patch give the drive-axle normal load
 *   Wr = (m·g·a·cosθ + Fx·h) / L,
 * where Fx (> 0 driving, < 0 braking) = m·(ax + g·sinθ) when rolling and aero resistance are
 * neglected: the grade's weight shift and the inertial shift both enter through Fx.
 */
import { STANDARD_GRAVITY } from './constants'
import { PhysicsInputError, requireFinite, requirePositive } from './errors'

/** A rigid vehicle seen from the side: mass (kg) and geometry (m), distances from the steer axle. */
export interface RigidBody { massKg: number; wheelbaseM: number; cgToFrontAxleM: number; cgHeightM: number }

/** Road grade, rad (uphill in the direction of travel > 0). */
export interface GradeOptions { gradeRad?: number }

/** Validates a {@link RigidBody}; throws PhysicsInputError naming the field. @example checkBody({ massKg: 1, wheelbaseM: 4, cgToFrontAxleM: 2, cgHeightM: 1 }) */
export function checkBody(b: RigidBody, prefix = ''): void {
  requirePositive(`${prefix}massKg`, b.massKg)
  requirePositive(`${prefix}wheelbaseM`, b.wheelbaseM)
  requireFinite(`${prefix}cgToFrontAxleM`, b.cgToFrontAxleM)
  if (b.cgToFrontAxleM > b.wheelbaseM)
    throw new PhysicsInputError(`${prefix}cgToFrontAxleM`, `the CG (${b.cgToFrontAxleM} m) lies behind the drive axle (wheelbase ${b.wheelbaseM} m)`)
  if (b.cgToFrontAxleM < 0) throw new PhysicsInputError(`${prefix}cgToFrontAxleM`, 'the CG lies ahead of the steer axle')
  requirePositive(`${prefix}cgHeightM`, b.cgHeightM)
}

/** Validates a grade and returns cos θ. @example gradeCos(0) // 1 */
export function gradeCos(gradeRad: number): number {
  requireFinite('gradeRad', gradeRad)
  if (Math.abs(gradeRad) >= Math.PI / 2) throw new PhysicsInputError('gradeRad', 'must lie strictly between −π/2 and π/2')
  return Math.cos(gradeRad)
}

/**
 * Drive-axle normal load (N) while the axle transmits `wheelForceN` (driving > 0, braking < 0).
 * @example driveAxleLoad({ massKg: 10000, wheelbaseM: 5, cgToFrontAxleM: 3, cgHeightM: 1.5 }, 0) // 58 839.9 = m·g·3/5
 */
export function driveAxleLoad(body: RigidBody, wheelForceN: number, { gradeRad = 0 }: GradeOptions = {}): number {
  checkBody(body)
  requireFinite('wheelForceN', wheelForceN)
  const c = gradeCos(gradeRad)
  return (body.massKg * STANDARD_GRAVITY * body.cgToFrontAxleM * c + wheelForceN * body.cgHeightM) / body.wheelbaseM
}

/**
 * Largest tractive force (N) of the rear drive axle: Fx = μ·Wr with Wr from the load transfer, so
 *   Fx_max = μ·m·g·a·cosθ / (L − μ·h),
 * capped by steer-axle lift-off, Fx ≤ m·g·(L − a)·cosθ / h (relevant only if μ·h approaches L).
 * @example tractionLimit({ massKg: 10000, wheelbaseM: 5, cgToFrontAxleM: 3, cgHeightM: 1.5 }, 0.8) // 61 936.7
 */
export function tractionLimit(body: RigidBody, mu: number, { gradeRad = 0 }: GradeOptions = {}): number {
  checkBody(body)
  requirePositive('mu', mu)
  const c = gradeCos(gradeRad)
  const w = body.massKg * STANDARD_GRAVITY * c
  const tipUp = (w * (body.wheelbaseM - body.cgToFrontAxleM)) / body.cgHeightM
  const den = body.wheelbaseM - mu * body.cgHeightM
  return den > 0 ? Math.min((mu * w * body.cgToFrontAxleM) / den, tipUp) : tipUp
}

/**
 * Largest braking force (N, returned positive) of the rear drive axle before lock-up; braking
 * moves load forward, Wr = (m·g·a·cosθ − Fb·h)/L, so Fb_max = μ·m·g·a·cosθ / (L + μ·h).
 * @example regenLimit({ massKg: 10000, wheelbaseM: 5, cgToFrontAxleM: 3, cgHeightM: 1.5 }, 0.8) // 37 961.2
 */
export function regenLimit(body: RigidBody, mu: number, { gradeRad = 0 }: GradeOptions = {}): number {
  checkBody(body)
  requirePositive('mu', mu)
  const c = gradeCos(gradeRad)
  return (mu * body.massKg * STANDARD_GRAVITY * body.cgToFrontAxleM * c) / (body.wheelbaseM + mu * body.cgHeightM)
}
