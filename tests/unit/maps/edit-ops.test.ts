import { describe, expect, it } from 'vitest'
import {
  addOffset, clampToEnvelope, fillLinear, limitsFromVehicle, MapEditError, motorEnvelopeAt, normaliseSelection, scaleBy, setValue, smooth, validate, wholeTable, type MapTable,
} from '../../../maps'
import { deepFreeze, insideTable, small, vehicle } from '@/tests/support/fixtures'

const limits = limitsFromVehicle(vehicle)

/** Run an operation on a frozen input and check the input is still equal to a fresh copy. */
function pure(op: (t: MapTable) => MapTable, t: MapTable = small()): MapTable {
  const before = structuredClone(t)
  const out = op(deepFreeze(t))
  expect(t).toEqual(before)
  expect(out).not.toBe(t)
  return out
}

describe('selection', () => {
  it('normalises reversed corners and refuses cells outside the table', () => {
    expect(normaliseSelection(small(), { r0: 2, c0: 2, r1: 0, c1: 1 })).toEqual({ r0: 0, c0: 1, r1: 2, c1: 2 })
    expect(() => normaliseSelection(small(), { r0: 0, c0: 0, r1: 3, c1: 0 })).toThrow(MapEditError)
    expect(() => normaliseSelection(small(), { r0: 0.5, c0: 0, r1: 1, c1: 0 })).toThrow(/whole index/)
  })
})

describe('setValue / scaleBy / addOffset', () => {
  it('setValue fills the selection (reversed corners) and nothing else', () => {
    const out = pure((t) => setValue(t, { r0: 2, c0: 2, r1: 1, c1: 1 }, 50))
    expect(out.values).toEqual([[0, 0, 0], [400, 50, 50], [800, 50, 50]])
  })

  it('scaleBy +10 % multiplies by 1.1, −100 % gives zero', () => {
    const out = pure((t) => scaleBy(t, { r0: 2, c0: 0, r1: 2, c1: 2 }, 10))
    expect(out.values[2][0]).toBeCloseTo(880, 10)
    expect(out.values[2][2]).toBeCloseTo(440, 10)
    expect(out.values[1]).toEqual([400, 300, 100])
    expect(scaleBy(small(), wholeTable(small()), -100).values.flat().every((v) => v === 0)).toBe(true)
  })

  it('addOffset shifts by N·m', () => {
    const out = pure((t) => addOffset(t, { r0: 1, c0: 0, r1: 1, c1: 2 }, -50))
    expect(out.values[1]).toEqual([350, 250, 50])
  })

  it('refuses non-finite arguments with MapEditError', () => {
    expect(() => setValue(small(), wholeTable(small()), Number.NaN)).toThrow(MapEditError)
    expect(() => scaleBy(small(), wholeTable(small()), Infinity)).toThrow(/finite/)
    expect(() => addOffset(small(), wholeTable(small()), Number.NaN)).toThrow(MapEditError)
  })
})

describe('fillLinear', () => {
  it("'rows' interpolates by speed breakpoint position, not by index", () => {
    // Speeds 0, 10, 40 km/h; row 2 from 800 to 400: at 10 km/h 800 − 400 × 10/40 = 700 (by index it would be 600).
    const t = setValue(small(), { r0: 2, c0: 1, r1: 2, c1: 1 }, 0)
    const out = pure((x) => fillLinear(x, { r0: 2, c0: 0, r1: 2, c1: 2 }, 'rows'), t)
    expect(out.values[2]).toEqual([800, 700, 400])
  })

  it("'cols' interpolates by pedal breakpoint position", () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 20, 100], colAxis: [0, 10], values: [[0, 0], [999, 999], [1000, 500]] }
    const out = pure((x) => fillLinear(x, { r0: 0, c0: 0, r1: 2, c1: 1 }, 'cols'), t)
    expect(out.values[1]).toEqual([200, 100])
  })

  it('leaves a one-cell-wide selection unchanged and refuses an unknown direction', () => {
    expect(fillLinear(small(), { r0: 0, c0: 1, r1: 2, c1: 1 }, 'rows')).toEqual(small())
    // @ts-expect-error deliberate bad direction from untyped callers
    expect(() => fillLinear(small(), wholeTable(small()), 'diagonal')).toThrow(MapEditError)
  })
})

describe('smooth', () => {
  const spike: MapTable = { kind: 'drive', rowAxis: [0, 50, 100], colAxis: [0, 10, 20], values: [[0, 0, 0], [0, 900, 0], [0, 0, 0]] }

  it('takes the 3 × 3 mean, averaging only existing neighbours at the edges', () => {
    const out = pure((t) => smooth(t, wholeTable(t)), spike)
    // Centre: 900 / 9; edge cell: 900 / 6 neighbours; corner: 900 / 4.
    expect(out.values[1][1]).toBe(100)
    expect(out.values[0][1]).toBe(150)
    expect(out.values[0][0]).toBe(225)
  })

  it('changes only the selected cells, reading neighbours from the original', () => {
    const out = smooth(spike, { r0: 0, c0: 0, r1: 0, c1: 0 })
    expect(out.values).toEqual([[225, 0, 0], [0, 900, 0], [0, 0, 0]])
  })
})

describe('clampToEnvelope', () => {
  it('brings every drive cell inside the motor envelope', () => {
    const wild = insideTable('drive', 2)
    const out = pure((t) => clampToEnvelope(t, limits), wild)
    out.values.forEach((row) => row.forEach((v, c) => expect(v).toBeLessThanOrEqual(motorEnvelopeAt(limits, out.colAxis[c]))))
    expect(out.values[4][0]).toBe(2000)
    expect(out.values[1][0]).toBe(wild.values[1][0]) // 0.25 × 2 × 2000 = 1000 was already fine
    expect(validate(out, limits).filter((f) => f.severity === 'error')).toEqual([])
  })

  it('clamps regen to [0, min(envelope, charge limit)] and leaves non-finite cells for validate', () => {
    const t: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 40], values: [[-30, Number.NaN], [5000, 5000]] }
    const out = clampToEnvelope(t, limits)
    expect(out.values[0][0]).toBe(0)
    expect(out.values[0][1]).toBeNaN()
    expect(out.values[1][0]).toBe(2000)
    expect(out.values[1][1]).toBeCloseTo(500, 9) // 200 kW / 400 rad/s
  })
})
