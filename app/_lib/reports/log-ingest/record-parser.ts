/**
 * The one CSV parser of the log ingest: a state machine over the text that handles quoting itself and
 * yields each record as field ranges (`text`, `starts`, `ends`, `count`) at its first physical line, so
 * numbers are read in place without cell strings. Fed text in chunks of any size; a record cut by a chunk
 * boundary is kept and finished with the next chunk, so the result does not depend on where the text is cut.
 * Quoting as RFC 4180: a field that begins with `"` is quoted, may hold delimiters and line breaks, and
 * writes `"` as `""`; blanks may follow the closing quote. A quote inside an unquoted field is plain text.
 */
import 'server-only'
import { LogFormatError } from '@/physics/drive-log'

/** Line break of a log: sniffed once from the end of the header line. */
export type LogNewline = '\n' | '\r\n' | '\r'

/** Receives each record; the arrays are reused, valid until the call returns. */
export type RecordSink = (text: string, starts: Int32Array, ends: Int32Array, count: number, line: number) => void

/** A quoted field may be at most this long: past it the quote is taken as unbalanced (bounds memory). */
export const MAX_QUOTED_CHARS = 65_536
/** A record may be at most this long (a line that never ends would otherwise be held whole). */
export const MAX_RECORD_CHARS = 1 << 20

const QUOTE = 34
const SPACE = 32

/** A parser fed text chunk by chunk. */
export interface RecordParser {
  /** Parses the complete records of `chunk` (plus what was left of the previous one). */
  push(chunk: string): void
  /** Parses what is left as the last record; throws if a quoted field is still open. */
  end(): void
}

/** @example const p = createRecordParser(',', '\n', (t, s, e, n, line) => {}); p.push('a,"b,c"\n1,2'); p.end() */
export function createRecordParser(delimiter: string, newline: LogNewline, onRecord: RecordSink): RecordParser {
  const D = delimiter.charCodeAt(0)
  const NL = newline.charCodeAt(0) // \n, or \r (alone or followed by \n)
  const crlf = newline === '\r\n'
  const lastOfNewline = newline[newline.length - 1]
  let starts = new Int32Array(64)
  let ends = new Int32Array(64)
  let carry = ''
  let line = 1 // physical line where the next record starts

  const grow = () => {
    const s = new Int32Array(starts.length * 2); s.set(starts); starts = s
    const e = new Int32Array(ends.length * 2); e.set(ends); ends = e
  }
  const malformed = (at: number, reason: string) => new LogFormatError('row', at, null, `malformed CSV: ${reason}`)

  /** Line breaks inside a quoted field, for the physical line numbers of the records after it. */
  const breaksIn = (buf: string, from: number, to: number): number => {
    let k = 0
    for (let p = buf.indexOf(newline, from); p >= 0 && p < to; p = buf.indexOf(newline, p + newline.length)) k++
    return k
  }

  /** A record with `""` escapes: its fields unescaped and laid end to end in a new string (rare). */
  const unescaped = (buf: string, count: number, escaped: boolean[]): string => {
    let out = ''
    for (let k = 0; k < count; k++) {
      const cell = buf.slice(starts[k], ends[k])
      starts[k] = out.length
      out += escaped[k] ? cell.replaceAll('""', '"') : cell
      ends[k] = out.length
    }
    return out
  }

  /**
   * Parses the records of `buf` from `from`. Returns where the unfinished last record starts (to be
   * kept), or `buf.length` when every record is complete. With `final`, the end of `buf` ends the record.
   */
  const run = (buf: string, from: number, final: boolean): number => {
    const len = buf.length
    let i = from
    let quoteAt = -1 // the next `"` at or after i (len when none): lines before it cannot hold a quoted field
    while (i < len) {
      if (quoteAt < i) { quoteAt = buf.indexOf('"', i); if (quoteAt < 0) quoteAt = len }
      const eol = buf.indexOf(newline, i)
      if (eol >= 0 && eol < quoteAt && eol - i <= MAX_RECORD_CHARS) {
        // A whole line without a quote: its fields are the runs between delimiters (what the state machine
        // below would find, in one tight loop; native indexOf finds the line end and the next quote).
        let count = 0
        let s = i
        for (let j = i; j < eol; j++) {
          if (buf.charCodeAt(j) !== D) continue
          if (count + 1 >= starts.length) grow()
          starts[count] = s
          ends[count++] = j
          s = j + 1
        }
        starts[count] = s
        ends[count++] = eol
        i = eol + newline.length
        onRecord(buf, starts, ends, count, line++)
        continue
      }
      const rec = i
      const at = line
      let count = 0
      let breaks = 0
      let escaped: boolean[] | null = null
      for (;;) { // one field per turn
        if (count === starts.length) grow()
        let s = i
        let e: number
        if (i < len && buf.charCodeAt(i) === QUOTE) {
          let j = i + 1
          let esc = false
          for (;;) {
            const q = buf.indexOf('"', j)
            if (q < 0 || (q + 1 === len && !final)) { // closing quote not seen yet (or cannot tell it from `""`)
              if (len - i > MAX_QUOTED_CHARS) throw malformed(at, 'a quoted field is not closed')
              if (!final) return rec
              throw malformed(at, 'a quoted field is not closed at the end of the log')
            }
            if (q - i > MAX_QUOTED_CHARS) throw malformed(at, 'a quoted field is not closed')
            if (buf.charCodeAt(q + 1) === QUOTE) { esc = true; j = q + 2; continue }
            s = i + 1
            e = q
            i = q + 1
            break
          }
          breaks += breaksIn(buf, s, e)
          if (esc) (escaped ??= [])[count] = true
          while (i < len && buf.charCodeAt(i) === SPACE) i++
          if (i < len) {
            const c = buf.charCodeAt(i)
            if (c !== D && !(c === NL && (!crlf || i + 1 === len || buf.charCodeAt(i + 1) === 10)))
              throw malformed(at, 'text after the closing quote of a quoted field')
          }
        } else {
          for (; i < len; i++) {
            const c = buf.charCodeAt(i)
            if (c === D) break
            if (c === NL) {
              if (!crlf) break
              if (i + 1 === len) { if (!final) return rec; continue } // a lone \r ending the text stays in the field
              if (buf.charCodeAt(i + 1) === 10) break
            }
          }
          e = i
        }
        starts[count] = s
        ends[count] = e
        count++
        if (i >= len) { if (!final) return rec; break } // the text ends the record
        if (buf.charCodeAt(i) === D) { i++; continue }
        if (crlf) { if (i + 1 === len) { if (!final) return rec } else i++ } // \r\n: step past the \r (a lone final \r ends it too)
        i++
        break
      }
      if (i - rec > MAX_RECORD_CHARS) throw malformed(at, `a record longer than ${MAX_RECORD_CHARS} characters`)
      line = at + 1 + breaks
      onRecord(escaped ? unescaped(buf, count, escaped) : buf, starts, ends, count, at)
    }
    return len
  }

  return {
    push(chunk) {
      let buf = chunk
      let from = 0
      if (carry !== '') {
        // Finish the record cut by the chunk boundary in a small string of its own: the chunk then stays a
        // flat string (reading a concatenation costs about a third more per character). Only when that
        // record goes on past the chunk's first line break (a quoted field spanning lines) is it joined whole.
        const nl = chunk.indexOf(lastOfNewline)
        const joint = nl < 0 ? '' : carry + chunk.slice(0, nl + 1)
        if (joint !== '' && run(joint, 0, false) === joint.length) from = nl + 1
        else buf = carry + chunk
      }
      const k = run(buf, from, false)
      carry = k < buf.length ? buf.slice(k) : ''
      if (carry.length > MAX_RECORD_CHARS) throw malformed(line, `a record longer than ${MAX_RECORD_CHARS} characters`)
    },
    end() {
      const buf = carry
      carry = ''
      if (buf !== '') run(buf, 0, true)
    },
  }
}
