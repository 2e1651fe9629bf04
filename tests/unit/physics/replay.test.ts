import { describe, expect, it } from 'vitest'
import { createReplayer, type ReplaySetParts } from '@/physics/replay'
import type { MapTable } from '@/physics'
import type { RampLimits } from '@/maps/ramps'
import { vehicle } from '@/tests/support/fixtures'

// Hand case (worked out for this test): 10 Hz, 3 s at a steady 20 km/h; the pedal goes from 0 to 100 % at 1.0 s.
const FLAT: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 100], values: [[0, 0], [800, 800]] }
const MORE: MapTable = { ...FLAT, values: [[0, 0], [1000, 1000]] }
const RAMP: RampLimits = { speedKmh: [0, 100], tipInNmPerS: [2000, 2000], tipOutNmPerS: [2000, 2000], lashBandNm: 0, lashRateNmPerS: 1 }
const log = Array.from({ length: 30 }, (_, i) => ({ timeS: i / 10, roadSpeedKmh: 20, accelPedalPct: i >= 10 ? 100 : 0, measuredSlip: 0.01 }))
const setA: ReplaySetParts = { drive: FLAT, regen: null, ramps: RAMP }

function replay(candidate: ReplaySetParts) {
  const r = createReplayer({ driven: setA, candidate: { ...candidate, vehicle }, surface: 'dry-asphalt', loadCase: 'laden' })
  for (const s of log) r.push(s)
  return r.finish()
}

describe('replaying a drive through a set', () => {
  it('through the set it was driven on, predicts exactly the driven torque request: 0, then +200 N·m a step to 800', () => {
    const r = replay(setA)
    // Ramp 2,000 N·m/s × 0.1 s = 200 N·m per sample from the step at 1.0 s: 200, 400, 600, 800 (held).
    const want = log.map((s) => (s.timeS < 1 - 1e-9 ? 0 : Math.min(800, 200 * (Math.round(s.timeS * 10) - 9))))
    r.series.drivenNm.forEach((v, i) => expect(v, `driven at ${log[i].timeS} s`).toBeCloseTo(want[i], 9))
    r.series.candidateNm.forEach((v, i) => expect(v, `candidate at ${log[i].timeS} s`).toBe(r.series.drivenNm[i]))
    expect(r.moreSeconds).toBe(0)
    expect(r.worstCells).toEqual([])
    expect(r.measuredPeakSlip).toBe(0.01)
    expect(r.samples).toBe(30)
    expect(r.seconds).toBeCloseTo(2.9, 9)
  })

  it('through a stronger candidate: the time and cells where it asks for more, by hand', () => {
    const r = replay({ drive: MORE, regen: null, ramps: RAMP })
    // Candidate 200, 400, 600, 800, 1000 from 1.0 s; driven stops at 800: 200 N·m more from 1.4 s to 2.9 s = 16 samples × 0.1 s.
    expect(r.moreSeconds).toBeCloseTo(1.6, 9)
    expect(r.moreShare).toBeCloseTo(1.6 / 2.9, 9)
    expect(r.worstExcessNm).toBeCloseTo(200, 9)
    expect(r.worstAtS).toBeCloseTo(1.4, 9)
    // The logged pedal 100 % and 20 km/h fall on the candidate's cell (100 %, 0 km/h): the nearer speed breakpoint.
    expect(r.worstCells).toEqual([{ row: 1, col: 0, pedalPct: 100, speedKmh: 0, seconds: expect.closeTo(1.6, 9), worstExcessNm: expect.closeTo(200, 9) }])
    expect(r.predictedPeakSlip).toBeGreaterThan(0)
  })

  it('asks for lift-off regen when the pedal is released and brake regen on the brake pedal', () => {
    const regen: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [0, 100], values: [[100, 100], [600, 600]] }
    const r = createReplayer({ driven: { drive: FLAT, regen, ramps: null }, candidate: { drive: FLAT, regen, ramps: null, vehicle }, surface: 'dry-asphalt', loadCase: 'laden' })
    r.push({ timeS: 0, roadSpeedKmh: 40, accelPedalPct: 0, measuredSlip: NaN })
    r.push({ timeS: 0.1, roadSpeedKmh: 40, accelPedalPct: 0, brakePedalPct: 50, measuredSlip: NaN })
    const out = r.finish()
    expect(out.series.drivenNm).toEqual([-100, -350])
    expect(out.series.measuredSlip).toEqual([null, null])
  })

  it('keeps at most about twice the point budget in its traces', () => {
    const r = createReplayer({ driven: setA, candidate: { ...setA, vehicle }, surface: 'dry-asphalt', loadCase: 'laden', maxPoints: 100 })
    for (let i = 0; i < 10_000; i++) r.push({ timeS: i / 50, roadSpeedKmh: 30, accelPedalPct: 50, measuredSlip: 0 })
    expect(r.finish().series.t.length).toBeLessThanOrEqual(200)
  })
})
