// The physics overlay checked against values computed by hand in the test from the published formulas.
import { describe, expect, it } from 'vitest'
import { mapOverlay } from '@/physics/overlay'
import type { MapTable, VehicleParams } from '@/physics'
import { rigid6x4 } from '@/tests/support/fixtures'

// Standard gravity, exact by definition (3rd CGPM 1901; NIST SP 330).
const g = 9.80665
const v: VehicleParams = rigid6x4
const G = v.gearRatios[0] * v.finalDriveRatio
const eta = v.drivelineEfficiency
const R = v.wheelRadiusM
const L = v.wheelbaseM
const a = v.emptyCgToFrontAxleM
const h = v.emptyCgHeightM
const W = v.emptyMassKg * g

/**
 * Traction-limited rear drive axle with load transfer on level ground, Gillespie, Fundamentals of
 * Vehicle Dynamics, ch. 2: Fx_max = μ·W·(a/L) / (1 − μ·h/L), a = CG behind the front axle.
 */
const gillespieDriveLimitN = (mu: number) => (mu * W * (a / L)) / (1 - (mu * h) / L)
/** Braking on the drive axle alone moves load forward: Fb_max = μ·W·(a/L) / (1 + μ·h/L) (same derivation, Fx < 0). */
const regenLimitN = (mu: number) => (mu * W * (a / L)) / (1 + (mu * h) / L)
/** Wheel force → motor-shaft torque: driving loses η on the way to the wheel (T_m = F·R/(G·η)); regen loses it on the way back (T_m = F·R·η/G). */
const driveTorque = (f: number) => (f * R) / (G * eta)
const regenTorque = (f: number) => (f * R * eta) / G

// The Magic Formula (Pacejka, Tire and Vehicle Dynamics, ch. 4), written out here independently of physics/tyre.ts.
const mf = (k: number, c: { B: number; C: number; D: number; E: number }) => {
  const x = c.B * k
  return c.D * Math.sin(c.C * Math.atan(x - c.E * (x - Math.atan(x))))
}

/** The default truck drive tyre (physics/drive-tyre.ts: C_κ/F_z = 12, C = 1.5, E = 0.3) on a surface of peak μ: B = 12/(C·μ). */
const truckCurve = (mu: number) => ({ B: 12 / (1.5 * mu), C: 1.5, D: mu, E: 0.3 })
/** Rising-branch inverse by plain bisection on the in-test formula. */
function bisect(f: (k: number) => number, target: number, hi: number): number {
  let lo = 0
  for (let i = 0; i < 200; i++) { const m = (lo + hi) / 2; if (f(m) < target) lo = m; else hi = m }
  return (lo + hi) / 2
}

function driveMap(torques: number[]): MapTable {
  const colAxis = [0, 5, 10, 20]
  return { kind: 'drive', rowAxis: torques.map((_, i) => i * (100 / (torques.length - 1))), colAxis, values: torques.map((t) => colAxis.map(() => t)) }
}

describe('mapOverlay: traction-limit torque per speed', () => {
  it('equals the hand-computed load-transfer limit on packed snow (μ = 0.3), converted through R, G and η', () => {
    const limitNm = driveTorque(gillespieDriveLimitN(0.3)) // ≈ 572 N·m for this vehicle
    const o = mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'packed-snow', map: driveMap([0, 100, 200]) })
    expect(o.tractionLimitBySpeed).toHaveLength(4)
    for (const p of o.tractionLimitBySpeed) {
      expect(p.tractionLimitNm).toBeCloseTo(limitNm, 6)
      expect(p.limitNm).toBeLessThanOrEqual(p.envelopeLimitNm)
    }
    expect(limitNm).toBeGreaterThan(560)
    expect(limitNm).toBeLessThan(585)
  })

  it('gives the regen (lock-up) limit for a regen map, as a braking magnitude', () => {
    const map: MapTable = { kind: 'regen', rowAxis: [0, 100], colAxis: [10, 40], values: [[100, 100], [200, 200]] }
    const o = mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'ice', map })
    expect(o.tractionLimitBySpeed[0].tractionLimitNm).toBeCloseTo(regenTorque(regenLimitN(0.1)), 6)
  })
})

describe('mapOverlay: slip heat map', () => {
  it('predicts the slip the drive-tyre curve gives for the cell force ratio on wet asphalt', () => {
    const T = 1200
    const o = mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'wet-asphalt', map: driveMap([0, T]) })
    const fx = (T * G * eta) / R
    const wr = W * (a / L) + (fx * h) / L // rear load with load transfer
    const ratio = fx / wr
    const kappa = bisect((k) => mf(k, truckCurve(0.82)), ratio, 0.2)
    expect(o.slip[1][0]).toBeCloseTo(kappa, 9)
    expect(o.utilisation[1][0]).toBeCloseTo(fx / gillespieDriveLimitN(0.82), 9)
    expect(o.slip[0][0]).toBe(0)
    expect(o.spin[1][0]).toBe(false)
  })

  it('on dry asphalt the predicted slip reproduces the force ratio through the formula', () => {
    const T = 2000
    const o = mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'dry-asphalt', map: driveMap([0, T]) })
    const fx = (T * G * eta) / R
    const ratio = fx / (W * (a / L) + (fx * h) / L)
    const kappa = o.slip[1][2]
    expect(kappa).not.toBeNull()
    expect(mf(kappa ?? NaN, truckCurve(1))).toBeCloseTo(ratio, 9)
  })

  it('marks cells beyond the peak as spin with no slip, and counts them', () => {
    const limitNm = driveTorque(gillespieDriveLimitN(0.3))
    const o = mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'packed-snow', map: driveMap([0, 0.5 * limitNm, 1.5 * limitNm]) })
    expect(o.spin).toEqual([[false, false, false, false], [false, false, false, false], [true, true, true, true]])
    expect(o.slip[2]).toEqual([null, null, null, null])
    expect(o.utilisation[1][0]).toBeCloseTo(0.5, 9)
    expect(o.utilisation[2][0]).toBeCloseTo(1.5, 9)
    expect(o.spinCount).toBe(4)
    // Peak where C·atan(u) = π/2, u = x − E(x − atan x) = tan(π/3) = √3 with C = 1.5, E = 0.3; κ = x/B.
    const x = bisect((y) => y - 0.3 * (y - Math.atan(y)), Math.sqrt(3), 10)
    expect(o.tyrePeakSlip).toBeCloseTo(x / truckCurve(0.3).B, 9)
    // and near the brush model's full-sliding slip κ_sl = 3·μ/(C_κ/F_z) = 0.075 (Pacejka ch. 3).
    expect(o.tyrePeakSlip).toBeCloseTo(0.075, 4)
  })

  it('changes with the load case: laden puts more load on the drive axle, so less of the grip is used', () => {
    const map = driveMap([0, 400, 800])
    const empty = mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'packed-snow', map })
    const laden = mapOverlay({ vehicle: v, loadCase: 'laden', surface: 'packed-snow', map })
    expect(empty.spinCount).toBe(4)
    expect(laden.spinCount).toBe(0)
    expect(laden.utilisation[1][0]).toBeLessThan(empty.utilisation[1][0])
  })

  it('does not mutate the map', () => {
    const map = driveMap([0, 300, 900])
    const copy = structuredClone(map)
    mapOverlay({ vehicle: v, loadCase: 'empty', surface: 'ice', map })
    expect(map).toEqual(copy)
  })
})
