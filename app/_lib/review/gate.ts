/**
 * The release gate: a revision goes to the vehicles only when (a) validation finds no error,
 * (b) no cell asks for more than the traction limit less the program's margin in any declared
 * release condition — or the lead acknowledges each exception with a reason — and (c) at least one
 * drive report was filed against this exact revision and none of its reports has an open safety
 * concern. Pure: the caller loads the data.
 */
import 'server-only'
import type { Acknowledgement, ReleaseConditions } from '@/db/schema'
import type { SafetyState } from '@/domain/report-safety'
import { limitsFromVehicle, validate, type MapTable } from '@/maps'
import { slipGrid, SURFACE_IDS, SURFACES, type SurfaceId } from '@/physics'
import type { LoadCase, VehicleParams } from '@/physics/vehicle'

export interface TractionException {
  key: string
  surface: SurfaceId
  loadCase: LoadCase
  cells: { row: number; col: number; pedalPct: number; speedKmh: number; torqueNm: number; allowedNm: number }[]
}

export interface GateCondition {
  id: 'validation' | 'traction' | 'drive-report'
  met: boolean
  summary: string
  details: string[]
}

export interface GateResult {
  ok: boolean
  conditions: GateCondition[]
  exceptions: TractionException[]
  /** Exceptions without an acknowledgement. */
  unacknowledged: string[]
}

/** Low-friction surfaces (peak μ below 0.6): the gate insists on at least one of them. */
export const LOW_FRICTION = SURFACE_IDS.filter((id) => SURFACES[id].peakMu < 0.6)

export function tractionExceptions(table: MapTable, vehicle: VehicleParams, c: ReleaseConditions): TractionException[] {
  const out: TractionException[] = []
  for (const surface of c.surfaces) {
    for (const loadCase of c.loadCases) {
      const grid = slipGrid({ vehicle, loadCase, surface, gradeRad: 0, ...table })
      const cells: TractionException['cells'] = []
      grid.forEach((row, r) =>
        row.forEach((cell, col) => {
          const allowed = Math.abs(cell.motorTorqueAtLimitNm) * (1 - c.marginPct / 100)
          const torque = Math.abs(cell.deliveredTorqueNm)
          if (torque > allowed + 1e-9) cells.push({ row: r, col, pedalPct: table.rowAxis[r], speedKmh: table.colAxis[col], torqueNm: torque, allowedNm: allowed })
        }),
      )
      if (cells.length) out.push({ key: `traction:${surface}:${loadCase}`, surface, loadCase, cells })
    }
  }
  return out
}

export function releaseGate(input: {
  table: MapTable
  vehicle: VehicleParams
  conditions: ReleaseConditions
  reports: { safety: SafetyState }[]
  acknowledgements: Acknowledgement[]
}): GateResult {
  const { table, vehicle, conditions } = input
  const errors = validate(table, limitsFromVehicle(vehicle)).filter((f) => f.severity === 'error')
  const exceptions = tractionExceptions(table, vehicle, conditions)
  const acked = new Set(input.acknowledgements.filter((a) => a.reason.trim()).map((a) => a.key))
  const unacknowledged = exceptions.filter((e) => !acked.has(e.key)).map((e) => e.key)
  const lowMu = conditions.surfaces.some((s) => LOW_FRICTION.includes(s))
  const bothLoads = conditions.loadCases.includes('empty') && conditions.loadCases.includes('laden')
  const declared = lowMu && bothLoads
  const open = input.reports.filter((r) => r.safety === 'open').length

  const validation: GateCondition = {
    id: 'validation',
    met: errors.length === 0,
    summary: errors.length === 0 ? 'Validation finds no error' : `Validation finds ${errors.length} error(s)`,
    details: errors.slice(0, 20).map((e) => e.message),
  }
  const traction: GateCondition = {
    id: 'traction',
    met: declared && unacknowledged.length === 0,
    summary: !declared
      ? 'The program’s release conditions must include a low-friction surface and both the empty and laden load cases'
      : exceptions.length === 0
        ? `No cell above the traction limit less ${conditions.marginPct} % (${conditions.surfaces.length} surfaces × ${conditions.loadCases.length} load cases)`
        : `${exceptions.reduce((n, e) => n + e.cells.length, 0)} cell(s) above the traction limit less ${conditions.marginPct} %; ${unacknowledged.length} of ${exceptions.length} condition(s) not acknowledged`,
    details: exceptions.map((e) => `${e.surface}, ${e.loadCase}: ${e.cells.length} cell(s), worst at ${e.cells[0].pedalPct} % / ${e.cells[0].speedKmh} km/h`),
  }
  const report: GateCondition = {
    id: 'drive-report',
    met: input.reports.length > 0 && open === 0,
    summary: input.reports.length === 0 ? 'No drive report has been filed against this revision' : open > 0 ? `${open} drive report(s) with an open safety concern` : `${input.reports.length} drive report(s), no open safety concern`,
    details: [],
  }
  const all = [validation, traction, report]
  return { ok: all.every((c) => c.met), conditions: all, exceptions, unacknowledged }
}
