/**
 * Header resolution: matches a log's header line to our columns, case-insensitively and trimmed,
 * after applying the driver's mapping `{ ourColumn: theirHeader }`. Extra columns are ignored, not errors.
 */
import { DRIVE_LOG_COLUMNS, REQUIRED_CHANNELS, WHEEL_CHANNELS, columnFactor, findLogColumn, type LogChannel, type LogColumnSpec } from './columns'
import { LogFormatError } from './errors'

/** Maps one of our column names to the header text used in the driver's file. @example { "road_speed_mph": "Speed MPH" } */
export type LogHeaderMapping = Readonly<Record<string, string>>

/** A header cell bound to one of our columns. `index` is 0-based; `factor` converts raw to the working unit. */
export interface ResolvedLogColumn { spec: LogColumnSpec; index: number; header: string; factor: number }

/** Result of {@link resolveLogHeader}. */
export interface LogLayout {
  /** Header cells as found (trimmed, BOM removed). */
  headers: readonly string[]
  /** One bound column per channel present. */
  columns: readonly ResolvedLogColumn[]
  byChannel: Readonly<Partial<Record<LogChannel, ResolvedLogColumn>>>
  /** Header cells not used, with the reason. `index` is 0-based. */
  ignored: readonly { index: number; header: string; reason: string }[]
}

/** Options for {@link resolveLogHeader}. */
export interface LogHeaderOptions {
  mapping?: LogHeaderMapping
  /** Dynamic rolling radius, m; required when wheel speeds are angular (rad/s or rpm). */
  wheelRadiusM?: number
  /** Fail unless a brake pedal column exists (regen occupancy is indexed by brake pedal %). */
  requireBrake?: boolean
}

const norm = (s: string): string => s.trim().toLowerCase()
const headerError = (msg: string) => new LogFormatError('header', 1, null, msg)
const listHeaders = (h: readonly string[]) => h.map((x) => JSON.stringify(x)).join(', ')

/** Checks the mapping is a plain `{ string: string }` naming our columns; returns its entries. */
function mappingEntries(mapping: unknown): [LogColumnSpec, string][] {
  if (mapping === undefined || mapping === null) return []
  if (typeof mapping !== 'object' || Array.isArray(mapping)) throw headerError('the column mapping must be an object { ourColumn: theirHeader }')
  return Object.entries(mapping).map(([k, v]) => {
    const spec = findLogColumn(norm(k))
    if (!spec) throw headerError(`the mapping names "${k}", which is not a column Mapwright reads`)
    if (typeof v !== 'string' || v.trim() === '') throw headerError(`the mapping for ${spec.name} must be a non-empty header name`)
    return [spec, v]
  })
}

/**
 * Binds header cells to our columns. Throws {@link LogFormatError} (line 1) for a missing required
 * column (naming it and listing the headers found), a bad mapping, or a used header that appears twice.
 * @example resolveLogHeader(['Time_S', 'road_speed_kmh', 'wheel_speed_kmh', 'accel_pedal_pct', 'note']).ignored[0].header // 'note'
 */
export function resolveLogHeader(rawHeaders: readonly string[], opts: LogHeaderOptions = {}): LogLayout {
  const headers = rawHeaders.map((h, i) => (i === 0 ? h.replace(/^\uFEFF/, '') : h).trim())
  const keys = headers.map(norm)
  const taken = new Map<number, LogColumnSpec>()
  const byChannel: Partial<Record<LogChannel, ResolvedLogColumn>> = {}
  const bind = (spec: LogColumnSpec, index: number) => {
    let factor: number
    try { factor = columnFactor(spec, opts.wheelRadiusM) } catch {
      throw headerError(`${spec.name} is an angular wheel speed and needs the wheel radius (wheelRadiusM > 0)`)
    }
    if (keys.indexOf(keys[index], index + 1) !== -1 || keys.indexOf(keys[index]) !== index)
      throw headerError(`header "${headers[index]}" appears more than once`)
    taken.set(index, spec)
    byChannel[spec.channel] = { spec, index, header: headers[index], factor }
  }
  for (const [spec, theirs] of mappingEntries(opts.mapping)) {
    const index = keys.indexOf(norm(theirs))
    if (index < 0) throw headerError(`the mapping sends ${spec.name} to "${theirs}", which is not in the header; found: ${listHeaders(headers)}`)
    if (taken.has(index)) throw headerError(`the mapping uses header "${theirs}" twice`)
    if (byChannel[spec.channel]) throw headerError(`the mapping gives ${spec.channel} twice (${byChannel[spec.channel]?.spec.name} and ${spec.name})`)
    bind(spec, index)
  }
  const ignored: { index: number; header: string; reason: string }[] = []
  // Unmapped cells bind by our own names, preferring the unit listed first in DRIVE_LOG_COLUMNS.
  const order = new Map(DRIVE_LOG_COLUMNS.map((c, i) => [c.name, i]))
  const candidates = keys
    .map((k, index) => ({ index, spec: taken.has(index) ? undefined : findLogColumn(k) }))
    .sort((a, b) => (order.get(a.spec?.name ?? '') ?? 1e9) - (order.get(b.spec?.name ?? '') ?? 1e9) || a.index - b.index)
  for (const { index, spec } of candidates) {
    if (taken.has(index)) continue
    if (!spec) ignored.push({ index, header: headers[index], reason: 'not a column Mapwright reads' })
    else if (byChannel[spec.channel]) ignored.push({ index, header: headers[index], reason: `${spec.channel} already read from "${byChannel[spec.channel]?.header}"` })
    else bind(spec, index)
  }
  ignored.sort((a, b) => a.index - b.index)
  const missing: string[] = REQUIRED_CHANNELS.filter((ch) => !byChannel[ch]).map((ch) => DRIVE_LOG_COLUMNS.find((c) => c.channel === ch)?.name ?? ch)
  if (!WHEEL_CHANNELS.some((ch) => byChannel[ch])) missing.push('a drive-wheel speed (e.g. wheel_speed_kmh)')
  if (opts.requireBrake && !byChannel.brakePedal) missing.push('brake_pedal_pct (regen occupancy uses the brake pedal)')
  if (missing.length) throw headerError(`missing required column${missing.length > 1 ? 's' : ''} ${missing.join(', ')}; found: ${listHeaders(headers)}`)
  const columns = Object.values(byChannel).sort((a, b) => a.index - b.index)
  return { headers, columns, byChannel, ignored }
}
