/**
 * Pull a map inside what the vehicle can do, cell by cell.
 */
import { chargeLimitTorqueAt, motorEnvelopeAt } from './envelope'
import type { MapLimits } from './limits'
import { cloneTable, type MapTable } from './table'

/**
 * Copy of `table` with every cell inside the limits validate checks as errors:
 * - drive: −envelope ≤ T ≤ envelope, and a negative (braking) value also ≥ −charge limit;
 * - regen: 0 ≤ T ≤ min(envelope, charge limit).
 * Non-finite cells are left as they are (validate reports them; guessing a value would hide it).
 * Only breakpoint cells are clamped: between speed breakpoints the interpolated line may still
 * cross the curved power limit ('envelope-between' warns; insert a speed breakpoint there).
 * @example clampToEnvelope(t, limits).values[r][c] <= motorEnvelopeAt(limits, t.colAxis[c]) // true
 */
export function clampToEnvelope(table: MapTable, limits: MapLimits): MapTable {
  const out = cloneTable(table)
  out.values.forEach((row, r) =>
    row.forEach((v, c) => {
      if (!Number.isFinite(v)) return
      const speed = table.colAxis[c]
      const env = motorEnvelopeAt(limits, speed)
      const brake = Math.min(env, chargeLimitTorqueAt(limits, speed))
      const lo = table.kind === 'regen' ? 0 : -brake
      const hi = table.kind === 'regen' ? brake : env
      out.values[r][c] = Math.min(hi, Math.max(lo, v))
    }),
  )
  return out
}
