import { describe, expect, it } from 'vitest'
import { UNITS } from '@/maps'
import { applyGridEdits } from '@/app/_components/map-grid/grid-data'
import { changedMarks, gridSync } from '@/app/_components/map-grid/grid-sync'
import { gridCommand } from '@/app/_components/map-grid/grid-keys'
import { runGridCommand } from '@/app/_components/map-grid/ops'
import { small } from '@/tests/support/fixtures'

describe('grid edits', () => {
  it('a breakpoint out of order is refused with its position and values in the shown unit', () => {
    expect(() => applyGridEdits(small(), [{ row: 0, col: 2, value: 50 }], UNITS.metric)).toThrow('speed breakpoint #2 must lie between 0 km/h and 40 km/h; 50 km/h would break the order')
    // 40 km/h ≈ 24.9 mph (1 mile = 1.609344 km, international yard and pound agreement, 1959).
    expect(() => applyGridEdits(small(), [{ row: 0, col: 2, value: 30 }], UNITS.imperial)).toThrow(/between 0 mph and 24\.9 mph; 30 mph/)
  })

  it('Delete clears only torque cells, and refuses a selection of breakpoints alone', () => {
    const t = runGridCommand('clear', small(), { r0: 2, c0: 0, r1: 3, c1: 1 })
    expect(t.values).toEqual([[0, 0, 0], [0, 300, 100], [0, 700, 400]])
    expect(t.rowAxis).toEqual(small().rowAxis)
    expect(() => runGridCommand('clear', small(), { r0: 0, c0: 1, r1: 0, c1: 3 })).toThrow(/Breakpoints cannot be cleared/)
  })

  it('maps keys to commands, leaving other keys to the grid', () => {
    const k = (key: string, mods: Partial<KeyboardEvent> = {}) => gridCommand({ key, ctrlKey: false, metaKey: false, altKey: false, shiftKey: false, ...mods })
    expect(k('Delete')).toBe('clear')
    expect(k('Backspace')).toBe('clear')
    expect(k('d', { ctrlKey: true })).toBe('fill-down')
    expect(k('R', { metaKey: true })).toBe('fill-right')
    expect(k('d')).toBeNull()
    expect(k('r', { ctrlKey: true, shiftKey: true })).toBeNull()
  })

  it('syncs only the cells that differ, and reloads when the shape changed', () => {
    expect(gridSync([[1, 2], [3, 4]], [[1, 2], [3, 5]])).toEqual({ reload: false, cells: [[1, 1, 5]] })
    expect(gridSync([[1, 2]], [[1, 2, 3]])).toEqual({ reload: true })
    const a = new Map([['1:1', { severity: 'error' as const, messages: ['x'] }]])
    expect(changedMarks(a, new Map([['1:1', { severity: 'error' as const, messages: ['x'] }]]))).toEqual([])
    expect(changedMarks(a, new Map([['2:2', { severity: 'warning' as const, messages: ['y'] }]]))).toEqual(['1:1', '2:2'])
  })
})

describe('toolbar inputs across a unit switch', () => {
  it('converts typed torque and speed, leaves percentages and non-numbers', async () => {
    const { convertTyped } = await import('@/app/_components/map-grid/toolbar')
    // 1 lbf·ft = 1.3558179483 N·m and 1 mph = 1.609344 km/h (NIST SP 811, appendix B).
    const out = convertTyped({ set: '1355.8', scale: '5', offset: 'abc', insert: '16.1' }, 'insert-col', UNITS.metric, UNITS.imperial)
    expect(out).toEqual({ set: '1000', scale: '5', offset: 'abc', insert: '10' })
    expect(convertTyped({ set: '', scale: '5', offset: '50', insert: '35' }, 'insert-row', UNITS.metric, UNITS.imperial).insert).toBe('35')
  })
})
