import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { findInterval, lookup, MapInputError, type MapTable } from '../../../maps'

/**
 * Reference: the bilinear formula as given in Press, Teukolsky, Vetterling & Flannery,
 * "Numerical Recipes", §3.6 (Interpolation in two or more dimensions), written over the
 * rectangle corners (x1, y1) … (x2, y2):
 * f(x,y) ≈ [f11(x2−x)(y2−y) + f21(x−x1)(y2−y) + f12(x2−x)(y−y1) + f22(x−x1)(y−y1)] / ((x2−x1)(y2−y1))
 */
function textbookBilinear(x: number, y: number, x1: number, x2: number, y1: number, y2: number, f11: number, f21: number, f12: number, f22: number): number {
  return (f11 * (x2 - x) * (y2 - y) + f21 * (x - x1) * (y2 - y) + f12 * (x2 - x) * (y - y1) + f22 * (x - x1) * (y - y1)) / ((x2 - x1) * (y2 - y1))
}

// x = speed (columns), y = pedal (rows).
const table: MapTable = {
  kind: 'drive',
  rowAxis: [0, 50, 100],
  colAxis: [0, 20, 60],
  values: [
    [0, 100, 300],
    [200, 500, 1100],
    [900, 1200, 1500],
  ],
}

describe('lookup', () => {
  it('matches the Numerical Recipes §3.6 bilinear formula inside a cell', () => {
    // Speed 35 km/h between 20 and 60, pedal 30 % between 0 and 50.
    const expected = textbookBilinear(35, 30, 20, 60, 0, 50, 100, 300, 500, 1100)
    // By hand: (100·25·20 + 300·15·20 + 500·25·30 + 1100·15·30) / (40·50) = 1,010,000 / 2,000 = 505.
    expect(expected).toBe(505)
    expect(lookup(table, 30, 35)).toBeCloseTo(505, 10)
  })

  it('matches the formula at random points of every cell', () => {
    fc.assert(
      fc.property(fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 60, noNaN: true }), (p, s) => {
        const r = p >= 50 ? 1 : 0
        const c = s >= 20 ? 1 : 0
        const [y1, y2] = [table.rowAxis[r], table.rowAxis[r + 1]]
        const [x1, x2] = [table.colAxis[c], table.colAxis[c + 1]]
        const v = table.values
        const want = textbookBilinear(s, p, x1, x2, y1, y2, v[r][c], v[r][c + 1], v[r + 1][c], v[r + 1][c + 1])
        expect(lookup(table, p, s)).toBeCloseTo(want, 8)
      }),
    )
  })

  it('returns the stored value exactly on every breakpoint', () => {
    table.rowAxis.forEach((p, r) => table.colAxis.forEach((s, c) => expect(lookup(table, p, s)).toBe(table.values[r][c])))
  })

  it('holds the edge values outside the axes (no extrapolation)', () => {
    expect(lookup(table, -20, 10)).toBe(lookup(table, 0, 10))
    expect(lookup(table, 150, 40)).toBe(lookup(table, 100, 40))
    expect(lookup(table, 50, 500)).toBe(1100)
    expect(lookup(table, 50, -5)).toBe(200)
    expect(lookup(table, 1000, 1000)).toBe(1500)
    expect(lookup(table, -1, -1)).toBe(0)
  })

  it('stays within the four surrounding cells (property)', () => {
    fc.assert(
      fc.property(fc.double({ min: -50, max: 150, noNaN: true }), fc.double({ min: -10, max: 100, noNaN: true }), (p, s) => {
        const v = lookup(table, p, s)
        expect(v).toBeGreaterThanOrEqual(0 - 1e-9)
        expect(v).toBeLessThanOrEqual(1500 + 1e-9)
      }),
    )
  })

  it('refuses non-finite coordinates with a typed error instead of NaN', () => {
    expect(() => lookup(table, Number.NaN, 10)).toThrow(MapInputError)
    expect(() => lookup(table, 10, Infinity)).toThrow(/finite/)
  })

  it('is fast: a million lookups on a 64 × 64 table well under two seconds', () => {
    const axis = Array.from({ length: 64 }, (_, i) => i * 1.5)
    const big: MapTable = { kind: 'drive', rowAxis: axis, colAxis: axis, values: axis.map((a) => axis.map((b) => a + b)) }
    const t0 = performance.now()
    let sum = 0
    for (let i = 0; i < 1_000_000; i++) sum += lookup(big, (i * 0.37) % 100, (i * 0.11) % 96)
    expect(Number.isFinite(sum)).toBe(true)
    expect(performance.now() - t0).toBeLessThan(2000)
  })
})

describe('findInterval', () => {
  it('agrees with a linear scan (property)', () => {
    fc.assert(
      fc.property(fc.uniqueArray(fc.integer({ min: -1000, max: 1000 }), { minLength: 2, maxLength: 64 }), fc.double({ min: -1200, max: 1200, noNaN: true }), (raw, x) => {
        const axis = [...raw].sort((a, b) => a - b)
        let want = 0
        for (let i = 0; i < axis.length - 1; i++) if (axis[i] <= x) want = i
        expect(findInterval(axis, x)).toBe(want)
      }),
    )
  })

  it('handles a one-point axis', () => {
    expect(findInterval([5], 100)).toBe(0)
  })
})
