import { describe, expect, it } from 'vitest'
import { DEFAULT_EXIT_FRACTION, DEFAULT_MIN_SLIP_SPEED_KMH } from '@/physics'
import { analyse, series } from './helpers'

// Default spin threshold without a surface: κ = 0.15; exit below 0.75 × 0.15 = 0.1125 (hysteresis chosen here).
describe('events: hysteresis, absolute speed difference, minimum speed', () => {
  it('a slip chattering around the threshold (0.14 / 0.16 every sample) is one event, not many', () => {
    const s = series(2, 0.02, (_, i) => ({ wheelSpeedsKmh: [36 * (1 + (i % 2 ? 0.14 : 0.16))] }))
    const { result } = analyse(s)
    expect(result.events).toHaveLength(1)
    expect(result.events[0].startS).toBe(0)
    expect(result.shortExcursions).toBe(0)
    // Without hysteresis (exit fraction 1) the same log gives 51 separate 0.02 s excursions, none kept.
    const flat = analyse(s, { thresholds: { exitFraction: 1, exitSpeedDiffKmh: 2 } }).result
    expect(flat.events).toHaveLength(0)
    expect(flat.shortExcursions).toBe(51)
  })
  it('ends once κ falls below the exit fraction', () => {
    expect(DEFAULT_EXIT_FRACTION).toBe(0.75)
    const s = series(2, 0.02, (t) => ({ wheelSpeedsKmh: [36 * (1 + (t < 1 ? 0.2 : t < 1.5 ? 0.12 : 0.11))] }))
    expect(analyse(s).result.events[0].endS).toBeCloseTo(1.5, 12)
  })
  it('needs an absolute difference too: 25 % slip at 6 km/h (1.5 km/h) is no event; at 36 km/h (9 km/h) it is', () => {
    expect(analyse(series(1, 0.02, () => ({ roadSpeedKmh: 6, wheelSpeedsKmh: [7.5] }))).result.events).toEqual([])
    expect(analyse(series(1, 0.02, () => ({ roadSpeedKmh: 36, wheelSpeedsKmh: [45] }))).result.events).toHaveLength(1)
  })
  it('no event and no statistics below the minimum speed (5 km/h), where wheel-speed sensors are unreliable', () => {
    expect(DEFAULT_MIN_SLIP_SPEED_KMH).toBe(5)
    // Road 1 km/h, wheel 4.5 km/h: κ = (1.25 − 0.278)/0.5 = 1.94 and Δv = 3.5 km/h, both beyond threshold, but too slow.
    const { result } = analyse(series(1, 0.02, () => ({ roadSpeedKmh: 1, wheelSpeedsKmh: [4.5] })))
    expect(result.events).toEqual([])
    expect(result.slip.movingSamples).toBe(0)
    // A launch spin from rest is judged once the wheel passes 5 km/h.
    expect(analyse(series(1, 0.02, () => ({ roadSpeedKmh: 1, wheelSpeedsKmh: [8] }))).result.events.map((e) => e.kind)).toEqual(['spin'])
  })
  it('refuses thresholds that make no sense, naming the field', () => {
    expect(() => analyse([], { thresholds: { exitFraction: 1.5 } })).toThrow(/thresholds.exitFraction/)
    expect(() => analyse([], { thresholds: { minSpeedDiffKmh: 1, exitSpeedDiffKmh: 2 } })).toThrow(/thresholds.exitSpeedDiffKmh/)
    expect(() => analyse([], { thresholds: { minSpeedKmh: -1 } })).toThrow(/thresholds.minSpeedKmh/)
  })
})
