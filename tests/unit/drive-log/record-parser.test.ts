// The one CSV parser of the log ingest: records as papaparse (an independent open-source implementation of
// RFC 4180 quoting) reads them, for any cutting of the text into chunks, with physical line numbers.
import { Readable } from 'node:stream'
import fc from 'fast-check'
import Papa from 'papaparse'
import { describe, expect, it } from 'vitest'
import { ingestLog, ingestLogText } from '@/app/_lib/reports/log-ingest'
import { sniffLog } from '@/app/_lib/reports/log-ingest/header-line'
import { createRecordParser, MAX_QUOTED_CHARS, MAX_RECORD_CHARS, type LogNewline } from '@/app/_lib/reports/log-ingest/record-parser'
import { LogFormatError } from '@/physics'
import { HEADER } from './helpers'

/** Records (as cells) and their first lines, feeding `text` cut at `cuts`. */
function parse(text: string, d = ',', nl: LogNewline = '\n', cuts: number[] = []): { cells: string[][]; lines: number[] } {
  const cells: string[][] = []
  const lines: number[] = []
  const p = createRecordParser(d, nl, (t, s, e, n, line) => {
    cells.push(Array.from({ length: n }, (_, k) => t.slice(s[k], e[k])))
    lines.push(line)
  })
  let prev = 0
  for (const c of [...new Set(cuts)].filter((c) => c > 0 && c < text.length).sort((a, b) => a - b)) { p.push(text.slice(prev, c)); prev = c }
  p.push(text.slice(prev))
  p.end()
  return { cells, lines }
}

function caught(f: () => unknown): LogFormatError {
  try { f() } catch (e) { if (e instanceof LogFormatError) return e; throw e }
  throw new Error('expected a LogFormatError')
}

describe('createRecordParser', () => {
  it('property: the same records as papaparse, for random quoting, delimiters, line breaks and chunk cuts', () => {
    const plain = fc.stringMatching(/^([a-z0-9 .\-é]{0,5}|[a-z0-9 .\-é]{1,4}"[a-z0-9]{0,2})$/) // may hold a quote, never first
    const quoted = fc.array(fc.constantFrom('a', '1', ' ', '"', ',', ';', '\t', '\n', '\r', 'é'), { maxLength: 8 }).map((cs) => `"${cs.join('').replaceAll('"', '""')}"`)
    const record = fc.array(fc.oneof(plain, quoted), { minLength: 1, maxLength: 5 })
    fc.assert(fc.property(
      fc.array(record, { minLength: 1, maxLength: 8 }), fc.constantFrom(',', ';', '\t'), fc.constantFrom<LogNewline>('\n', '\r\n', '\r'), fc.boolean(), fc.array(fc.nat(200), { maxLength: 6 }),
      (records, d, nl, trailing, cuts) => {
        const text = records.map((r) => r.join(d)).join(nl) + (trailing ? nl : '')
        fc.pre(text !== '' && text !== nl)
        const oracle = Papa.parse<string[]>(text, { delimiter: d, newline: nl, header: false, skipEmptyLines: false })
        expect(oracle.errors).toEqual([])
        const expected = text.endsWith(nl) ? oracle.data.slice(0, -1) : oracle.data
        const got = parse(text, d, nl, cuts)
        expect(got.cells).toEqual(expected)
        expect(got).toEqual(parse(text, d, nl)) // cuts change nothing, line numbers included
      },
    ), { numRuns: 2000 })
  })

  it('numbers records by their first physical line, counting breaks inside quoted fields', () => {
    expect(parse('h,n\n1,"a\nb\nc"\n\n2,x\n').lines).toEqual([1, 2, 5, 6])
    expect(parse('h,n\r\n1,"a\r\nb"\r\n2,x', ',', '\r\n').lines).toEqual([1, 2, 4])
  })

  it('a quote inside an unquoted field is text; blanks may follow a closing quote; "" is one quote', () => {
    expect(parse('ab"c,"d"  ,"e ""f"""\n').cells).toEqual([['ab"c', 'd', 'e "f"']])
  })

  it('a quoted field spanning chunk boundaries: cut inside it, between "" and between \\r and \\n', () => {
    const text = 'a,b\r\n1,"x\r\ny "" z"\r\n2,w\r\n'
    const whole = parse(text, ',', '\r\n')
    expect(whole.cells).toEqual([['a', 'b'], ['1', 'x\r\ny " z'], ['2', 'w']])
    for (let c = 1; c < text.length; c++) expect(parse(text, ',', '\r\n', [c])).toEqual(whole)
    expect(parse(text, ',', '\r\n', Array.from({ length: text.length }, (_, k) => k))).toEqual(whole) // one character per chunk
  })

  it('with \\r\\n line breaks a lone \\r is text, also when it ends the log', () => {
    expect(parse('1,a\rb\r\n2,c\r', ',', '\r\n', [4, 12]).cells).toEqual([['1', 'a\rb'], ['2', 'c\r']])
  })

  it('an unbalanced quote at the end: the record\'s line, in the parser and through both ingest paths', () => {
    expect(caught(() => parse('a,b\n1,2\n"3,4\n5,6\n'))).toMatchObject({ code: 'row', line: 3, message: 'line 3: malformed CSV: a quoted field is not closed at the end of the log' })
    expect(caught(() => ingestLogText(`${HEADER}\n0,10,10,5\n"1,10,10,5\n`))).toMatchObject({ code: 'row', line: 3 })
  })

  it('text after a closing quote, and fields past the length limits, are refused with the line', () => {
    expect(caught(() => parse('a,b\n1,"2"x\n'))).toMatchObject({ code: 'row', line: 2, message: 'line 2: malformed CSV: text after the closing quote of a quoted field' })
    expect(caught(() => parse(`a,b\n1,"${'x'.repeat(MAX_QUOTED_CHARS)}"\n`))).toMatchObject({ line: 2, reason: 'malformed CSV: a quoted field is not closed' })
    expect(caught(() => parse(`a,b\n1,${'x'.repeat(MAX_RECORD_CHARS)}\n`, ',', '\n', [100_000]))).toMatchObject({ line: 2, reason: `malformed CSV: a record longer than ${MAX_RECORD_CHARS} characters` })
  })
})

describe('sniffLog: one look at the first line', () => {
  it('delimiter and line break, waiting for the character after a \\r', () => {
    expect(sniffLog('time_s;v\r\n0;1', false)).toEqual({ delimiter: ';', newline: '\r\n' })
    expect(sniffLog('time_s\tv\r0\t1', false)).toEqual({ delimiter: '\t', newline: '\r' })
    expect(sniffLog('time_s,v\n', false)).toEqual({ delimiter: ',', newline: '\n' })
    expect(sniffLog('time_s,v\r', false)).toBeNull()
    expect(sniffLog('time_s,v\r', true)).toEqual({ delimiter: ',', newline: '\r' })
    expect(sniffLog('time_s,v', false)).toBeNull()
  })
})

describe('quoted cells through the streaming ingest', () => {
  const log = `${HEADER},note\r\n0,10,10,5,"one\r\ntwo, ""three"""\r\n"0.1",10,"10",5,a"b\r\n0.2,10,10,5,\r\n`
  it('read as the one-shot path reads them, for every cut point', async () => {
    const oneShot = ingestLogText(log)
    expect(oneShot.samples).toBe(3)
    const bytes = Buffer.from(log)
    for (let c = 1; c < bytes.length; c++) expect(await ingestLog(() => Readable.from([bytes.subarray(0, c), bytes.subarray(c)]))).toEqual(oneShot)
  })
  it('both paths give physical lines after a quoted cell spanning lines, and drop one byte-order mark before a quoted header', async () => {
    const bad = `${HEADER},note\n0,10,10,5,"a\nb"\n0.1,x,10,5,c\n`
    expect(caught(() => ingestLogText(bad))).toMatchObject({ line: 4, column: { index: 2 } })
    await expect(ingestLog(Readable.from([Buffer.from(bad)]))).rejects.toMatchObject({ line: 4, column: { index: 2 } })
    const bom = `\uFEFF"time_s",road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n0,10,10,5\n`
    expect(ingestLogText(bom).samples).toBe(1)
    expect(await ingestLog(Readable.from(['\uFEFF', bom.slice(1)]))).toEqual(ingestLogText(bom, { calibrateRadius: false }))
  })
  it('a quote inside an unquoted number cell is a bad number at its line and column', () => {
    expect(caught(() => ingestLogText(`${HEADER}\n0,10,10,5\n0.1,1"0,10,5\n`))).toMatchObject({ line: 3, column: { index: 2, name: 'road_speed_kmh' }, reason: '"1\\"0" is not a number' })
  })
})
