/**
 * Physics overlay of a whole map for plotting and cell shading: the motor-shaft torque the drive
 * axle can transmit at each speed breakpoint, and per cell the predicted slip ratio, whether the
 * cell is beyond the tyre's peak (wheel spin for drive torque, lock-up for regen) and how much of
 * the available grip it uses. Built from {@link slipGrid} and {@link tractionLimitTorqueBySpeed}
 * so the overlay and the cell slip view can never disagree.
 */
import { resolveSurface, type CellContext } from './cell-slip'
import { slipGrid, tractionLimitTorqueBySpeed, type TorqueLimitPoint } from './slip-grid'
import type { MapKind, MapTable } from './table'
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
}

/**
 * Builds the overlay of a map. Throws PhysicsInputError for a bad vehicle, load case or map.
 * @example mapOverlay({ vehicle: truck, loadCase: 'empty', surface: 'ice', map: driveMap }).spinCount
 */
export function mapOverlay(args: CellContext & { map: MapTable }): MapOverlay {
  const { map, ...ctx } = args
  const cells = slipGrid({ ...ctx, ...map })
  const spin = cells.map((row) => row.map((c) => c.spin || c.lock))
  const pk = peakSlip(resolveSurface(ctx.surface).coeffs)
  return {
    kind: map.kind,
    tractionLimitBySpeed: tractionLimitTorqueBySpeed({ ...ctx, colAxis: map.colAxis, kind: map.kind }),
    slip: cells.map((row) => row.map((c) => c.slip)),
    spin,
    utilisation: cells.map((row) => row.map((c) => c.utilisation)),
    spinCount: spin.reduce((n, row) => n + row.filter(Boolean).length, 0),
    tyrePeakSlip: Number.isFinite(pk) ? pk : null,
  }
}
