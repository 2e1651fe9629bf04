/**
 * A linear axle-load model shared by rigid trucks and tractor-semitrailers. With quasi-steady
 * load transfer every normal load is linear in the drive-axle force Fx (N, driving > 0):
 *   Wr(Fx) = Wr0·cosθ + Fx·He/L,     Wf(Fx) = Wf0·cosθ − Fx·kf,
 * where Wr0, Wf0 are the level-road static loads and He an effective transfer height.
 * A rigid truck has He = h; a tractor-semitrailer's He comes from the free-body derivation in trailer.ts.
 */
import type { MapKind } from './table'
import { PhysicsInputError } from './errors'

/** Linear axle-load model. All loads in N for a level road; multiply by cosθ on a grade. */
export interface AxleLoadModel {
  /** Total mass the drive axle must accelerate (truck or tractor + trailer), kg. */
  totalMassKg: number
  wheelbaseM: number
  /** Level-road static drive-axle load Wr0, N. */
  staticDriveAxleLoadN: number
  /** Effective load-transfer height He, m (Wr rises by Fx·He/L). */
  transferHeightM: number
  /** Level-road static steer-axle load Wf0, N. */
  staticSteerAxleLoadN: number
  /** Steer-axle load lost per newton of drive force, N/N. */
  steerUnloadPerN: number
}

/** Drive-axle normal load (N) at drive force Fx (N) on a grade with cosine `cosGrade`. @example driveAxleLoadN(m, 0, 1) // m.staticDriveAxleLoadN */
export function driveAxleLoadN(m: AxleLoadModel, wheelForceN: number, cosGrade = 1): number {
  return m.staticDriveAxleLoadN * cosGrade + (wheelForceN * m.transferHeightM) / m.wheelbaseM
}

/**
 * Drive (`'drive'`) or braking (`'regen'`) force limit of the drive axle, N, returned positive:
 *   drive: μ·Wr0·cosθ / (1 − μ·He/L),   regen: μ·Wr0·cosθ / (1 + μ·He/L),
 * the drive case capped where the steer axle would lift (Wf = 0).
 * @example driveAxleLimitN(model, 0.8, 1, 'drive')
 */
export function driveAxleLimitN(m: AxleLoadModel, mu: number, cosGrade: number, mode: MapKind): number {
  if (!(mu > 0 && Number.isFinite(mu))) throw new PhysicsInputError('mu', `must be a finite number > 0 (got ${String(mu)})`)
  const k = (mu * m.transferHeightM) / m.wheelbaseM
  const w = mu * m.staticDriveAxleLoadN * cosGrade
  if (mode === 'regen') return 1 + k > 0 ? w / (1 + k) : Infinity
  const lift = steerLiftForceN(m, cosGrade)
  return 1 - k > 0 ? Math.min(w / (1 - k), lift) : lift
}

/** Drive force (N) at which the steer axle would unload completely (Wf = 0); Infinity if it never does. @example steerLiftForceN(model, 1) */
export function steerLiftForceN(m: AxleLoadModel, cosGrade = 1): number {
  return m.steerUnloadPerN > 0 ? (m.staticSteerAxleLoadN * cosGrade) / m.steerUnloadPerN : Infinity
}
