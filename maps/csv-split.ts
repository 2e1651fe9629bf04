/**
 * Line and cell splitting for CSV files as spreadsheets write them: `,` or `;` delimiter,
 * optional double quotes ("" inside quotes is a quote), CRLF/LF/CR line ends, a UTF-8 BOM.
 */
import { MapFormatError } from './errors'

export interface CsvLine {
  /** 1-based line number in the file. */
  line: number
  cells: string[]
}

/**
 * The delimiter used by the header line: the more frequent of `;` and `,` outside quotes
 * (`;` files from locales with a decimal comma still have more `;` than `,` in the header).
 * @example detectDelimiter('pedal;0;12,5;20') // ';'
 */
export function detectDelimiter(header: string): ',' | ';' {
  const bare = header.replace(/"[^"]*"/g, '')
  const semi = bare.split(';').length - 1
  const comma = bare.split(',').length - 1
  return semi > comma ? ';' : ','
}

function splitCells(text: string, delimiter: string, line: number): string[] {
  const cells: string[] = []
  let cell = ''
  let quoted = false
  for (let i = 0; i < text.length; i++) {
    const ch = text[i]
    if (quoted) {
      if (ch === '"' && text[i + 1] === '"') {
        cell += '"'
        i++
      } else if (ch === '"') quoted = false
      else cell += ch
    } else if (ch === '"' && cell.trim() === '') {
      quoted = true
      cell = ''
    } else if (ch === delimiter) {
      cells.push(cell)
      cell = ''
    } else cell += ch
  }
  if (quoted) throw new MapFormatError('bad-quote', 'a quoted cell is not closed', line, cells.length + 1)
  cells.push(cell)
  return cells
}

/**
 * Non-empty lines split into cells, with their line numbers. Trailing blank lines are dropped;
 * a blank line before the end is refused (it usually means two tables were pasted together).
 * @example splitCsv('a,b\r\n1,2\r\n').lines // [{ line: 1, cells: ['a', 'b'] }, { line: 2, cells: ['1', '2'] }]
 */
export function splitCsv(text: string): { delimiter: ',' | ';'; lines: CsvLine[] } {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text
  const raw = body.split(/\r\n|\n|\r/)
  while (raw.length > 0 && raw[raw.length - 1].trim() === '') raw.pop()
  if (raw.length === 0) throw new MapFormatError('empty-file', 'the file is empty', 1, 1)
  const delimiter = detectDelimiter(raw[0])
  const lines = raw.map((t, i) => {
    if (t.trim() === '') throw new MapFormatError('empty-line', 'the line is empty; a map is one block of rows', i + 1, 1)
    return { line: i + 1, cells: splitCells(t, delimiter, i + 1) }
  })
  return { delimiter, lines }
}
