import { describe, expect, it } from 'vitest'
import { analyse, series } from './helpers'

describe('downsampled plot series (bucketed min/max)', () => {
  it('keeps at most ~2000 points per channel on a 2 h, 50 Hz log, and a one-sample spike survives', () => {
    const s = series(7200, 0.02, (t, i) => ({ roadSpeedKmh: 40 + 10 * Math.sin(t / 60), wheelSpeedsKmh: [i === 200_000 ? 200 : 40 + 10 * Math.sin(t / 60)] }))
    const out = analyse(s, { maxSeriesPoints: 2000 }).result.series
    expect(out.tS.length * 2).toBeLessThanOrEqual(2000)
    expect(out.tS.length).toBeGreaterThan(400)
    expect(Math.max(...out.slip.max.map((x) => x ?? -Infinity))).toBeGreaterThan(3) // the spike
    expect(Math.max(...out.wheelSpeedKmh.max.map((x) => x ?? -Infinity))).toBe(200)
    expect(out.tS[1] - out.tS[0]).toBeCloseTo(out.bucketS, 9)
  })
  it('bucket extremes bracket every value; missing channels are null', () => {
    const s = series(10, 0.02, (t) => ({ accelPedalPct: 50 + 40 * Math.sin(t) }))
    const out = analyse(s, { maxSeriesPoints: 40 }).result.series
    expect(out.tS.length).toBeLessThanOrEqual(20)
    for (const x of s) {
      const b = Math.min(out.tS.length - 1, Math.floor((x.timeS - out.tS[0]) / out.bucketS))
      expect(out.accelPedalPct.min[b]!).toBeLessThanOrEqual(x.accelPedalPct)
      expect(out.accelPedalPct.max[b]!).toBeGreaterThanOrEqual(x.accelPedalPct)
    }
    expect(out.motorTorqueNm.min.every((x) => x === null)).toBe(true)
  })
})
