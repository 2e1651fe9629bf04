/**
 * Rules on the values alone, needing no vehicle: pedal monotonicity and regen sign.
 * Non-finite cells are skipped (they already carry a 'not-finite' finding).
 */
import type { Finding } from './findings'
import { cellLabel, humanNumber } from './number-format'
import type { MapTable } from './table'

/**
 * A drive map that falls as the pedal rises makes the truck slow down when the driver asks for
 * more — an error. In a regen map a fall with more brake pedal is odd but may be deliberate
 * hand-over to the friction brakes, so it is only a warning.
 * @example checkValues(table).filter((f) => f.rule === 'pedal-monotonic')
 */
export function checkValues(table: MapTable): Finding[] {
  const out: Finding[] = []
  const { kind, rowAxis, colAxis, values } = table
  const at = (r: number, c: number) => cellLabel(kind, rowAxis[r], colAxis[c])
  const pedalWord = kind === 'regen' ? 'brake pedal' : 'pedal'
  for (let c = 0; c < colAxis.length; c++) {
    for (let r = 1; r < rowAxis.length; r++) {
      const below = values[r - 1][c]
      const here = values[r][c]
      if (!Number.isFinite(below) || !Number.isFinite(here) || here >= below) continue
      out.push({
        severity: kind === 'drive' ? 'error' : 'warning',
        rule: 'pedal-monotonic',
        row: r,
        col: c,
        message: `${at(r, c)}: ${humanNumber(here)} N·m is less than ${humanNumber(below)} N·m at ${humanNumber(rowAxis[r - 1])} % ${pedalWord}` +
          (kind === 'drive' ? ' — a drive map must not fall as the pedal rises' : ' — regen falls as the brake pedal rises'),
      })
    }
  }
  if (kind === 'regen')
    values.forEach((row, r) =>
      row.forEach((v, c) => {
        if (Number.isFinite(v) && v < 0)
          out.push({ severity: 'error', rule: 'regen-negative', row: r, col: c, message: `${at(r, c)}: regen braking torque ${humanNumber(v)} N·m is negative; regen values must be ≥ 0` })
      }),
    )
  return out
}
