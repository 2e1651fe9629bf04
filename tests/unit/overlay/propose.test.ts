import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { proposeTractionSafe } from '@/physics/overlay-propose'
import { PhysicsInputError, type MapTable } from '@/physics'

const drive = (values: number[][]): MapTable => ({ kind: 'drive', rowAxis: values.map((_, i) => i * 10), colAxis: values[0].map((_, j) => j * 10), values })

describe('proposeTractionSafe', () => {
  it('lowers cells above the ceiling to limit × (1 − margin), leaves the others alone', () => {
    const map = drive([[0, 0], [500, 400], [900, 700], [1200, 1000]])
    const p = proposeTractionSafe(map, [1000, 2000], 10)
    expect(p.ceilingByCol).toEqual([900, 1800])
    expect(p.table.values).toEqual([[0, 0], [500, 400], [900, 700], [900, 1000]])
    expect(p.changes).toEqual([{ row: 3, col: 0, before: 1200, after: 900, reason: 'limit' }])
  })

  it('keeps a drive column rising with the pedal by lowering, never raising (an invalid dip is repaired from the top)', () => {
    const map = drive([[0], [800], [600], [1500]])
    const p = proposeTractionSafe(map, [1000], 0)
    expect(p.table.values.map((r) => r[0])).toEqual([0, 600, 600, 1000])
    expect(p.changes).toEqual([
      { row: 3, col: 0, before: 1500, after: 1000, reason: 'limit' },
      { row: 1, col: 0, before: 800, after: 600, reason: 'pedal-order' },
    ])
  })

  it('only caps a regen map (a fall with brake pedal may be deliberate)', () => {
    const map: MapTable = { kind: 'regen', rowAxis: [0, 50, 100], colAxis: [10], values: [[900], [400], [2000]] }
    expect(proposeTractionSafe(map, [1000], 0).table.values).toEqual([[900], [400], [1000]])
  })

  it('rounds the ceiling down to a whole N·m so the draft stays under the limit', () => {
    const p = proposeTractionSafe(drive([[0], [5000]]), [1234.56], 10)
    expect(p.ceilingByCol[0]).toBe(1111)
    expect(p.table.values[1][0]).toBeLessThanOrEqual(1234.56 * 0.9)
  })

  it('for any drive map: under the ceiling where it was above, rising with the pedal, unchanged cells untouched, no torque added, no mutation', () => {
    const grid = fc.integer({ min: 2, max: 6 }).chain((rows) =>
      fc.integer({ min: 1, max: 5 }).chain((cols) =>
        fc.record({
          values: fc.array(fc.array(fc.integer({ min: -200, max: 3000 }), { minLength: cols, maxLength: cols }), { minLength: rows, maxLength: rows }),
          limits: fc.array(fc.integer({ min: 0, max: 3000 }), { minLength: cols, maxLength: cols }),
          margin: fc.integer({ min: 0, max: 50 }),
        }),
      ),
    )
    fc.assert(
      fc.property(grid, ({ values, limits, margin }) => {
        const map = drive(values)
        const before = structuredClone(map)
        const p = proposeTractionSafe(map, limits, margin)
        expect(map).toEqual(before)
        const changed = new Set(p.changes.map((c) => `${c.row},${c.col}`))
        p.table.values.forEach((row, r) =>
          row.forEach((after, c) => {
            const orig = values[r][c]
            expect(after).toBeLessThanOrEqual(orig)
            if (orig > limits[c] * (1 - margin / 100)) expect(after).toBeLessThanOrEqual(limits[c] * (1 - margin / 100))
            if (r > 0) expect(after).toBeGreaterThanOrEqual(p.table.values[r - 1][c])
            if (!changed.has(`${r},${c}`)) expect(after).toBe(orig)
          }),
        )
        // A map that already rises with the pedal only has 'limit' changes.
        const rising = values.every((row, r) => r === 0 || row.every((x, c) => x >= values[r - 1][c]))
        if (rising) expect(p.changes.every((c) => c.reason === 'limit')).toBe(true)
      }),
    )
  })

  it('lists changes largest first', () => {
    const p = proposeTractionSafe(drive([[0, 0], [1100, 1500]]), [1000, 1000], 0)
    expect(p.changes.map((c) => c.before - c.after)).toEqual([500, 100])
  })

  it('refuses a bad margin or a limit list of the wrong length', () => {
    const map = drive([[0], [100]])
    expect(() => proposeTractionSafe(map, [1000], 100)).toThrow(PhysicsInputError)
    expect(() => proposeTractionSafe(map, [1000], -1)).toThrow(PhysicsInputError)
    expect(() => proposeTractionSafe(map, [1000, 1000], 10)).toThrow(/one per speed breakpoint/)
    expect(() => proposeTractionSafe(map, [NaN], 10)).toThrow(PhysicsInputError)
  })
})
