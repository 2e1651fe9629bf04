import { describe, expect, it } from 'vitest'
import { setGate, type SetGatePart } from '@/app/_lib/sets/gate'
import { releaseConditionsSchema } from '@/app/_schemas/program'
import type { MapTable, VehicleParams } from '@/physics'
import { SMALL_DRIVE, vehicle } from '@/tests/support/fixtures'

// Same hand case as tests/unit/physics/battery.test.ts: at 60 and 90 km/h, laden, a full and cold pack
// (30 kW) leaves 0.071 and 0.047 m/s² where the nominal 200 kW gives 0.474 and 0.316 m/s².
const regen: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 10, 60, 90], values: [[0, 600, 600, 600], [0, 2000, 2000, 2000]] }
const withTable: VehicleParams = {
  ...vehicle,
  batteryPowerTable: { socPct: [20, 95], temperatureC: [-10, 25], chargePowerW: [[150_000, 300_000], [30_000, 120_000]], dischargePowerW: [[200_000, 400_000], [300_000, 450_000]] },
}
const parts: SetGatePart[] = [
  { kind: 'drive', revisionId: 1, number: 1, mapName: 'Drive', state: 'approved', table: SMALL_DRIVE },
  { kind: 'regen', revisionId: 2, number: 3, mapName: 'Regen', state: 'approved', table: regen },
]
const base = { surfaces: ['packed-snow' as const], loadCases: ['laden' as const], marginPct: 10 }
const gate = (v: VehicleParams, conditions: Parameters<typeof setGate>[0]['conditions']) =>
  setGate({ parts, vehicle: v, conditions, reports: [{ surface: 'packed-snow', loadCase: 'laden' }], concerns: [], acknowledgements: [] }).conditions.find((c) => c.id === 'lift-off')

describe('the set gate’s lift-off condition at battery corners', () => {
  const cold = { label: 'Full and cold', socPct: 95, temperatureC: -10 }
  it('is absent for versions that declare no corners or no minimum (older versions judge as before)', () => {
    expect(gate(withTable, base)).toBeUndefined()
    expect(gate(withTable, { ...base, batteryCorners: [cold] })).toBeUndefined()
    expect(releaseConditionsSchema.safeParse(base).success).toBe(true)
  })
  it('is not met where the full and cold pack takes lift-off below the minimum, and says by how much', () => {
    const c = gate(withTable, { ...base, batteryCorners: [cold], minLiftOffDecelMps2: 0.3 })
    expect(c?.met).toBe(false)
    expect(c?.details[0]).toMatch(/Regen r3, Full and cold \(95 %, -10 °C\), Laden \(gross mass\): 0\.05 m\/s² instead of 0\.32 at 90 km\/h; 2 speed\(s\) below/)
  })
  it('is met without a table (every corner is the nominal pack) or with a lower minimum', () => {
    expect(gate(vehicle, { ...base, batteryCorners: [cold], minLiftOffDecelMps2: 0.3 })?.met).toBe(true)
    expect(gate(withTable, { ...base, batteryCorners: [cold], minLiftOffDecelMps2: 0.04 })?.met).toBe(true)
  })
  it('rejects a corner out of range, naming the field', () => {
    const r = releaseConditionsSchema.safeParse({ ...base, batteryCorners: [{ ...cold, socPct: 120 }] })
    expect(r.error?.issues[0].path.join('.')).toBe('batteryCorners.0.socPct')
  })
})
