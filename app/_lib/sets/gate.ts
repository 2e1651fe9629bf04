/**
 * The release gate of a set: it goes to the vehicles only when (a) it holds a drive and a regen
 * map, each revision approved; (b) validation finds no error in either map under the set's
 * parameter version; (c) no cell of either map asks for more than the traction limit less the
 * version's margin in any of its release conditions — or the lead acknowledges each exception
 * (map × surface × load case) with a reason; (c′) both maps export exactly to the C header; (d) at least one drive report was filed on this
 * exact set; (d′) the set's drive reports together cover every release condition (surface × load case), or the
 * lead waives each uncovered one with a reason; (e) no open safety concern sits on any of its revisions, whichever set it was
 * found in. Pure: the caller loads the data.
 */
import 'server-only'
import type { Acknowledgement, ReleaseConditions } from '@/db/schema'
import type { RevisionState } from '@/domain/revision-states'
import { STATE_LABELS } from '@/domain/revision-states'
import { limitsFromVehicle, MapError, toFixedTable, validate, type MapKind, type MapTable } from '@/maps'
import { surfaceLabel, type SurfaceId } from '@/physics/surfaces'
import { loadCaseLabel } from '@/physics/load-cases'
import type { LoadCase, VehicleParams } from '@/physics/vehicle'
import { LOW_FRICTION, tractionExceptions } from '../review/gate'

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
  mapKind: MapKind
  revisionId: number
  surface: SurfaceId
  loadCase: LoadCase
  cells: { row: number; col: number; pedalPct: number; speedKmh: number; torqueNm: number; allowedNm: number }[]
}

export interface SetGateCondition {
  id: 'parts' | 'approved' | 'validation' | 'exportable' | 'traction' | 'drive-report' | 'coverage' | 'safety'
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

export const exceptionKey = (kind: MapKind, surface: SurfaceId, loadCase: LoadCase) => `traction:${kind}:${surface}:${loadCase}`
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
  return parts.flatMap((p) =>
    tractionExceptions(p.table, vehicle, c).map((e) => ({ key: exceptionKey(p.kind, e.surface, e.loadCase), mapKind: p.kind, revisionId: p.revisionId, surface: e.surface, loadCase: e.loadCase, cells: e.cells })),
  )
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
  const lowMu = conditions.surfaces.some((s) => LOW_FRICTION.includes(s))
  const bothLoads = conditions.loadCases.includes('empty') && conditions.loadCases.includes('laden')
  const declared = lowMu && bothLoads
  const cells = exceptions.reduce((n, e) => n + e.cells.length, 0)
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
    {
      id: 'traction',
      met: declared && unacknowledged.length === 0,
      summary: !declared
        ? 'The parameter version’s release conditions must include a low-friction surface and both the empty and laden load cases'
        : exceptions.length === 0
          ? `No cell above the traction limit less ${conditions.marginPct} % (${conditions.surfaces.length} surfaces × ${conditions.loadCases.length} load cases, both maps)`
          : `${cells} cell(s) above the traction limit less ${conditions.marginPct} %; ${unacknowledged.length} of ${exceptions.length} exception(s) not acknowledged`,
      details: exceptions.map((e) => `${e.mapKind} map, ${surfaceLabel(e.surface)}, ${loadCaseLabel(e.loadCase)}: ${e.cells.length} cell(s), first at ${e.cells[0].pedalPct} % / ${e.cells[0].speedKmh} km/h`),
    },
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
    {
      id: 'safety',
      met: input.concerns.length === 0,
      summary: input.concerns.length === 0 ? 'No open safety concern on any of its revisions' : `${input.concerns.length} open safety concern(s) on its revisions`,
      details: input.concerns.map((c) => `drive report ${c.reportId} (set ${c.setNumber})`),
    },
  ]
  return { ok: all.every((c) => c.met), conditions: all, exceptions, unacknowledged, coverage, uncovered }
}
