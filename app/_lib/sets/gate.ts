/**
 * The release gate of a set: it goes to the vehicles only when (a) it holds a drive and a regen
 * map, each revision approved; (b) validation finds no error in either map under the set's
 * parameter version; (c) no cell of either map asks for more than the traction limit less the
 * version's margin in any of its release conditions — or the lead acknowledges each exception
 * (map × surface × load case) with a reason; (c″) on a tractor, no lift-off cell of the regen map takes
 * the drive axle's lateral capacity below the design lateral acceleration (the jackknife finding), or
 * the lead acknowledges it likewise; (c′) both maps export exactly to the C header; (d) at least one drive report was filed on this
 * exact set; (d′) the set's drive reports together cover every release condition (surface × load case), or the
 * lead waives each uncovered one with a reason; (e) no open safety concern sits on any of its revisions, whichever set it was
 * found in; (f) when the version declares battery corners and a minimum lift-off deceleration, no
 * corner takes the regen map's lift-off deceleration below it where the nominal pack reaches it
 * (docs/physics.md §7a); (g) when the version declares a start grade or a hold grade and speed, the drive
 * map at full pedal gives the torque they need within the motor, battery and dry-road tyres (docs/physics.md §9b).
 * Pure: the caller loads the data.
 */
import 'server-only'
import type { Acknowledgement, ReleaseConditions } from '@/db/schema'
import type { RevisionState } from '@/domain/revision-states'
import { STATE_LABELS } from '@/domain/revision-states'
import { limitsFromVehicle, MapError, toFixedTable, validate, type MapKind, type MapTable } from '@/maps'
import { surfaceLabel, type SurfaceId } from '@/physics/surfaces'
import { loadCaseLabel } from '@/physics/load-cases'
import { liftOffFindings } from '@/physics/battery'
import type { LoadCase, VehicleParams } from '@/physics/vehicle'
import { DEFAULT_DESIGN_LATERAL_ACCEL_MPS2 } from '@/physics/lateral-margin'
import { jackknifeExceptions, LOW_FRICTION, tractionExceptions } from '../review/gate'
import { checkRampsAgainstMaps, type RampLimits } from '@/maps/ramps'
import { declaresGrade, gradeChecks, gradeLine } from './grade'

/** Review states in which a revision has been approved by a lead (released and replaced ones were). */
export const APPROVED_STATES: readonly RevisionState[] = ['approved', 'released', 'retired']

export interface SetGatePart {
  kind: MapKind
  revisionId: number
  number: number
  mapName: string
  state: RevisionState
  table: MapTable
}

export interface SetTractionException {
  key: string
  /** 'traction': cells above the traction limit less the margin; 'jackknife': lift-off regen cells below the design lateral acceleration. */
  finding: 'traction' | 'jackknife'
  mapKind: MapKind
  revisionId: number
  surface: SurfaceId
  loadCase: LoadCase
  cells: { row: number; col: number; pedalPct: number; speedKmh: number; torqueNm: number; allowedNm: number }[]
}

export interface SetGateCondition {
  id: 'parts' | 'approved' | 'validation' | 'exportable' | 'ramps' | 'traction' | 'jackknife' | 'lift-off' | 'grade' | 'drive-report' | 'coverage' | 'replay' | 'safety'
  met: boolean
  summary: string
  details: string[]
}

/** One release condition (surface × load case) and the drive-report evidence for it. */
export interface CoverageCell {
  key: string
  surface: SurfaceId
  loadCase: LoadCase
  /** Drive reports on the set driven on this surface with this load case. */
  reports: number
  /** The lead's reason when no report covers it and it was waived; null otherwise. */
  waiver: string | null
}

export interface SetGateResult {
  ok: boolean
  conditions: SetGateCondition[]
  exceptions: SetTractionException[]
  /** Keys of exceptions without an acknowledgement. */
  unacknowledged: string[]
  /** Every release condition, in the order the parameter version declares them (surface-major). */
  coverage: CoverageCell[]
  /** Keys of coverage cells with no report and no waiver. */
  uncovered: string[]
}

export const exceptionKey = (kind: MapKind, surface: SurfaceId, loadCase: LoadCase, finding: SetTractionException['finding'] = 'traction') => `${finding}:${kind}:${surface}:${loadCase}`
export const coverageKey = (surface: SurfaceId, loadCase: LoadCase) => `coverage:${surface}:${loadCase}`

/** The coverage grid: reports per declared surface × load case, and the waivers (with a reason) of empty cells. */
export function setCoverage(c: ReleaseConditions, reports: readonly { surface: SurfaceId; loadCase: LoadCase }[], waivers: readonly Acknowledgement[]): CoverageCell[] {
  return c.surfaces.flatMap((surface) =>
    c.loadCases.map((loadCase) => {
      const key = coverageKey(surface, loadCase)
      const n = reports.filter((r) => r.surface === surface && r.loadCase === loadCase).length
      const w = n === 0 ? waivers.find((a) => a.key === key && a.reason.trim()) : undefined
      return { key, surface, loadCase, reports: n, waiver: w ? w.reason.trim() : null }
    }),
  )
}

export function setTractionExceptions(parts: SetGatePart[], vehicle: VehicleParams, c: ReleaseConditions): SetTractionException[] {
  return parts.flatMap((p) => [
    ...tractionExceptions(p.table, vehicle, c).map((e) => ({ key: exceptionKey(p.kind, e.surface, e.loadCase), finding: 'traction' as const, mapKind: p.kind, revisionId: p.revisionId, surface: e.surface, loadCase: e.loadCase, cells: e.cells })),
    ...jackknifeExceptions(p.table, vehicle, c).map((e) => ({ key: exceptionKey(p.kind, e.surface, e.loadCase, 'jackknife'), finding: 'jackknife' as const, mapKind: p.kind, revisionId: p.revisionId, surface: e.surface, loadCase: e.loadCase, cells: e.cells })),
  ])
}

export function setGate(input: {
  parts: SetGatePart[]
  vehicle: VehicleParams
  conditions: ReleaseConditions
  /** Reports filed on this set: the surface and load case each was driven with. */
  reports: readonly { surface: SurfaceId; loadCase: LoadCase }[]
  /** Open safety concerns on any revision of the set: report id and the set it was filed on. */
  concerns: { reportId: number; setNumber: number }[]
  acknowledgements: Acknowledgement[]
  /** The set's ramp limits, or null when it holds none. */
  ramps?: RampLimits | null
  /** The evidence logs replayed through the set, when the version declares a replay margin. */
  replay?: ReplayEvidence[] | null
}): SetGateResult {
  const { parts, vehicle, conditions } = input
  const kinds = new Set(parts.map((p) => p.kind))
  const partsMet = kinds.has('drive') && kinds.has('regen')
  const unapproved = parts.filter((p) => !APPROVED_STATES.includes(p.state))
  const limits = limitsFromVehicle(vehicle)
  const errors = parts.flatMap((p) => validate(p.table, limits).filter((f) => f.severity === 'error').map((f) => `${p.mapName} r${p.number}: ${f.message}`))
  // The package is built at release: a map the C header cannot hold exactly must stop the gate, not the build.
  const unexportable = parts.flatMap((p) => {
    try {
      toFixedTable(p.table)
      return []
    } catch (e) {
      if (e instanceof MapError) return [`${p.mapName} r${p.number}: ${e.message}`]
      throw e
    }
  })
  const exceptions = setTractionExceptions(parts, vehicle, conditions)
  const acked = new Set(input.acknowledgements.filter((a) => a.reason.trim()).map((a) => a.key))
  const unacknowledged = exceptions.filter((e) => !acked.has(e.key)).map((e) => e.key)
  const traction = exceptions.filter((e) => e.finding === 'traction')
  const tractionOpen = traction.filter((e) => !acked.has(e.key)).length
  const jackknife = exceptions.filter((e) => e.finding === 'jackknife')
  const jackknifeOpen = jackknife.filter((e) => !acked.has(e.key)).length
  const design = conditions.designLateralAccelMps2 ?? DEFAULT_DESIGN_LATERAL_ACCEL_MPS2
  const lowMu = conditions.surfaces.some((s) => LOW_FRICTION.includes(s))
  const bothLoads = conditions.loadCases.includes('empty') && conditions.loadCases.includes('laden')
  const declared = lowMu && bothLoads
  const cells = traction.reduce((n, e) => n + e.cells.length, 0)

  const liftOff = liftOffCondition(parts, vehicle, conditions)
  const grade = gradeCondition(parts, vehicle, conditions)
  const coverage = setCoverage(conditions, input.reports, input.acknowledgements)
  const uncovered = coverage.filter((c) => c.reports === 0 && c.waiver === null).map((c) => c.key)
  const waived = coverage.filter((c) => c.waiver !== null).length
  const nReports = input.reports.length

  const all: SetGateCondition[] = [
    {
      id: 'parts',
      met: partsMet,
      summary: partsMet ? 'The set holds a drive map and a regen map' : `The set holds no ${kinds.has('drive') ? 'regen' : 'drive'} map`,
      details: [],
    },
    {
      id: 'approved',
      met: unapproved.length === 0,
      summary:
        unapproved.length === 0
          ? 'Every map revision in the set is approved'
          : unapproved.length === 1
            ? `${unapproved[0].mapName} r${unapproved[0].number} is not approved (it is “${STATE_LABELS[unapproved[0].state]}”)`
            : `${unapproved.length} map revisions are not approved`,
      details: unapproved.map((p) => `${p.mapName} r${p.number} is “${STATE_LABELS[p.state]}”`),
    },
    {
      id: 'validation',
      met: errors.length === 0,
      summary: errors.length === 0 ? 'Validation finds no error in either map' : `Validation finds ${errors.length} error(s)`,
      details: errors.slice(0, 20),
    },
    {
      id: 'exportable',
      met: unexportable.length === 0,
      summary: unexportable.length === 0 ? 'Both maps export exactly to the C header' : `${unexportable.length} map(s) cannot be exported exactly`,
      details: unexportable,
    },
    rampCondition(input.ramps ?? null, parts),
    {
      id: 'traction',
      met: declared && tractionOpen === 0,
      summary: !declared
        ? 'The parameter version’s release conditions must include a low-friction surface and both the empty and laden load cases'
        : traction.length === 0
          ? `No cell above the traction limit less ${conditions.marginPct} % (${conditions.surfaces.length} surfaces × ${conditions.loadCases.length} load cases, both maps)`
          : `${cells} cell(s) above the traction limit less ${conditions.marginPct} %; ${tractionOpen} of ${traction.length} exception(s) not acknowledged`,
      details: traction.map((e) => `${e.mapKind} map, ${surfaceLabel(e.surface)}, ${loadCaseLabel(e.loadCase)}: ${e.cells.length} cell(s), first at ${e.cells[0].pedalPct} % / ${e.cells[0].speedKmh} km/h`),
    },
    {
      id: 'jackknife',
      met: jackknifeOpen === 0,
      summary: !vehicle.trailer
        ? 'No semitrailer: no jackknife check on lift-off regen'
        : jackknife.length === 0
          ? `Lift-off regen leaves the drive axle at least ${design} m/s² of lateral grip on every declared surface the axle holds it on free rolling (semitrailer cases)`
          : `Lift-off regen takes the drive axle below ${design} m/s² of lateral grip in ${jackknife.reduce((n, e) => n + e.cells.length, 0)} cell(s): a tractor can jackknife in a curve; ${jackknifeOpen} of ${jackknife.length} finding(s) not acknowledged`,
      details: jackknife.map((e) => `${surfaceLabel(e.surface)}, ${loadCaseLabel(e.loadCase)}: ${e.cells.length} lift-off cell(s) above ${Math.round(e.cells[0].allowedNm)} N·m regen, first at ${e.cells[0].speedKmh} km/h`),
    },
    ...(liftOff ? [liftOff] : []),
    ...(grade ? [grade] : []),
    {
      id: 'drive-report',
      met: nReports > 0,
      summary: nReports === 0 ? 'No drive report has been filed on this set' : `${nReports} drive report(s) on this set`,
      details: [],
    },
    {
      id: 'coverage',
      met: uncovered.length === 0,
      summary:
        uncovered.length === 0
          ? `Drive reports cover every release condition (${coverage.length})${waived ? `, ${waived} waived by the lead` : ''}`
          : `${uncovered.length} of ${coverage.length} release condition(s) have no drive report and no waiver`,
      details: coverage.filter((c) => uncovered.includes(c.key)).map((c) => `${surfaceLabel(c.surface)}, ${loadCaseLabel(c.loadCase)}: no drive report`),
    },
    ...(input.replay && conditions.replayMarginNm !== undefined ? [replayCondition(input.replay, conditions.replayMarginNm)] : []),
    {
      id: 'safety',
      met: input.concerns.length === 0,
      summary: input.concerns.length === 0 ? 'No open safety concern on any of its revisions' : `${input.concerns.length} open safety concern(s) on its revisions`,
      details: input.concerns.map((c) => `drive report ${c.reportId} (set ${c.setNumber})`),
    },
  ]
  return { ok: all.every((c) => c.met), conditions: all, exceptions, unacknowledged, coverage, uncovered }
}

const fmt = (x: number) => x.toFixed(2)

/**
 * The lift-off condition of a set, or null when the version declares no battery corners or no minimum
 * (older versions: the gate judges as before). Evaluated on the regen map over the declared load cases.
 */
export function liftOffCondition(parts: SetGatePart[], vehicle: VehicleParams, c: ReleaseConditions): SetGateCondition | null {
  const corners = c.batteryCorners ?? []
  if (!corners.length || c.minLiftOffDecelMps2 === undefined) return null
  const min = c.minLiftOffDecelMps2
  const findings = parts.filter((p) => p.kind === 'regen').flatMap((p) => liftOffFindings(vehicle, p.table, c.loadCases, corners, min).map((f) => ({ ...f, part: p })))
  return {
    id: 'lift-off',
    met: findings.length === 0,
    summary: findings.length === 0
      ? `Lift-off regen keeps at least ${fmt(min)} m/s² at every battery corner (${corners.map((k) => k.label).join(', ')}) wherever the nominal pack gives it`
      : `At ${new Set(findings.map((f) => f.corner.label)).size} battery corner(s) lift-off regen falls below ${fmt(min)} m/s²`,
    details: findings.map((f) => {
      const worst = f.points.reduce((a, b) => (b.cornerDecelMps2 < a.cornerDecelMps2 ? b : a))
      return `${f.part.mapName} r${f.part.number}, ${f.corner.label} (${f.corner.socPct} %, ${f.corner.temperatureC} °C), ${loadCaseLabel(f.loadCase)}: ${fmt(worst.cornerDecelMps2)} m/s² instead of ${fmt(worst.nominalDecelMps2)} at ${worst.speedKmh} km/h; ${f.points.length} speed(s) below`
    }),
  }
}

/**
 * The start-and-hold-on-grade condition, or null when the version declares no grade (older versions
 * judge as before). Laden, dry asphalt, drive map at full pedal (physics/gradeability.ts).
 */
export function gradeCondition(parts: SetGatePart[], vehicle: VehicleParams, c: ReleaseConditions): SetGateCondition | null {
  if (!declaresGrade(c)) return null
  const drive = parts.find((p) => p.kind === 'drive')
  if (!drive) return { id: 'grade', met: false, summary: 'The version asks for a start or hold on grade, but the set holds no drive map', details: [] }
  const checks = gradeChecks(vehicle, drive.table, c)
  const failed = checks.filter((k) => k.verdict !== 'met')
  const empty = failed.filter((k) => k.verdict === 'traction-short').length
  return {
    id: 'grade',
    met: failed.length === 0,
    summary: failed.length === 0
      ? `The drive map at full pedal starts and holds the laden truck on the declared grades (${checks.length} check(s))`
      : `${failed.length} of ${checks.length} grade requirement(s) not met${empty ? `; ${empty} beyond what the dry-road tyres carry: no single map can satisfy both` : ''}`,
    details: checks.map(gradeLine),
  }
}

/** The largest drive torque and regen torque the set's maps ask for, N·m. */
export function torqueRange(parts: Pick<SetGatePart, 'kind' | 'table'>[]): { driveMaxNm: number; regenMaxNm: number } {
  const max = (kind: MapKind) => Math.max(0, ...parts.filter((p) => p.kind === kind).flatMap((p) => p.table.values.flat().map(Math.abs)))
  return { driveMaxNm: max('drive'), regenMaxNm: max('regen') }
}

/** Ramp limits, when the set holds them, must fit its maps (the lash band inside their torque range). */
function rampCondition(ramps: RampLimits | null, parts: SetGatePart[]): SetGateCondition {
  if (!ramps) return { id: 'ramps', met: true, summary: 'The set holds no ramp limits: the controller keeps the ones it has', details: [] }
  const errors = checkRampsAgainstMaps(ramps, torqueRange(parts)).filter((f) => f.severity === 'error')
  return {
    id: 'ramps',
    met: errors.length === 0,
    summary: errors.length === 0 ? 'The ramp limits fit the maps' : `The ramp limits do not fit the maps (${errors.length} problem(s))`,
    details: errors.map((f) => f.message),
  }
}

/** One evidence log replayed through the set: the most its request exceeded what was driven, N·m, and when. */
export interface ReplayEvidence { reportId: number; setNumber: number; logId: number; fileName: string; worstExcessNm: number; worstAtS: number | null }

/** Replayed over the program's evidence logs, the set never asks for more than was driven by over the margin. */
function replayCondition(evidence: ReplayEvidence[], marginNm: number): SetGateCondition {
  const over = evidence.filter((e) => e.worstExcessNm > marginNm)
  return {
    id: 'replay',
    met: over.length === 0,
    summary:
      evidence.length === 0
        ? 'No analysed log on the program’s other sets to replay this set over'
        : over.length === 0
          ? `Replayed over ${evidence.length} evidence log(s), the set never asks for more than was driven by over ${marginNm} N·m`
          : `Replayed over the evidence, the set asks for more than was driven by over ${marginNm} N·m on ${over.length} of ${evidence.length} log(s)`,
    details: over.map((e) => `${e.fileName} (report ${e.reportId}, set ${e.setNumber}): up to ${Math.round(e.worstExcessNm)} N·m more${e.worstAtS !== null ? ` at ${e.worstAtS.toFixed(1)} s` : ''}`),
  }
}
