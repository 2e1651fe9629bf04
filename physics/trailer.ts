/**
 * Tractor-semitrailer load transfer (derivation in docs/physics.md, "Tractor-semitrailer").
 * Trailer free body (axle free-rolling, kingpin at height hk, CG ct behind the kingpin at height ht,
 * axle kt behind the kingpin), with A = ax + g·sinθ:
 *   Hk = mt·A,   Fk = [mt·g·cosθ·(kt − ct) − mt·A·(ht − hk)] / kt.
 * Tractor (mass m, CG a, h; fifth wheel f behind the steer axle; wheelbase L), moments about the steer contact:
 *   L·Wr = m·g·a·cosθ + m·h·A + f·Fk + hk·Hk,  and Fx = (m + mt)·A.
 */
import { STANDARD_GRAVITY } from './constants'
import { PhysicsInputError, requireFinite, requirePositive } from './errors'
import { driveAxleLimitN, driveAxleLoadN, type AxleLoadModel } from './axle-model'
import { checkBody, gradeCos, type GradeOptions, type RigidBody } from './traction'

/** Semitrailer as the physics sees it: mass and CG (relative to the kingpin), axle position, coupling geometry, m. */
export interface SemitrailerBody {
  massKg: number
  cgToKingpinM: number
  cgHeightM: number
  kingpinToAxleM: number
  /** Fifth wheel behind the tractor steer axle, and its height, m. */
  fifthWheelToFrontAxleM: number
  fifthWheelHeightM: number
}

function checkTrailer(t: SemitrailerBody): void {
  for (const k of ['massKg', 'kingpinToAxleM', 'cgHeightM', 'fifthWheelToFrontAxleM', 'fifthWheelHeightM'] as const)
    requirePositive(`trailer.${k}`, t[k])
  requireFinite('trailer.cgToKingpinM', t.cgToKingpinM)
  if (t.cgToKingpinM < 0 || t.cgToKingpinM > t.kingpinToAxleM)
    throw new PhysicsInputError('trailer.cgToKingpinM', 'the trailer CG must lie between the kingpin and the trailer axle')
}

/**
 * Linear axle-load model of the combination (see {@link AxleLoadModel}):
 * Wr0 = g·[m·a + f·mt·(kt − ct)/kt]/L,  He = [m·h + mt·hk − f·mt·(ht − hk)/kt] / (m + mt).
 * @example combinationModel(tractor, trailer).transferHeightM
 */
export function combinationModel(tractor: RigidBody, trailer: SemitrailerBody): AxleLoadModel {
  checkBody(tractor, 'tractor.')
  checkTrailer(trailer)
  const { massKg: m, wheelbaseM: L, cgToFrontAxleM: a, cgHeightM: h } = tractor
  const { massKg: mt, cgToKingpinM: ct, cgHeightM: ht, kingpinToAxleM: kt, fifthWheelToFrontAxleM: f, fifthWheelHeightM: hk } = trailer
  const g = STANDARD_GRAVITY
  const mTot = m + mt
  const fk0 = (mt * g * (kt - ct)) / kt
  const wr0 = (m * g * a + f * fk0) / L
  const he = (m * h + mt * hk - (f * mt * (ht - hk)) / kt) / mTot
  // Wf = m·g·cosθ + Fk − Wr; Fk falls by (ht − hk)·mt/(mTot·kt) per newton of Fx.
  const steerUnload = (mt * (ht - hk)) / (mTot * kt) + he / L
  return { totalMassKg: mTot, wheelbaseM: L, staticDriveAxleLoadN: wr0, transferHeightM: he, staticSteerAxleLoadN: m * g + fk0 - wr0, steerUnloadPerN: steerUnload }
}

/**
 * Fifth-wheel (kingpin) forces on the trailer while the tractor drive axle transmits Fx (N):
 * vertical load Fk (N, upward on the trailer = downward on the tractor) and horizontal pull Hk (N, forward on the trailer).
 * @example fifthWheelLoad(tractor, trailer, 0).verticalN // static kingpin load mt·g·(kt − ct)/kt
 */
export function fifthWheelLoad(tractor: RigidBody, trailer: SemitrailerBody, wheelForceN: number, { gradeRad = 0 }: GradeOptions = {}): { verticalN: number; horizontalN: number } {
  checkBody(tractor, 'tractor.')
  checkTrailer(trailer)
  requireFinite('wheelForceN', wheelForceN)
  const c = gradeCos(gradeRad)
  const { massKg: mt, cgToKingpinM: ct, cgHeightM: ht, kingpinToAxleM: kt, fifthWheelHeightM: hk } = trailer
  const A = wheelForceN / (tractor.massKg + mt)
  return { verticalN: (mt * STANDARD_GRAVITY * c * (kt - ct) - mt * A * (ht - hk)) / kt, horizontalN: mt * A }
}

/** Tractor drive-axle load (N) at drive force Fx (N). @example tractorDriveAxleLoad(tractor, trailer, 0) */
export function tractorDriveAxleLoad(tractor: RigidBody, trailer: SemitrailerBody, wheelForceN: number, { gradeRad = 0 }: GradeOptions = {}): number {
  requireFinite('wheelForceN', wheelForceN)
  return driveAxleLoadN(combinationModel(tractor, trailer), wheelForceN, gradeCos(gradeRad))
}

/** Tractor drive-axle traction limit (N): μ·Wr0·cosθ / (1 − μ·He/L). @example tractorTractionLimit(tractor, trailer, 0.8) */
export function tractorTractionLimit(tractor: RigidBody, trailer: SemitrailerBody, mu: number, { gradeRad = 0 }: GradeOptions = {}): number {
  return driveAxleLimitN(combinationModel(tractor, trailer), mu, gradeCos(gradeRad), 'drive')
}

/** Tractor drive-axle braking limit before lock-up (N, positive): μ·Wr0·cosθ / (1 + μ·He/L). @example tractorRegenLimit(tractor, trailer, 0.8) */
export function tractorRegenLimit(tractor: RigidBody, trailer: SemitrailerBody, mu: number, { gradeRad = 0 }: GradeOptions = {}): number {
  return driveAxleLimitN(combinationModel(tractor, trailer), mu, gradeCos(gradeRad), 'regen')
}
