import { describe, expect, it } from 'vitest'
import { positiveEnergyJ } from '@/physics'
import { analyse, series } from './helpers'

describe('energy and distance (trapezoid rule)', () => {
  it('constant power by hand: 600 V × 100 A = 60 kW for 1 h = 60 kWh drawn, none regenerated', () => {
    const { result } = analyse(series(3600, 0.5, () => ({ batteryVoltageV: 600, batteryCurrentA: 100 })))
    expect(result.energy?.drawnKWh).toBeCloseTo(60, 9)
    expect(result.energy?.regeneratedKWh).toBe(0)
    expect(result.energy?.netKWh).toBeCloseTo(60, 9)
  })
  it('regen: −50 A at 640 V for 90 s = 32 kW × 90 s = 0.8 kWh regenerated', () => {
    const { result } = analyse(series(90, 0.1, () => ({ batteryVoltageV: 640, batteryCurrentA: -50 })))
    expect(result.energy?.regeneratedKWh).toBeCloseTo(0.8, 9)
    expect(result.energy?.drawnKWh).toBe(0)
  })
  it('splits an interval at the zero crossing of linear power', () => {
    // P from +100 W to −300 W over 4 s crosses zero at 1 s: +50 J drawn, 450 J regenerated; net trapezoid −400 J.
    expect(positiveEnergyJ(100, -300, 4)).toBe(50)
    expect(positiveEnergyJ(-100, 300, 4)).toBe(450)
    expect(positiveEnergyJ(100, -300, 4) - positiveEnergyJ(-100, 300, 4)).toBe(0.5 * (100 - 300) * 4)
  })
  it('a ramp is integrated exactly: I from 0 to 200 A at 500 V over 10 s → ½·100 kW·10 s', () => {
    const { result } = analyse(series(10, 0.01, (t) => ({ batteryVoltageV: 500, batteryCurrentA: 20 * t })))
    expect(result.energy!.drawnKWh * 3.6e6).toBeCloseTo(500e3, 4)
  })
  it('skips intervals with a missing voltage or current; no battery columns → energy null', () => {
    const s = series(10, 1, (t) => ({ batteryVoltageV: 600, batteryCurrentA: t === 5 ? NaN : 100 }))
    expect(analyse(s).result.energy!.drawnKWh * 3.6e6).toBeCloseTo(600 * 100 * 8, 6)
    expect(analyse(series(1, 0.5, () => ({}))).result.energy).toBeNull()
  })
  it('distance: 36 km/h for 100 s = 1 km; duration and sample count', () => {
    const { result } = analyse(series(100, 0.02, () => ({})))
    expect(result.distanceKm).toBeCloseTo(1, 10)
    expect(result.durationS).toBeCloseTo(100, 10)
    expect(result.samples).toBe(5001)
    expect(result.maxRoadSpeedKmh).toBe(36)
  })
})
