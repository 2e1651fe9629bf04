/** Reads the header line off the front of a text stream and decides the delimiter, or refuses the file as not CSV. */
import 'server-only'
import { LogFormatError } from '@/physics/drive-log'

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

/** Pulls text until the first line break; returns the text read so far (unconsumed) and the delimiter. */
export async function readHead(chunks: AsyncIterator<string>): Promise<{ head: string; delimiter: string; done: boolean }> {
  let head = ''
  for (;;) {
    const nl = head.search(/[\r\n]/)
    if (nl >= 0) return { head, delimiter: sniffHeaderLine(head.slice(0, nl)), done: false }
    if (head.length > MAX_HEADER_CHARS) throw new LogFormatError('not-csv', 1, null, `no line break in the first ${MAX_HEADER_CHARS} characters; this does not look like a CSV log`)
    const next = await chunks.next()
    if (next.done) {
      if (head.trim() === '') throw new LogFormatError('empty', 0, null, 'the log is empty')
      return { head, delimiter: sniffHeaderLine(head), done: true }
    }
    head += next.value
  }
}
