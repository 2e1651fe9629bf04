/** Resolves the spin / lock-up thresholds from options, the surface's tyre curve, or the default. */
import { resolveSurface } from '../cell-slip'
import { SLIP_SPEED_FLOOR_MPS } from '../constants'
import { PhysicsInputError, requirePositive } from '../errors'
import { peakSlip } from '../tyre'
import { mpsToKmh } from '../units'
import type { AnalysisResult, LogAnalyserOptions } from './types'

/** Spin threshold used without a surface: slip ratio 0.15, near the force peak of typical dry-road curves. */
export const DEFAULT_SPIN_SLIP = 0.15
/** Shortest reported event, s. */
export const DEFAULT_MIN_EVENT_S = 0.1

/**
 * κ_spin = option, else the surface's Magic Formula peak slip (beyond it the tyre is on the falling
 * branch: the wheel runs away), else {@link DEFAULT_SPIN_SLIP}; κ_lock defaults to κ_spin.
 * Slip is only judged when the road or a wheel moves at ≥ the slip floor (0.5 m/s = 1.8 km/h), the
 * speed below which the physics `slipRatio` regularises its denominator.
 * @example resolveThresholds({ surface: 'ice' }).spinSlip // ≈ 0.389 = tan(1)/4
 */
export function resolveThresholds(opts: Pick<LogAnalyserOptions, 'surface' | 'thresholds'>): AnalysisResult['thresholds'] {
  const t = opts.thresholds ?? {}
  let spinSlip = DEFAULT_SPIN_SLIP
  let source: AnalysisResult['thresholds']['source'] = 'default'
  if (t.spinSlip !== undefined) { spinSlip = requirePositive('thresholds.spinSlip', t.spinSlip); source = 'option' }
  else if (opts.surface !== undefined) {
    const peak = peakSlip(resolveSurface(opts.surface).coeffs)
    // A monotone curve has no peak (Infinity): fall back to the default rather than never flagging spin.
    if (Number.isFinite(peak)) { spinSlip = peak; source = 'surface' }
  }
  const lockSlip = t.lockSlip === undefined ? spinSlip : requirePositive('thresholds.lockSlip', t.lockSlip)
  const minDurationS = t.minDurationS === undefined ? DEFAULT_MIN_EVENT_S : t.minDurationS
  if (!(minDurationS >= 0 && Number.isFinite(minDurationS))) throw new PhysicsInputError('thresholds.minDurationS', 'must be a finite number ≥ 0')
  return { spinSlip, lockSlip, minDurationS, minSpeedKmh: mpsToKmh(SLIP_SPEED_FLOOR_MPS), source }
}
