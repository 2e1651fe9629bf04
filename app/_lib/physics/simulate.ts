/**
 * Launch and lift-off simulations of a stored revision, as the simulate route serves them:
 * the query schema, the run, and the samples as columns rounded to 5 significant digits (the
 * plots need no more, and it keeps a 30 s run near 100 kB of JSON).
 */
import 'server-only'
import { z } from 'zod'
import type { MapTable } from '@/maps'
import { simulateLaunch, simulateLiftOff, type SimSample, type VehicleParams } from '@/physics'
import { ValidationError } from '../http/errors'
import { checkLoadCase, gradePctField, gradeRad, loadCaseField, physics, surfaceField } from './query'

const num = (name: string, unit: string, min: number, max: number) =>
  z.coerce.number({ error: `${name} must be a number (${unit})` }).min(min, `${name} must be at least ${min} ${unit}`).max(max, `${name} must be at most ${max} ${unit}`)

export const simulateQuerySchema = z.object({
  mode: z.enum(['launch', 'liftoff'], { error: "mode must be 'launch' or 'liftoff'" }),
  surface: surfaceField,
  loadCase: loadCaseField,
  pedalPct: num('pedalPct', '%', 0, 100).default(100),
  /** 0 = a pedal step; otherwise a linear ramp from 0 to pedalPct over this many seconds. */
  rampS: num('rampS', 's', 0, 20).default(0),
  initialSpeedKmh: num('initialSpeedKmh', 'km/h', 0, 130).optional(),
  gradePct: gradePctField.default(0),
  durationS: num('durationS', 's', 1, 60).default(30),
})
export type SimulateQuery = z.infer<typeof simulateQuerySchema>

export const SERIES = ['t', 'pedalPct', 'speedKmh', 'wheelSpeedKmh', 'slip', 'motorTorqueNm', 'accelMps2', 'jerkMps3'] as const
export type Series = Record<(typeof SERIES)[number], number[]>

/** Output interval of the samples, s; jerk is differenced over it (docs/physics.md §9). */
export const SAMPLE_S = 0.02

const round5 = (x: number): number => (Number.isFinite(x) ? Number(x.toPrecision(5)) : x)

function columns(samples: SimSample[]): Series {
  const col = (k: (typeof SERIES)[number]) => samples.map((s) => round5(s[k]))
  return { t: col('t'), pedalPct: col('pedalPct'), speedKmh: col('speedKmh'), wheelSpeedKmh: col('wheelSpeedKmh'), slip: col('slip'), motorTorqueNm: col('motorTorqueNm'), accelMps2: col('accelMps2'), jerkMps3: col('jerkMps3') }
}

/** Infinity (a monotone tyre curve has no peak slip) does not survive JSON; say null instead. */
const finiteOrNull = (x: number): number | null => (Number.isFinite(x) ? x : null)

/** Runs the simulation the query asks for on `table`; a launch needs a drive map, a lift-off a regen map. */
export function simulate(vehicle: VehicleParams, table: MapTable, q: SimulateQuery) {
  checkLoadCase(vehicle, q.loadCase)
  const base = { vehicle, loadCase: q.loadCase, surface: q.surface, gradeRad: gradeRad(q.gradePct), durationS: q.durationS, sampleS: SAMPLE_S, map: table }
  if (q.mode === 'launch') {
    if (table.kind !== 'drive') throw new ValidationError('mode: a launch runs on a drive map; this is a regen map (use mode=liftoff)')
    const pedal = q.rampS > 0 ? { kind: 'ramp' as const, toPct: q.pedalPct, durationS: q.rampS } : { kind: 'step' as const, pedalPct: q.pedalPct }
    const r = physics(() => simulateLaunch({ ...base, pedal, initialSpeedKmh: q.initialSpeedKmh ?? 0 }))
    return { mode: 'launch' as const, summary: { ...r.summary, tyrePeakSlip: finiteOrNull(r.summary.tyrePeakSlip) }, series: columns(r.samples) }
  }
  if (table.kind !== 'regen') throw new ValidationError('mode: a lift-off runs on a regen map; this is a drive map (use mode=launch)')
  const initialSpeedKmh = q.initialSpeedKmh ?? 60
  if (initialSpeedKmh <= 2) throw new ValidationError('initialSpeedKmh: a lift-off needs a starting speed above 2 km/h')
  const r = physics(() => simulateLiftOff({ ...base, initialSpeedKmh }))
  return { mode: 'liftoff' as const, summary: { ...r.summary, tyrePeakSlip: finiteOrNull(r.summary.tyrePeakSlip) }, series: columns(r.samples) }
}

export type SimulationResponse = ReturnType<typeof simulate>
