/**
 * The traction part of the release gate for one map: the cells that ask for more than the
 * traction limit less the margin, per surface × load case. The set gate (app/_lib/sets/gate.ts)
 * runs it for each map of a set. Pure: the caller loads the data.
 */
import 'server-only'
import type { ReleaseConditions } from '@/db/schema'
import type { MapTable } from '@/maps'
import { DEFAULT_DESIGN_LATERAL_ACCEL_MPS2, hasTrailer, lateralMargin, slipGrid, SURFACE_IDS, SURFACES, type SurfaceId } from '@/physics'
import type { LoadCase, VehicleParams } from '@/physics/vehicle'

export interface TractionException {
  key: string
  surface: SurfaceId
  loadCase: LoadCase
  cells: { row: number; col: number; pedalPct: number; speedKmh: number; torqueNm: number; allowedNm: number }[]
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

/**
 * The jackknife finding of a regen map on a tractor: per surface × semitrailer load case, the cells of
 * the lift-off row (the first row, brake pedal released) whose regen takes the drive axle's remaining
 * lateral capacity (friction ellipse) below the design lateral acceleration that the free-rolling axle
 * holds. `allowedNm` is the regen torque at which the capacity just equals the design value. A surface
 * that cannot hold the design value even free rolling is left out: the map cannot help there.
 */
export function jackknifeExceptions(table: MapTable, vehicle: VehicleParams, c: ReleaseConditions): TractionException[] {
  if (table.kind !== 'regen' || !vehicle.trailer) return []
  const design = c.designLateralAccelMps2 ?? DEFAULT_DESIGN_LATERAL_ACCEL_MPS2
  const out: TractionException[] = []
  for (const surface of c.surfaces) {
    for (const loadCase of c.loadCases.filter(hasTrailer)) {
      const margin = lateralMargin({ vehicle, loadCase, surface, gradeRad: 0 }, 'regen', design)
      if (margin.torqueAtDesignNm === null) continue
      const allowed = margin.torqueAtDesignNm
      const grid = slipGrid({ vehicle, loadCase, surface, gradeRad: 0, ...table })
      const cells: TractionException['cells'] = []
      grid[0].forEach((cell, col) => {
        if (cell.lateralCapacityMps2 < design) cells.push({ row: 0, col, pedalPct: table.rowAxis[0], speedKmh: table.colAxis[col], torqueNm: Math.abs(cell.deliveredTorqueNm), allowedNm: allowed })
      })
      if (cells.length) out.push({ key: `jackknife:${surface}:${loadCase}`, surface, loadCase, cells })
    }
  }
  return out
}
