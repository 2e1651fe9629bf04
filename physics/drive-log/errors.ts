/** Typed error for drive logs: every problem with an uploaded log names its line and, where known, its column. */

/** What kind of problem a {@link LogFormatError} reports. */
export type LogErrorCode =
  | 'not-csv' // binary bytes, undecodable text, no delimiter in the header line
  | 'header' // missing required column, bad mapping, duplicated header
  | 'row' // a cell that is not a number, wrong field count, broken quoting
  | 'time-order' // time going backwards
  | 'too-large' // more bytes than the caller allows
  | 'empty' // no data rows

/** A 1-based column position and the header text found there. */
export interface LogColumnRef { index: number; name: string }

/**
 * A malformed drive log. `line` is the 1-based physical line (the header is line 1; 0 when the problem is
 * not tied to a line, e.g. an empty upload), `column` the 1-based column index and header name, or null.
 * @example new LogFormatError('row', 12, { index: 3, name: 'road_speed_kmh' }, '"abc" is not a number').message
 * // 'line 12, column 3 (road_speed_kmh): "abc" is not a number'
 */
export class LogFormatError extends Error {
  readonly code: LogErrorCode
  readonly line: number
  readonly column: LogColumnRef | null
  /** The bare reason, without the position prefix. */
  readonly reason: string
  constructor(code: LogErrorCode, line: number, column: LogColumnRef | null, reason: string) {
    const where = [line > 0 ? `line ${line}` : '', column ? `column ${column.index} (${column.name})` : ''].filter(Boolean)
    super(where.length ? `${where.join(', ')}: ${reason}` : reason)
    this.name = 'LogFormatError'
    this.code = code
    this.line = line
    this.column = column
    this.reason = reason
  }
}
