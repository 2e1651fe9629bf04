import { describe, expect, it } from 'vitest'
import { addOffset, diff, insertBreakpoint, scaleBy, setValue, type MapTable } from '../../../maps'
import { small } from '@/tests/support/fixtures'

describe('diff, same axes', () => {
  it('reports nothing for identical tables', () => {
    const d = diff(small(), small())
    expect(d).toMatchObject({ axesDiffer: false, kindDiffers: false, changed: [], cellCount: 9, largestAbsolute: null, largestRelative: null })
  })

  it('lists changed cells by |change| descending with absolute and relative maxima', () => {
    let b = setValue(small(), { r0: 2, c0: 0, r1: 2, c1: 0 }, 700) // −100 (−12.5 %)
    b = setValue(b, { r0: 1, c0: 2, r1: 1, c1: 2 }, 150) // +50 (+50 %)
    b = setValue(b, { r0: 0, c0: 1, r1: 0, c1: 1 }, 20) // +20 from 0: no relative change
    const d = diff(small(), b)
    expect(d.changed.map((c) => [c.row, c.col, c.delta])).toEqual([[2, 0, -100], [1, 2, 50], [0, 1, 20]])
    expect(d.largestAbsolute).toMatchObject({ row: 2, col: 0, before: 800, after: 700, delta: -100, relative: -0.125, pedalPct: 100, speedKmh: 0 })
    expect(d.largestRelative).toMatchObject({ row: 1, col: 2, relative: 0.5 })
    expect(d.changed[2].relative).toBeNull()
  })

  it('ignores changes within the tolerance', () => {
    const b = addOffset(small(), { r0: 0, c0: 0, r1: 2, c1: 2 }, 0.001)
    expect(diff(small(), b, 0.01).changed).toEqual([])
    expect(diff(small(), b).changed.length).toBe(9)
  })

  it('sees a kind change', () => {
    expect(diff(small(), { ...small(), kind: 'regen' }).kindDiffers).toBe(true)
  })
})

describe('diff, different axes (b resampled onto a)', () => {
  it('finds no change when b only gained a breakpoint on the same surface', () => {
    const d = diff(small(), insertBreakpoint(small(), 'col', 25))
    expect(d.axesDiffer).toBe(true)
    expect(d.changed).toEqual([])
  })

  it('compares b at a’s breakpoints by lookup', () => {
    const b: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 40], values: [[0, 0], [1000, 400]] }
    const d = diff(small(), b)
    expect(d.axesDiffer).toBe(true)
    // b at (50 %, 10 km/h) = 0.5 × (1000 − 600 × 10/40) = 425 vs 300 in a.
    const cell = d.changed.find((c) => c.row === 1 && c.col === 1)
    expect(cell).toMatchObject({ before: 300, after: 425, delta: 125 })
    expect(d.largestAbsolute).toMatchObject({ row: 2, col: 0, delta: 200 })
  })

  it('relative changes use |before|', () => {
    const a: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[-100, 0], [0, 0]] }
    expect(diff(a, scaleBy(a, { r0: 0, c0: 0, r1: 0, c1: 0 }, 10)).largestRelative?.relative).toBeCloseTo(-0.1, 12)
  })
})
