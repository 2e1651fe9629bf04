import { describe, expect, it } from 'vitest'
import { cellSlip, criticalAxleLoadN, driveAxleLimitN, drivenAxlesFor, drivenLimitN, rigidModel, simulateLaunch, vehicleParamsSchema, type VehicleParams } from '@/physics'
import { vehicle } from '../../support/fixtures'

// Hand case of docs/physics.md §6a: a rigid truck, m = 20 000 kg, L = 5 m (steer axle to tandem centre),
// a = 3.5 m, h = 1.5 m, packed snow μ = 0.3, level road.
//   W = 20 000 × 9.80665 = 196 133 N;  W_r0 = W·a/L = 137 293.1 N;  H_e/L = 1.5/5 = 0.3;  μ·H_e/L = 0.09.
const model = rigidModel({ massKg: 20_000, wheelbaseM: 5, cgToFrontAxleM: 3.5, cgHeightM: 1.5 })
const mu = 0.3

describe('tandem drive limits (docs/physics.md §6a, hand-checked; one-axle form: Gillespie, Fundamentals of Vehicle Dynamics, ch. 2)', () => {
  it('static case: each tandem axle carries half the group load; 4×2 and locked 6×4 keep the one-axle limit', () => {
    expect(model.staticDriveAxleLoadN).toBeCloseTo(137_293.1, 1)
    const open = drivenAxlesFor({ axleLayout: '6x4', tandem: { interAxleDifferential: 'open', interAxleTransfer: 0.1 } })
    expect(criticalAxleLoadN(open, model.staticDriveAxleLoadN, 0)).toBeCloseTo(68_646.55, 1)
    // Locked: F = μ·W_r0/(1 − μ·H_e/L) = 41 187.93/0.91 = 45 261.46 N (hand), whatever the inter-axle transfer.
    const locked = drivenAxlesFor({ axleLayout: '6x4', tandem: { interAxleDifferential: 'locked', interAxleTransfer: 0.1 } })
    expect(drivenLimitN(model, locked, mu, 1, 'drive')).toBeCloseTo(45_261.46, 1)
    expect(drivenLimitN(model, drivenAxlesFor({ axleLayout: '4x2' }), mu, 1, 'drive')).toBeCloseTo(driveAxleLimitN(model, mu, 1, 'drive'), 9)
    // An open differential without transfer: twice the lighter (= either) axle's limit = the same 45 261.46 N.
    expect(drivenLimitN(model, drivenAxlesFor({ axleLayout: '6x4', tandem: { interAxleDifferential: 'open' } }), mu, 1, 'drive')).toBeCloseTo(45_261.46, 1)
  })

  it('open 6×4 with inter-axle transfer ε = 0.1, by hand', () => {
    // F = μ·W_r0/(1 − μ·H_e/L + 2·μ·ε) = 41 187.93/(1 − 0.09 + 0.06) = 41 187.93/0.97 = 42 461.78 N: 6.2 % below locked.
    const open = drivenAxlesFor({ axleLayout: '6x4', tandem: { interAxleDifferential: 'open', interAxleTransfer: 0.1 } })
    const F = drivenLimitN(model, open, mu, 1, 'drive')
    expect(F).toBeCloseTo(42_461.78, 1)
    // Check by axle: group load 137 293.1 + 0.3 × 42 461.78 = 150 031.6 N; lighter axle 75 015.8 − 0.1 × 42 461.78
    // = 70 769.6 N; μ × 70 769.6 = 21 230.9 N = F/2 — twice the lighter axle's limit.
    const lighter = criticalAxleLoadN(open, model.staticDriveAxleLoadN + F * 0.3, F)
    expect(lighter).toBeCloseTo(70_769.6, 0)
    expect(mu * lighter).toBeCloseTo(F / 2, 6)
    // Regen: F_b = 41 187.93/(1 + 0.09 + 0.06) = 35 815.59 N (the transfer reverses, the lighter axle still limits).
    expect(drivenLimitN(model, open, mu, 1, 'regen')).toBeCloseTo(35_815.59, 1)
    // Negative ε moves load the other way; an open differential is limited by whichever axle is lighter.
    const back = drivenAxlesFor({ axleLayout: '6x4', tandem: { interAxleDifferential: 'open', interAxleTransfer: -0.1 } })
    expect(drivenLimitN(model, back, mu, 1, 'drive')).toBeCloseTo(F, 9)
  })

  it('6×2, forward axle driven, half the group load, ε = 0.1, by hand', () => {
    // Driven-axle load W_d = ½·(W_r0 + F·H_e/L) − ε·F; at its peak F = μ·W_d:
    // F = μ·½·W_r0/(1 − μ·½·H_e/L + μ·ε) = 20 593.97/(1 − 0.045 + 0.03) = 20 593.97/0.985 = 20 907.58 N.
    const d = drivenAxlesFor({ axleLayout: '6x2', tandem: { interAxleTransfer: 0.1 } })
    expect(drivenLimitN(model, d, mu, 1, 'drive')).toBeCloseTo(20_907.58, 1)
    // Rear axle driven: it gains ε·F, F = 20 593.97/(1 − 0.045 − 0.03) = 22 263.75 N.
    expect(drivenLimitN(model, drivenAxlesFor({ axleLayout: '6x2', tandem: { drivenAxle: 'rear', interAxleTransfer: 0.1 } }), mu, 1, 'drive')).toBeCloseTo(22_263.75, 1)
    // A load-shift system at 60 % raises it: 0.3 × 0.6 × 137 293.1 / (1 − 0.054 + 0.03) = 24 712.76/0.976 = 25 320.45 N.
    expect(drivenLimitN(model, drivenAxlesFor({ axleLayout: '6x2', tandem: { drivenLoadShare: 0.6, interAxleTransfer: 0.1 } }), mu, 1, 'drive')).toBeCloseTo(25_320.45, 1)
  })
})

describe('tandem fields in stored parameter versions', () => {
  it('old JSON (6×4 without tandem fields) parses and judges exactly as before', () => {
    const old = JSON.parse(JSON.stringify(vehicle)) as VehicleParams
    expect(vehicleParamsSchema.safeParse(old).success).toBe(true)
    const args = { loadCase: 'laden' as const, surface: 'packed-snow' as const, motorTorqueNm: 900, roadSpeedKmh: 5 }
    const before = cellSlip({ vehicle: old, ...args })
    const lockedExplicit = cellSlip({ vehicle: { ...old, tandem: { interAxleDifferential: 'locked', interAxleTransfer: 0.2 } }, ...args })
    expect(lockedExplicit.limitForceN).toBe(before.limitForceN)
    expect(lockedExplicit.slip).toBe(before.slip)
    const open = cellSlip({ vehicle: { ...old, tandem: { interAxleDifferential: 'open', interAxleTransfer: 0.1 } }, ...args })
    expect(open.limitForceN).toBeLessThan(before.limitForceN)
    // The lighter axle takes half the force on less than half the load: it slips more.
    expect(open.slip!).toBeGreaterThan(before.slip!)
    expect(open.criticalAxleLoadN).toBeLessThan(open.driveAxleLoadN / 2)
  })
  it('names the field of a bad tandem entry', () => {
    const r = vehicleParamsSchema.safeParse({ ...vehicle, axleLayout: '6x2', tandem: { drivenLoadShare: 1.4 } })
    expect(r.success).toBe(false)
    expect(r.error?.issues[0].path.join('.')).toBe('tandem.drivenLoadShare')
    expect(vehicleParamsSchema.safeParse({ ...vehicle, axleLayout: '8x4' }).error?.issues[0].message).toMatch(/4x2, 6x4 or 6x2/)
  })
})

describe('tandem in the time-domain launch', () => {
  // The simulation follows the critical axle; a torque between the open and the locked limit must spin
  // the open tandem and not the locked one, and an explicit locked tandem must run exactly as the default.
  const base = { ...vehicle, tandem: null }
  const open: VehicleParams = { ...vehicle, tandem: { interAxleDifferential: 'open', interAxleTransfer: 0.2 } }
  const lockedExplicit: VehicleParams = { ...vehicle, tandem: { interAxleDifferential: 'locked', interAxleTransfer: 0.2 } }
  const limit = (v: VehicleParams) => cellSlip({ vehicle: v, loadCase: 'laden', surface: 'packed-snow', motorTorqueNm: 1, roadSpeedKmh: 5 }).motorTorqueAtLimitNm
  const torque = (limit(open) + limit(base)) / 2
  const map = { kind: 'drive' as const, rowAxis: [0, 100], colAxis: [0, 100], values: [[torque, torque], [torque, torque]] }
  const launch = (v: VehicleParams) => simulateLaunch({ vehicle: v, loadCase: 'laden', surface: 'packed-snow', map, pedal: { kind: 'step', pedalPct: 0 }, durationS: 2, torqueRateLimitNmPerS: 5000 }).summary
  it('spins the open tandem at a torque the locked one holds', () => {
    expect(limit(open)).toBeLessThan(limit(base))
    expect(launch(open).timeBeyondPeakSlipS).toBeGreaterThan(0)
    expect(launch(base).timeBeyondPeakSlipS).toBe(0)
    expect(launch(lockedExplicit)).toEqual(launch(base))
  })
})
