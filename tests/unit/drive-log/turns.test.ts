import { describe, expect, it } from 'vitest'
import { createWheelCombiner } from '@/physics'
import { analyse, series } from './helpers'

// Rigid-axle kinematics (Gillespie, Fundamentals of Vehicle Dynamics, ch. 6; Wong, Theory of Ground Vehicles,
// ch. 5): a wheel at lateral offset y (positive left) moves at v_c − ψ̇·y, so with track width b the inner wheel
// runs ψ̇·b/2 slower and the outer ψ̇·b/2 faster than the axle centre. Case built by hand: v_c = 20 km/h on a
// 15 m radius → ψ̇ = (20/3.6)/15 = 0.37037 rad/s; b = 1.8 m → ±ψ̇·b/2 = ±0.33333 m/s = ±1.2 km/h, i.e. ±6 %.
const V = 20
const YAW = V / 3.6 / 15
const HALF = YAW * 0.9 * 3.6 // km/h
const leftTurn = (over = {}) => series(4, 0.02, () => ({ roadSpeedKmh: V, wheelSpeedsKmh: [V - HALF, V + HALF], ...over }))
const SIDES = ['wheelLeft', 'wheelRight'] as const

describe('a turn does not read as slip', () => {
  it('by hand: inner and outer wheels differ by ψ̇·b = 2.4 km/h (±6 % of 20 km/h)', () => {
    expect(HALF).toBeCloseTo(1.2, 12)
  })
  it('judged per wheel without their names, the outer wheel reads +6 % slip — the bias the left/right mean removes', () => {
    const { result } = analyse(leftTurn())
    expect(result.slip.maxAbs).toBeCloseTo(0.06, 12)
  })
  it('left and right named: their mean is the axle centre, κ = 0', () => {
    const { result, slips } = analyse(leftTurn(), { wheelChannels: SIDES })
    expect(slips.every((k) => Math.abs(k) < 1e-12)).toBe(true)
    expect(result.turns).toMatchObject({ leftRightMean: 201, yawCorrected: 0, uncorrected: 0 })
    expect(result.events).toEqual([])
  })
  it('with a yaw rate: each side corrected by ∓ψ̇·b/2, κ = 0 on both', () => {
    const { result, slips } = analyse(leftTurn({ yawRateRadS: YAW }), { wheelChannels: SIDES, trackWidthM: 1.8 })
    expect(slips.every((k) => Math.abs(k) < 1e-12)).toBe(true)
    expect(result.turns.yawCorrected).toBe(201)
  })
  it('with a yaw rate, one wheel spinning on an open differential is still seen at full size (not halved by a mean)', () => {
    // Inner (left) wheel spins at 30 km/h in the same turn; corrected: 30 + 1.2 = 31.2 → κ = 11.2/20 = 0.56.
    const s = series(1, 0.02, () => ({ roadSpeedKmh: V, wheelSpeedsKmh: [30, V + HALF], yawRateRadS: YAW }))
    const { slips } = analyse(s, { wheelChannels: SIDES })
    expect(slips[0]).toBeCloseTo(11.2 / 20, 12)
    // Without the yaw rate the mean gives (30 + 21.2)/2 = 25.6 → κ = 0.28: smaller, but still a spin above 0.15.
    const mean = analyse(series(1, 0.02, () => ({ roadSpeedKmh: V, wheelSpeedsKmh: [30, V + HALF] })), { wheelChannels: SIDES })
    expect(mean.slips[0]).toBeCloseTo(5.6 / 20, 12)
    expect(mean.result.events.map((e) => e.kind)).toEqual(['spin'])
  })
  it('the combiner: a missing side falls back to the other as logged; a tandem keeps its two axles apart', () => {
    const c = createWheelCombiner(['wheelLeft', 'wheelRight', 'wheelLeft2', 'wheelRight2'], 1.8)
    const out = new Float64Array(c.size)
    expect(c.combine([NaN, 21, 30, 32], undefined, out)).toBe('mean')
    expect(Array.from(out)).toEqual([NaN, 21, 31, NaN])
    expect(c.combine([19, 21, 19, 21], 0, out)).toBe('yaw')
    expect(Array.from(out)).toEqual([19, 21, 19, 21])
  })
})
