import { describe, expect, it } from 'vitest'
import { simulateLaunch, type MapTable } from '@/physics'
import { vehicleParamsSchema } from '@/physics/vehicle'
import { simulateManoeuvre } from '@/physics/drivability'
import { vehicle } from '@/tests/support/fixtures'

// Full pedal gives 2,000 N·m at 0 km/h falling to 200 N·m at 20 km/h: a spinning wheel, seen as speed,
// asks for less torque. FLAT gives 2,000 N·m at every speed.
const FALLING: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 20], values: [[0, 0], [2000, 200]] }
const FLAT: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 20], values: [[0, 0], [2000, 2000]] }

const launch = (map: MapTable, mapSpeedSource?: 'road' | 'driven-wheel') =>
  simulateLaunch({ vehicle: { ...vehicle, mapSpeedSource }, loadCase: 'laden', surface: 'packed-snow', map, pedal: { kind: 'step', pedalPct: 100 }, durationS: 4 }).summary

describe('which speed the map is looked up on', () => {
  it('with driven-wheel speed a spin on packed snow raises the looked-up speed, so a map falling with speed spins less', () => {
    const road = launch(FALLING, 'road')
    const wheel = launch(FALLING, 'driven-wheel')
    // With road speed the truck barely moves, the map keeps asking for 2,000 N·m and the wheel runs away.
    expect(road.peakSlip).toBeGreaterThan(wheel.peakSlip * 2)
    expect(wheel.timeBeyondPeakSlipS).toBeLessThan(road.timeBeyondPeakSlipS)
  })

  it('the drivability launch through the set honours it too', () => {
    const man = (mapSpeedSource: 'road' | 'driven-wheel') =>
      simulateManoeuvre({ vehicle: { ...vehicle, mapSpeedSource }, loadCase: 'laden', surface: 'packed-snow', drive: FALLING, regen: null, ramps: null, manoeuvre: { kind: 'launch', pedalPct: 100 } }).summary
    expect(man('driven-wheel').peakSlip).toBeLessThan(man('road').peakSlip / 2)
  })

  it('with a map flat over speed both lookups are identical', () => {
    expect(launch(FLAT, 'driven-wheel')).toEqual(launch(FLAT, 'road'))
  })

  it('a stored version without the field judges as road speed, and the field accepts only road or driven-wheel', () => {
    expect(launch(FALLING, undefined)).toEqual(launch(FALLING, 'road'))
    expect(vehicleParamsSchema.safeParse(vehicle).success).toBe(true)
    const bad = vehicleParamsSchema.safeParse({ ...vehicle, mapSpeedSource: 'gps' })
    expect(bad.success).toBe(false)
    expect(bad.error?.issues[0].message).toMatch(/Map lookup speed/)
  })
})
