import { describe, expect, it } from 'vitest'
import { findingMessage, limitsFromVehicle, renderParts, sentence, nm, kmh, UNITS, unitSystem, validate, type MapTable } from '../../../maps'
import { vehicle } from '@/tests/support/fixtures'

const limits = { ...limitsFromVehicle(vehicle), maxStepNm: 5000 }
const only = (t: MapTable, rule: string) => validate(t, limits).filter((f) => f.rule === rule)

// Conversion factors: 1 lbf·ft = 1.3558179483314004 N·m, 1 mph = 1.609344 km/h (NIST SP 811, exact).
describe('structured findings', () => {
  it('carry their numbers in SI units beside the sentence', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 40, 100], colAxis: [0, 20], values: [[0, 0], [0, 2400], [0, 2400]] }
    const [f] = only(t, 'motor-envelope')
    expect(f).toMatchObject({ row: 1, col: 1, pedalPct: 40, speedKmh: 20, valueNm: 2400 })
    expect(f.limitNm).toBeCloseTo(1500, 9)
    expect(findingMessage(f, UNITS.metric)).toBe(f.message)
  })

  it('render in imperial units from the numbers, not by rewriting text', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 40, 100], colAxis: [0, 20], values: [[0, 0], [0, 9999], [0, 9999]] }
    const [f] = only(t, 'motor-envelope')
    // 20 km/h = 12.43 mph; 9,999 N·m = 7,374.93 lbf·ft; 1,500 N·m = 1,106.34 lbf·ft.
    expect(findingMessage(f, UNITS.imperial)).toBe('at 40 % pedal, 12.4 mph: 7,374.9 lbf·ft exceeds the motor envelope of 1,106.3 lbf·ft')
  })

  it('convert both ends of a speed range and leave kW and % alone', () => {
    const between = only({ kind: 'drive', rowAxis: [0, 100], colAxis: [20, 30], values: [[0, 0], [1500, 1000]] }, 'envelope-between')[0]
    expect(findingMessage(between, UNITS.imperial)).toMatch(/^at 100 % pedal, between 12\.4 and 18\.6 mph: interpolation reaches [\d,.]+ lbf·ft at [\d.]+ mph/)
    const charge = only({ kind: 'regen', rowAxis: [0, 100], colAxis: [0, 40], values: [[0, 400], [0, 600]] }, 'charge-power')[0]
    expect(findingMessage(charge, UNITS.imperial)).toBe('at 100 % brake pedal, 24.9 mph: 442.5 lbf·ft of braking needs 240 kW at the motor shaft, above the battery charge limit of 200 kW (368.8 lbf·ft at this speed)')
  })

  it('sentence joins text and keeps quantities as data', () => {
    const parts = sentence`from ${kmh(10, true)} to ${kmh(20)}: ${nm(1234.56)} at ${50} %`
    expect(parts).toEqual(['from ', { value: 10, unit: 'km/h', bare: true }, ' to ', { value: 20, unit: 'km/h' }, ': ', { value: 1234.56, unit: 'N·m' }, ' at 50 %'])
    expect(renderParts(parts)).toBe('from 10 to 20 km/h: 1,234.6 N·m at 50 %')
  })

  it('unitSystem reads a query value; anything unknown is metric', () => {
    expect(unitSystem('imperial')).toBe('imperial')
    expect(unitSystem('furlongs')).toBe('metric')
    expect(UNITS.imperial.torqueIn(UNITS.imperial.torqueOut(2400))).toBeCloseTo(2400, 9)
  })
})
