import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { analyse, sample, series } from './helpers'

const MAP = { rowAxis: [0, 50, 100], colAxis: [0, 20, 40, 80] }
const sum = (g: number[][]) => g.flat().reduce((a, b) => a + b, 0)

describe('map-cell occupancy (bilinear share, zero-order hold)', () => {
  it('by hand: 2 s held at pedal 25 %, 30 km/h splits ½·½ over the four cells around it', () => {
    const { result } = analyse([sample(0, { accelPedalPct: 25, roadSpeedKmh: 30 }), sample(2, { accelPedalPct: 100, roadSpeedKmh: 80 })], { map: MAP, maxGapS: 5 })
    expect(result.occupancy?.seconds).toEqual([
      [0, 0.5, 0.5, 0],
      [0, 0.5, 0.5, 0],
      [0, 0, 0, 0],
    ])
  })
  it('clamps outside the axes to the edge cells', () => {
    const { result } = analyse([sample(0, { accelPedalPct: 120, roadSpeedKmh: 95 }), sample(1)], { map: MAP })
    expect(result.occupancy?.seconds[2][3]).toBe(1)
  })
  it('sums to the covered time (duration minus gaps) for random logs', () => {
    fc.assert(fc.property(
      fc.array(fc.record({ dt: fc.double({ min: 0, max: 1.5, noNaN: true }), pedal: fc.double({ min: -10, max: 110, noNaN: true }), v: fc.double({ min: 0, max: 120, noNaN: true }) }), { minLength: 1, maxLength: 60 }),
      (steps) => {
        let t = 0
        const s = steps.map((x) => sample((t += x.dt), { accelPedalPct: x.pedal, roadSpeedKmh: x.v, wheelSpeedsKmh: [x.v] }))
        const { result } = analyse(s, { map: MAP })
        const occ = result.occupancy!
        expect(sum(occ.seconds) + occ.unassignedS).toBeCloseTo(result.coveredS, 9)
        expect(result.coveredS).toBeCloseTo(result.durationS - result.gaps.totalS, 12)
      },
    ))
  })
  it('regen maps are indexed by brake pedal and count only accelerator-released time', () => {
    const s = series(4, 0.5, (t) => (t < 2 ? { accelPedalPct: 40, brakePedalPct: 0 } : { accelPedalPct: 0, brakePedalPct: 50, roadSpeedKmh: 40 }))
    const occ = analyse(s, { map: MAP, kind: 'regen' }).result.occupancy!
    expect(occ.kind).toBe('regen')
    expect(occ.unassignedS).toBe(2) // 0 … 2 s: accelerator pressed
    expect(occ.seconds[1][2]).toBe(2) // 2 … 4 s at 50 % brake, 40 km/h
    expect(sum(occ.seconds)).toBe(2)
  })
  it('incomplete samples hand their interval to unassignedS', () => {
    const occ = analyse([sample(0, { roadSpeedKmh: NaN }), sample(1), sample(1.5)], { map: MAP }).result.occupancy!
    expect(occ.unassignedS).toBe(1)
    expect(sum(occ.seconds)).toBe(0.5)
  })
})
