/**
 * A traction-safe draft of a map: every cell above the traction limit of its speed column is
 * lowered to that limit less a margin. The draft is a proposal only; an engineer reviews and saves it.
 *
 * Why a top-down running minimum for drive maps: within one speed column the ceiling is the same
 * for every pedal row, so capping a column that already rises with the pedal keeps it rising. A
 * column that fell somewhere (an invalid drive map) is repaired by walking from 100 % pedal down
 * and lowering any cell above the one above it. That only ever removes torque, never adds it, so
 * the result stays under the ceiling wherever the input was above it and no cell gains torque.
 * Regen maps are only capped: a fall with brake pedal may be a deliberate hand-over to the
 * friction brakes (see docs/map-formats.md, rule pedal-monotonic).
 */
import { PhysicsInputError, requireFinite } from './errors'
import type { MapTable } from './table'

/** One changed cell of a proposal. */
export interface ProposedChange {
  row: number
  col: number
  before: number
  after: number
  /** 'limit': lowered to the traction ceiling; 'pedal-order': lowered to keep the column rising with the pedal. */
  reason: 'limit' | 'pedal-order'
}

export interface Proposal {
  table: MapTable
  /** The ceiling per speed column, N·m: limit × (1 − margin/100), rounded down to a whole N·m. */
  ceilingByCol: number[]
  changes: ProposedChange[]
}

/**
 * Proposes a draft. `limitByCol[c]` is the traction torque limit (N·m magnitude at the motor shaft)
 * for speed column c; `marginPct` in [0, 100). Does not mutate its inputs.
 * @example proposeTractionSafe(map, [1500, 1500, 1500], 10).changes.length
 */
export function proposeTractionSafe(map: MapTable, limitByCol: readonly number[], marginPct: number): Proposal {
  requireFinite('marginPct', marginPct)
  if (marginPct < 0 || marginPct >= 100) throw new PhysicsInputError('marginPct', 'must be at least 0 and below 100')
  if (limitByCol.length !== map.colAxis.length) throw new PhysicsInputError('limitByCol', `needs ${map.colAxis.length} values, one per speed breakpoint`)
  limitByCol.forEach((l, c) => { if (!(Number.isFinite(l) && l >= 0)) throw new PhysicsInputError(`limitByCol[${c}]`, 'must be a finite number ≥ 0') })
  // Whole N·m, rounded down, so the draft reads cleanly in the grid and still sits under the ceiling.
  const ceilingByCol = limitByCol.map((l) => Math.floor(l * (1 - marginPct / 100)))
  const values = map.values.map((row) => row.map((v, c) => Math.min(v, ceilingByCol[c])))
  const reasons = map.values.map((row) => row.map((v, c): ProposedChange['reason'] | null => (v > ceilingByCol[c] ? 'limit' : null)))
  if (map.kind === 'drive')
    for (let c = 0; c < map.colAxis.length; c++)
      for (let r = values.length - 2; r >= 0; r--)
        if (values[r][c] > values[r + 1][c]) { values[r][c] = values[r + 1][c]; reasons[r][c] ??= 'pedal-order' }
  const changes: ProposedChange[] = []
  values.forEach((row, r) => row.forEach((after, c) => {
    const before = map.values[r][c]
    const reason = reasons[r][c]
    if (after !== before && reason) changes.push({ row: r, col: c, before, after, reason })
  }))
  changes.sort((x, y) => Math.abs(y.after - y.before) - Math.abs(x.after - x.before) || x.row - y.row || x.col - y.col)
  return { table: { kind: map.kind, rowAxis: [...map.rowAxis], colAxis: [...map.colAxis], values }, ceilingByCol, changes }
}
