/**
 * Rules on the values alone, needing no vehicle: pedal monotonicity and regen sign.
 * Non-finite cells are skipped (they already carry a 'not-finite' finding).
 */
import { cellLabel, nm, pedalWord, sentence } from './finding-text'
import { cellWhere, finding, type Finding } from './findings'
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
  for (let c = 0; c < colAxis.length; c++) {
    for (let r = 1; r < rowAxis.length; r++) {
      const below = values[r - 1][c]
      const here = values[r][c]
      if (!Number.isFinite(below) || !Number.isFinite(here) || here >= below) continue
      const why = kind === 'drive' ? ' — a drive map must not fall as the pedal rises' : ' — regen falls as the brake pedal rises'
      out.push(finding({
        severity: kind === 'drive' ? 'error' : 'warning',
        rule: 'pedal-monotonic',
        ...cellWhere(table, r, c),
        valueNm: here,
        limitNm: below,
        parts: sentence`${at(r, c)}: ${nm(here)} is less than ${nm(below)} at ${rowAxis[r - 1]} % ${pedalWord(kind)}${why}`,
      }))
    }
  }
  if (kind === 'regen')
    values.forEach((row, r) =>
      row.forEach((v, c) => {
        if (Number.isFinite(v) && v < 0)
          out.push(finding({ severity: 'error', rule: 'regen-negative', ...cellWhere(table, r, c), valueNm: v, limitNm: 0, parts: sentence`${at(r, c)}: regen braking torque ${nm(v)} is negative; regen values must be ≥ 0` }))
      }),
    )
  return out
}
