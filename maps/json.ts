/**
 * Maps as JSON: the table fields plus a format tag and version so a stray JSON file is
 * recognised and a future layout change can be read alongside this one.
 *
 *   { "format": "mapwright-map-table", "version": 1, "kind": "drive",
 *     "rowAxis": [0, 100], "colAxis": [0, 50], "values": [[0, 0], [1500, 900.5]] }
 */
import { MapFormatError } from './errors'
import { mapTableSchema } from './schema'
import { assertFiniteTable, type MapTable } from './table'

export const JSON_FORMAT_TAG = 'mapwright-map-table'
export const JSON_FORMAT_VERSION = 1

/**
 * Pretty JSON (two-space indent, one value row per line). JSON.stringify writes shortest
 * round-trip numbers, so fromJson(toJson(t)) equals t (−0 reads back as 0). Throws
 * MapInputError for a non-finite number, which JSON would silently turn into null.
 * @example JSON.parse(toJson(t)).format // 'mapwright-map-table'
 */
export function toJson(table: MapTable): string {
  assertFiniteTable(table, 'JSON')
  const rows = table.values.map((r) => '    ' + JSON.stringify(r)).join(',\n')
  return (
    '{\n' +
    `  "format": ${JSON.stringify(JSON_FORMAT_TAG)},\n  "version": ${JSON_FORMAT_VERSION},\n  "kind": ${JSON.stringify(table.kind)},\n` +
    `  "rowAxis": ${JSON.stringify(table.rowAxis)},\n  "colAxis": ${JSON.stringify(table.colAxis)},\n` +
    `  "values": [\n${rows}\n  ]\n}\n`
  )
}

/** 1-based line and column of a character offset. */
function position(text: string, offset: number): { line: number; column: number } {
  const before = text.slice(0, offset).split(/\r\n|\n|\r/)
  return { line: before.length, column: before[before.length - 1].length + 1 }
}

/**
 * Read a map from JSON. Syntax errors give a MapFormatError with line and column (when the
 * runtime reports a position); content errors name the path, e.g. "at values[2][3]: must be a
 * finite number". The format tag and version are optional (a bare table is accepted) but must
 * be right when present.
 * @example fromJson('{"kind":"regen","rowAxis":[0,100],"colAxis":[0,80],"values":[[0,300],[0,900]]}').kind // 'regen'
 */
export function fromJson(text: string): MapTable {
  let data: unknown
  try {
    data = JSON.parse(text.charCodeAt(0) === 0xfeff ? text.slice(1) : text)
  } catch (e) {
    const msg = e instanceof Error ? e.message : String(e)
    const m = /position (\d+)/.exec(msg)
    const at = m ? position(text, Number(m[1])) : undefined
    throw new MapFormatError('json-syntax', `not valid JSON (${msg.replace(/ in JSON at position.*$/, '')})`, at?.line, at?.column)
  }
  if (typeof data === 'object' && data !== null && !Array.isArray(data)) {
    const { format, version, ...rest } = data as Record<string, unknown>
    if (format !== undefined && format !== JSON_FORMAT_TAG)
      throw new MapFormatError('json-format', `format is ${JSON.stringify(format)}, expected ${JSON.stringify(JSON_FORMAT_TAG)}`, undefined, undefined, ['format'])
    if (version !== undefined && version !== JSON_FORMAT_VERSION)
      throw new MapFormatError('json-version', `version ${JSON.stringify(version)} is not supported (this program reads version ${JSON_FORMAT_VERSION})`, undefined, undefined, ['version'])
    data = rest
  }
  const parsed = mapTableSchema.safeParse(data)
  if (!parsed.success) {
    const issue = parsed.error.issues[0]
    const path = issue.path.filter((p): p is string | number => typeof p !== 'symbol')
    throw new MapFormatError('json-content', issue.message, undefined, undefined, path.length > 0 ? path : undefined)
  }
  return parsed.data
}
