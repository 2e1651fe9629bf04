import { describe, expect, it } from 'vitest'
import { simulateManoeuvre, setRequest } from '@/physics/drivability'
import type { MapTable } from '@/physics'
import type { RampLimits } from '@/maps/ramps'
import { vehicle } from '@/tests/support/fixtures'

// A drive map whose torque depends on the pedal only: 0 N·m at 0 %, 800 N·m at 100 %.
const FLAT: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 100], values: [[0, 0], [800, 800]] }
const LIFT_OFF: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 100], values: [[300, 300], [900, 900]] }
const RAMP_2000: RampLimits = { speedKmh: [0, 100], tipInNmPerS: [2000, 2000], tipOutNmPerS: [4000, 4000], lashBandNm: 0, lashRateNmPerS: 1 }

describe('tip-in on a rigid vehicle against the closed form', () => {
  it('a torque ramp of Ṫ gives a jerk of Ṫ·G·η / (R·m_eff) while it ramps, and reaches 90 % at 0.9·ΔT/Ṫ', () => {
    // Closed form for a rigid vehicle (no tyre slip, no resistances): m_eff·dV/dt = T·G·η/R with
    // m_eff = m + (J_wheels + J_motor·G²)/R² (Gillespie, Fundamentals of Vehicle Dynamics, ch. 2, effective
    // mass of the rotating parts); differentiating, jerk = (dT/dt)·G·η/(R·m_eff).
    // Fixture: G = 9 × 2 = 18, η = 0.95, R = 0.5 m, laden m = 26,000 kg, J = 60 + 0.3 × 18² = 157.2 kg·m²,
    // m_eff = 26,000 + 157.2 / 0.25 = 26,628.8 kg; Ṫ = 2,000 N·m/s → jerk = 34,200 / 13,314.4 = 2.5687 m/s³.
    const r = simulateManoeuvre({ vehicle, loadCase: 'laden', surface: 'dry-asphalt', tyre: 'no-slip', ignoreResistances: true, drive: FLAT, regen: null, ramps: RAMP_2000, manoeuvre: { kind: 'tip-in', speedKmh: 20, fromPedalPct: 0, toPedalPct: 100 } })
    const closed = (2000 * 18 * 0.95) / (0.5 * (26_000 + 157.2 / 0.25))
    expect(r.summary.peakJerkMps3).toBeCloseTo(closed, 2)
    // 800 N·m at 2,000 N·m/s: 0.4 s of ramp; 90 % at 0.36 s.
    expect(r.summary.timeTo90PctS).toBeCloseTo(0.36, 2)
    // Jerk only while ramping: RMS over the 4 s window = closed × √(0.4 / 4).
    expect(r.summary.rmsJerkMps3).toBeCloseTo(closed * Math.sqrt(0.1), 1)
    expect(r.summary.requestNm).toBe(800)
    expect(r.summary.startTorqueNm).toBe(0)
  })

  it('without ramps the step reaches the motor at once: the jerk is one step of acceleration over one sample', () => {
    const r = simulateManoeuvre({ vehicle, loadCase: 'laden', surface: 'dry-asphalt', tyre: 'no-slip', ignoreResistances: true, drive: FLAT, regen: null, ramps: null, manoeuvre: { kind: 'tip-in', speedKmh: 20, fromPedalPct: 0, toPedalPct: 100 } })
    const accel = (800 * 18 * 0.95) / (0.5 * (26_000 + 157.2 / 0.25))
    // a rises from 0 to 1.0274 m/s² within one 0.01 s sample: jerk ≈ a / 0.01 s.
    expect(r.summary.peakJerkMps3).toBeGreaterThan(accel / 0.011)
    expect(r.summary.timeTo90PctS).toBeLessThan(0.011) // within the first 0.01 s sample
  })
})

describe('tip-out into lift-off regen', () => {
  it('asks for the drive map less the lift-off row when the pedal is released, and ramps down at the tip-out rate', () => {
    const request = setRequest(FLAT, LIFT_OFF)
    expect(request(100, 30)).toBe(800)
    expect(request(0, 30)).toBe(-300)
    const r = simulateManoeuvre({ vehicle, loadCase: 'laden', surface: 'dry-asphalt', tyre: 'no-slip', ignoreResistances: true, drive: FLAT, regen: LIFT_OFF, ramps: RAMP_2000, manoeuvre: { kind: 'tip-out', speedKmh: 40, fromPedalPct: 100 } })
    // 800 → −300 N·m at 4,000 N·m/s: 0.275 s; 90 % of the 1,100 N·m change at 0.2475 s.
    expect(r.summary.timeTo90PctS).toBeCloseTo(0.2475, 2)
    expect(r.summary.requestNm).toBe(-300)
  })

  it('refuses a pedal outside 0–100 % and a tip-in from standstill, naming the field', () => {
    const base = { vehicle, loadCase: 'laden' as const, surface: 'dry-asphalt' as const, drive: FLAT, regen: null, ramps: null }
    expect(() => simulateManoeuvre({ ...base, manoeuvre: { kind: 'tip-in', speedKmh: 20, fromPedalPct: 0, toPedalPct: 120 } })).toThrow(/manoeuvre.toPedalPct/)
    expect(() => simulateManoeuvre({ ...base, manoeuvre: { kind: 'tip-in', speedKmh: 0, fromPedalPct: 0, toPedalPct: 50 } })).toThrow(/manoeuvre.speedKmh/)
  })
})
