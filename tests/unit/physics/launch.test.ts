import { describe, expect, it } from 'vitest'
import * as math from 'mathjs'
import { pedalAt, simulateLaunch, PhysicsInputError, type LaunchOptions } from '@/physics'
import { linearDriveMap, tractor } from '@/tests/support/fixtures'

type SolveODE = (f: (t: number, y: number[]) => number[], tspan: [number, number], y0: number[], o: { method: string; tol: number; maxStep: number }) => { t: number[]; y: number[][] }
const solveODEFn: unknown = Reflect.get(math, 'solveODE') // mathjs 15 ships solveODE without a TS declaration
const isSolveODE = (f: unknown): f is SolveODE => typeof f === 'function'

const g = 9.80665
// Fixture, laden: m = 19 000 kg; R = 0.5 m; G = 12; η = 0.95; 3000 N·m; 450 kW; battery 500 kW (not binding).
// Equivalent rotating inertia at the wheel J = 60 + 0.5 × 12² = 132 kg·m² → m_eff = m + J/R² = 19 528 kg.
const m = 19000
const mEff = m + 132 / 0.25
const base: LaunchOptions = {
  vehicle: tractor, loadCase: 'laden', surface: 'dry-asphalt', map: linearDriveMap(3000),
  pedal: { kind: 'step', pedalPct: 100 }, durationS: 25,
}

describe('simulateLaunch', () => {
  it('reproduces the closed-form constant-torque-then-constant-power launch (idealised tyre, no resistance) to 0.1 %', () => {
    // Closed form (Newton's second law, derived in the test):
    //   phase 1, T = 3000 N·m: a1 = T·G·η/(R·m_eff) = 68 400 / 19 528 m/s², until ω_b = P/T = 150 rad/s ↔ v_b = 6.25 m/s;
    //   phase 2, P·η = F·v: m_eff·v·dv = P·η·dt ⇒ t(v) = t_b + m_eff·(v² − v_b²)/(2·P·η).
    const a1 = (3000 * 12 * 0.95) / 0.5 / mEff
    const tb = 6.25 / a1
    const tAt = (v: number) => tb + (mEff * (v * v - 6.25 * 6.25)) / (2 * 450000 * 0.95)
    const r = simulateLaunch({ ...base, tyre: 'no-slip', ignoreResistances: true })
    expect(Math.abs((r.summary.timeTo30KmhS as number) / tAt(30 / 3.6) - 1)).toBeLessThan(1e-3)
    expect(Math.abs((r.summary.timeTo50KmhS as number) / tAt(50 / 3.6) - 1)).toBeLessThan(1e-3)
    expect(r.summary.peakSlip).toBe(0)
    expect(r.summary.peakAccelMps2).toBeCloseTo(a1, 6)
  })
  it('with rolling, aero and grade resistance matches a mathjs solveODE (RK45) reference within 0.1 %', () => {
    expect(isSolveODE(solveODEFn)).toBe(true)
    if (!isSolveODE(solveODEFn)) return
    const theta = Math.atan(0.02) // 2 % uphill
    // Independent ODE written in the test: m_eff·dv/dt = T(v)·G·η/R − f_r·m·g·cosθ − ½·ρ·Cd·A·v² − m·g·sinθ,
    // ρ = 1.225 kg/m³ (ISO 2533 sea level), T(v) = min(3000, 450 000/ω, 500 000/ω), ω = v·G/R.
    const f = (_t: number, [v]: number[]) => {
      const w = (v * 12) / 0.5
      const T = Math.min(3000, w > 0 ? 450000 / w : Infinity)
      return [((T * 12 * 0.95) / 0.5 - 0.006 * m * g * Math.cos(theta) - 0.5 * 1.225 * 0.6 * 9.5 * v * v - m * g * Math.sin(theta)) / mEff]
    }
    const raw = solveODEFn(f, [0, 15], [0], { method: 'RK45', tol: 1e-10, maxStep: 0.02 })
    const sol = { t: raw.t, y: raw.y.map((y) => y[0]) }
    const crossing = (kmh: number) => {
      const v = kmh / 3.6
      const i = sol.y.findIndex((y) => y >= v)
      return sol.t[i - 1] + ((sol.t[i] - sol.t[i - 1]) * (v - sol.y[i - 1])) / (sol.y[i] - sol.y[i - 1])
    }
    const r = simulateLaunch({ ...base, tyre: 'no-slip', gradeRad: theta, durationS: 15 }) // stays below the 94 km/h motor limit
    expect(Math.abs((r.summary.timeTo30KmhS as number) / crossing(30) - 1)).toBeLessThan(1e-3)
    expect(Math.abs((r.summary.timeTo50KmhS as number) / crossing(50) - 1)).toBeLessThan(1e-3)
    expect(Math.abs(r.summary.finalSpeedKmh / (sol.y[sol.y.length - 1] * 3.6) - 1)).toBeLessThan(1e-3)
  })
  it('Magic Formula tyre on dry asphalt stays close to the idealised tyre (within 2 %)', () => {
    const mf = simulateLaunch({ ...base })
    const ideal = simulateLaunch({ ...base, tyre: 'no-slip' })
    expect(mf.summary.timeBeyondPeakSlipS).toBe(0)
    expect(mf.summary.peakSlip).toBeGreaterThan(0)
    expect(mf.summary.peakSlip).toBeLessThan(mf.summary.tyrePeakSlip)
    // Tolerance reasoning: drive slip of ~2 % spins the motor ~2 % faster at a given road speed, so in the
    // power-limited phase torque is ~2 % lower; the launch is slower by at most about that fraction.
    const ratio = (mf.summary.timeTo50KmhS as number) / (ideal.summary.timeTo50KmhS as number)
    expect(ratio).toBeGreaterThan(1)
    expect(ratio - 1).toBeLessThan(0.02)
  })
  it('spins up on ice: slip beyond the peak and a slower launch', () => {
    const ice = simulateLaunch({ ...base, loadCase: 'empty', surface: 'ice', durationS: 10 })
    expect(ice.summary.timeBeyondPeakSlipS).toBeGreaterThan(1)
    expect(ice.summary.peakSlip).toBeGreaterThan(ice.summary.tyrePeakSlip)
    // Acceleration can never exceed the traction-limited value μ_peak·Wr_max/m ≈ 0.1·g·(a/L)/(1 − 0.1·h/L) (hand bound).
    expect(ice.summary.peakAccelMps2).toBeLessThan((0.1 * g * (1.6 / 3.8)) / (1 - (0.1 * 1.1) / 3.8) * 1.01)
  })
  it('reports time series with jerk; a ramp or a torque rate limit softens the tip-in', () => {
    const step = simulateLaunch({ ...base, durationS: 3 })
    const ramp = simulateLaunch({ ...base, durationS: 3, pedal: { kind: 'ramp', toPct: 100, durationS: 1 } })
    const filtered = simulateLaunch({ ...base, durationS: 3, torqueRateLimitNmPerS: 6000 })
    expect(step.samples[0].t).toBe(0)
    expect(step.samples.length).toBeGreaterThan(290)
    expect(ramp.summary.peakJerkMps3).toBeLessThan(step.summary.peakJerkMps3 / 10)
    expect(filtered.summary.peakJerkMps3).toBeLessThan(step.summary.peakJerkMps3 / 10)
    const s = step.samples[150]
    for (const k of ['t', 'speedKmh', 'wheelSpeedKmh', 'slip', 'motorTorqueNm', 'accelMps2', 'jerkMps3'] as const) expect(Number.isFinite(s[k])).toBe(true)
  })
  it('Magic Formula mode is step-converged and survives zero rotating inertia (stiff wheel mode)', () => {
    const coarse = simulateLaunch({ ...base, surface: 'wet-asphalt', durationS: 8 })
    const fine = simulateLaunch({ ...base, surface: 'wet-asphalt', durationS: 8, stepS: 5e-5 })
    expect(Math.abs((coarse.summary.timeTo30KmhS as number) / (fine.summary.timeTo30KmhS as number) - 1)).toBeLessThan(5e-3)
    const stiff = simulateLaunch({ ...base, durationS: 3, vehicle: { ...tractor, motorInertiaKgM2: 0, driveWheelsInertiaKgM2: 0 } })
    expect(stiff.samples.every((x) => Number.isFinite(x.speedKmh) && Number.isFinite(x.slip))).toBe(true)
    expect(stiff.summary.finalSpeedKmh).toBeGreaterThan(0)
  })
  it('pedal traces: step, ramp, logged samples', () => {
    expect(pedalAt({ kind: 'step', pedalPct: 80, atS: 1 }, 0.5)).toBe(0)
    expect(pedalAt({ kind: 'step', pedalPct: 80, atS: 1 }, 1)).toBe(80)
    expect(pedalAt({ kind: 'ramp', fromPct: 20, toPct: 100, startS: 1, durationS: 2 }, 2)).toBe(60)
    const logged = { kind: 'samples' as const, samples: [{ t: 0, pedalPct: 0 }, { t: 1, pedalPct: 50 }, { t: 3, pedalPct: 100 }] }
    expect(pedalAt(logged, 2)).toBe(75)
    expect(pedalAt(logged, 9)).toBe(100)
    const r = simulateLaunch({ ...base, durationS: 4, pedal: logged })
    expect(r.samples[50].pedalPct).toBeCloseTo(25, 9)
  })
  it('rejects a regen map and bad traces', () => {
    expect(() => simulateLaunch({ ...base, map: { ...base.map, kind: 'regen' } })).toThrow(PhysicsInputError)
    expect(() => simulateLaunch({ ...base, pedal: { kind: 'samples', samples: [] } })).toThrow(/pedal/)
    expect(() => simulateLaunch({ ...base, durationS: -1 })).toThrow(/durationS/)
  })
})
