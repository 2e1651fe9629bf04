/**
 * The canonical text of a map's content, from which the server computes the revision checksum
 * (db/checksum.ts, SHA-256), so two revisions, a file and a flashed header can be matched
 * without comparing tables cell by cell.
 */
import { MapInputError } from './errors'
import type { MapTable } from './table'

/**
 * Canonical JSON: keys in the fixed order kind, rowAxis, colAxis, values; no whitespace;
 * numbers as shortest round-trip decimal (ECMAScript String(n), so −0 becomes 0, and
 * 1e21 stays "1e+21"). Throws for a non-finite number, which has no JSON form.
 * @example canonicalJson({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 50], values: [[0, 0], [1500, 900.5]] })
 *          // '{"kind":"drive","rowAxis":[0,100],"colAxis":[0,50],"values":[[0,0],[1500,900.5]]}'
 */
export function canonicalJson(table: MapTable): string {
  const num = (n: number) => {
    if (!Number.isFinite(n)) throw new MapInputError('not-finite', `canonical JSON needs finite numbers, got ${n}`)
    return String(n)
  }
  const list = (a: readonly number[]) => '[' + a.map(num).join(',') + ']'
  return `{"kind":${JSON.stringify(table.kind)},"rowAxis":${list(table.rowAxis)},"colAxis":${list(table.colAxis)},"values":[${table.values.map(list).join(',')}]}`
}
