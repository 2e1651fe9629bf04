/**
 * Physics overlay of a whole map for plotting and cell shading: the motor-shaft torque the drive
 * axle can transmit at each speed breakpoint, and per cell the predicted slip ratio, whether the
 * cell is beyond the tyre's peak (wheel spin for drive torque, lock-up for regen) and how much of
 * the available grip it uses, and the lateral acceleration the drive axle can still hold in a curve
 * (friction ellipse) against the program's design lateral acceleration. Built from {@link slipGrid} and
 * {@link tractionLimitTorqueBySpeed} so the overlay and the cell slip view can never disagree.
 */
import type { CellContext } from './cell-slip'
import { driveCurveFor } from './drive-curve'
import { DEFAULT_DESIGN_LATERAL_ACCEL_MPS2, lateralMargin } from './lateral-margin'
import { axleLoadsFor } from './load-case'
import { hasTrailer } from './load-cases'
import { slipGrid, tractionLimitTorqueBySpeed, type TorqueLimitPoint } from './slip-grid'
import type { MapKind, MapTable } from './table'
import { gradeCos } from './traction'
import { peakSlip } from './tyre'

/** Everything a plot of one map on one surface and load case needs (row = pedal, column = speed). */
export interface MapOverlay {
  kind: MapKind
  /** Per speed breakpoint: traction (or lock-up) torque limit, envelope limit and the smaller of the two, N·m magnitudes. */
  tractionLimitBySpeed: TorqueLimitPoint[]
  /** Predicted slip ratio per cell, null when beyond the peak (no steady slip exists there). */
  slip: (number | null)[][]
  /** True where the cell is beyond the tyre's peak: spin for drive torque, lock-up for braking torque. */
  spin: boolean[][]
  /** |wheel force| / limit per cell; above 1 means beyond the peak. */
  utilisation: number[][]
  /** Number of cells beyond the peak. */
  spinCount: number
  /** Slip at the tyre curve's peak for the surface; null for a curve without an interior peak. */
  tyrePeakSlip: number | null
  /** Largest steady lateral acceleration the drive axle can still hold per cell, m/s² (friction ellipse). */
  lateralCapacityMps2: number[][]
  /** The design lateral acceleration judged against, m/s². */
  designLateralAccelMps2: number
  /** Lateral acceleration the drive axle holds free rolling on this surface, m/s². */
  freeRollingLateralMps2: number
  /** True where the cell's torque takes the lateral capacity below the design value the free-rolling axle holds. */
  lateralShort: boolean[][]
  lateralShortCount: number
  /**
   * Regen map on a load case with a semitrailer: cells of the lift-off row (the first, lowest brake-pedal
   * row) that are lateral-short — the drive axle would slide out in the design curve under lift-off regen,
   * how a tractor jackknife starts. Null when not applicable (drive map, or no trailer).
   */
  liftOffJackknifeCells: number | null
}

/**
 * Builds the overlay of a map. Throws PhysicsInputError for a bad vehicle, load case or map.
 * @example mapOverlay({ vehicle: truck, loadCase: 'empty', surface: 'ice', map: driveMap }).spinCount
 */
export function mapOverlay(args: CellContext & { map: MapTable; designLateralAccelMps2?: number }): MapOverlay {
  const { map, designLateralAccelMps2: design = DEFAULT_DESIGN_LATERAL_ACCEL_MPS2, ...ctx } = args
  const cells = slipGrid({ ...ctx, ...map })
  const spin = cells.map((row) => row.map((c) => c.spin || c.lock))
  const cosG = gradeCos(ctx.gradeRad ?? 0)
  const pk = peakSlip(driveCurveFor(ctx.vehicle, axleLoadsFor(ctx.vehicle, ctx.loadCase).model, ctx.surface, cosG))
  const margin = lateralMargin(ctx, map.kind, design)
  const lateralShort = cells.map((row) => row.map((c) => !margin.surfaceShort && c.lateralCapacityMps2 < design))
  const jackknife = map.kind === 'regen' && hasTrailer(ctx.loadCase) ? lateralShort[0].filter(Boolean).length : null
  return {
    kind: map.kind,
    tractionLimitBySpeed: tractionLimitTorqueBySpeed({ ...ctx, colAxis: map.colAxis, kind: map.kind }),
    slip: cells.map((row) => row.map((c) => c.slip)),
    spin,
    utilisation: cells.map((row) => row.map((c) => c.utilisation)),
    spinCount: spin.reduce((n, row) => n + row.filter(Boolean).length, 0),
    tyrePeakSlip: Number.isFinite(pk) ? pk : null,
    lateralCapacityMps2: cells.map((row) => row.map((c) => c.lateralCapacityMps2)),
    designLateralAccelMps2: design,
    freeRollingLateralMps2: margin.freeRollingMps2,
    lateralShort,
    lateralShortCount: lateralShort.reduce((n, row) => n + row.filter(Boolean).length, 0),
    liftOffJackknifeCells: jackknife,
  }
}
