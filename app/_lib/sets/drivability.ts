/**
 * Drivability of a set: tip-in, tip-out and launch through its ramp limits, on every release
 * surface × load case of its parameter version, judged against the version's comfort limits.
 */
import 'server-only'
import { z } from 'zod'
import type { MapSetFull } from '@/db/queries/sets'
import type { ReleaseConditions } from '@/db/schema'
import { simulateManoeuvre, MANOEUVRES, type Manoeuvre, type ManoeuvreKind } from '@/physics/drivability'
import { loadCaseLabel } from '@/physics/load-cases'
import { loadCasesFor } from '@/physics'
import { surfaceLabel, type SurfaceId } from '@/physics/surfaces'
import type { LoadCase } from '@/physics/vehicle'
import { ValidationError } from '../http/errors'
import { physics } from '../physics/query'
import { DEFAULT_COMFORT } from './drivability-defaults'
import { declaresGrade, gradeChecks } from './grade'

export { DEFAULT_COMFORT }

export function comfortOf(c: ReleaseConditions) {
  const own = c.maxPeakJerkMps3 !== undefined || c.maxTimeTo90S !== undefined
  return {
    maxPeakJerkMps3: c.maxPeakJerkMps3 ?? DEFAULT_COMFORT.maxPeakJerkMps3,
    maxTimeTo90S: c.maxTimeTo90S ?? DEFAULT_COMFORT.maxTimeTo90S,
    source: own ? c.comfortSource?.trim() || 'stated in the parameter version (no source given)' : DEFAULT_COMFORT.source,
  }
}

const num = (name: string, unit: string, min: number, max: number, dflt: number) =>
  z.coerce.number({ error: `${name} must be a number (${unit})` }).min(min, `${name} must be at least ${min} ${unit}`).max(max, `${name} must be at most ${max} ${unit}`).default(dflt)

/** The manoeuvres' settings, from the page's form or the API's query. */
export const drivabilityQuerySchema = z.object({
  tipInSpeedKmh: num('tipInSpeedKmh', 'km/h', 1, 120, 30),
  tipInFromPct: num('tipInFromPct', '%', 0, 100, 10),
  tipInToPct: num('tipInToPct', '%', 0, 100, 80),
  tipOutSpeedKmh: num('tipOutSpeedKmh', 'km/h', 3, 120, 50),
  tipOutFromPct: num('tipOutFromPct', '%', 0, 100, 60),
  launchPedalPct: num('launchPedalPct', '%', 1, 100, 100),
})
export type DrivabilityQuery = z.infer<typeof drivabilityQuerySchema>

export function manoeuvreOf(kind: ManoeuvreKind, q: DrivabilityQuery): Manoeuvre {
  if (kind === 'tip-in') return { kind, speedKmh: q.tipInSpeedKmh, fromPedalPct: q.tipInFromPct, toPedalPct: q.tipInToPct }
  if (kind === 'tip-out') return { kind, speedKmh: q.tipOutSpeedKmh, fromPedalPct: q.tipOutFromPct }
  return { kind, pedalPct: q.launchPedalPct }
}

export const MANOEUVRE_LABELS: Record<ManoeuvreKind, string> = { 'tip-in': 'Tip-in', 'tip-out': 'Tip-out', launch: 'Launch' }

export interface DrivabilityRow {
  manoeuvre: ManoeuvreKind
  surface: SurfaceId
  loadCase: LoadCase
  label: string
  peakJerkMps3: number
  rmsJerkMps3: number
  timeTo90PctS: number | null
  peakSlip: number
  minSlip: number
  timeBeyondPeakS: number
  speedReachedKmh: number
  /** Which comfort limits the run breaks (empty: it passes). */
  fails: ('jerk' | 'response')[]
}

const round = (x: number, d = 3) => Number(x.toFixed(d))

/** Every manoeuvre on every release condition of the set. Throws ValidationError when the set lacks a drive map. */
export function setDrivability(set: MapSetFull, q: DrivabilityQuery) {
  if (!set.drive) throw new ValidationError('The set holds no drive map: drivability needs one')
  const c = set.paramVersion.releaseConditions
  const comfort = comfortOf(c)
  const rows: DrivabilityRow[] = []
  const offered = loadCasesFor(set.paramVersion.params)
  for (const surface of c.surfaces)
    for (const loadCase of c.loadCases.filter((l) => offered.includes(l)))
      for (const kind of MANOEUVRES) {
        const r = run(set, q, kind, surface, loadCase).summary
        const fails: DrivabilityRow['fails'] = []
        if (r.peakJerkMps3 > comfort.maxPeakJerkMps3) fails.push('jerk')
        if (r.timeTo90PctS === null || r.timeTo90PctS > comfort.maxTimeTo90S) fails.push('response')
        rows.push({
          manoeuvre: kind, surface, loadCase, label: `${MANOEUVRE_LABELS[kind]}, ${surfaceLabel(surface)}, ${loadCaseLabel(loadCase)}`,
          peakJerkMps3: round(r.peakJerkMps3), rmsJerkMps3: round(r.rmsJerkMps3), timeTo90PctS: r.timeTo90PctS === null ? null : round(r.timeTo90PctS),
          peakSlip: round(r.peakSlip, 4), minSlip: round(r.minSlip, 4), timeBeyondPeakS: round(r.timeBeyondPeakS), speedReachedKmh: round(r.speedReachedKmh, 1), fails,
        })
      }
  const v = set.paramVersion.params
  // Start and hold on grade: only when the version declares them (null: not asked for).
  const grade = declaresGrade(c) ? gradeChecks(v, set.drive.table, c) : null
  return {
    comfort, ramps: set.rampVersion ? { number: set.rampVersion.number } : null, rows, passed: rows.every((r) => r.fails.length === 0),
    mapSpeedSource: v.mapSpeedSource ?? 'road',
    grade,
  }
}

/** One manoeuvre with its traces (speed, slip, torque, acceleration, jerk, pedal), for the plots. */
export function run(set: MapSetFull, q: DrivabilityQuery, kind: ManoeuvreKind, surface: SurfaceId, loadCase: LoadCase) {
  if (!set.drive) throw new ValidationError('The set holds no drive map: drivability needs one')
  const drive = set.drive.table
  const regen = set.regen?.table ?? null
  return physics(() =>
    simulateManoeuvre({
      vehicle: set.paramVersion.params, loadCase, surface, drive, regen, ramps: set.rampVersion?.limits ?? null,
      manoeuvre: manoeuvreOf(kind, q), sampleS: 0.01,
    }),
  )
}
