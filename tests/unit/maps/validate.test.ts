import { describe, expect, it } from 'vitest'
import { clampToEnvelope, isValid, limitsFromVehicle, validate, VALIDATION_RULES, type Finding, type MapTable, type RuleId } from '../../../maps'
import { handChargeLimit, handEnvelope, insideTable, vehicle } from '@/tests/support/fixtures'

const limits = limitsFromVehicle(vehicle)
const rules = (fs: Finding[]) => [...new Set(fs.map((f) => f.rule))].sort()
const only = (fs: Finding[], rule: RuleId) => fs.filter((f) => f.rule === rule)

function withCell(t: MapTable, r: number, c: number, v: number): MapTable {
  return { ...t, values: t.values.map((row, i) => row.map((x, j) => (i === r && j === c ? v : x))) }
}

describe('validate: clean maps', () => {
  it('finds nothing in maps built inside the envelope, with or without limits', () => {
    for (const kind of ['drive', 'regen'] as const) {
      expect(validate(insideTable(kind))).toEqual([])
      expect(validate(insideTable(kind), limits)).toEqual([])
      expect(isValid(insideTable(kind), limits)).toBe(true)
    }
  })

  it('documents every rule it can report', () => {
    expect(Object.keys(VALIDATION_RULES).length).toBe(12)
  })
})

describe('validate: structural rules', () => {
  const t = insideTable('drive')

  it('axis-size: fewer than 2 or more than 64 breakpoints', () => {
    const one: MapTable = { kind: 'drive', rowAxis: [0], colAxis: [0, 10], values: [[0, 0]] }
    expect(rules(validate(one))).toEqual(['axis-size'])
    const many = Array.from({ length: 65 }, (_, i) => i)
    expect(rules(validate({ kind: 'drive', rowAxis: [0, 100], colAxis: many, values: [many.map(() => 0), many.map(() => 0)] }))).toEqual(['axis-size'])
  })

  it('axis-order: equal or falling breakpoints, naming the breakpoint', () => {
    const fs = validate({ ...t, colAxis: [0, 10, 10, 20, 30, 60, 90] })
    expect(rules(fs)).toEqual(['axis-order'])
    expect(fs[0]).toMatchObject({ severity: 'error', col: 2 })
    expect(fs[0].message).toBe('speed breakpoint 3 (10 km/h) is not greater than the one before (10 km/h)')
  })

  it('axis-range: pedal outside 0–100 %, negative speed', () => {
    expect(only(validate({ ...t, rowAxis: [0, 25, 50, 75, 120] }), 'axis-range')[0]).toMatchObject({ row: 4 })
    expect(only(validate({ ...t, colAxis: [-5, 10, 15, 20, 30, 60, 90] }), 'axis-range')[0]).toMatchObject({ col: 0 })
  })

  it('shape: missing row and short row', () => {
    expect(rules(validate({ ...t, values: t.values.slice(1) }))).toEqual(['shape'])
    const short = validate({ ...t, values: t.values.map((r, i) => (i === 2 ? r.slice(1) : r)) })
    expect(short).toEqual([expect.objectContaining({ rule: 'shape', row: 2 })])
  })

  it('reports rather than throws on malformed input from untyped callers', () => {
    const junk = { kind: 'drive', rowAxis: 'x', colAxis: [0, 1], values: null } as unknown as MapTable
    expect(rules(validate(junk, limits))).toEqual(['shape'])
    const strings = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 1], values: [['a', 0], [0, 0]] } as unknown as MapTable
    expect(validate(strings, limits)).toEqual([expect.objectContaining({ rule: 'not-finite', row: 0, col: 0 })])
  })

  it('not-finite: NaN or infinite values and breakpoints', () => {
    const fs = validate(withCell(t, 1, 3, Number.NaN))
    expect(fs).toEqual([expect.objectContaining({ rule: 'not-finite', row: 1, col: 3 })])
    expect(fs[0].message).toBe('at 25 % pedal, 20 km/h: the value is NaN, not a finite number')
    expect(rules(validate({ ...t, colAxis: [0, 10, 15, 20, 30, 60, Infinity] }))).toEqual(['not-finite'])
  })
})

describe('validate: value rules (no vehicle needed)', () => {
  it('pedal-monotonic: a drive map falling with pedal is an error', () => {
    const t = withCell(insideTable('drive'), 2, 1, 10) // below 25 % pedal's 350 N·m at 10 km/h
    const fs = only(validate(t), 'pedal-monotonic')
    expect(fs).toEqual([expect.objectContaining({ severity: 'error', row: 2, col: 1 })])
    expect(fs[0].message).toBe('at 50 % pedal, 10 km/h: 10 N·m is less than 350 N·m at 25 % pedal — a drive map must not fall as the pedal rises')
  })

  it('pedal-monotonic: equal neighbours are fine; in a regen map a fall is a warning', () => {
    const flat: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[50, 50], [50, 50]] }
    expect(validate(flat)).toEqual([])
    const t = withCell(insideTable('regen'), 3, 2, 0)
    expect(only(validate(t), 'pedal-monotonic')[0]).toMatchObject({ severity: 'warning', row: 3, col: 2 })
  })

  it('regen-negative: negative braking torque, naming lift-off', () => {
    const fs = only(validate(withCell(insideTable('regen'), 0, 4, -20)), 'regen-negative')
    expect(fs).toEqual([expect.objectContaining({ severity: 'error', row: 0, col: 4 })])
    expect(fs[0].message).toBe('at 0 % brake pedal (lift-off), 30 km/h: regen braking torque -20 N·m is negative; regen values must be ≥ 0')
    expect(only(validate(insideTable('regen')), 'regen-negative')).toEqual([])
  })
})

describe('validate: vehicle rules', () => {
  it('motor-envelope: names the cell and the envelope computed from P = T·ω', () => {
    // 20 km/h: ω = 20 / 3.6 / 0.5 × 18 = 200 rad/s; 300 kW / 200 rad/s = 1,500 N·m.
    const env = 300_000 / ((20 / 3.6 / 0.5) * 18)
    expect(env).toBeCloseTo(1500, 9)
    const t: MapTable = { kind: 'drive', rowAxis: [0, 40, 100], colAxis: [0, 20], values: [[0, 0], [0, 2400], [0, 2400]] }
    const fs = only(validate(t, { ...limits, maxStepNm: 5000 }), 'motor-envelope')
    expect(fs.map((f) => [f.row, f.col])).toEqual([[1, 1], [2, 1]])
    expect(fs[0].message).toBe('at 40 % pedal, 20 km/h: 2,400 N·m exceeds the motor envelope of 1,500 N·m')
  })

  it('motor-envelope: exactly on the envelope passes; any torque beyond the motor speed limit fails', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [20, 30, 100], values: [[0, 0, 0], [handEnvelope(20), handEnvelope(30), 0]] }
    expect(only(validate(t, limits), 'motor-envelope')).toEqual([])
    const over = only(validate(withCell(t, 1, 2, 50), limits), 'motor-envelope')
    expect(over[0].message).toMatch(/at 100 % pedal, 100 km\/h: 50 N·m exceeds the motor envelope of 0 N·m \(above 94.2 km\/h/)
  })

  it('charge-power: braking torque × ω above the charge limit, without efficiency credit', () => {
    // 40 km/h: ω = 400 rad/s; 600 N·m × 400 = 240 kW > 200 kW; 500 N·m is exactly the limit.
    expect(handChargeLimit(40)).toBeCloseTo(500, 9)
    const t: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 40], values: [[0, 400], [0, 600]] }
    const fs = only(validate(t, { ...limits, maxStepNm: 5000 }), 'charge-power')
    expect(fs).toEqual([expect.objectContaining({ severity: 'error', row: 1, col: 1 })])
    expect(fs[0].message).toBe('at 100 % brake pedal, 40 km/h: 600 N·m of braking needs 240 kW at the motor shaft, above the battery charge limit of 200 kW (500 N·m at this speed)')
    expect(only(validate(withCell(t, 1, 1, 500), { ...limits, maxStepNm: 5000 }), 'charge-power')).toEqual([])
  })

  it('charge-power also covers negative (braking) values in a drive map', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 40], values: [[0, -600], [0, 100]] }
    expect(only(validate(t, { ...limits, maxStepNm: 5000 }), 'charge-power')).toEqual([expect.objectContaining({ row: 0, col: 1 })])
  })

  it('discharge-power: drive torque × ω above the battery discharge limit is a warning', () => {
    const lim = { ...limits, batteryDischargePowerW: 200_000, maxStepNm: 5000 }
    // 30 km/h: ω = 300 rad/s; 900 N·m × 300 = 270 kW > 200 kW (and under the 1,000 N·m envelope).
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 30], values: [[0, 0], [0, 900]] }
    expect(only(validate(t, lim), 'discharge-power')).toEqual([expect.objectContaining({ severity: 'warning', row: 1, col: 1 })])
    expect(only(validate(withCell(t, 1, 1, 600), lim), 'discharge-power')).toEqual([])
  })

  it('envelope-between: a straight line between cells on the power curve rises above it', () => {
    // Cells exactly on T = P/ω at 20 and 30 km/h (1,500 and 1,000 N·m); at 25 km/h the line
    // gives 1,250 N·m but the envelope is 300,000 / 250 = 1,200 N·m.
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [20, 30], values: [[0, 0], [1500, 1000]] }
    const fs = validate(t, { ...limits, maxStepNm: 5000 })
    expect(rules(fs)).toEqual(['envelope-between'])
    expect(fs[0]).toMatchObject({ severity: 'warning', row: 1, col: 0 })
    expect(fs[0].message).toMatch(/^at 100 % pedal, between 20 and 30 km\/h: interpolation reaches .* above the motor envelope/)
    expect(validate({ ...t, values: [[0, 0], [1400, 900]] }, { ...limits, maxStepNm: 5000 })).toEqual([])
  })

  it('steep-step: neighbours further apart than 25 % of peak torque (500 N·m) warn', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [500, 501]] }
    const fs = only(validate(t, limits), 'steep-step')
    expect(fs).toEqual([expect.objectContaining({ severity: 'warning', row: 1, col: 1 })])
    expect(fs[0].message).toBe('at 10 km/h, from 0 to 100 % pedal: a step of 501 N·m exceeds 500 N·m')
    expect(only(validate(t, { ...limits, maxStepNm: 600 }), 'steep-step')).toEqual([])
    expect(only(validate(t), 'steep-step')).toEqual([])
  })

  it('orders errors before warnings and skips cell rules on a broken structure', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 10], values: [[0, 0], [600, 3000]] }
    const fs = validate(t, limits)
    expect(fs[0].severity).toBe('error')
    expect(fs.map((f) => f.severity).lastIndexOf('error')).toBeLessThan(fs.map((f) => f.severity).indexOf('warning'))
    expect(rules(validate({ ...t, values: [[0, 0]] }, limits))).toEqual(['shape'])
  })

  it('a clamped map has no errors left (only between-breakpoint and step warnings)', () => {
    const wild = insideTable('regen', 3)
    wild.values[0][3] = -100
    const fs = validate(clampToEnvelope(wild, limits), limits)
    expect(fs.filter((f) => f.severity === 'error')).toEqual([])
  })
})
