import { describe, expect, it } from 'vitest'
import { DEFAULT_SPIN_SLIP, peakSlip } from '@/physics'
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
  it('uses the drive tyre’s peak slip on the surface as threshold (brush model: κ* ≈ κ_sl = 3·μ/(C_κ/F_z), Pacejka ch. 3)', () => {
    // Default truck tyre, C_κ/F_z = 12: dry (μ 1) κ* ≈ 3/12 = 0.25; the spin exceeds it from κ = 0.25 (i = 105, t = 2.10 s) to 0.44.
    const dry = analyse(truthLog(), { surface: 'dry-asphalt' }).result
    expect(dry.thresholds.spinSlip).toBe(peakSlip({ B: 12 / 1.5, C: 1.5, D: 1, E: 0.3 }))
    expect(dry.thresholds.spinSlip).toBeCloseTo(0.25, 3)
    expect(dry.thresholds.source).toBe('surface')
    expect(dry.events[0].startS).toBeCloseTo(2.1, 12)
    expect(dry.events[0].durationS).toBeCloseTo(0.4, 12)
    // Ice (μ 0.1): κ* ≈ 0.025, so the whole excursion from κ = 0.2 is spin.
    const ice = analyse(truthLog(), { surface: 'ice' }).result
    expect(ice.thresholds.spinSlip).toBeCloseTo(0.025, 4)
    expect(ice.events[0].startS).toBeCloseTo(2.0, 12)
    // A softer program tyre, C_κ/F_z = 8: κ* ≈ 3/8 = 0.375 on dry; spin from κ = 0.38 (i = 118, t = 2.36 s).
    const soft = analyse(truthLog(), { surface: 'dry-asphalt', driveTyre: { slipStiffnessPerLoad: 8 } }).result
    expect(soft.thresholds.spinSlip).toBeCloseTo(0.375, 3)
    expect(soft.events[0].startS).toBeCloseTo(2.36, 12)
    expect(soft.events[0].durationS).toBeCloseTo(0.14, 12)
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
