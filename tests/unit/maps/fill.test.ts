import { describe, expect, it } from 'vitest'
import { clearCells, CLEARED_TORQUE_NM, fillDown, fillRight, MapEditError, type MapTable } from '../../../maps'
import { deepFreeze, small } from '@/tests/support/fixtures'

// small(): rows [0, 0, 0], [400, 300, 100], [800, 700, 400] (hand-written fixture).

/** Run on a frozen input: the input must come back unchanged. */
function pure(op: (t: MapTable) => MapTable): MapTable {
  const t = small()
  const out = op(deepFreeze(t))
  expect(t).toEqual(small())
  return out
}

describe('clearCells', () => {
  it('sets the selection to 0 N·m and nothing else', () => {
    expect(CLEARED_TORQUE_NM).toBe(0)
    expect(pure((t) => clearCells(t, { r0: 2, c0: 1, r1: 1, c1: 2 })).values).toEqual([[0, 0, 0], [400, 0, 0], [800, 0, 0]])
  })
})

describe('fillDown / fillRight', () => {
  it('fill down copies the top selected row into the rows below it, inside the selected columns', () => {
    expect(pure((t) => fillDown(t, { r0: 1, c0: 0, r1: 2, c1: 1 })).values).toEqual([[0, 0, 0], [400, 300, 100], [400, 300, 400]])
  })
  it('fill down on one row copies the row above into it', () => {
    expect(pure((t) => fillDown(t, { r0: 2, c0: 0, r1: 2, c1: 2 })).values[2]).toEqual([400, 300, 100])
  })
  it('fill right copies the left selected column into the columns to its right', () => {
    expect(pure((t) => fillRight(t, { r0: 1, c0: 0, r1: 2, c1: 2 })).values).toEqual([[0, 0, 0], [400, 400, 400], [800, 800, 800]])
  })
  it('fill right on one column copies the column to its left', () => {
    expect(pure((t) => fillRight(t, { r0: 0, c0: 2, r1: 2, c1: 2 })).values.map((r) => r[2])).toEqual([0, 300, 700])
  })
  it('refuses a fill with nothing to copy from, naming why', () => {
    expect(() => fillDown(small(), { r0: 0, c0: 0, r1: 0, c1: 2 })).toThrow(MapEditError)
    expect(() => fillDown(small(), { r0: 0, c0: 0, r1: 0, c1: 2 })).toThrow(/row above/)
    expect(() => fillRight(small(), { r0: 0, c0: 0, r1: 2, c1: 0 })).toThrow(/column left/)
  })
})
