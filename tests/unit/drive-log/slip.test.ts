import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { slipRatio } from '@/physics'
import { analyse, sample } from './helpers'

describe('measured slip (SAE J670:2008 / ISO 8855:2011: κ = (ΩR − V)/|V|)', () => {
  it('by hand: road 36 km/h = 10 m/s, wheel 39.6 km/h = 11 m/s → κ = (11 − 10)/10 = 0.1', () => {
    const { slips } = analyse([sample(0, { roadSpeedKmh: 36, wheelSpeedsKmh: [39.6] })])
    expect(slips[0]).toBeCloseTo(0.1, 14)
  })
  it('by hand: braking, wheel 27 km/h = 7.5 m/s at 10 m/s → κ = −0.25; locked wheel → −1', () => {
    const { slips } = analyse([sample(0, { wheelSpeedsKmh: [27] }), sample(0.02, { wheelSpeedsKmh: [0] })])
    expect(slips[0]).toBeCloseTo(-0.25, 14)
    expect(slips[1]).toBe(-1)
  })
  it('standstill rule: the denominator is floored at 0.5 m/s (physics slipRatio), so a wheel creeping at 0.9 km/h from rest gives 0.5', () => {
    const { slips } = analyse([sample(0, { roadSpeedKmh: 0, wheelSpeedsKmh: [0.9] })])
    expect(slips[0]).toBeCloseTo(0.25 / 0.5, 14)
  })
  it('equals the physics slipRatio on km/h inputs converted to m/s, for any speeds', () => {
    fc.assert(fc.property(fc.double({ min: -150, max: 150, noNaN: true }), fc.double({ min: -150, max: 150, noNaN: true }), (v, w) => {
      const { slips } = analyse([sample(0, { roadSpeedKmh: v, wheelSpeedsKmh: [w] })])
      expect(slips[0]).toBe(slipRatio(w / 3.6, v / 3.6))
    }))
  })
  it('takes the wheel of largest |κ|, so one wheel spinning on an open differential is not averaged away', () => {
    const { slips } = analyse([sample(0, { wheelSpeedsKmh: [36, 54] }), sample(0.02, { wheelSpeedsKmh: [30, 37] })])
    expect(slips[0]).toBeCloseTo(0.5, 14)
    expect(slips[1]).toBeCloseTo(-1 / 6, 14)
  })
  it('skips missing wheels; a sample without road speed, pedal or any wheel is incomplete (NaN)', () => {
    const { slips, result } = analyse([
      sample(0, { wheelSpeedsKmh: [NaN, 39.6] }),
      sample(0.02, { wheelSpeedsKmh: [NaN, NaN] }),
      sample(0.04, { roadSpeedKmh: NaN }),
      sample(0.06, { accelPedalPct: NaN }),
    ])
    expect(slips[0]).toBeCloseTo(0.1, 14)
    expect(slips.slice(1).every(Number.isNaN)).toBe(true)
    expect(result.incompleteSamples).toBe(3)
  })
})
