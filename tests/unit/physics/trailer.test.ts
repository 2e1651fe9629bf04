import { describe, expect, it } from 'vitest'
import { lusolve } from 'mathjs'
import { axleLoadsFor, combinationModel, fifthWheelLoad, tractorDriveAxleLoad, tractorRegenLimit, tractorTractionLimit, PhysicsInputError } from '@/physics'
import { tractor as program } from '@/tests/support/fixtures'

const tractor = { massKg: 9000, wheelbaseM: 3.8, cgToFrontAxleM: 1.6, cgHeightM: 1.1 }
const trailer = { massKg: 30000, cgToKingpinM: 4.8, cgHeightM: 2.0, kingpinToAxleM: 8, fifthWheelToFrontAxleM: 3.5, fifthWheelHeightM: 1.2 }
const g = 9.80665

/**
 * Independent free body of the combination, written in the test and solved with mathjs lusolve.
 * Unknowns x = [Fk, Hk, Nt, Wr, Wf, A, Fx]; A = ax + g·sinθ. Moments are taken about each body's CG
 * (the code under test takes them about contact points). Trailer axle free-rolling.
 */
function freeBody(mu: number, theta: number, braking: boolean): Record<'Fk' | 'Hk' | 'Nt' | 'Wr' | 'Wf' | 'A' | 'Fx', number> {
  const { massKg: m, wheelbaseM: L, cgToFrontAxleM: a, cgHeightM: h } = tractor
  const { massKg: mt, cgToKingpinM: ct, cgHeightM: ht, kingpinToAxleM: kt, fifthWheelToFrontAxleM: f, fifthWheelHeightM: hk } = trailer
  const c = Math.cos(theta)
  const M = [
    [0, 1, 0, 0, 0, -mt, 0], // trailer horizontal: Hk = mt·A
    [1, 0, 1, 0, 0, 0, 0], // trailer vertical: Fk + Nt = mt·g·cosθ
    [ct, -(hk - ht), -(kt - ct), 0, 0, 0, 0], // trailer moments about its CG
    [0, -1, 0, 0, 0, -m, 1], // tractor horizontal: Fx − Hk − m·A = 0
    [-1, 0, 0, 1, 1, 0, 0], // tractor vertical: Wr + Wf − Fk = m·g·cosθ
    [-(a - f), hk - h, 0, -(L - a), a, 0, h], // tractor moments about its CG
    [0, 0, 0, braking ? mu : -mu, 0, 0, 1], // Fx = ±μ·Wr at the limit
  ]
  const rhs = [[0], [mt * g * c], [0], [0], [m * g * c], [0], [0]]
  const [Fk, Hk, Nt, Wr, Wf, A, Fx] = (lusolve(M, rhs) as number[][]).map((r) => r[0])
  return { Fk, Hk, Nt, Wr, Wf, A, Fx }
}

describe('tractor-semitrailer load transfer', () => {
  it('static kingpin load is mt·g·(kt − ct)/kt (lever rule, by hand)', () => {
    // 30 000 × 9.80665 × (8 − 4.8)/8 = 117 679.8 N
    expect(fifthWheelLoad(tractor, trailer, 0).verticalN).toBeCloseTo(117679.8, 1)
    expect(fifthWheelLoad(tractor, trailer, 0).horizontalN).toBe(0)
  })
  it('traction limit matches the independent free-body solution (level and 6 % grade)', () => {
    for (const theta of [0, Math.atan(0.06)]) {
      const fb = freeBody(0.8, theta, false)
      expect(tractorTractionLimit(tractor, trailer, 0.8, { gradeRad: theta })).toBeCloseTo(fb.Fx, 5)
      expect(tractorDriveAxleLoad(tractor, trailer, fb.Fx, { gradeRad: theta })).toBeCloseTo(fb.Wr, 5)
      const k = fifthWheelLoad(tractor, trailer, fb.Fx, { gradeRad: theta })
      expect(k.verticalN).toBeCloseTo(fb.Fk, 5)
      expect(k.horizontalN).toBeCloseTo(fb.Hk, 5)
      expect(fb.Nt).toBeGreaterThan(0)
    }
  })
  it('regen limit matches the free body under braking (downhill 5 %)', () => {
    const theta = -Math.atan(0.05)
    const fb = freeBody(0.3, theta, true)
    expect(-tractorRegenLimit(tractor, trailer, 0.3, { gradeRad: theta })).toBeCloseTo(fb.Fx, 5)
    expect(tractorRegenLimit(tractor, trailer, 0.3)).toBeLessThan(0.3 * tractorDriveAxleLoad(tractor, trailer, 0))
  })
  it('steer-axle load from the model matches the free body', () => {
    const fb = freeBody(0.8, 0, false)
    const m = combinationModel(tractor, trailer)
    expect(m.staticSteerAxleLoadN - fb.Fx * m.steerUnloadPerN).toBeCloseTo(fb.Wf, 5)
    expect(m.totalMassKg).toBe(39000)
  })
  it('load cases: trailer-laden = tractor at kerb mass/empty CG + laden trailer', () => {
    const lc = axleLoadsFor(program, 'trailer-laden')
    expect(lc.tractor).toEqual({ massKg: 9000, wheelbaseM: 3.8, cgToFrontAxleM: 1.6, cgHeightM: 1.1 })
    expect(lc.trailer).toEqual(trailer)
    expect(lc.model).toEqual(combinationModel(tractor, trailer))
    expect(axleLoadsFor(program, 'laden').tractor.massKg).toBe(19000)
    expect(axleLoadsFor(program, 'empty').trailer).toBeNull()
    expect(() => axleLoadsFor({ ...program, trailer: null }, 'trailer-empty')).toThrow(PhysicsInputError)
  })
  it('rejects a trailer CG outside kingpin–axle', () => {
    expect(() => combinationModel(tractor, { ...trailer, cgToKingpinM: 9 })).toThrow(/trailer\.cgToKingpinM/)
  })
})
