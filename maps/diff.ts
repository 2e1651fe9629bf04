/**
 * Cell-by-cell comparison of two revisions of a map, for the review screen.
 */
import { lookup } from './lookup'
import { sameAxes, type MapTable } from './table'

export interface CellChange {
  row: number
  col: number
  pedalPct: number
  speedKmh: number
  /** Value in `a`, N·m. */
  before: number
  /** Value in `b` (resampled onto a's breakpoints when the axes differ), N·m. */
  after: number
  /** after − before, N·m. */
  delta: number
  /** delta ÷ |before|; null when before is 0 (a relative change from nothing is undefined). */
  relative: number | null
}

export interface MapDiff {
  /** True when the breakpoints differ; b was then resampled onto a's breakpoints with lookup. */
  axesDiffer: boolean
  kindDiffers: boolean
  /** Cells whose value changed by more than the tolerance, largest |delta| first. */
  changed: CellChange[]
  /** Cells compared (a's grid). */
  cellCount: number
  /** Change with the largest |delta|, null when nothing changed. */
  largestAbsolute: CellChange | null
  /** Change with the largest |relative| (cells with before = 0 excluded), null if none. */
  largestRelative: CellChange | null
}

/**
 * Compare `b` against `a` on a's grid. When the axes differ, b is evaluated at each of a's
 * breakpoints with lookup (so features of b between a's breakpoints are not seen — compare
 * the other way round, or after insertBreakpoint, to see them). `toleranceNm` ignores tiny
 * changes such as resampling round-off; default 0 (any change counts).
 * @example diff(a, scaleBy(a, sel, 10)).largestRelative?.relative // ≈ 0.1
 */
export function diff(a: MapTable, b: MapTable, toleranceNm = 0): MapDiff {
  const axesDiffer = !sameAxes(a, b)
  const changed: CellChange[] = []
  a.rowAxis.forEach((pedalPct, row) =>
    a.colAxis.forEach((speedKmh, col) => {
      const before = a.values[row][col]
      const after = axesDiffer ? lookup(b, pedalPct, speedKmh) : b.values[row][col]
      const delta = after - before
      // NaN compares false everywhere; count a cell that became or stopped being NaN as changed.
      const nanChange = Number.isNaN(before) !== Number.isNaN(after)
      if (!(Math.abs(delta) > toleranceNm) && !nanChange) return
      changed.push({ row, col, pedalPct, speedKmh, before, after, delta, relative: before !== 0 && Number.isFinite(delta) ? delta / Math.abs(before) : null })
    }),
  )
  // A NaN delta (a cell that became NaN) sorts first: it is the change most worth seeing.
  const size = (ch: CellChange) => (Number.isNaN(ch.delta) ? Infinity : Math.abs(ch.delta))
  changed.sort((x, y) => size(y) - size(x) || x.row - y.row || x.col - y.col)
  let largestRelative: CellChange | null = null
  for (const ch of changed)
    if (ch.relative !== null && (!largestRelative || Math.abs(ch.relative) > Math.abs(largestRelative.relative ?? 0))) largestRelative = ch
  return {
    axesDiffer,
    kindDiffers: a.kind !== b.kind,
    changed,
    cellCount: a.rowAxis.length * a.colAxis.length,
    largestAbsolute: changed[0] ?? null,
    largestRelative,
  }
}
