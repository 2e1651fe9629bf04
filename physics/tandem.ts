/**
 * Driven axles of a 4×2, 6×4 or 6×2 truck: how the drive force and the drive-group load share out
 * between the axles of a tandem, and the force limit of the axle that reaches its peak first
 * (the "critical" driven axle). Derivation and hand case: docs/physics.md §6a.
 *
 * The group load W_r(F) = W_r0·cosθ + F·H_e/L comes from the axle-load model (whole-vehicle pitch
 * transfer). The critical axle carries
 *   load   W_c(F) = α·W_r(F) + d·|F|,   force  φ·F,
 * α its share of the group load, φ its share of the drive force, d the inter-axle transfer onto it per
 * newton of |F| (negative when it unloads; it differs between driving and braking). At its peak
 * φ·F = μ·W_c(F), so
 *   drive:  F = μ·α·W_r0·cosθ / (φ − μ·α·H_e/L − μ·d_drive)
 *   regen:  F = μ·α·W_r0·cosθ / (φ + μ·α·H_e/L − μ·d_regen)
 * 4×2, and 6×4 with a locked inter-axle differential (both axles at one slip, so the force divides in
 * proportion to load and the transfer between them cancels): α = φ = 1, d = 0 — the one-axle model.
 * 6×4 open: equal torque, α = φ = ½, d = −|ε| both ways (the lighter axle limits: twice its limit).
 * 6×2: α = share s, φ = 1, d_drive = −ε (forward axle driven) or +ε (rear), reversed in regen.
 */
import type { AxleLoadModel } from './axle-model'
import { steerLiftForceN } from './axle-model'
import { PhysicsInputError } from './errors'
import type { MapKind } from './table'
import type { VehicleParams } from './vehicle'

/** Share factors of the critical driven axle; see the module comment. */
export interface DrivenAxles {
  layout: VehicleParams['axleLayout']
  /** Which axle limits: the only one (4×2), the group (6×4 locked), the lighter one (6×4 open), the driven one (6×2). */
  critical: 'single' | 'group' | 'lighter' | 'driven'
  /** φ: share of the tandem drive force on the critical axle. */
  forceShare: number
  /** α: share of the group load on the critical axle (static and pitch transfer alike). */
  loadShare: number
  /** d: load gained by the critical axle per newton of |F| while driving and while braking, N/N. */
  transferDrive: number
  transferRegen: number
}

/**
 * Share factors for a program. Defaults (docs/physics.md §6a): inter-axle differential locked,
 * transfer ε = 0, 6×2 forward axle driven with half the group load — so versions stored before these
 * fields existed keep the one-axle numbers.
 * @example drivenAxlesFor({ axleLayout: '6x4', tandem: { interAxleDifferential: 'open' } }).forceShare // 0.5
 */
export function drivenAxlesFor(v: Pick<VehicleParams, 'axleLayout' | 'tandem'>): DrivenAxles {
  const t = v.tandem ?? {}
  const eps = t.interAxleTransfer ?? 0
  if (v.axleLayout === '4x2') return { layout: '4x2', critical: 'single', forceShare: 1, loadShare: 1, transferDrive: 0, transferRegen: 0 }
  if (v.axleLayout === '6x4') {
    if ((t.interAxleDifferential ?? 'locked') === 'locked')
      return { layout: '6x4', critical: 'group', forceShare: 1, loadShare: 1, transferDrive: 0, transferRegen: 0 }
    return { layout: '6x4', critical: 'lighter', forceShare: 0.5, loadShare: 0.5, transferDrive: -Math.abs(eps), transferRegen: -Math.abs(eps) }
  }
  if (v.axleLayout === '6x2') {
    const s = t.drivenLoadShare ?? 0.5
    const sign = (t.drivenAxle ?? 'forward') === 'forward' ? -1 : 1
    return { layout: '6x2', critical: 'driven', forceShare: 1, loadShare: s, transferDrive: sign * eps, transferRegen: -sign * eps }
  }
  throw new PhysicsInputError('vehicle.axleLayout', `unknown axle layout "${String(v.axleLayout)}"`)
}

/**
 * Normal load (N) on the critical driven axle at tandem force F (N, driving > 0) given the group load W_r(F) (N).
 * @example criticalAxleLoadN(d, 100_000, 20_000)
 */
export function criticalAxleLoadN(d: DrivenAxles, groupLoadN: number, wheelForceN: number): number {
  return d.loadShare * groupLoadN + (wheelForceN >= 0 ? d.transferDrive : d.transferRegen) * Math.abs(wheelForceN)
}

/**
 * Tandem (total) drive or braking force limit, N (positive), where the critical driven axle reaches μ;
 * the drive case capped where the steer axle would lift. Equals driveAxleLimitN for 4×2 and locked 6×4.
 * @example drivenLimitN(model, drivenAxlesFor(truck), 0.3, 1, 'drive')
 */
export function drivenLimitN(m: AxleLoadModel, d: DrivenAxles, mu: number, cosGrade: number, mode: MapKind): number {
  if (!(mu > 0 && Number.isFinite(mu))) throw new PhysicsInputError('mu', `must be a finite number > 0 (got ${String(mu)})`)
  const k = m.transferHeightM / m.wheelbaseM
  const w = mu * d.loadShare * m.staticDriveAxleLoadN * cosGrade
  if (mode === 'regen') {
    const den = d.forceShare + mu * d.loadShare * k - mu * d.transferRegen
    return den > 0 ? w / den : Infinity
  }
  const lift = steerLiftForceN(m, cosGrade)
  const den = d.forceShare - mu * d.loadShare * k - mu * d.transferDrive
  return den > 0 ? Math.min(w / den, lift) : lift
}

/**
 * Force ratio F_x/F_z of the critical driven axle at tandem force F (N) and group load W_r (N);
 * null when that axle carries no load (the wheel would spin or lock at any force).
 * @example criticalForceRatio(d, 100_000, 20_000) // 0.2 for a 4×2
 */
export function criticalForceRatio(d: DrivenAxles, groupLoadN: number, wheelForceN: number): number | null {
  const load = criticalAxleLoadN(d, groupLoadN, wheelForceN)
  if (load > 0) return (d.forceShare * wheelForceN) / load
  return wheelForceN === 0 ? 0 : null
}
