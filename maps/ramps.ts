/**
 * Torque ramp limits: how fast the controller lets the motor torque request rise (tip-in) and fall
 * (tip-out), in N·m/s at the motor shaft, as curves over road speed, with a slower rate through a
 * band around zero torque where the driveline lash is taken up (all three are trade terms). A set
 * carries them as a versioned part beside its drive and regen maps.
 *
 * Representation: speed breakpoints in km/h with at most one decimal, rates in whole N·m/s, the lash
 * band's half-width in whole N·m; so the C header holds them exactly as int32 (speed × 10).
 */
import { z } from 'zod'
import { findInterval } from '../physics/table'

export interface RampLimits {
  /** Road-speed breakpoints, km/h, strictly increasing, 2 … 16 of them. */
  speedKmh: number[]
  /** Largest rise of the torque request per second at each breakpoint, N·m/s (> 0). */
  tipInNmPerS: number[]
  /** Largest fall of the torque request per second at each breakpoint, N·m/s (> 0); into regen too. */
  tipOutNmPerS: number[]
  /** Half-width of the band around zero torque, N·m: while the request is within ±band it moves at the lash rate. */
  lashBandNm: number
  /** Rate through the lash band, N·m/s (> 0), normally well below the tip-in and tip-out rates. */
  lashRateNmPerS: number
}

export const MAX_RAMP_BREAKPOINTS = 16
/** Rates above this are no limit at all for a truck motor (full torque in well under 10 ms). */
export const MAX_RATE_NM_PER_S = 1_000_000

const whole = (label: string, max: number) =>
  z
    .number({ error: `${label} must be a number` })
    .refine(Number.isFinite, `${label} must be finite`)
    .refine(Number.isInteger, `${label} must be a whole number (the controller stores whole units)`)
    .gt(0, `${label} must be greater than 0`)
    .max(max, `${label} must be at most ${max.toLocaleString('en')}`)

const speed = z
  .number({ error: 'Each speed breakpoint must be a number (km/h)' })
  .refine(Number.isFinite, 'Each speed breakpoint must be finite')
  .min(0, 'Speed breakpoints must not be negative')
  .max(250, 'Speed breakpoints must be at most 250 km/h')
  .refine((v) => Math.abs(v * 10 - Math.round(v * 10)) < 1e-9, 'Speed breakpoints take at most one decimal (0.1 km/h)')

/** The shape and every rule that needs no map: the same schema for the form and the API. */
export const rampLimitsSchema = z
  .object({
    speedKmh: z.array(speed).min(2, 'Give at least 2 speed breakpoints').max(MAX_RAMP_BREAKPOINTS, `At most ${MAX_RAMP_BREAKPOINTS} speed breakpoints`),
    tipInNmPerS: z.array(whole('Each tip-in rate (N·m/s)', MAX_RATE_NM_PER_S)),
    tipOutNmPerS: z.array(whole('Each tip-out rate (N·m/s)', MAX_RATE_NM_PER_S)),
    lashBandNm: z
      .number({ error: 'The lash band must be a number (N·m)' })
      .refine(Number.isInteger, 'The lash band must be a whole number of N·m')
      .min(0, 'The lash band must not be negative (0 means no band)')
      .max(100_000, 'The lash band must be at most 100,000 N·m'),
    lashRateNmPerS: whole('The lash-band rate (N·m/s)', MAX_RATE_NM_PER_S),
  })
  .superRefine((r, ctx) => {
    for (let i = 1; i < r.speedKmh.length; i++)
      if (!(r.speedKmh[i] > r.speedKmh[i - 1]))
        ctx.addIssue({ code: 'custom', path: ['speedKmh', i], message: `Speed breakpoint #${i + 1} (${r.speedKmh[i]} km/h) must be above #${i} (${r.speedKmh[i - 1]} km/h)` })
    for (const k of ['tipInNmPerS', 'tipOutNmPerS'] as const)
      if (r[k].length !== r.speedKmh.length)
        ctx.addIssue({ code: 'custom', path: [k], message: `${k === 'tipInNmPerS' ? 'Tip-in' : 'Tip-out'} needs one rate per speed breakpoint: ${r[k].length} rates for ${r.speedKmh.length} breakpoints` })
  })

export type RampLimitsInput = z.input<typeof rampLimitsSchema>

export interface RampFinding {
  severity: 'error' | 'warning'
  field: string
  message: string
}

/**
 * Checks that need the set's maps: the lash band must lie inside the torque range the maps ask for
 * (a band wider than the map's largest torque would slow every request), and the lash rate should
 * be the slowest (a faster rate through the lash is the opposite of its purpose; a warning).
 * `range` is the largest drive torque and the largest regen torque magnitude of the set's maps, N·m.
 */
export function checkRampsAgainstMaps(r: RampLimits, range: { driveMaxNm: number; regenMaxNm: number }): RampFinding[] {
  const out: RampFinding[] = []
  const narrowest = Math.min(range.driveMaxNm > 0 ? range.driveMaxNm : Infinity, range.regenMaxNm > 0 ? range.regenMaxNm : Infinity)
  if (Number.isFinite(narrowest) && r.lashBandNm >= narrowest)
    out.push({ severity: 'error', field: 'lashBandNm', message: `The lash band (±${r.lashBandNm} N·m) must be narrower than the maps' torque range (largest ${range.driveMaxNm} N·m drive, ${range.regenMaxNm} N·m regen)` })
  const slowest = Math.min(...r.tipInNmPerS, ...r.tipOutNmPerS)
  if (r.lashBandNm > 0 && r.lashRateNmPerS > slowest)
    out.push({ severity: 'warning', field: 'lashRateNmPerS', message: `The lash-band rate (${r.lashRateNmPerS} N·m/s) is faster than the slowest tip-in or tip-out rate (${slowest} N·m/s); it normally takes up the lash more gently` })
  return out
}

/** The tip-in and tip-out rates at a road speed, N·m/s (linear between breakpoints, held beyond the ends). */
export function ratesAt(r: RampLimits, speedKmh: number): { tipIn: number; tipOut: number } {
  const xs = r.speedKmh
  const i = findInterval(xs, speedKmh)
  const f = xs.length < 2 ? 0 : Math.min(1, Math.max(0, (speedKmh - xs[i]) / (xs[i + 1] - xs[i])))
  const at = (ys: number[]) => (xs.length < 2 ? ys[0] : ys[i] + f * (ys[i + 1] - ys[i]))
  return { tipIn: at(r.tipInNmPerS), tipOut: at(r.tipOutNmPerS) }
}

/**
 * One controller step: the torque command after `dt` seconds, moving from `current` towards
 * `target` no faster than the ramp allows. Rising uses the tip-in rate, falling the tip-out rate,
 * and the part of the move inside ±lashBandNm the lash rate; the time budget is spent piecewise, so
 * a step that crosses the band edge is exact (not the rate of wherever the step began).
 * @example rampStep(ramps, 0, 2000, 50, 0.01) // 0 + 0.01 s × the lash rate, while inside the band
 */
export function rampStep(r: RampLimits, current: number, target: number, speedKmh: number, dt: number): number {
  if (!(dt > 0) || current === target) return current
  const { tipIn, tipOut } = ratesAt(r, speedKmh)
  const up = target > current
  const outer = up ? tipIn : tipOut
  const band = r.lashBandNm
  const inBand = (x: number) => x > -band && x < band
  let x = current
  let time = dt
  // At most three pieces: outside, through the band, outside again.
  for (let piece = 0; piece < 3 && time > 0 && x !== target; piece++) {
    const rate = band > 0 && (inBand(x) || (up ? x === -band : x === band)) ? r.lashRateNmPerS : outer
    // Where this piece ends: the band edge ahead, or the target.
    let edge = target
    if (band > 0) {
      if (up && x < -band) edge = Math.min(target, -band)
      else if (up && x < band) edge = Math.min(target, band)
      else if (!up && x > band) edge = Math.max(target, band)
      else if (!up && x > -band) edge = Math.max(target, -band)
    }
    const need = Math.abs(edge - x) / rate
    if (need >= time) return x + (up ? 1 : -1) * rate * time
    x = edge
    time -= need
  }
  return x
}

/**
 * A whole request trace through the limiter: `request[i]` at `speedKmh[i]` every `dt` seconds,
 * starting from `start` (the command held before the trace). Returns the commands.
 */
export function rampTrace(r: RampLimits, request: readonly number[], speedKmh: readonly number[] | number, dt: number, start = request[0] ?? 0): number[] {
  const out = new Array<number>(request.length)
  let c = start
  for (let i = 0; i < request.length; i++) {
    c = rampStep(r, c, request[i], typeof speedKmh === 'number' ? speedKmh : speedKmh[i], dt)
    out[i] = c
  }
  return out
}

/**
 * Starting ramp limits for a program, scaled to its motor: tip-in reaches peak torque in about
 * 0.5 s at low speed and 0.3 s above 30 km/h, tip-out in about 0.25 s, and the lash band is 3 % of
 * peak torque crossed at a tenth of the slowest rate. Common practice as a first guess to tune from,
 * not a recommendation for any vehicle.
 */
export function starterRamps(motorPeakTorqueNm: number): RampLimits {
  const t = Math.max(1, Math.round(motorPeakTorqueNm))
  const r = (x: number) => Math.max(1, Math.round(x / 10) * 10)
  const tipIn = [r(t / 0.5), r(t / 0.4), r(t / 0.3), r(t / 0.3)]
  const tipOut = [r(t / 0.25), r(t / 0.25), r(t / 0.25), r(t / 0.25)]
  return { speedKmh: [0, 10, 30, 80], tipInNmPerS: tipIn, tipOutNmPerS: tipOut, lashBandNm: Math.max(1, Math.round(t * 0.03)), lashRateNmPerS: r(Math.min(...tipIn) / 10) }
}
