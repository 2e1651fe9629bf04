// Combined slip by the friction ellipse (Wong, Theory of Ground Vehicles, ch. 1; Pacejka, Tire and Vehicle
// Dynamics, ch. 3 — an isotropic tyre's limit is a circle): (F_x/F_x,max)² + (F_y/F_y,max)² ≤ 1.
import { describe, expect, it } from 'vitest'
import { cellSlip, lateralCapacityMps2, lateralMargin, remainingLateralFraction, axleLoadsFor } from '@/physics'
import { mapOverlay } from '@/physics/overlay'
import { tractor } from '@/tests/support/fixtures'

const g = 9.80665

describe('friction ellipse', () => {
  it('90 % of the longitudinal grip in use leaves √(1 − 0.9²) ≈ 43.6 % of the lateral capacity (hand)', () => {
    expect(remainingLateralFraction(0.9)).toBeCloseTo(Math.sqrt(0.19), 12)
    expect(remainingLateralFraction(0.9)).toBeCloseTo(0.4359, 4)
    expect(remainingLateralFraction(0)).toBe(1)
    expect(remainingLateralFraction(-0.6)).toBeCloseTo(0.8, 12) // 3-4-5 triangle
    expect(remainingLateralFraction(1.2)).toBe(0)
  })
  it('on packed snow (μ 0.3) that is about 1.3 m/s² of lateral acceleration: 0.436 × 0.3 × g', () => {
    const W = 100_000
    expect(lateralCapacityMps2(0.3, W, -0.9 * 0.3 * W, W)).toBeCloseTo(Math.sqrt(0.19) * 0.3 * g, 9)
    expect(lateralCapacityMps2(0.3, W, -0.9 * 0.3 * W, W)).toBeCloseTo(1.28, 2)
  })
  it('per cell: the tractor with an empty trailer on packed snow at 90 % of its lift-off regen limit (hand, with load transfer)', () => {
    const { model } = axleLoadsFor(tractor, 'trailer-empty')
    const k = (0.3 * model.transferHeightM) / model.wheelbaseM
    const Fb = (0.3 * model.staticDriveAxleLoadN) / (1 + k) // regen limit, physics docs §4
    const F = -0.9 * Fb
    const W = model.staticDriveAxleLoadN + (F * model.transferHeightM) / model.wheelbaseM // load moves forward
    const expected = (g * Math.sqrt((0.3 * W) ** 2 - F * F)) / model.staticDriveAxleLoadN
    const at = cellSlip({ vehicle: tractor, loadCase: 'trailer-empty', surface: 'packed-snow', motorTorqueNm: -1, roadSpeedKmh: 30, applyEnvelope: false })
    const r = cellSlip({ vehicle: tractor, loadCase: 'trailer-empty', surface: 'packed-snow', motorTorqueNm: 0.9 * at.motorTorqueAtLimitNm, roadSpeedKmh: 30, applyEnvelope: false })
    expect(r.wheelForceN).toBeCloseTo(F, 6)
    expect(r.lateralCapacityMps2).toBeCloseTo(expected, 9)
    expect(r.lateralCapacityMps2).toBeLessThan(1.3)
    // free rolling holds μ·g
    expect(cellSlip({ vehicle: tractor, loadCase: 'trailer-empty', surface: 'packed-snow', motorTorqueNm: 0, roadSpeedKmh: 30 }).lateralCapacityMps2).toBeCloseTo(0.3 * g, 9)
  })
})

describe('lateral margin and the jackknife finding', () => {
  const ctx = { vehicle: tractor, loadCase: 'trailer-empty' as const, surface: 'packed-snow' as const }
  it('finds the regen torque at which the capacity falls to the design lateral acceleration', () => {
    const m = lateralMargin(ctx, 'regen', 1.5)
    expect(m.surfaceShort).toBe(false)
    expect(m.freeRollingMps2).toBeCloseTo(0.3 * g, 9)
    const t = m.torqueAtDesignNm as number
    const lat = (T: number) => cellSlip({ ...ctx, motorTorqueNm: -T, roadSpeedKmh: 20, applyEnvelope: false }).lateralCapacityMps2
    expect(lat(t)).toBeCloseTo(1.5, 5)
    expect(lat(t * 1.01)).toBeLessThan(1.5)
    expect(lateralMargin({ ...ctx, surface: 'ice' }, 'regen', 1.5)).toMatchObject({ surfaceShort: true, torqueAtDesignNm: null })
  })
  it('the overlay counts lift-off cells of a regen map that take the drive axle below the design value (trailer cases only)', () => {
    const t = lateralMargin(ctx, 'regen', 1.5).torqueAtDesignNm as number
    const map = { kind: 'regen' as const, rowAxis: [0, 50], colAxis: [20, 40, 60], values: [[0.5 * t, 1.2 * t, 0.9 * t], [2 * t, 2 * t, 2 * t]] }
    const o = mapOverlay({ ...ctx, map, designLateralAccelMps2: 1.5 })
    expect(o.lateralShort[0]).toEqual([false, true, false])
    expect(o.liftOffJackknifeCells).toBe(1)
    expect(o.designLateralAccelMps2).toBe(1.5)
    expect(mapOverlay({ ...ctx, loadCase: 'laden', map }).liftOffJackknifeCells).toBeNull()
    expect(mapOverlay({ ...ctx, surface: 'ice', map }).lateralShortCount).toBe(0) // the surface is short, not the map
  })
})
