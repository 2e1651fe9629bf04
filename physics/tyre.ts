/**
 * Pacejka's Magic Formula for the longitudinal force ratio Fx/Fz versus slip ratio κ
 * (Pacejka, Tire and Vehicle Dynamics, ch. 4, pure longitudinal slip, no shifts):
 *   x = Bκ,  u(x) = x − E(x − atan x),  Fx/Fz = D·sin(C·atan(u)).
 * This module requires B > 0, C > 0, D > 0 and E ≤ 1; with E ≤ 1 the inner function u is
 * strictly increasing, which makes the rising branch invertible analytically.
 */
import { PhysicsInputError, requireFinite } from './errors'

/** Magic Formula coefficients: stiffness B, shape C, peak D (a friction coefficient), curvature E. */
export interface MagicFormulaCoeffs { B: number; C: number; D: number; E: number }

/** Optional work counter for {@link slipForForceRatio}; each inner-function evaluation counts as one MF-equivalent evaluation. */
export interface SolveStats { solves: number; mfEvaluations: number }

/** Throws {@link PhysicsInputError} unless B, C, D > 0 and E ≤ 1. @example checkCoeffs({ B: 10, C: 1.9, D: 1, E: 0.97 }) */
export function checkCoeffs(c: MagicFormulaCoeffs, field = 'coeffs'): void {
  for (const k of ['B', 'C', 'D'] as const)
    if (!(Number.isFinite(c[k]) && c[k] > 0)) throw new PhysicsInputError(`${field}.${k}`, `must be a finite number > 0 (got ${String(c[k])})`)
  if (!(Number.isFinite(c.E) && c.E <= 1)) throw new PhysicsInputError(`${field}.E`, `must be finite and ≤ 1 (got ${String(c.E)})`)
}

const inner = (x: number, E: number): number => x - E * (x - Math.atan(x))

/**
 * Force ratio Fx/Fz at slip ratio κ (dimensionless). Odd in κ.
 * @example magicFormula(0.1, { B: 10, C: 1.9, D: 1, E: 0.97 }) // ≈ 0.85
 */
export function magicFormula(slip: number, c: MagicFormulaCoeffs): number {
  requireFinite('slip', slip)
  return c.D * Math.sin(c.C * Math.atan(inner(c.B * slip, c.E)))
}

/**
 * d(Fx/Fz)/dκ, analytic: D·cos(C·atan u)·C/(1+u²)·B·((1−E) + E/(1+x²)).
 * @example magicFormulaSlope(0, { B: 10, C: 1.9, D: 1, E: 0.97 }) // 19 = B·C·D
 */
export function magicFormulaSlope(slip: number, c: MagicFormulaCoeffs): number {
  const x = c.B * slip
  const u = inner(x, c.E)
  return c.D * Math.cos(c.C * Math.atan(u)) * (c.C / (1 + u * u)) * c.B * (1 - c.E + c.E / (1 + x * x))
}

/** Supremum of u(x) for x ≥ 0: ∞ when E < 1, π/2 when E = 1. */
const innerSup = (E: number): number => (E < 1 ? Infinity : Math.PI / 2)

/** Target of u at the force peak, tan(π/(2C)), or null when the curve has no interior peak. */
function peakTarget(c: MagicFormulaCoeffs): number | null {
  if (c.C <= 1) return null
  const t = Math.tan(Math.PI / (2 * c.C))
  return t < innerSup(c.E) ? t : null
}

/** Solves u(x) = t for x ≥ 0 by bracketed Newton (closed form when E = 1). */
function solveInner(t: number, E: number, stats?: SolveStats): number {
  if (E === 1) { if (stats) stats.mfEvaluations++; return Math.tan(t) }
  // E ≥ 0: (1−E)x ≤ u(x) ≤ x, u concave; E < 0: x ≤ u(x) ≤ (1−E)x, u convex.
  let lo = E >= 0 ? t : t / (1 - E)
  let hi = E >= 0 ? t / (1 - E) : t
  let x = E >= 0 ? lo : hi // Newton from this side converges monotonically
  for (let i = 0; i < 60; i++) {
    const g = inner(x, E) - t
    if (stats) stats.mfEvaluations++
    if (g < 0) lo = Math.max(lo, x); else hi = Math.min(hi, x)
    let xn = x - g / (1 - E + E / (1 + x * x))
    if (!(xn >= lo && xn <= hi)) xn = 0.5 * (lo + hi)
    if (Math.abs(xn - x) <= 1e-14 * Math.max(1, x)) return xn
    x = xn
  }
  return x
}

/**
 * Slip ratio κ > 0 where Fx/Fz peaks; solves u(Bκ) = tan(π/(2C)). Returns Infinity when the
 * curve is monotone (C ≤ 1, or E = 1 with C ≤ π/(2·atan(π/2)) ≈ 1.565): no finite peak.
 * @example peakSlip({ B: 10, C: 1.9, D: 1, E: 0.97 }) // ≈ 0.18
 */
export function peakSlip(c: MagicFormulaCoeffs): number {
  checkCoeffs(c)
  const t = peakTarget(c)
  return t === null ? Infinity : solveInner(t, c.E) / c.B
}

/**
 * Largest |Fx/Fz| the curve reaches: D when there is a peak, else its asymptote
 * (D·sin(C·π/2) for C ≤ 1 and E < 1; D·sin(C·atan(π/2)) when E = 1).
 * @example peakForceRatio({ B: 12, C: 2.3, D: 0.82, E: 1 }) // 0.82
 */
export function peakForceRatio(c: MagicFormulaCoeffs): number {
  checkCoeffs(c)
  if (peakTarget(c) !== null) return c.D
  return c.D * Math.sin(c.C * Math.atan(innerSup(c.E)))
}

/**
 * Slip ratio on the rising branch where Fx/Fz = ratio (negative ratio → negative slip),
 * or null when |ratio| exceeds the peak. Inverts sin and atan analytically,
 * u = tan(asin(|ratio|/D)/C), then solves u(Bκ) = u by bracketed Newton (≈ 3–6 inner
 * evaluations, converged to ~1e-14 relative in κ). Pass `stats` to count work.
 * @example slipForForceRatio(0.5, { B: 10, C: 1.9, D: 1, E: 0.97 }) // ≈ 0.0288
 */
export function slipForForceRatio(ratio: number, c: MagicFormulaCoeffs, stats?: SolveStats): number | null {
  requireFinite('ratio', ratio)
  checkCoeffs(c)
  return solveRatio(ratio, c, peakTarget(c), stats)
}

/** The body of {@link slipForForceRatio} for a finite ratio and checked coefficients, given `t = peakTarget(c)`. */
function solveRatio(ratio: number, c: MagicFormulaCoeffs, t: number | null, stats?: SolveStats): number | null {
  if (stats) stats.solves++
  if (ratio === 0) return 0
  const r = Math.abs(ratio)
  const sign = ratio < 0 ? -1 : 1
  if (t !== null) {
    if (r > c.D * (1 + 1e-12)) return null
    if (r >= c.D) return sign * solveInner(t, c.E, stats) / c.B
  } else if (r >= c.D * Math.sin(c.C * Math.atan(innerSup(c.E)))) return null
  const target = Math.tan(Math.asin(r / c.D) / c.C)
  return sign * solveInner(target, c.E, stats) / c.B
}

/**
 * {@link slipForForceRatio} for many ratios on one curve: checks the coefficients and finds the peak
 * once, then each call only validates its ratio. Same results, same errors for a bad ratio.
 * @example const solve = slipSolverFor(SURFACES.ice.coeffs); solve(0.05)
 */
export function slipSolverFor(c: MagicFormulaCoeffs): (ratio: number, stats?: SolveStats) => number | null {
  checkCoeffs(c)
  const coeffs: MagicFormulaCoeffs = { B: c.B, C: c.C, D: c.D, E: c.E } // a snapshot: later changes to c cannot unvalidate it
  const t = peakTarget(coeffs)
  return (ratio, stats) => solveRatio(requireFinite('ratio', ratio), coeffs, t, stats)
}
