import { describe, expect, it } from 'vitest'
import { checkGrade, gradeDemands, gradeRadFromPct, gradeWheelForceN } from '@/physics/gradeability'
import type { MapTable } from '@/physics'
import { vehicle } from '@/tests/support/fixtures'

// Fixture truck, laden: m = 26,000 kg, R = 0.5 m, G = 9 × 2 = 18, η = 0.95, C_rr = 0.006, C_d·A = 0.6 × 9 m²,
// a = 2.4 m, h = 1.6 m, L = 4.2 m, motor 2,000 N·m / 300 kW; dry asphalt μ = 1 with the default tyre.
const g = 9.80665
const FULL: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 100], values: [[0, 0], [2000, 2000]] }
const WEAK: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 100], values: [[0, 0], [1000, 1000]] }

describe('force on a grade (Gillespie, Fundamentals of Vehicle Dynamics, ch. 2, grade and rolling resistance; recalled from memory)', () => {
  it('F = m·g·(sin θ + C_rr·cos θ) with θ = atan(grade/100): hand case, 18 % laden', () => {
    // Hand: √(1 + 0.18²) = 1.016070; sin θ = 0.177153, cos θ = 0.984185;
    // F = 26,000 × 9.80665 × (0.177153 + 0.006 × 0.984185) = 254,972.9 × 0.183058 = 46,675 N.
    const f = gradeWheelForceN(vehicle, 26_000, 18, 0)
    expect(f.total).toBeCloseTo(46_675, -1)
    expect(f.aero).toBe(0)
    // Motor torque: 46,675 × 0.5 / (18 × 0.95) = 1,364.8 N·m.
    const c = checkGrade({ vehicle, drive: FULL }, { kind: 'start', gradePct: 18, speedKmh: 0 })
    expect(c.neededNm).toBeCloseTo(1364.8, 0)
    expect(c.verdict).toBe('met')
  })

  it('at 100 % (45°) the grade and rolling parts are m·g/√2 and C_rr·m·g/√2 (closed form)', () => {
    const f = gradeWheelForceN(vehicle, 10_000, 100, 0)
    expect(f.grade).toBeCloseTo((10_000 * g) / Math.SQRT2, 6)
    expect(f.rolling).toBeCloseTo((0.006 * 10_000 * g) / Math.SQRT2, 6)
    expect(gradeRadFromPct(100)).toBeCloseTo(Math.PI / 4, 12)
  })

  it('a hold adds ½ρC_dA·V²: 5 % at 60 km/h is 15,180 N, 443.9 N·m, under the 500 N·m power limit at 600 rad/s', () => {
    // Aero: 0.5 × 1.225 (ISO 2533 sea level) × 0.6 × 9 × (16.667 m/s)² = 918.75 N.
    // Grade + rolling: 254,972.9 × (0.049938 + 0.006 × 0.998752) = 14,261 N. Total 15,180 N.
    // Motor speed 16.667 / 0.5 × 18 = 600 rad/s: power limit 300 kW / 600 = 500 N·m (battery 583 N·m).
    const c = checkGrade({ vehicle, drive: FULL }, { kind: 'hold', gradePct: 5, speedKmh: 60 })
    expect(c.aeroForceN).toBeCloseTo(918.75, 1)
    expect(c.wheelForceN).toBeCloseTo(15_180, -1)
    expect(c.neededNm).toBeCloseTo(443.9, 0)
    expect(c.envelopeNm).toBeCloseTo(500, 6)
    expect(c.availableNm).toBeCloseTo(500, 6)
    expect(c.verdict).toBe('met')
  })
})

describe('verdicts', () => {
  it('a map that gives too little at full pedal is map-short, and says which band to raise it into', () => {
    const c = checkGrade({ vehicle, drive: WEAK }, { kind: 'start', gradePct: 18, speedKmh: 0 })
    expect(c.verdict).toBe('map-short')
    expect(c.explanation).toMatch(/Raise the full-pedal cells to between 1,365 and 2,000 N·m/)
  })

  it('beyond the motor peak no map can help: 30 % needs 2,185 N·m against 2,000 N·m', () => {
    // sin = 0.287348, cos = 0.957826: F = 254,972.9 × (0.287348 + 0.005747) = 74,731 N → 74,731 × 0.5 / 17.1 = 2,185 N·m.
    const c = checkGrade({ vehicle, drive: FULL }, { kind: 'start', gradePct: 30, speedKmh: 0 })
    expect(c.neededNm).toBeCloseTo(2185, -1)
    expect(c.verdict).toBe('envelope-short')
  })

  it('when the tyres cannot carry the force the band is empty: no single map satisfies both', () => {
    // Dry, 100 %: tyres allow μ·Wr0·cosθ/(1 − μ·h/L) = 145,698 × 0.7071 / 0.61905 = 166,420 N (Gillespie ch. 2,
    // traction-limited, recalled from memory), the grade needs 254,972.9 × (0.70711 + 0.00424) = 181,377 N.
    const c = checkGrade({ vehicle: { ...vehicle, motorPeakTorqueNm: 20_000 }, drive: FULL }, { kind: 'start', gradePct: 100, speedKmh: 0 })
    const wr0 = (26_000 * g * 2.4) / 4.2
    const limitN = (wr0 * Math.SQRT1_2) / (1 - 1.6 / 4.2)
    expect(c.tractionNm).toBeCloseTo((limitN * 0.5) / 17.1, 0)
    expect(c.neededNm).toBeGreaterThan(c.tractionNm)
    expect(c.verdict).toBe('traction-short')
    expect(c.explanation).toMatch(/no single map can satisfy both/)
  })
})

describe('declared requirements', () => {
  it('absent conditions make no demand; a hold needs both grade and speed, named when one is missing', () => {
    expect(gradeDemands({})).toEqual([])
    expect(gradeDemands({ startGradePct: 12, holdGradePct: 4, holdSpeedKmh: 50 })).toEqual([
      { kind: 'start', gradePct: 12, speedKmh: 0 },
      { kind: 'hold', gradePct: 4, speedKmh: 50 },
    ])
    expect(() => gradeDemands({ holdGradePct: 4 })).toThrow(/holdSpeedKmh/)
    expect(() => gradeWheelForceN(vehicle, 1000, -3, 0)).toThrow(/gradePct/)
  })
})

describe('the full-pedal band in the editor', () => {
  it('is the grade torque (as the start check computes it) up to the worst release condition’s traction limit; empty where they cross', async () => {
    const { fullPedalBand, checkGrade: check } = await import('@/physics/gradeability')
    const { prepareCellSlip } = await import('@/physics/cell-slip')
    const { vehicle: truck } = await import('@/tests/support/fixtures')
    const drive = { kind: 'drive' as const, rowAxis: [0, 100], colAxis: [0, 20, 60], values: [[0, 0, 0], [1500, 1200, 500]] }
    const band = fullPedalBand(truck, drive, { startGradePct: 8 }, { surfaces: ['dry-asphalt', 'packed-snow'], loadCases: ['empty', 'laden'] })!
    expect(band).toHaveLength(3)
    // At 0 km/h the needed torque is the start check's own figure.
    expect(band[0].neededNm).toBeCloseTo(check({ vehicle: truck, drive }, { kind: 'start', gradePct: 8, speedKmh: 0 }).neededNm, 9)
    // The worst release condition is the lightest drive axle on the slipperiest surface.
    expect(band[0]).toMatchObject({ worstSurface: 'packed-snow', worstLoadCase: 'empty' })
    expect(band[0].allowedNm).toBeCloseTo(Math.abs(prepareCellSlip({ vehicle: truck, loadCase: 'empty', surface: 'packed-snow', applyEnvelope: false })(1, 0).motorTorqueAtLimitNm), 9)
    for (const c of band) expect(c.empty).toBe(c.neededNm > c.allowedNm)
    expect(fullPedalBand(truck, drive, {}, { surfaces: ['dry-asphalt'], loadCases: ['laden'] })).toBeNull()
  })
})
