import { describe, expect, it } from 'vitest'
import { mergeTables, resolveMerge, type MapTable } from '../../../maps'
import { deepFreeze, small } from '@/tests/support/fixtures'

const withCells = (cells: [number, number, number][], t: MapTable = small()): MapTable => {
  const out = structuredClone(t)
  for (const [r, c, v] of cells) out.values[r][c] = v
  return out
}

describe('mergeTables', () => {
  it('takes cells changed on one side only from that side, with no conflict', () => {
    const parent = deepFreeze(small())
    const mine = deepFreeze(withCells([[1, 1, 310]]))
    const theirs = deepFreeze(withCells([[2, 2, 420], [0, 1, 5]]))
    const m = mergeTables(parent, mine, theirs)
    expect(m.ok).toBe(true)
    if (!m.ok) return
    expect(m.conflicts).toEqual([])
    expect(m.takenFromMine).toBe(1)
    expect(m.takenFromTheirs).toBe(2)
    expect(m.table.values).toEqual([[0, 5, 0], [400, 310, 100], [800, 700, 420]])
    expect(parent).toEqual(small()) // inputs untouched (frozen as well)
  })

  it('a cell changed equally on both sides is no conflict', () => {
    const m = mergeTables(small(), withCells([[1, 0, 450]]), withCells([[1, 0, 450]]))
    expect(m.ok && m.conflicts).toEqual([])
    expect(m.ok && m.table.values[1][0]).toBe(450)
  })

  it('only cells both sides changed differently are conflicts, and resolve picks per cell', () => {
    const m = mergeTables(small(), withCells([[1, 0, 450], [2, 1, 650], [0, 2, 9]]), withCells([[1, 0, 430], [2, 1, 690], [1, 2, 120]]))
    expect(m.ok).toBe(true)
    if (!m.ok) return
    expect(m.conflicts).toEqual([
      { row: 1, col: 0, parent: 400, mine: 450, theirs: 430 },
      { row: 2, col: 1, parent: 700, mine: 650, theirs: 690 },
    ])
    expect(m.table.values[1][2]).toBe(120) // theirs only
    expect(m.table.values[0][2]).toBe(9) // mine only
    const picked = resolveMerge(m.table, m.conflicts, (c) => (c.row === 1 ? 'theirs' : 'mine'))
    expect([picked.values[1][0], picked.values[2][1]]).toEqual([430, 650])
    expect(resolveMerge(m.table, m.conflicts, () => 'theirs').values[2][1]).toBe(690)
    expect(resolveMerge(m.table, m.conflicts, () => 'mine').values[1][0]).toBe(450)
    expect(m.table.values[1][0]).toBe(450) // resolve left the merge result alone
  })

  it('refuses a cell-by-cell merge when either side moved breakpoints, saying which', () => {
    const moved = { ...small(), colAxis: [0, 12, 40] }
    const a = mergeTables(small(), moved, withCells([[1, 1, 1]]))
    expect(a).toEqual({ ok: false, reason: expect.stringMatching(/your edits move the speed breakpoints/) })
    const b = mergeTables(small(), small(), { ...small(), rowAxis: [0, 60, 100] })
    expect(b).toEqual({ ok: false, reason: expect.stringMatching(/newer revision moves the pedal breakpoints/) })
  })

  it('refuses maps of different kinds', () => {
    expect(mergeTables(small(), small(), { ...small(), kind: 'regen' }).ok).toBe(false)
  })
})
