import { describe, expect, it } from 'vitest'
import { checkRampsAgainstMaps, rampLimitsSchema, rampStep, rampTrace, ratesAt, starterRamps, type RampLimits } from '@/maps/ramps'

// A hand-worked case (worked out on paper for this test, not from a source): tip-in 1,000 N·m/s,
// tip-out 2,000 N·m/s, lash band ±50 N·m crossed at 100 N·m/s.
const ramps: RampLimits = { speedKmh: [0, 100], tipInNmPerS: [1000, 1000], tipOutNmPerS: [2000, 2000], lashBandNm: 50, lashRateNmPerS: 100 }

describe('ramp limiter', () => {
  it('matches a hand-worked trace from −200 N·m to a 500 N·m request through the lash band', () => {
    // −200 → −50 at 1,000 N·m/s: 0.15 s; −50 → 50 at 100 N·m/s: 1.0 s; 50 → 500 at 1,000 N·m/s: 0.45 s; 1.6 s in all.
    // Steps of 0.1 s: −100; then 0.05 s to −50 and 0.05 s × 100 = 5 → −45; +10 a step to 45 (t = 1.1 s);
    // then 0.05 s to 50 and 0.05 s × 1,000 = 50 → 100; +100 a step to 500 at t = 1.6 s.
    const out = rampTrace(ramps, new Array(17).fill(500), 20, 0.1, -200)
    const want = [-100, -45, -35, -25, -15, -5, 5, 15, 25, 35, 45, 100, 200, 300, 400, 500, 500]
    out.forEach((v, i) => expect(v, `step ${i + 1}`).toBeCloseTo(want[i], 9))
  })

  it('falls at the tip-out rate and slows through the band on the way down (into regen)', () => {
    // 300 → 50 at 2,000 N·m/s: 0.125 s; in 0.2 s: 0.075 s more at 100 N·m/s → 50 − 7.5 = 42.5.
    expect(rampStep(ramps, 300, -400, 20, 0.2)).toBeCloseTo(42.5, 9)
    // Leaving the band at −50 downward, the tip-out rate applies again: −50 − 0.1 × 2,000 = −250.
    expect(rampStep(ramps, -50, -400, 20, 0.1)).toBeCloseTo(-250, 9)
    // Never past the request.
    expect(rampStep(ramps, 100, 120, 20, 1)).toBe(120)
  })

  it('interpolates the rates over speed and holds them beyond the ends', () => {
    const r: RampLimits = { ...ramps, speedKmh: [10, 30], tipInNmPerS: [1000, 3000], tipOutNmPerS: [2000, 2000] }
    expect(ratesAt(r, 20).tipIn).toBe(2000)
    expect(ratesAt(r, 0).tipIn).toBe(1000)
    expect(ratesAt(r, 90).tipIn).toBe(3000)
  })

  it('with no band, rises at the tip-in rate throughout', () => {
    expect(rampStep({ ...ramps, lashBandNm: 0 }, -200, 500, 20, 0.3)).toBeCloseTo(100, 9)
  })
})

describe('ramp limits validation', () => {
  it('accepts the starter ramps and refuses bad input with the field and the reason', () => {
    expect(rampLimitsSchema.safeParse(starterRamps(2400)).success).toBe(true)
    const bad = rampLimitsSchema.safeParse({ speedKmh: [0, 20, 10], tipInNmPerS: [100, 0, 100], tipOutNmPerS: [100, 100], lashBandNm: -1, lashRateNmPerS: 50.5 })
    expect(bad.success).toBe(false)
    const msgs = bad.error!.issues.map((i) => `${i.path.join('.')}: ${i.message}`)
    expect(msgs).toContain('speedKmh.2: Speed breakpoint #3 (10 km/h) must be above #2 (20 km/h)')
    expect(msgs).toContain('tipInNmPerS.1: Each tip-in rate (N·m/s) must be greater than 0')
    expect(msgs).toContain('tipOutNmPerS: Tip-out needs one rate per speed breakpoint: 2 rates for 3 breakpoints')
    expect(msgs.some((m) => m.startsWith('lashBandNm: The lash band must not be negative'))).toBe(true)
    expect(msgs.some((m) => m.startsWith('lashRateNmPerS: The lash-band rate (N·m/s) must be a whole number'))).toBe(true)
    expect(rampLimitsSchema.safeParse({ ...ramps, speedKmh: [0, 10.25] }).error?.issues[0].message).toBe('Speed breakpoints take at most one decimal (0.1 km/h)')
  })

  it('refuses a lash band as wide as the maps ask for, and warns of a lash rate faster than the ramps', () => {
    expect(checkRampsAgainstMaps(ramps, { driveMaxNm: 2400, regenMaxNm: 1200 })).toEqual([])
    expect(checkRampsAgainstMaps({ ...ramps, lashBandNm: 1200 }, { driveMaxNm: 2400, regenMaxNm: 1200 })[0]).toMatchObject({ severity: 'error', field: 'lashBandNm' })
    expect(checkRampsAgainstMaps({ ...ramps, lashRateNmPerS: 5000 }, { driveMaxNm: 2400, regenMaxNm: 1200 })[0]).toMatchObject({ severity: 'warning', field: 'lashRateNmPerS' })
  })
})
