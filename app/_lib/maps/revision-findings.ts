import { limitsFromVehicle, validate, type Finding, type MapTable } from '@/maps'
import type { VehicleParams } from '@/physics/vehicle'
import { tableMemo } from './table-memo'

/** A few parameter sets per table: a program gains a parameter version now and then, not per request. */
const memo = tableMemo<Finding[]>(4)
const jsonMemo = tableMemo<string>(4)

/** What the findings depend on besides the table: the limits the parameters give, and their key. */
function limitsOf(params: VehicleParams) {
  const limits = limitsFromVehicle(params)
  return { limits, key: JSON.stringify(limits) }
}

/**
 * Findings of a stored revision under a program's parameters. Both are immutable once stored (a
 * save makes a new revision, a parameter change a new version), so the result is memoised beside
 * the cached table, keyed by the limits the parameters give.
 */
export function revisionFindings(table: MapTable, params: VehicleParams): Finding[] {
  const { limits, key } = limitsOf(params)
  return memo(table, key, () => validate(table, limits))
}

/** The same findings as JSON text, memoised the same way (a map read splices it into its answer). */
export function revisionFindingsJson(table: MapTable, params: VehicleParams): string {
  const { limits, key } = limitsOf(params)
  return jsonMemo(table, key, () => JSON.stringify(memo(table, key, () => validate(table, limits))))
}
