import { describe, expect, it } from 'vitest'
import { simulateLiftOff, PhysicsInputError } from '@/physics'
import { regenMap, tractor } from '@/tests/support/fixtures'

const g = 9.80665

describe('simulateLiftOff', () => {
  it('locks the drive axle on ice with strong 0 % regen', () => {
    const r = simulateLiftOff({ vehicle: tractor, loadCase: 'empty', surface: 'ice', map: regenMap(1500), initialSpeedKmh: 60, durationS: 10 })
    expect(r.summary.locks).toBe(true)
    expect(r.summary.lockTimeS as number).toBeLessThan(1)
    expect(r.summary.minSlip).toBeCloseTo(-1, 6) // wheel stopped: κ = (0 − V)/V
    // A sliding axle can brake no harder than the ice allows: decel ≤ μ_peak·Wr/m with Wr ≤ static (hand bound, plus resistances)
    expect(r.summary.peakDecelMps2).toBeLessThan((0.1 * 9000 * g * (1.6 / 3.8) + 0.006 * 9000 * g + 0.5 * 1.225 * 0.6 * 9.5 * (60 / 3.6) ** 2) / 9000)
  })
  it('does not lock on dry asphalt with mild regen, and the deceleration matches a hand force balance', () => {
    const r = simulateLiftOff({ vehicle: tractor, loadCase: 'empty', surface: 'dry-asphalt', map: regenMap(300), initialSpeedKmh: 60, durationS: 60 })
    expect(r.summary.locks).toBe(false)
    expect(r.summary.lockTimeS).toBeNull()
    expect(r.summary.minSlip).toBeLessThan(0)
    expect(-r.summary.minSlip).toBeLessThan(r.summary.tyrePeakSlip)
    expect(r.summary.finalSpeedKmh).toBeLessThan(2.1)
    // Hand balance at 60 km/h: wheel braking 300 × 12/0.95/0.5 = 7578.9 N; rolling 0.006 × 9000 × g = 529.6 N;
    // aero ½ × 1.225 × 0.6 × 9.5 × 16.667² = 969.8 N; m_eff = 9000 + 132/0.25 = 9528 kg → 0.9528 m/s².
    const expected = ((300 * 12) / 0.95 / 0.5 + 0.006 * 9000 * g + 0.5 * 1.225 * 0.6 * 9.5 * (60 / 3.6) ** 2) / 9528
    expect(Math.abs(r.summary.peakDecelMps2 / expected - 1)).toBeLessThan(0.01)
  })
  it('limits regen torque by battery charge power', () => {
    // 80 km/h → ω = 22.22/0.5 × 12 = 533.3 rad/s; charge limit 350 000/533.3 = 656.25 N·m < 1500 requested.
    const r = simulateLiftOff({ vehicle: tractor, loadCase: 'trailer-laden', surface: 'dry-asphalt', map: regenMap(1500), initialSpeedKmh: 80, durationS: 0.5 })
    expect(r.samples[1].motorTorqueNm).toBeCloseTo(-656.25, -1)
    // Shaft power |T|·ω at the actual (slipping) motor speed equals the charge limit, within 0.5 %.
    for (const s of r.samples.slice(1)) expect(Math.abs((-s.motorTorqueNm * ((s.wheelSpeedKmh / 3.6 / 0.5) * 12)) / 350000 - 1)).toBeLessThan(5e-3)
  })
  it('rejects a drive map and a non-positive initial speed', () => {
    const m = regenMap(300)
    expect(() => simulateLiftOff({ vehicle: tractor, loadCase: 'empty', surface: 'ice', map: { ...m, kind: 'drive' }, initialSpeedKmh: 60, durationS: 5 })).toThrow(PhysicsInputError)
    expect(() => simulateLiftOff({ vehicle: tractor, loadCase: 'empty', surface: 'ice', map: m, initialSpeedKmh: 0, durationS: 5 })).toThrow(/initialSpeedKmh/)
  })
})
