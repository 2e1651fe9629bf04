/** One changed leaf between two JSON values: its path (a.b[2].c), the value before and after. */
export interface JsonChange {
  path: string
  from: unknown
  to: unknown
}

const isObject = (v: unknown): v is Record<string, unknown> => typeof v === 'object' && v !== null && !Array.isArray(v)

/**
 * Field-by-field differences between two plain JSON values (objects, arrays, scalars), for the
 * audit trail and the version diff: a leaf that differs, appears or disappears is one change.
 * Arrays of scalars of different length count as one change of the whole array.
 * @example jsonChanges({ a: 1, b: [1, 2] }, { a: 2, b: [1, 2] }) // [{ path: 'a', from: 1, to: 2 }]
 */
export function jsonChanges(before: unknown, after: unknown, path = ''): JsonChange[] {
  if (isObject(before) && isObject(after)) {
    const keys = [...new Set([...Object.keys(before), ...Object.keys(after)])].sort()
    return keys.flatMap((k) => jsonChanges(before[k], after[k], path ? `${path}.${k}` : k))
  }
  if (Array.isArray(before) && Array.isArray(after) && before.length === after.length)
    return before.flatMap((v, i) => jsonChanges(v, after[i], `${path}[${i}]`))
  if (JSON.stringify(before) === JSON.stringify(after)) return []
  return [{ path, from: before ?? null, to: after ?? null }]
}
