/** The one sniff of a log: reads the first line off the front of the text, decides the delimiter and the line break, or refuses the file as not CSV. */
import 'server-only'
import { LogFormatError } from '@/physics/drive-log'
import type { LogNewline } from './record-parser'

/** The header must end within this many characters. */
export const MAX_HEADER_CHARS = 65_536
const DELIMITERS = [',', ';', '\t'] as const

/** Delimiter of a header line: the most frequent of comma, semicolon, tab. Throws `not-csv` when none, or when the line holds control characters. */
export function sniffHeaderLine(line: string): string {
  // Control characters are exactly what marks a header that is not text.
  if (/[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f\ufffd]/.test(line))
    throw new LogFormatError('not-csv', 1, null, 'the header line is not text (control characters); upload the log as CSV text')
  let best = ''
  let most = 0
  for (const d of DELIMITERS) {
    const k = line.split(d).length - 1
    if (k > most) { most = k; best = d }
  }
  if (!best) throw new LogFormatError('not-csv', 1, null, `the header line has no delimiter (comma, semicolon or tab): ${JSON.stringify(line.slice(0, 80))}`)
  return best
}

/** What one look at the first line of a log decides: its delimiter and its line break. */
export interface LogDialect { delimiter: string; newline: LogNewline }

/**
 * The dialect from the start of the text, or null when more text is needed to see the end of the first line.
 * The line break is the one ending the first line: `\r\n`, a lone `\r`, or `\n`. A byte-order mark is not
 * part of the header.
 * @example sniffLog('time_s;speed\r\n0;1', false) // { delimiter: ';', newline: '\r\n' }
 */
export function sniffLog(text: string, final: boolean): LogDialect | null {
  const nl = text.search(/[\r\n]/)
  if (nl < 0) {
    if (text.length > MAX_HEADER_CHARS) throw new LogFormatError('not-csv', 1, null, `no line break in the first ${MAX_HEADER_CHARS} characters; this does not look like a CSV log`)
    if (!final) return null
    if (text.trim() === '') throw new LogFormatError('empty', 0, null, 'the log is empty')
    return { delimiter: sniffHeaderLine(text), newline: '\n' }
  }
  if (text.charCodeAt(nl) === 13 && nl + 1 === text.length && !final) return null // \r or \r\n: wait for the next character
  const newline = text.charCodeAt(nl) === 10 ? '\n' : text.charCodeAt(nl + 1) === 10 ? '\r\n' : '\r'
  return { delimiter: sniffHeaderLine(text.slice(0, nl)), newline }
}

/** Pulls text until the dialect is known; returns the text read so far (unconsumed, BOM removed) and the dialect. */
export async function readHead(chunks: AsyncIterator<string>): Promise<{ head: string } & LogDialect> {
  let head = ''
  let first = true
  for (;;) {
    const next = await chunks.next()
    if (!next.done) head += next.value
    if (first && head !== '') { first = false; if (head.charCodeAt(0) === 0xfeff) head = head.slice(1) } // one mark at most, as in ingestLogText
    const dialect = sniffLog(head, !!next.done)
    if (dialect) return { head, ...dialect }
  }
}
