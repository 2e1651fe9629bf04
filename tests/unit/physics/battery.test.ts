import { describe, expect, it } from 'vitest'
import { batteryPowerAt, liftOffDecelBySpeed, liftOffFindings, vehicleParamsSchema, type MapTable, type VehicleParams } from '@/physics'
import { vehicle } from '../../support/fixtures'

// Invented pack table (test data): charge/discharge power over SoC 20 / 95 % × −10 / 25 °C.
const table = {
  socPct: [20, 95],
  temperatureC: [-10, 25],
  chargePowerW: [[150_000, 300_000], [30_000, 120_000]],
  dischargePowerW: [[200_000, 400_000], [300_000, 450_000]],
}
const withTable: VehicleParams = { ...vehicle, batteryPowerTable: table }
const cold = { label: 'Full and cold', socPct: 95, temperatureC: -10 }
// Lift-off row 600 N·m from 10 km/h (0 at standstill: fade-in), brake row 2 000 N·m.
const regen: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 10, 60, 90], values: [[0, 600, 600, 600], [0, 2000, 2000, 2000]] }

describe('battery power table (bilinear, clamped)', () => {
  it('reads corners, the middle and beyond the edges', () => {
    expect(batteryPowerAt(withTable, 95, -10).chargePowerW).toBe(30_000)
    // Bilinear at the centre of the cell is the mean of its four corners: (150 + 300 + 30 + 120)/4 = 150 kW.
    expect(batteryPowerAt(withTable, 57.5, 7.5).chargePowerW).toBeCloseTo(150_000, 6)
    // Clamped: 100 % and −20 °C read the 95 % / −10 °C entry.
    expect(batteryPowerAt(withTable, 100, -20)).toEqual({ chargePowerW: 30_000, dischargePowerW: 300_000 })
    // No table: the program's constants (old versions judge as before).
    expect(batteryPowerAt(vehicle, 95, -10)).toEqual({ chargePowerW: 200_000, dischargePowerW: 350_000 })
  })
  it('rejects a table whose rows do not match its breakpoints, naming the field', () => {
    const r = vehicleParamsSchema.safeParse({ ...vehicle, batteryPowerTable: { ...table, chargePowerW: [[1, 2]] } })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0].path.join('.')).toBe('batteryPowerTable.chargePowerW')
    expect(vehicleParamsSchema.safeParse({ ...vehicle, batteryPowerTable: { ...table, socPct: [95, 20] } }).error?.issues[0].message).toMatch(/ascend/)
  })
})

describe('lift-off deceleration at a charge limit, by hand', () => {
  // Fixture: G = 9 × 2 = 18, R = 0.5 m, η = 0.95, ω = 10 rad/s per km/h; motor min(2 000 N·m, 300 kW/ω).
  // Laden 26 000 kg; rotating parts J = 60 + 0.3 × 18² = 157.2 kg·m², J/R² = 628.8 kg ⇒ m_eff = 26 628.8 kg.
  // a = min(T_map, T_motor, P/ω)·G / (η·R·m_eff); η·R·m_eff = 0.95 × 0.5 × 26 628.8 = 12 648.68 kg·m.
  it('60 km/h: 30 kW full-and-cold leaves 50 N·m of the map’s 600', () => {
    const [, , at60] = liftOffDecelBySpeed(withTable, regen, 'laden', cold)
    // ω = 600 rad/s; P/ω = 30 000/600 = 50 N·m < motor 500 N·m < map 600 N·m.
    // a = 50 × 18 / 12 648.68 = 900/12 648.68 = 0.07115 m/s².
    expect(at60.torqueNm).toBeCloseTo(50, 9)
    expect(at60.limitedBy).toBe('battery')
    expect(at60.decelMps2).toBeCloseTo(0.07115, 5)
    // Nominal 200 kW: P/ω = 333.33 N·m ⇒ a = 6 000/12 648.68 = 0.47436 m/s².
    expect(liftOffDecelBySpeed(withTable, regen, 'laden')[2].decelMps2).toBeCloseTo(0.47436, 5)
  })
  it('finds the speeds where the corner takes the driver’s deceleration below the minimum', () => {
    // Minimum 0.3 m/s². 10 km/h: corner P/ω = 300 N·m ⇒ 0.4269, fine. 60 km/h: 0.474 → 0.071.
    // 90 km/h: nominal min(600, 333.3, 222.2) = 222.2 N·m ⇒ 4 000/12 648.68 = 0.3162; corner 33.3 N·m ⇒ 0.0474.
    // 0 km/h: the map asks for nothing (its fade-in), not a finding.
    const f = liftOffFindings(withTable, regen, ['laden'], [cold, { label: 'Half and warm', socPct: 57.5, temperatureC: 25 }], 0.3)
    expect(f).toHaveLength(1)
    expect(f[0].corner.label).toBe('Full and cold')
    expect(f[0].points.map((p) => p.speedKmh)).toEqual([60, 90])
    expect(f[0].points[1].nominalDecelMps2).toBeCloseTo(0.3162, 4)
    expect(f[0].points[1].cornerDecelMps2).toBeCloseTo(0.0474, 4)
    // Without a table every corner is the nominal pack: nothing to find.
    expect(liftOffFindings(vehicle, regen, ['laden'], [cold], 0.3)).toEqual([])
  })
})
