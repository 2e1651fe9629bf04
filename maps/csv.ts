/**
 * Maps as CSV, the layout any spreadsheet opens:
 *
 *   pedal_pct\speed_kmh,0,10,20
 *   0,0,0,0
 *   100,2000,1800,1200
 *
 * First row: a corner cell, then the speed breakpoints (km/h). Each further row: a pedal
 * breakpoint (%), then the torque requests (N·m) at those speeds.
 */
import Papa from 'papaparse'
import { MapFormatError } from './errors'
import { formatExact, parseExact } from './number-format'
import { assertFiniteTable, MAX_BREAKPOINTS, MIN_BREAKPOINTS, type MapKind, type MapTable } from './table'

/** Corner cell written by toCsv, per kind; it names both axes for a reader of the file. */
export const CSV_CORNER: Readonly<Record<MapKind, string>> = { drive: 'pedal_pct\\speed_kmh', regen: 'brake_pedal_pct\\speed_kmh' }

/**
 * CSV text with `,` delimiter, LF line ends and a final newline. Numbers use the shortest
 * representation that reads back to the same double, so fromCsv(toCsv(t), t.kind) equals t.
 * Throws MapInputError for a non-finite number (it could not be read back).
 * @example toCsv({ kind: 'drive', rowAxis: [0, 100], colAxis: [0, 50], values: [[0, 0], [1500, 900.5]] })
 *          // "pedal_pct\\speed_kmh,0,50\n0,0,0\n100,1500,900.5\n"
 */
export function toCsv(table: MapTable): string {
  assertFiniteTable(table, 'CSV')
  const lines = [[CSV_CORNER[table.kind], ...table.colAxis.map(formatExact)].join(',')]
  table.rowAxis.forEach((p, r) => lines.push([formatExact(p), ...table.values[r].map(formatExact)].join(',')))
  return lines.join('\n') + '\n'
}

interface CsvLine {
  /** 1-based line number in the file. */
  line: number
  cells: string[]
}

/** The cells of one line split by papaparse; a quote left open is refused at the cell it opens. */
function cellsOf(text: string, delimiter: ',' | ';', line: number): string[] {
  const { data, errors } = Papa.parse<string[]>(text, { delimiter, quoteChar: '"', newline: '\n' })
  const cells = data[0] ?? ['']
  if (errors.some((e) => e.code === 'MissingQuotes')) throw new MapFormatError('bad-quote', 'a quoted cell is not closed', line, cells.length)
  return cells
}

/**
 * Non-empty lines split into cells, with their line numbers. A quoted cell never spans lines
 * (a map cell holds a number), so each line is split alone and errors keep their position.
 * The delimiter is the one of `,` and `;` that splits the header into more cells (`;` files
 * from decimal-comma locales still have more `;` than `,`). Trailing blank lines are dropped;
 * a blank line before the end is refused (it usually means two tables were pasted together).
 */
function splitCsv(text: string): { delimiter: ',' | ';'; lines: CsvLine[] } {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text
  const raw = body.split(/\r\n|\n|\r/)
  while (raw.length > 0 && raw[raw.length - 1].trim() === '') raw.pop()
  // Leading lines starting with '#' are notes for the reader (a test package marks its files so); line numbers still count them.
  let skip = 0
  while (skip < raw.length && raw[skip].startsWith('#')) skip++
  if (raw.length === skip) throw new MapFormatError('empty-file', 'the file is empty', skip + 1, 1)
  const fields = (d: ',' | ';') => Papa.parse<string[]>(raw[skip], { delimiter: d, quoteChar: '"', newline: '\n' }).data[0]?.length ?? 0
  const delimiter = fields(';') > fields(',') ? ';' : ','
  const lines = raw.slice(skip).map((t, j) => {
    const i = j + skip
    if (t.trim() === '') throw new MapFormatError('empty-line', 'the line is empty; a map is one block of rows', i + 1, 1)
    return { line: i + 1, cells: cellsOf(t, delimiter, i + 1) }
  })
  return { delimiter, lines }
}

function number(text: string, delimiter: string, line: number, column: number): number {
  // With `;` as delimiter the file may come from a decimal-comma locale: "12,5" means 12.5.
  const t = delimiter === ';' && !text.includes('.') ? text.replace(/^(\s*[+-]?\d*),(\d)/, '$1.$2') : text
  const n = parseExact(t)
  if (n === undefined) {
    const shown = text.trim() === '' ? 'an empty cell' : `'${text.trim()}'`
    throw new MapFormatError('not-a-number', `${shown} is not a number`, line, column)
  }
  return n
}

function checkIncreasing(prev: number | undefined, v: number, what: string, line: number, column: number): void {
  if (prev !== undefined && v <= prev)
    throw new MapFormatError('axis-order', `${what} breakpoint ${formatExact(v)} is not greater than the previous one (${formatExact(prev)})`, line, column)
}

/**
 * Read a map from CSV. Accepts `,` or `;` delimiters, CRLF, a BOM, leading `#` note lines and trailing blank lines.
 * Throws MapFormatError (with 1-based line and column) for anything else: a non-number,
 * a ragged row, non-increasing breakpoints, an empty file, too few or too many rows or columns.
 * The corner cell is free text, but a corner that names the other kind is refused.
 * @example fromCsv('pedal_pct\\speed_kmh;0;50\n0;0;0\n100;1500;900,5\n', 'drive').values[1][1] // 900.5
 */
export function fromCsv(text: string, kind: MapKind): MapTable {
  const { delimiter, lines } = splitCsv(text)
  const [header, ...body] = lines
  const other: MapKind = kind === 'drive' ? 'regen' : 'drive'
  if (header.cells[0].trim() === CSV_CORNER[other])
    throw new MapFormatError('kind-mismatch', `the corner cell says this is a ${other} map, but a ${kind} map was asked for`, header.line, 1)
  const colAxis = header.cells.slice(1).map((t, i) => number(t, delimiter, header.line, i + 2))
  colAxis.forEach((v, i) => checkIncreasing(colAxis[i - 1], v, 'speed', header.line, i + 2))
  if (colAxis.length < MIN_BREAKPOINTS || colAxis.length > MAX_BREAKPOINTS)
    throw new MapFormatError('column-count', `the first row has ${colAxis.length} speed breakpoints; ${MIN_BREAKPOINTS} to ${MAX_BREAKPOINTS} are needed after the corner cell`, header.line, Math.min(colAxis.length, MAX_BREAKPOINTS) + 2)
  if (body.length < MIN_BREAKPOINTS || body.length > MAX_BREAKPOINTS) {
    const lastLine = lines[lines.length - 1].line
    throw new MapFormatError('row-count', `the file has ${body.length} pedal rows; ${MIN_BREAKPOINTS} to ${MAX_BREAKPOINTS} are needed below the speed row`, body.length > MAX_BREAKPOINTS ? body[MAX_BREAKPOINTS].line : lastLine + 1, 1)
  }
  const rowAxis: number[] = []
  const values = body.map((l: CsvLine) => {
    if (l.cells.length !== header.cells.length) {
      const col = Math.min(l.cells.length, header.cells.length) + 1
      throw new MapFormatError('ragged-row', `the row has ${l.cells.length} cells but the first row has ${header.cells.length}`, l.line, col)
    }
    const pedal = number(l.cells[0], delimiter, l.line, 1)
    checkIncreasing(rowAxis[rowAxis.length - 1], pedal, 'pedal', l.line, 1)
    rowAxis.push(pedal)
    return l.cells.slice(1).map((t, i) => number(t, delimiter, l.line, i + 2))
  })
  return { kind, rowAxis, colAxis, values }
}
