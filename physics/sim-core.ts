/**
 * Shared time-stepping core of the launch and lift-off simulations: one equivalent drive wheel
 * (all drive wheels and the reflected motor inertia, J = J_wheels + J_motor·G²) and the vehicle mass.
 *   J·dω/dt = T_wheel − R·Fx,   m·dV/dt = Fx − f_r·m·g·cosθ − ½ρ·Cd·A·V|V| − m·g·sinθ,
 *   Fx = μ(κ)·Wr,  Wr = Wr0·cosθ + Fx·He/L  ⇒  Fx = μ·Wr0·cosθ / (1 − μ·He/L).
 * Magic Formula mode: linearised implicit Euler in (ω, V) (stable on the stiff slip mode near standstill).
 * No-slip mode (idealised tyre, ω = V/R): classical RK4 on V with m_eff = m + J/R².
 * No rollback: at standstill the vehicle is held unless the drive force beats grade and rolling resistance.
 * Map lookup speed: the road speed V, or with `vehicle.mapSpeedSource = 'driven-wheel'` the drive-wheel
 * speed ω·R (the controller only sees the motor speed), which a spin raises; the ramps see the same speed.
 * No traction control acts: the request is what the map gives at that speed (docs/physics.md §9a).
 */
import { driveAxleLoadN } from './axle-model'
import { driveCurveFor } from './drive-curve'
import { SEA_LEVEL_AIR_DENSITY, SLIP_SPEED_FLOOR_MPS, STANDARD_GRAVITY } from './constants'
import { deliverableAtShaft } from './envelope'
import { overallRatio, wheelTorqueFromMotor } from './driveline'
import { PhysicsInputError, requirePositive } from './errors'
import { axleLoadsFor } from './load-case'
import type { Surface, SurfaceId } from './surfaces'
import { gradeCos } from './traction'
import { magicFormula, magicFormulaSlope, peakSlip } from './tyre'
import { drivenAxlesFor } from './tandem'
import type { LoadCase } from './load-cases'
import type { VehicleParams } from './vehicle'

/** Options common to both simulations. Times in s. */
export interface SimOptions {
  vehicle: VehicleParams
  loadCase: LoadCase
  surface: Surface | SurfaceId
  gradeRad?: number
  gearIndex?: number
  durationS: number
  /** Integration step (default 2e-4 s Magic Formula mode, 1e-3 s no-slip mode). */
  stepS?: number
  /** Output sample interval (default 0.01 s). Jerk is differenced at this interval. */
  sampleS?: number
  /** `'magic-formula'` (default) or `'no-slip'` (idealised tyre, for verification). */
  tyre?: 'magic-formula' | 'no-slip'
  /** Drop rolling resistance, drag and grade force (verification against closed forms). */
  ignoreResistances?: boolean
  /** Optional torque-command rate limit, N·m/s at the motor shaft (default none). */
  torqueRateLimitNmPerS?: number
  /**
   * Optional controller ramp in place of the plain rate limit: the next command from the current one,
   * the request, the road speed (km/h) and the step (s) — e.g. the set's ramp limits (maps/ramps.ts).
   */
  torqueLimiter?: (currentNm: number, requestNm: number, speedKmh: number, dtS: number) => number
  /** Motor torque command held before the run starts, N·m (default 0): a tip-in starts from a held pedal. */
  initialCommandNm?: number
}

/** One output sample. */
export interface SimSample {
  t: number; pedalPct: number; speedKmh: number; wheelSpeedKmh: number; slip: number
  motorTorqueNm: number; wheelForceN: number; driveAxleLoadN: number; accelMps2: number; jerkMps3: number
}

/** Raw result of the core. */
export interface SimRun {
  samples: SimSample[]
  crossings: (number | null)[]
  peakSlip: number; minSlip: number; tyrePeakSlip: number
  timeBeyondPeakDriveS: number; timeBeyondPeakBrakeS: number; firstLockS: number | null; peakJerkMps3: number
}

/** Motor torque request (N·m, negative = regen) from pedal % and vehicle speed km/h. */
export type TorqueRequest = (pedalPct: number, speedKmh: number) => number

export function runSimulation(o: SimOptions, pedal: (t: number) => number, request: TorqueRequest, v0: number, crossKmh: number[], stopKmh = -1): SimRun {
  const { vehicle: v, gearIndex = 0 } = o
  const { model } = axleLoadsFor(v, o.loadCase)
  const cosG = gradeCos(o.gradeRad ?? 0)
  const coeffs = driveCurveFor(v, model, o.surface, cosG)
  const sinG = Math.sin(o.gradeRad ?? 0)
  const noSlip = o.tyre === 'no-slip'
  const T = requirePositive('durationS', o.durationS)
  if (T > 3600) throw new PhysicsInputError('durationS', 'must be at most 3600 s')
  const h = Math.min(requirePositive('stepS', o.stepS ?? (noSlip ? 1e-3 : 2e-4)), T)
  const sampleS = Math.max(requirePositive('sampleS', o.sampleS ?? 0.01), h)
  const rate = o.torqueRateLimitNmPerS === undefined ? Infinity : requirePositive('torqueRateLimitNmPerS', o.torqueRateLimitNmPerS)
  const G = overallRatio(v, gearIndex)
  const R = v.wheelRadiusM
  const m = model.totalMassKg
  // Floor on J (1e-4·m·R²) keeps the step solvable for a zero-inertia entry; documented in docs/physics.md.
  const J = Math.max(v.driveWheelsInertiaKgM2 + v.motorInertiaKgM2 * G * G, 1e-4 * m * R * R)
  const W0c = model.staticDriveAxleLoadN * cosG
  const k = model.transferHeightM / model.wheelbaseM
  // The equivalent wheel is the critical driven axle (docs/physics.md §6a): its force ratio r gives the
  // tandem force F = r·α·W0c / (φ − r·(α·k + d)); for 4×2 and locked 6×4 (α = φ = 1, d = 0) the one-axle form.
  const dr = drivenAxlesFor(v)
  const aW0c = dr.loadShare * W0c
  const res = !o.ignoreResistances
  const rollN = res ? v.rollingResistanceCoeff * m * STANDARD_GRAVITY * cosG : 0
  const gradeN = res ? m * STANDARD_GRAVITY * sinG : 0
  const aeroK = res ? 0.5 * SEA_LEVEL_AIR_DENSITY * v.dragCoefficient * v.frontalAreaM2 : 0
  const kPeak = peakSlip(coeffs)
  const net = (fx: number, V: number): number => {
    if (V > 1e-9) return fx - gradeN - rollN - aeroK * V * Math.abs(V)
    const f = fx - gradeN
    return f > rollN ? f - rollN : f < -rollN ? f + rollN : 0 // held at standstill, no rollback below
  }
  let cmdPrev = o.initialCommandNm ?? 0
  let cmdLast = cmdPrev
  const limit = o.torqueLimiter ?? ((c: number, req: number) => Math.max(c - rate * h, Math.min(c + rate * h, req)))
  // `U` is the looked-up speed, m/s: the road speed, or the drive-wheel speed ω·R when the program says so.
  const command = (t: number, U: number): number => (cmdLast = limit(cmdPrev, request(pedal(t), U * 3.6), U * 3.6, h))
  const capped = (cmd: number, wShaft: number): number => {
    const cap = deliverableAtShaft(v, wShaft, cmd < 0 ? 'regen' : 'drive')
    return Math.max(-cap, Math.min(cap, cmd))
  }
  const motorTorque = (t: number, U: number, wShaft: number): number => capped(command(t, U), wShaft)
  const onWheel = v.mapSpeedSource === 'driven-wheel'
  let t = 0, V = v0, w = v0 / R, a = 0, aPrevSample = 0, tPrevSample = 0, tm = 0, fx = 0, kappa = 0
  const run: SimRun = { samples: [], crossings: crossKmh.map(() => null), peakSlip: 0, minSlip: 0, tyrePeakSlip: kPeak,
    timeBeyondPeakDriveS: 0, timeBeyondPeakBrakeS: 0, firstLockS: null, peakJerkMps3: 0 }
  const record = (): void => {
    const jerk = run.samples.length && t > tPrevSample ? (a - aPrevSample) / (t - tPrevSample) : 0
    aPrevSample = a
    tPrevSample = t
    run.peakJerkMps3 = Math.max(run.peakJerkMps3, Math.abs(jerk))
    run.samples.push({ t, pedalPct: pedal(t), speedKmh: V * 3.6, wheelSpeedKmh: w * R * 3.6, slip: kappa, motorTorqueNm: tm,
      wheelForceN: fx, driveAxleLoadN: driveAxleLoadN(model, fx, cosG), accelMps2: a, jerkMps3: jerk })
  }
  record()
  let nextSample = sampleS
  const nSteps = Math.ceil(T / h - 1e-9)
  for (let i = 0; i < nSteps; i++) {
    const Vp = V
    if (noSlip) {
      const mEff = m + J / (R * R)
      // A controller ramp updates its command once per step (a zero-order hold, as firmware does):
      // RK4's stages must not each see the pedal at their own time and ramp again.
      const held = o.torqueLimiter ? command(t, V) : null
      const tq = (tt: number, VV: number) => (held === null ? motorTorque(tt, VV, (VV / R) * G) : capped(held, (VV / R) * G))
      const f = (tt: number, VV: number): number => net(wheelTorqueFromMotor(v, tq(tt, VV), gearIndex) / R, VV) / mEff
      const k1 = f(t, V), k2 = f(t + h / 2, V + (h / 2) * k1), k3 = f(t + h / 2, V + (h / 2) * k2), k4 = f(t + h, V + h * k3)
      V = Math.max(0, V + (h / 6) * (k1 + 2 * k2 + 2 * k3 + k4))
      w = V / R
      tm = tq(t + h, V)
      fx = wheelTorqueFromMotor(v, tm, gearIndex) / R - (J / (R * R)) * ((V - Vp) / h)
    } else {
      tm = motorTorque(t, onWheel ? w * R : V, w * G)
      const tw = wheelTorqueFromMotor(v, tm, gearIndex)
      const vDen = Math.max(Math.abs(V), SLIP_SPEED_FLOOR_MPS)
      kappa = (w * R - V) / vDen
      const r = magicFormula(kappa, coeffs)
      const d = r >= 0 ? dr.transferDrive : dr.transferRegen
      // guard: φ − μ·(α·He/L ± d) > 0 for any real truck (μ ≤ 1, He/L < 1, |ε| ≤ 0.5); 0.05·φ is a numerical floor
      const den = Math.max(dr.forceShare - r * (dr.loadShare * k) - Math.abs(r) * d, 0.05 * dr.forceShare)
      fx = (r * aW0c) / den
      const g = (h * Math.max(0, (magicFormulaSlope(kappa, coeffs) * aW0c * dr.forceShare) / (den * den))) / vDen
      const b1 = h * (tw - R * fx)
      const n = net(fx, V)
      let dw: number, dV: number
      if (V <= 1e-9 && n === 0) { dV = 0; dw = b1 / (J + g * R * R) } else {
        const b2 = h * n
        const a11 = J + g * R * R, a22 = m + g, a12 = -g * R
        const det = a11 * a22 - a12 * a12
        dw = (b1 * a22 - a12 * b2) / det
        dV = (a11 * b2 - a12 * b1) / det
      }
      V = Math.max(0, V + dV)
      w = Math.max(0, w + dw)
      if (kappa > kPeak) run.timeBeyondPeakDriveS += h
      if (kappa < -kPeak) { run.timeBeyondPeakBrakeS += h; if (run.firstLockS === null) run.firstLockS = t }
      run.peakSlip = Math.max(run.peakSlip, kappa)
      run.minSlip = Math.min(run.minSlip, kappa)
    }
    a = (V - Vp) / h
    cmdPrev = cmdLast
    crossKmh.forEach((c, j) => {
      const target = c / 3.6
      if (run.crossings[j] === null && Vp < target && V >= target) run.crossings[j] = t + (h * (target - Vp)) / (V - Vp)
    })
    t = (i + 1) * h
    const stop = V * 3.6 < stopKmh
    if (t >= nextSample - 1e-12 || i === nSteps - 1 || stop) { record(); nextSample += sampleS }
    if (stop) break
  }
  return run
}
