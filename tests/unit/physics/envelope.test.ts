import { describe, expect, it } from 'vitest'
import { deliverableTorqueLimit, motorShaftSpeedRadS, motorTorqueFromWheel, motorTorqueLimit, overallRatio, wheelTorqueFromMotor, PhysicsInputError } from '@/physics'
import { tractor } from '@/tests/support/fixtures'

// Fixture: R = 0.5 m, G = 2 × 6 = 12, η = 0.95, 3000 N·m, 450 kW, 6000 rpm, battery 500 kW out / 350 kW in.
describe('motor envelope', () => {
  it('shaft speed ω = V/R·G (hand values)', () => {
    expect(overallRatio(tractor)).toBe(12)
    expect(motorShaftSpeedRadS(tractor, 36)).toBeCloseTo(240, 12) // 10 m/s / 0.5 m × 12
    expect(() => overallRatio(tractor, 1)).toThrow(/gearIndex/)
  })
  it('constant torque to base speed, constant power above, zero above the speed limit', () => {
    // Base speed ω_b = 450 000 / 3000 = 150 rad/s ↔ 150 × 0.5 / 12 = 6.25 m/s = 22.5 km/h.
    expect(motorTorqueLimit(tractor, 0)).toBe(3000)
    expect(motorTorqueLimit(tractor, 22.5)).toBeCloseTo(3000, 9)
    expect(motorTorqueLimit(tractor, 45)).toBeCloseTo(1500, 9) // ω = 300 rad/s → 450 000/300
    // 6000 rpm = 628.32 rad/s ↔ 26.18 m/s = 94.25 km/h
    expect(motorTorqueLimit(tractor, 94)).toBeGreaterThan(0)
    expect(motorTorqueLimit(tractor, 95)).toBe(0)
  })
  it('battery power limits drive and regen separately', () => {
    expect(deliverableTorqueLimit(tractor, 45, 'drive')).toBeCloseTo(1500, 9) // motor 1500 < battery 500 000/300
    expect(deliverableTorqueLimit(tractor, 45, 'regen')).toBeCloseTo(350000 / 300, 9) // charge 1166.7 < motor 1500
  })
})

describe('driveline efficiency direction', () => {
  it('drive multiplies by η, regen divides (losses add to wheel braking)', () => {
    expect(wheelTorqueFromMotor(tractor, 1000)).toBeCloseTo(11400, 9) // 1000 × 12 × 0.95
    expect(wheelTorqueFromMotor(tractor, -1000)).toBeCloseTo(-12000 / 0.95, 9)
    expect(motorTorqueFromWheel(tractor, 11400)).toBeCloseTo(1000, 9)
    expect(motorTorqueFromWheel(tractor, -12000 / 0.95)).toBeCloseTo(-1000, 9)
  })
  it('typed errors', () => {
    expect(() => motorTorqueLimit({ ...tractor, motorPeakTorqueNm: -5 }, 10)).toThrow(PhysicsInputError)
    expect(() => motorShaftSpeedRadS(tractor, Number.NaN)).toThrow(/roadSpeedKmh/)
  })
})
