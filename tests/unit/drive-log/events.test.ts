import { describe, expect, it } from 'vitest'
import { DEFAULT_SPIN_SLIP, SURFACES, peakSlip } from '@/physics'
import { analyse, series } from './helpers'

// 50 Hz at a steady 36 km/h (10 m/s). Truth, built here:
//  • spin: wheel ahead from t = 2.00 s to 2.48 s (κ rising 0.2 → 0.44, peak at 2.48 s), in band again at 2.50 s;
//  • lock: wheel stopped (κ = −1) from 5.00 s to 5.28 s, rolling again at 5.30 s;
//  • a 0.04 s excursion (κ = 0.3 at 7.00 and 7.02 s), shorter than the 0.1 s minimum.
const DT = 0.02
function truthLog() {
  return series(10, DT, (t, i) => {
    if (i >= 100 && i < 125) return { wheelSpeedsKmh: [36 * (1 + 0.2 + 0.01 * (i - 100))] }
    if (i >= 250 && i < 265) return { wheelSpeedsKmh: [0], accelPedalPct: 0, brakePedalPct: 60 }
    if (i === 350 || i === 351) return { wheelSpeedsKmh: [36 * 1.3] }
    return {}
  })
}

describe('wheel-spin and lock-up events', () => {
  it('finds the spin and the lock at the constructed times, with conditions at the start and at the peak', () => {
    const { result } = analyse(truthLog())
    expect(result.thresholds).toMatchObject({ spinSlip: DEFAULT_SPIN_SLIP, lockSlip: DEFAULT_SPIN_SLIP, source: 'default', minDurationS: 0.1 })
    expect(result.events).toHaveLength(2)
    const [spin, lock] = result.events
    expect(spin.kind).toBe('spin')
    expect(spin.startS).toBeCloseTo(2.0, 12)
    expect(spin.endS).toBeCloseTo(2.5, 12)
    expect(spin.durationS).toBeCloseTo(0.5, 12)
    expect(spin.peakSlip).toBeCloseTo(0.44, 12)
    expect(spin.peak.timeS).toBeCloseTo(2.48, 12)
    expect(spin.start).toMatchObject({ roadSpeedKmh: 36, accelPedalPct: 20, brakePedalPct: 0 })
    expect(spin.start.slip).toBeCloseTo(0.2, 12)
    expect(lock.kind).toBe('lock')
    expect([lock.startS, lock.endS, lock.peakSlip]).toEqual([5, expect.closeTo(5.3, 12), -1])
    expect(lock.start).toMatchObject({ accelPedalPct: 0, brakePedalPct: 60 })
    expect(result.shortExcursions).toBe(1)
  })
  it('uses the surface curve’s peak slip as threshold (ice: κ* = tan(tan(π/4))/B = tan(1)/4 ≈ 0.389)', () => {
    const { result } = analyse(truthLog(), { surface: 'ice' })
    expect(result.thresholds.spinSlip).toBeCloseTo(Math.tan(1) / 4, 12)
    expect(result.thresholds.source).toBe('surface')
    // The spin exceeds 0.389 only from κ = 0.39 (i = 119, t = 2.38 s) to 0.44.
    expect(result.events[0].startS).toBeCloseTo(2.38, 12)
    expect(result.events[0].durationS).toBeCloseTo(0.12, 12)
    expect(analyse(truthLog(), { surface: 'dry-asphalt' }).result.thresholds.spinSlip).toBe(peakSlip(SURFACES['dry-asphalt'].coeffs))
  })
  it('explicit thresholds win, and the lock threshold may differ', () => {
    const { result } = analyse(truthLog(), { thresholds: { spinSlip: 0.5, lockSlip: 0.9, minDurationS: 0 } })
    expect(result.events.map((e) => e.kind)).toEqual(['lock'])
    expect(result.shortExcursions).toBe(0)
  })
  it('a gap ends an event at its last flagged sample and nothing is integrated across it', () => {
    const s = truthLog().filter((x) => !(x.timeS > 2.2 && x.timeS < 4.5))
    const { result } = analyse(s)
    expect(result.gaps.count).toBe(1)
    expect(result.events[0].startS).toBe(2)
    expect(result.events[0].endS).toBeCloseTo(2.2, 12)
  })
  it('does not judge slip below the standstill floor (road and wheels < 1.8 km/h): sensor noise at rest is no spin', () => {
    const { result } = analyse(series(2, DT, (_, i) => ({ roadSpeedKmh: 0, wheelSpeedsKmh: [i % 2 ? 0.5 : 0] })))
    expect(result.events).toEqual([])
    expect(result.slip.movingSamples).toBe(0)
  })
})
