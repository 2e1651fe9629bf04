import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { insertBreakpoint, lookup, MapEditError, removeBreakpoint, setBreakpoint, type MapTable } from '../../../maps'
import { deepFreeze, small } from '@/tests/support/fixtures'

describe('insertBreakpoint', () => {
  it('adds a speed breakpoint filled by lookup', () => {
    const t = deepFreeze(small())
    const out = insertBreakpoint(t, 'col', 25)
    expect(out.colAxis).toEqual([0, 10, 25, 40])
    expect(out.values.map((r) => r[2])).toEqual([0, 200, 550])
    expect(t).toEqual(small())
  })

  it('adds a pedal breakpoint filled by lookup', () => {
    const out = insertBreakpoint(deepFreeze(small()), 'row', 75)
    expect(out.rowAxis).toEqual([0, 50, 75, 100])
    expect(out.values[2]).toEqual([600, 500, 250])
  })

  it('leaves the interpolated surface unchanged (property)', () => {
    const t = small()
    fc.assert(
      fc.property(fc.double({ min: 0.01, max: 39.99, noNaN: true }), fc.double({ min: 0, max: 100, noNaN: true }), fc.double({ min: 0, max: 40, noNaN: true }), (at, p, s) => {
        if (t.colAxis.includes(at)) return
        const out = insertBreakpoint(t, 'col', at)
        expect(lookup(out, p, s)).toBeCloseTo(lookup(t, p, s), 8)
      }),
    )
  })

  it('outside the axis holds the edge values', () => {
    const out = insertBreakpoint(small(), 'col', 80)
    expect(out.colAxis).toEqual([0, 10, 40, 80])
    expect(out.values.map((r) => r[3])).toEqual([0, 100, 400])
  })

  it('refuses a duplicate, a non-finite value and a full axis', () => {
    expect(() => insertBreakpoint(small(), 'col', 10)).toThrow(MapEditError)
    expect(() => insertBreakpoint(small(), 'row', Number.NaN)).toThrow(/finite/)
    const axis = Array.from({ length: 64 }, (_, i) => i)
    const full: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: axis, values: [axis.map(() => 0), axis.map(() => 1)] }
    expect(() => insertBreakpoint(full, 'col', 0.5)).toThrow(/at most 64/)
  })
})

describe('removeBreakpoint', () => {
  it('drops the breakpoint and its row or column', () => {
    const t = deepFreeze(small())
    expect(removeBreakpoint(t, 'row', 1)).toEqual({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10, 40], values: [[0, 0, 0], [800, 700, 400]] })
    expect(removeBreakpoint(t, 'col', 0).values).toEqual([[0, 0], [300, 100], [700, 400]])
  })

  it('refuses to go below 2 breakpoints and a bad index', () => {
    const two = removeBreakpoint(small(), 'row', 1)
    expect(() => removeBreakpoint(two, 'row', 0)).toThrow(expect.objectContaining({ code: 'too-few-breakpoints' }))
    expect(() => removeBreakpoint(small(), 'col', 3)).toThrow(MapEditError)
  })
})

describe('setBreakpoint', () => {
  it('moves a breakpoint between its neighbours, keeping the values', () => {
    const t = deepFreeze(small())
    const out = setBreakpoint(t, 'col', 1, 12)
    expect(out.colAxis).toEqual([0, 12, 40])
    expect(out.values).toEqual(small().values)
    expect(setBreakpoint(t, 'row', 2, 90).rowAxis).toEqual([0, 50, 90])
    expect(setBreakpoint(t, 'col', 0, -5).colAxis).toEqual([-5, 10, 40])
  })

  it('throws a typed error when the order would break', () => {
    const t = small()
    expect(() => setBreakpoint(t, 'col', 1, 40)).toThrow(MapEditError)
    expect(() => setBreakpoint(t, 'col', 1, 0)).toThrow(expect.objectContaining({ code: 'breakpoint-order', message: 'speed breakpoint #2 must lie between 0 km/h and 40 km/h; 0 km/h would break the order' }))
    expect(() => setBreakpoint(t, 'col', 0, 50)).toThrow('speed breakpoint #1 must lie below 10 km/h; 50 km/h would break the order')
    expect(() => setBreakpoint(t, 'row', 2, 50)).toThrow(/above 50/)
    expect(() => setBreakpoint(t, 'row', 0, Number.NaN)).toThrow(/finite/)
    expect(() => setBreakpoint(t, 'row', 7, 1)).toThrow(expect.objectContaining({ code: 'bad-index' }))
  })
})
