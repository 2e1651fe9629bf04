/** Resolves the spin / lock-up thresholds from options, the surface's tyre curve, or the default. */
import { resolveSurface } from '../drive-curve'
import { resolveDriveTyre, tyreCurve } from '../drive-tyre'
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
 * κ_spin = option, else the peak slip of the program's drive tyre on the surface at its nominal load
 * (beyond it the tyre is on the falling branch: the wheel runs away; the default truck tyre when the
 * options name none), else {@link DEFAULT_SPIN_SLIP}; κ_lock defaults to κ_spin.
 * Slip is only judged when the road or a wheel moves at ≥ the slip floor (0.5 m/s = 1.8 km/h), the
 * speed below which the physics `slipRatio` regularises its denominator.
 * @example resolveThresholds({ surface: 'ice' }).spinSlip // ≈ 0.025 = 3·0.1/12, the brush model's full-sliding slip
 */
export function resolveThresholds(opts: Pick<LogAnalyserOptions, 'surface' | 'thresholds' | 'driveTyre'>): AnalysisResult['thresholds'] {
  const t = opts.thresholds ?? {}
  let spinSlip = DEFAULT_SPIN_SLIP
  let source: AnalysisResult['thresholds']['source'] = 'default'
  if (t.spinSlip !== undefined) { spinSlip = requirePositive('thresholds.spinSlip', t.spinSlip); source = 'option' }
  else if (opts.surface !== undefined) {
    // The axle layout only sets the default tyre count, which the peak slip does not depend on.
    const tyre = resolveDriveTyre({ axleLayout: '4x2', driveTyre: opts.driveTyre })
    const peak = peakSlip(tyreCurve(tyre, resolveSurface(opts.surface).peakMu, tyre.nominalLoadPerTyreN))
    // A monotone curve has no peak (Infinity): fall back to the default rather than never flagging spin.
    if (Number.isFinite(peak)) { spinSlip = peak; source = 'surface' }
  }
  const lockSlip = t.lockSlip === undefined ? spinSlip : requirePositive('thresholds.lockSlip', t.lockSlip)
  const minDurationS = t.minDurationS === undefined ? DEFAULT_MIN_EVENT_S : t.minDurationS
  if (!(minDurationS >= 0 && Number.isFinite(minDurationS))) throw new PhysicsInputError('thresholds.minDurationS', 'must be a finite number ≥ 0')
  return { spinSlip, lockSlip, minDurationS, minSpeedKmh: mpsToKmh(SLIP_SPEED_FLOOR_MPS), source }
}
