import { describe, expect, it } from 'vitest'
import { checkMap, lookup, PhysicsInputError } from '@/physics'

const map = { kind: 'drive' as const, rowAxis: [0, 50, 100], colAxis: [0, 20, 60], values: [[0, 0, 0], [400, 300, 200], [1000, 800, 400]] }

describe('bilinear lookup, clamped', () => {
  it('hits breakpoints exactly and interpolates bilinearly (hand values)', () => {
    expect(lookup(map, 50, 20)).toBe(300)
    // row 75 between 50 and 100 (f = 0.5), col 40 between 20 and 60 (f = 0.5):
    // row 50: 300 + 0.5 × (200 − 300) = 250; row 100: 800 + 0.5 × (400 − 800) = 600; → 250 + 0.5 × 350 = 425
    expect(lookup(map, 75, 40)).toBeCloseTo(425, 12)
    expect(lookup(map, 25, 0)).toBeCloseTo(200, 12)
  })
  it('clamps to the edge values outside the axes', () => {
    expect(lookup(map, 120, 100)).toBe(400)
    expect(lookup(map, -10, -5)).toBe(0)
    expect(lookup(map, 100, -5)).toBe(1000)
    expect(lookup({ rowAxis: [0], colAxis: [0], values: [[7]] }, 3, 3)).toBe(7)
  })
  it('checkMap rejects malformed maps', () => {
    expect(() => checkMap({ ...map, rowAxis: [0, 50, 50] })).toThrow(PhysicsInputError)
    expect(() => checkMap({ ...map, values: [[0, 0], [1, 1], [2, 2]] })).toThrow(/values\[0\]/)
    expect(() => checkMap({ ...map, values: [[0, 0, Number.NaN], [1, 1, 1], [2, 2, 2]] })).toThrow(/values\[0\]\[2\]/)
    expect(() => lookup(map, Number.NaN, 0)).toThrow(PhysicsInputError)
  })
})
