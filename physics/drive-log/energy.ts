/**
 * Trapezoid rule for battery energy. Power P = V·I (W, positive = discharge) is taken as linear between
 * samples; an interval whose power changes sign is split at the zero crossing, so drawn and regenerated
 * energy are each exact for that linear P and drawn − regenerated equals the plain trapezoid ∫P dt.
 */

/** J per kWh (1 kWh = 3.6 MJ exactly). */
export const J_PER_KWH = 3.6e6

/**
 * ∫ max(P, 0) dt over an interval of `dtS` seconds with P linear from p0 to p1 (W) → J.
 * Regenerated energy is `positiveEnergyJ(−p0, −p1, dt)`.
 * @example positiveEnergyJ(100, 100, 2) // 200
 * @example positiveEnergyJ(100, -100, 2) // 50: triangle of height 100 over the first second
 */
export function positiveEnergyJ(p0: number, p1: number, dtS: number): number {
  if (p0 >= 0 && p1 >= 0) return 0.5 * (p0 + p1) * dtS
  if (p0 <= 0 && p1 <= 0) return 0
  const tau = (dtS * p0) / (p0 - p1) // zero crossing of the line
  return p0 > 0 ? 0.5 * p0 * tau : 0.5 * p1 * (dtS - tau)
}
