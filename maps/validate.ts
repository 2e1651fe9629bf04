/**
 * Map validation: structural rules always, vehicle rules when limits are given.
 */
import type { Finding } from './findings'
import type { MapLimits } from './limits'
import type { MapTable } from './table'
import { checkLimits } from './validate-limits'
import { checkStructure } from './validate-structure'
import { checkValues } from './validate-values'

/**
 * All findings for a table, errors first, then in row/column order (stable for the UI).
 * Without `limits` only the rules that need no vehicle run (see VALIDATION_RULES).
 * Never throws for a malformed table: malformed input is what it reports.
 * @example validate(table, limitsFromVehicle(vehicle)).filter((f) => f.severity === 'error')
 */
export function validate(table: MapTable, limits?: MapLimits): Finding[] {
  const { findings, cellsUsable } = checkStructure(table)
  if (cellsUsable) {
    findings.push(...checkValues(table))
    if (limits) findings.push(...checkLimits(table, limits))
  }
  const rank = (f: Finding) => (f.severity === 'error' ? 0 : 1)
  return findings
    .map((f, i) => ({ f, i }))
    .sort((x, y) => rank(x.f) - rank(y.f) || x.i - y.i)
    .map(({ f }) => f)
}

/** True when validate finds no error (warnings allowed). */
export function isValid(table: MapTable, limits?: MapLimits): boolean {
  return validate(table, limits).every((f) => f.severity !== 'error')
}
