/** Resolves the spin / lock-up thresholds from options, the surface's tyre curve, or the default. */
import { resolveSurface } from '../drive-curve'
import { resolveDriveTyre, tyreCurve } from '../drive-tyre'
import { PhysicsInputError, requirePositive } from '../errors'
import { peakSlip } from '../tyre'
import type { AnalysisResult, LogAnalyserOptions } from './types'

/** Spin threshold used without a surface: slip ratio 0.15, near the force peak of typical dry-road curves. */
export const DEFAULT_SPIN_SLIP = 0.15
/** Shortest reported event, s. */
export const DEFAULT_MIN_EVENT_S = 0.1
/**
 * Slowest speed at which slip is judged, km/h. Inductive wheel-speed sensors give little signal and tone-wheel
 * pulses come far apart at walking pace, and anti-lock controllers commonly stop regulating below about
 * 5–7 km/h for that reason (common practice); below it |κ| is mostly sensor noise over a small denominator.
 */
export const DEFAULT_MIN_SLIP_SPEED_KMH = 5
/** Hysteresis: an event ends when |κ| drops below this fraction of its entry threshold. */
export const DEFAULT_EXIT_FRACTION = 0.75
/**
 * An event also needs the wheel to differ from the road by at least 2 km/h to start and ends below 1 km/h:
 * at low speed a relative threshold alone is crossed by a few tenths of a km/h of sensor quantisation.
 */
export const DEFAULT_MIN_SPEED_DIFF_KMH = 2
export const DEFAULT_EXIT_SPEED_DIFF_KMH = 1

function nonNegative(name: string, v: number | undefined, dflt: number): number {
  if (v === undefined) return dflt
  if (!(v >= 0 && Number.isFinite(v))) throw new PhysicsInputError(`thresholds.${name}`, 'must be a finite number ≥ 0')
  return v
}

/**
 * κ_spin = option, else the peak slip of the program's drive tyre on the surface at its nominal load
 * (beyond it the tyre is on the falling branch: the wheel runs away; the default truck tyre when the
 * options name none), else {@link DEFAULT_SPIN_SLIP}; κ_lock defaults to κ_spin.
 * Slip is only judged when the road or a wheel moves at ≥ 5 km/h; an event needs both |κ| beyond its threshold
 * and |wheel − road| ≥ 2 km/h, and ends below 0.75 × the threshold or 1 km/h (hysteresis).
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
  const minDurationS = nonNegative('minDurationS', t.minDurationS, DEFAULT_MIN_EVENT_S)
  const exitFraction = t.exitFraction === undefined ? DEFAULT_EXIT_FRACTION : requirePositive('thresholds.exitFraction', t.exitFraction)
  if (exitFraction > 1) throw new PhysicsInputError('thresholds.exitFraction', 'must be at most 1 (the exit threshold cannot lie above the entry threshold)')
  const minSpeedDiffKmh = nonNegative('minSpeedDiffKmh', t.minSpeedDiffKmh, DEFAULT_MIN_SPEED_DIFF_KMH)
  const exitSpeedDiffKmh = nonNegative('exitSpeedDiffKmh', t.exitSpeedDiffKmh, Math.min(DEFAULT_EXIT_SPEED_DIFF_KMH, minSpeedDiffKmh))
  if (exitSpeedDiffKmh > minSpeedDiffKmh) throw new PhysicsInputError('thresholds.exitSpeedDiffKmh', 'must be at most thresholds.minSpeedDiffKmh')
  const minSpeedKmh = nonNegative('minSpeedKmh', t.minSpeedKmh, DEFAULT_MIN_SLIP_SPEED_KMH)
  return { spinSlip, lockSlip, exitFraction, minSpeedDiffKmh, exitSpeedDiffKmh, minDurationS, minSpeedKmh, source }
}
