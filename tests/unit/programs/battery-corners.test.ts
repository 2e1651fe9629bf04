import { describe, expect, it } from 'vitest'
import { batteryCornerRows } from '@/app/_lib/physics/battery-corners'
import type { MapTable, VehicleParams } from '@/physics'
import { vehicle } from '@/tests/support/fixtures'

// The hand case of tests/unit/physics/battery.test.ts (docs/physics.md §7a).
const regen: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 10, 60, 90], values: [[0, 600, 600, 600], [0, 2000, 2000, 2000]] }
const withTable: VehicleParams = {
  ...vehicle,
  batteryPowerTable: { socPct: [20, 95], temperatureC: [-10, 25], chargePowerW: [[150_000, 300_000], [30_000, 120_000]], dischargePowerW: [[200_000, 400_000], [100_000, 450_000]] },
}
const rc = { surfaces: ['packed-snow' as const], loadCases: ['laden' as const], marginPct: 10, batteryCorners: [{ label: 'Full and cold', socPct: 95, temperatureC: -10 }], minLiftOffDecelMps2: 0.3 }

describe('battery-corner rows of the physics page', () => {
  it('show the corner’s power, drive envelope and lift-off per speed, marking the points below the minimum', () => {
    const [row] = batteryCornerRows(withTable, rc, [{ name: 'Regen', number: 3, table: regen }])
    expect(row.chargeKW).toBe(30)
    expect(row.dischargeKW).toBe(100)
    // 60 km/h: ω = 600 rad/s; drive torque min(motor 300 kW/600 = 500, pack 100 kW/600 = 166.7) = 166.7 N·m; nominal 350 kW ⇒ 500 N·m.
    expect(row.driveEnvelopeNm).toBeCloseTo(166.667, 2)
    expect(row.nominalDriveEnvelopeNm).toBeCloseTo(500, 6)
    const pts = row.liftOff[0].points
    expect(pts.map((p) => p.belowMin)).toEqual([false, false, true, true])
    expect(pts[2].decelMps2).toBeCloseTo(0.07115, 5)
    expect(pts[2].limitedBy).toBe('battery')
  })
  it('are none when no corner is declared', () => {
    expect(batteryCornerRows(withTable, { ...rc, batteryCorners: undefined }, [{ name: 'Regen', number: 3, table: regen }])).toEqual([])
  })
})
