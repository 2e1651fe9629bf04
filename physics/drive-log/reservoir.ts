/**
 * Streaming percentiles from a bounded uniform reservoir (Vitter's Algorithm R) with a fixed-seed PRNG,
 * so a log always gives the same answer however it is chunked. Exact while count ≤ capacity; beyond
 * that each kept value is a uniform sample of all values seen, and the rank error of a p-quantile is
 * about √(p(1−p)/capacity) (≈ 0.0008 for p = 0.99 and 16 384 values).
 */
import { quantileSorted } from 'simple-statistics'
import { mulberry32 } from '../random'

/** A reservoir of at most `capacity` values. */
export interface Reservoir {
  add(x: number): void
  readonly count: number
  readonly exact: boolean
  /** Quantiles (simple-statistics `quantileSorted`, its interpolation rule) of the kept values; null when empty. */
  quantiles(ps: readonly number[]): (number | null)[]
}

/** @example const r = createReservoir(100); [1, 2, 3].forEach(r.add); r.quantiles([0.5]) // [2] */
export function createReservoir(capacity: number, seed = 0x5eed): Reservoir {
  const cap = Math.max(1, Math.floor(capacity))
  const kept = new Float64Array(cap)
  const random = mulberry32(seed)
  let n = 0
  return {
    add(x: number) {
      if (n < cap) kept[n] = x
      else {
        const j = Math.floor(random() * (n + 1))
        if (j < cap) kept[j] = x
      }
      n++
    },
    get count() { return n },
    get exact() { return n <= cap },
    quantiles(ps) {
      const m = Math.min(n, cap)
      if (m === 0) return ps.map(() => null)
      const sorted = Array.from(kept.subarray(0, m)).sort((a, b) => a - b)
      return ps.map((p) => quantileSorted(sorted, p))
    },
  }
}
