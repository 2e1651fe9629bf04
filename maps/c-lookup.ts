/**
 * The lookup the C header documents for firmware, on the header's integers, in TypeScript.
 * It mirrors the reference C function in docs/map-formats.md operation for operation (same
 * IEEE double steps in the same order), so the header can state how far firmware using it can
 * be from the app's lookup; tests/unit/maps/c-header.test.ts compiles that C and compares.
 */

/** The integer arrays and scales of a header; each axis has at least 2 breakpoints. */
export interface FixedGrid {
  /** Pedal breakpoints × pedalScale. */
  rowAxis: readonly number[]
  pedalScale: number
  /** Speed breakpoints × speedScale. */
  colAxis: readonly number[]
  speedScale: number
  /** Row-major values, torque × valueScale. */
  values: readonly number[]
  valueScale: number
}

/**
 * Torque, N·m, at a pedal position (%) and road speed (km/h): scale the inputs to the axes'
 * units, take the last interval whose lower breakpoint is ≤ the input (the first one below the
 * axis), clamp the fractions to [0, 1] so the edge value holds outside the axes, interpolate
 * bilinearly in double and divide by the value scale. Inputs must be finite.
 * @example fixedLookup({ rowAxis: [0, 1000], pedalScale: 10, colAxis: [0, 100], speedScale: 10, values: [0, 0, 1000, 2000], valueScale: 10 }, 50, 5) // 75
 */
export function fixedLookup(f: FixedGrid, pedalPct: number, speedKmh: number): number {
  const rows = f.rowAxis.length
  const cols = f.colAxis.length
  const p = pedalPct * f.pedalScale
  const s = speedKmh * f.speedScale
  let r = 0
  while (r < rows - 2 && p >= f.rowAxis[r + 1]) r++
  let c = 0
  while (c < cols - 2 && s >= f.colAxis[c + 1]) c++
  let u = (p - f.rowAxis[r]) / (f.rowAxis[r + 1] - f.rowAxis[r])
  let t = (s - f.colAxis[c]) / (f.colAxis[c + 1] - f.colAxis[c])
  u = u < 0 ? 0 : u > 1 ? 1 : u
  t = t < 0 ? 0 : t > 1 ? 1 : t
  const lo = r * cols
  const hi = lo + cols
  const v = f.values[lo + c] * (1 - t) * (1 - u) + f.values[lo + c + 1] * t * (1 - u) + f.values[hi + c] * (1 - t) * u + f.values[hi + c + 1] * t * u
  return v / f.valueScale
}
