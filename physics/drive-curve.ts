/** The drive tyre's Magic Formula curve for one vehicle, load case and surface (shared by cells, overlays and simulations). */
import type { AxleLoadModel } from './axle-model'
import { resolveDriveTyre, tyreCurve } from './drive-tyre'
import { PhysicsInputError } from './errors'
import { SURFACES, type Surface, type SurfaceId } from './surfaces'
import type { MagicFormulaCoeffs } from './tyre'
import type { VehicleParams } from './vehicle'

/** Resolves a surface id or object and checks its μ. @example resolveSurface('ice').peakMu // 0.1 */
export function resolveSurface(s: Surface | SurfaceId): Surface {
  const surface = typeof s === 'string' ? SURFACES[s] : s
  if (!surface) throw new PhysicsInputError('surface', `unknown surface "${String(s)}"`)
  if (!(surface.peakMu > 0 && Number.isFinite(surface.peakMu))) throw new PhysicsInputError('surface.peakMu', `must be a finite number > 0 (got ${String(surface.peakMu)})`)
  return surface
}

/**
 * The drive tyre's curve on `surface` at the static drive-axle load of the load case, shared by all
 * drive tyres: F_z = W_r0·cosθ / tyre count. Load sensitivity is taken at this static load, not
 * updated with the load transfer of each cell (a change of order k·ΔW/W, below 1 % for k ≤ 0.1).
 * @example driveCurveFor(truck, axleLoadsFor(truck, 'laden').model, 'ice', 1).B // 80 with the default tyre
 */
export function driveCurveFor(vehicle: VehicleParams, model: AxleLoadModel, surface: Surface | SurfaceId, cosGrade: number): MagicFormulaCoeffs {
  const tyre = resolveDriveTyre(vehicle)
  return tyreCurve(tyre, resolveSurface(surface).peakMu, (model.staticDriveAxleLoadN * cosGrade) / tyre.tyreCount)
}
