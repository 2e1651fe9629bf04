import { describe, expect, it } from 'vitest'
import { lusolve } from 'mathjs'
import { driveAxleLoad, regenLimit, tractionLimit, rigidModel, driveAxleLimitN, STANDARD_GRAVITY, PhysicsInputError } from '@/physics'

const body = { massKg: 10000, wheelbaseM: 5, cgToFrontAxleM: 3, cgHeightM: 1.5 }

/** Independent rigid-truck free body (steer axle at x = 0, drive axle at x = −L), solved with mathjs lusolve.
 * Unknowns [Wf, Wr, Fx, A] with A = ax + g·sinθ: vertical, horizontal, moments about the CG, and Fx = ±μ·Wr. */
function rigidFreeBody(mu: number, theta: number, braking: boolean): number[] {
  const { massKg: m, wheelbaseM: L, cgToFrontAxleM: a, cgHeightM: h } = body
  const g = 9.80665
  const M = [
    [1, 1, 0, 0], // Wf + Wr = m·g·cosθ
    [0, 0, 1, -m], // Fx − m·A = 0
    [a, -(L - a), h, 0], // moments about the CG: a·Wf − (L − a)·Wr + h·Fx = 0
    [0, braking ? mu : -mu, 1, 0], // Fx = μ·Wr (drive) or Fx = −μ·Wr (braking)
  ]
  const rhs = [[m * g * Math.cos(theta)], [0], [0], [0]]
  return (lusolve(M, rhs) as number[][]).map((r) => r[0])
}

describe('tractionLimit (rear drive, Gillespie ch. 2 traction-limited acceleration)', () => {
  it('Gillespie-style worked example, by hand', () => {
    // Published form (Gillespie, Fundamentals of Vehicle Dynamics, ch. 2, rear-wheel drive):
    //   Fx_max = μ·W·(b/L) / (1 − μ·h/L), b = CG behind the front axle.
    // W = 10 000 kg × 9.80665 = 98 066.5 N; b/L = 3/5 = 0.6; μ·h/L = 0.8 × 1.5/5 = 0.24.
    // Fx_max = 0.8 × 98 066.5 × 0.6 / 0.76 = 47 071.92 / 0.76 = 61 936.74 N (hand calculation).
    expect(tractionLimit(body, 0.8)).toBeCloseTo(61936.74, 1)
    // Static rear load 58 839.9 N; at the limit Wr = 58 839.9 + 61 936.74 × 1.5/5 = 77 420.9 N = Fx/μ.
    expect(driveAxleLoad(body, tractionLimit(body, 0.8))).toBeCloseTo(61936.74 / 0.8, 1)
  })
  it('agrees with the independent free-body solution on grades', () => {
    for (const theta of [0, Math.atan(0.1), -Math.atan(0.08)]) {
      const [, wr, fx] = rigidFreeBody(0.8, theta, false)
      expect(tractionLimit(body, 0.8, { gradeRad: theta })).toBeCloseTo(fx, 6)
      expect(driveAxleLoad(body, fx, { gradeRad: theta })).toBeCloseTo(wr, 6)
    }
  })
  it('grade effect: the limit scales with cos θ (the grade weight shift enters through Fx)', () => {
    const theta = Math.atan(0.1) // 10 % grade
    expect(tractionLimit(body, 0.8, { gradeRad: theta })).toBeCloseTo(61936.74 * Math.cos(theta), 1)
    // Net acceleration available uphill (force balance): (Fx_max − m·g·sinθ)/m.
    const a = (tractionLimit(body, 0.8, { gradeRad: theta }) - 10000 * STANDARD_GRAVITY * Math.sin(theta)) / 10000
    expect(a).toBeCloseTo((61936.74 * Math.cos(theta) - 98066.5 * Math.sin(theta)) / 10000, 4)
  })
})

describe('regenLimit (braking on the drive axle only, load moves forward)', () => {
  it('hand value and below the static μ·Wr', () => {
    // Fb_max = μ·W·(b/L)/(1 + μ·h/L) = 0.8 × 98 066.5 × 0.6 / 1.24 = 37 961.23 N (hand calculation).
    expect(regenLimit(body, 0.8)).toBeCloseTo(37961.23, 1)
    expect(regenLimit(body, 0.8)).toBeLessThan(0.8 * driveAxleLoad(body, 0)) // < μ × static 58 839.9 N
    const [, wr, fx] = rigidFreeBody(0.8, Math.atan(-0.06), true)
    expect(-regenLimit(body, 0.8, { gradeRad: Math.atan(-0.06) })).toBeCloseTo(fx, 6)
    expect(driveAxleLoad(body, fx, { gradeRad: Math.atan(-0.06) })).toBeCloseTo(wr, 6)
  })
  it('the shared axle model gives the same limits', () => {
    const m = rigidModel(body)
    expect(driveAxleLimitN(m, 0.8, 1, 'drive')).toBeCloseTo(tractionLimit(body, 0.8), 8)
    expect(driveAxleLimitN(m, 0.8, 1, 'regen')).toBeCloseTo(regenLimit(body, 0.8), 8)
  })
  it('steer-axle lift caps the drive limit when μ·h ≥ L', () => {
    const tall = { massKg: 1000, wheelbaseM: 2, cgToFrontAxleM: 1, cgHeightM: 2.5 }
    // Wf = 0 when Fx = m·g·(L − a)/h = 9806.65 × 1/2.5 = 3922.66 N (hand calculation).
    expect(tractionLimit(tall, 1)).toBeCloseTo(3922.66, 2)
  })
  it('typed errors: negative mass, CG behind the drive axle, NaN', () => {
    expect(() => tractionLimit({ ...body, massKg: -1 }, 0.8)).toThrow(PhysicsInputError)
    expect(() => tractionLimit({ ...body, massKg: -1 }, 0.8)).toThrow(/massKg/)
    expect(() => regenLimit({ ...body, cgToFrontAxleM: 5.5 }, 0.8)).toThrow(/cgToFrontAxleM.*behind the drive axle/)
    expect(() => tractionLimit(body, Number.NaN)).toThrow(/mu/)
    expect(() => tractionLimit(body, 0.8, { gradeRad: Number.NaN })).toThrow(/gradeRad/)
  })
})
