import { quantile } from 'simple-statistics'
import { describe, expect, it } from 'vitest'
import { createReservoir } from '@/physics/drive-log/reservoir'
import { analyse, series } from './helpers'

// A deterministic, skewed data set: mostly small creep slip with a heavy tail.
function values(n: number): number[] {
  let s = 12345
  const rnd = () => ((s = (Math.imul(s, 1103515245) + 12345) >>> 0) / 2 ** 32)
  return Array.from({ length: n }, () => { const u = rnd(); return u < 0.97 ? 0.02 * rnd() : 0.1 + rnd() ** 3 })
}
const rankOf = (sorted: number[], x: number) => sorted.filter((v) => v <= x).length / sorted.length

describe('streaming slip percentiles (bounded reservoir)', () => {
  it('are exact (equal to simple-statistics quantile) while the count fits the reservoir', () => {
    const xs = values(5000)
    const r = createReservoir(8192)
    xs.forEach((x) => r.add(x))
    expect(r.exact).toBe(true)
    expect(r.quantiles([0.5, 0.95, 0.99])).toEqual([quantile(xs, 0.5), quantile(xs, 0.95), quantile(xs, 0.99)])
  })
  it('stay within ±0.005 in rank of the exact quantile on 400 000 values with a 16 384 reservoir', () => {
    // Stated tolerance: rank error of a uniform reservoir ≈ √(p(1−p)/k) ≤ 0.0008 here; 0.005 is over 6σ.
    const xs = values(400_000)
    const r = createReservoir(16_384)
    xs.forEach((x) => r.add(x))
    const sorted = xs.slice().sort((a, b) => a - b)
    const got = r.quantiles([0.5, 0.95, 0.99]) as number[]
    ;[0.5, 0.95, 0.99].forEach((p, i) => {
      expect(Math.abs(rankOf(sorted, got[i]) - p)).toBeLessThan(0.005)
      expect(got[i]).toBeGreaterThanOrEqual(quantile(xs, Math.max(0, p - 0.005)))
      expect(got[i]).toBeLessThanOrEqual(quantile(xs, Math.min(1, p + 0.005)))
    })
  })
  it('are deterministic (fixed seed), and the analyser reports |κ| statistics of moving samples', () => {
    const s = series(20, 0.02, (_, i) => ({ wheelSpeedsKmh: [36 * (1 + (i % 10) / 100)] }))
    const a = analyse(s).result.slip
    expect(analyse(s).result.slip).toEqual(a)
    const abs = s.map((x) => Math.abs((x.wheelSpeedsKmh[0] - 36) / 36))
    expect(a.quantiles).toBe('exact')
    expect(a.p50Abs).toBeCloseTo(quantile(abs, 0.5), 12)
    expect(a.p99Abs).toBeCloseTo(quantile(abs, 0.99), 12)
    expect(a.meanAbs).toBeCloseTo(abs.reduce((x, y) => x + y) / abs.length, 12)
    expect(a.maxAbs).toBeCloseTo(0.09, 12)
  })
})
