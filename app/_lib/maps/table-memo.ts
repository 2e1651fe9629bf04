import type { MapTable } from '@/maps'

/**
 * Results computed from a stored revision's table (findings, physics overlays) kept beside the
 * table object. The revision-table cache hands out one frozen object per revision, so a result
 * lives exactly as long as its table stays cached and needs no size of its own beyond
 * `maxPerTable` keys (parameter sets and overlay choices) per table. Only pure functions of the
 * table and the key may be memoised.
 */
export function tableMemo<T>(maxPerTable: number) {
  const byTable = new WeakMap<MapTable, Map<string, T>>()
  return (table: MapTable, key: string, compute: () => T): T => {
    let perKey = byTable.get(table)
    const hit = perKey?.get(key)
    if (hit !== undefined) return hit
    const value = compute()
    if (!perKey) byTable.set(table, (perKey = new Map()))
    if (perKey.size >= maxPerTable) perKey.delete(perKey.keys().next().value as string)
    perKey.set(key, value)
    return value
  }
}
