/**
 * Typed errors of the map module. Callers (API routes, forms) switch on `code` and show
 * `message`, so every message names what was wrong and where in human terms.
 */

/** Base class so callers can catch every map error with one `instanceof`. */
export class MapError extends Error {
  constructor(
    /** Short kebab-case reason, stable for programs, e.g. 'breakpoint-order'. */
    readonly code: string,
    message: string,
  ) {
    super(message)
    this.name = new.target.name
  }
}

/**
 * A file (CSV or JSON) could not be read. `line` and `column` are 1-based; for CSV the column
 * counts cells, for JSON it counts characters. `path` is set for JSON schema failures.
 * @example new MapFormatError('not-a-number', "'abc' is not a number", 4, 3)
 *          // message: "line 4, column 3: 'abc' is not a number"
 */
export class MapFormatError extends MapError {
  constructor(
    code: string,
    /** The bare reason, without the position prefix. */
    readonly reason: string,
    readonly line?: number,
    readonly column?: number,
    readonly path?: readonly (string | number)[],
  ) {
    super(code, prefix(line, column, path) + reason)
  }
}

function prefix(line?: number, column?: number, path?: readonly (string | number)[]): string {
  const parts: string[] = []
  if (line !== undefined) parts.push(`line ${line}`)
  if (column !== undefined) parts.push(`column ${column}`)
  if (path && path.length > 0) parts.push(`at ${formatPath(path)}`)
  return parts.length > 0 ? parts.join(', ') + ': ' : ''
}

/** `['values', 2, 3]` → `values[2][3]`, the way a reader finds it in the file. */
export function formatPath(path: readonly (string | number)[]): string {
  return path.map((p, i) => (typeof p === 'number' ? `[${p}]` : i === 0 ? p : `.${p}`)).join('')
}

/**
 * An editing operation was refused (bad selection, breakpoint out of order, too few
 * breakpoints, non-finite argument). The input table is never modified.
 * @example throw new MapEditError('too-few-breakpoints', 'a map needs at least 2 speed breakpoints')
 */
export class MapEditError extends MapError {}

/**
 * An argument outside the table itself was unusable: a non-finite lookup coordinate, vehicle
 * parameters that give no meaningful limits, or a malformed table handed to a numeric routine.
 */
export class MapInputError extends MapError {}
