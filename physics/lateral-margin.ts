/**
 * Lateral margin of the drive axle in a curve while it drives or regenerates (friction ellipse,
 * physics/friction-ellipse.ts). The design lateral acceleration is a program's release condition: the
 * steady lateral acceleration, at the tyres, of the sharpest curve the truck should take at speed.
 */
import { prepareCellSlip, type CellContext } from './cell-slip'
import { PhysicsInputError } from './errors'

/**
 * Default design lateral acceleration, m/s²: about 0.15 g, the side-friction factor highway design
 * assumes on exit ramps at 50–80 km/h (AASHTO "Green Book" side-friction tables, about 0.14–0.16;
 * recalled from memory). Superelevation carries the rest of the centripetal acceleration.
 */
export const DEFAULT_DESIGN_LATERAL_ACCEL_MPS2 = 1.5

/** What the drive axle can hold laterally on one surface and load case. */
export interface LateralMargin {
  /** Lateral acceleration the drive axle holds with no drive or regen torque (μ·g·cosθ), m/s². */
  freeRollingMps2: number
  /** True when even free rolling cannot hold the design lateral acceleration: the surface, not the map, is short. */
  surfaceShort: boolean
  /**
   * Motor-shaft torque magnitude (N·m; drive, or braking for regen) at which the drive axle's lateral
   * capacity falls to the design value; null when the surface is short anyway.
   */
  torqueAtDesignNm: number | null
}

/**
 * Finds the torque at which the lateral capacity reaches `designMps2` by bisection on the (monotone)
 * capacity of {@link prepareCellSlip} without the envelope, so the answer holds at every speed.
 * @example lateralMargin({ vehicle: tractor, loadCase: 'trailer-empty', surface: 'packed-snow' }, 'regen', 1.5).torqueAtDesignNm
 */
export function lateralMargin(ctx: CellContext, kind: 'drive' | 'regen', designMps2: number): LateralMargin {
  if (!(designMps2 > 0 && Number.isFinite(designMps2))) throw new PhysicsInputError('designLateralAccelMps2', `must be a finite number > 0 (got ${String(designMps2)})`)
  const at = prepareCellSlip({ ...ctx, applyEnvelope: false })
  const sign = kind === 'regen' ? -1 : 1
  const free = at(0, 0).lateralCapacityMps2
  if (free < designMps2) return { freeRollingMps2: free, surfaceShort: true, torqueAtDesignNm: null }
  let lo = 0
  let hi = Math.abs(at(sign, 0).motorTorqueAtLimitNm) // capacity is 0 at the longitudinal limit
  for (let i = 0; i < 60 && hi - lo > 1e-6 * Math.max(1, hi); i++) {
    const mid = 0.5 * (lo + hi)
    if (at(sign * mid, 0).lateralCapacityMps2 >= designMps2) lo = mid
    else hi = mid
  }
  return { freeRollingMps2: free, surfaceShort: false, torqueAtDesignNm: lo }
}
