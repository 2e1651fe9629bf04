/**
 * Consumes a parsed log and feeds the pure analyser, in one of two forms:
 *  • `rows`: CSV rows already split into cells by papaparse (the one-shot path; line numbers count rows);
 *  • `lines`: whole physical lines from papaparse's streaming line splitter (the streaming path). An
 *    unquoted line is split and read in place; a line holding a double quote is re-parsed by papaparse
 *    with full CSV quoting, joining the following lines while a quoted cell is still open.
 * Both give the same result for the same bytes.
 */
import 'server-only'
import Papa, { type ParseError } from 'papaparse'
import {
  createLogAnalyser, createRadiusCalibrator, createRowDecoders, layoutWheelChannels, LogFormatError, resolveLogHeader,
  type AnalysisResult, type LineDecoder, type LogAnalyserOptions, type LogColumnRef, type LogHeaderMapping, type LogLayout, type LogSample,
  type RadiusCalibration, type RowDecoder,
} from '@/physics/drive-log'

/** Options for reading a log: header mapping, wheel radius for angular wheel speeds, and the analysis. */
export interface LogReadOptions extends Omit<LogAnalyserOptions, 'wheelChannels'> {
  /** `{ ourColumn: theirHeader }`, e.g. `{ "road_speed_mph": "Speed MPH" }`. */
  mapping?: LogHeaderMapping
  /** Dynamic rolling radius, m (needed for wheel speeds in rad/s or rpm). */
  wheelRadiusM?: number
  /** Run the effective-radius calibration as a first pass (where the source can be read twice). Default true. */
  calibrateRadius?: boolean
  /** Told of every analysed sample with its measured slip (NaN when not judged): the replay reads the log this way. */
  onSample?: (sample: LogSample, slip: number) => void
}

/** The analysis plus which columns were read and which were ignored. */
export interface LogIngestResult extends AnalysisResult {
  columns: {
    used: { column: string; header: string; index: number; unit: string }[]
    ignored: { header: string; index: number; reason: string }[]
  }
  /** Bytes read from the source (UTF-8). */
  bytes: number
}

/** Row consumer; `rows` takes one parser chunk of rows and its parse errors (row indexes relative to the chunk). */
export interface LogRowSink {
  rows(rows: readonly (readonly string[])[], errors: readonly ParseError[]): void
  /** Physical lines, each as papaparse's line splitter returns it (normally one element). */
  lines(lines: readonly (readonly string[])[]): void
  readonly dataRows: number
  finish(bytes: number): LogIngestResult
}

const isBlank = (r: readonly string[]) => r.length === 1 && r[0].trim() === ''
/** A record with a quoted cell that spans lines may be at most this long. */
const MAX_QUOTED_RECORD = 65_536
// The line splitter's delimiter: a control character refused in the header, so a line is normally one cell.
export const LINE_SPLIT_DELIMITER = '\u001f'

/** The first pass of a two-pass read: the same parsing and errors, feeding the radius calibrator only. */
export interface CalibrationSink extends Omit<LogRowSink, 'finish'> {
  finish(): RadiusCalibration
}

/** @example const sink = createLogRowSink({ surface: 'dry-asphalt' }, ','); sink.rows(papaRows, []); sink.finish(bytes) */
export function createLogRowSink(opts: LogReadOptions, delimiter = ','): LogRowSink {
  let analyser: ReturnType<typeof createLogAnalyser> | null = null
  const r = createRecordReader(opts, delimiter, (layout, timeColumn) => {
    const a = (analyser = createLogAnalyser({ ...opts, timeColumn, wheelChannels: layoutWheelChannels(layout) }))
    const hook = opts.onSample
    return hook ? (s: LogSample) => hook(s, a.push(s)) : a.push
  })
  return {
    rows: r.rows,
    lines: r.lines,
    get dataRows() { return r.dataRows },
    finish(bytes) {
      const l = r.end()
      return {
        ...analyser!.finish(),
        columns: {
          used: l.columns.map((c) => ({ column: c.spec.name, header: c.header, index: c.index + 1, unit: c.spec.unit })),
          ignored: l.ignored.map((g) => ({ header: g.header, index: g.index + 1, reason: g.reason })),
        },
        bytes,
      }
    },
  }
}

/** @example const first = createCalibrationSink(opts, ','); first.rows(papaRows, []); createLogRowSink({ ...opts, radiusCalibration: first.finish() }) */
export function createCalibrationSink(opts: LogReadOptions, delimiter = ','): CalibrationSink {
  let calibrator: ReturnType<typeof createRadiusCalibrator> | null = null
  const r = createRecordReader(opts, delimiter, (layout, timeColumn) => {
    calibrator = createRadiusCalibrator({ wheelChannels: layoutWheelChannels(layout), trackWidthM: opts.trackWidthM, maxGapS: opts.maxGapS, timeColumn })
    return calibrator.push
  })
  return {
    rows: r.rows,
    lines: r.lines,
    get dataRows() { return r.dataRows },
    finish() { r.end(); return calibrator!.result() },
  }
}

/** Header, decoding and line bookkeeping shared by both passes; `start` makes the sample consumer from the layout. */
function createRecordReader(opts: LogReadOptions, delimiter: string, start: (layout: LogLayout, timeColumn: LogColumnRef | undefined) => (s: LogSample) => unknown) {
  let line = 0
  let dataRows = 0
  let layout: LogLayout | null = null
  let decode: RowDecoder | null = null
  let decodeLine: LineDecoder | null = null
  let analyser: { push(s: LogSample): unknown } | null = null
  let quoted: { text: string; line: number } | null = null

  const header = (cells: readonly string[]) => {
    layout = resolveLogHeader(cells, { mapping: opts.mapping, wheelRadiusM: opts.wheelRadiusM, requireBrake: opts.kind === 'regen' && !!opts.map })
    const time = layout.byChannel.time
    const d = createRowDecoders(layout, delimiter)
    decode = d.fromFields
    decodeLine = d.fromLine
    analyser = { push: start(layout, time ? { index: time.index + 1, name: time.header } : undefined) }
  }
  /** One complete record as cells, at its first physical line. */
  const record = (cells: readonly string[], at: number) => {
    if (decode === null || analyser === null) {
      if (isBlank(cells)) return
      if (at !== 1) throw new LogFormatError('header', at, null, 'the header must be the first line')
      header(cells)
      return
    }
    if (isBlank(cells)) return
    analyser.push(decode(cells, at))
    dataRows++
  }
  /** Full CSV parse of a record holding quotes; null while a quoted cell is still open. */
  const parseQuoted = (text: string, at: number): string[] | null => {
    const p = Papa.parse<string[]>(text, { delimiter, header: false, dynamicTyping: false, skipEmptyLines: false })
    if (p.errors.some((e) => e.code === 'MissingQuotes')) return null
    if (p.errors.length) throw new LogFormatError('row', at, null, `malformed CSV: ${p.errors[0].message}`)
    const rows = p.data.length > 1 && isBlank(p.data[p.data.length - 1]) ? p.data.slice(0, -1) : p.data
    if (rows.length !== 1) throw new LogFormatError('row', at, null, 'malformed CSV: quoting splits this line into several records')
    return rows[0]
  }

  return {
    rows(rows: readonly (readonly string[])[], errors: readonly ParseError[]) {
      const base = line
      if (errors.length) {
        const e = errors.reduce((a, b) => ((a.row ?? 0) <= (b.row ?? 0) ? a : b))
        throw new LogFormatError('row', base + (e.row ?? 0) + 1, null, `malformed CSV: ${e.message}`)
      }
      for (let i = 0; i < rows.length; i++) record(rows[i], ++line)
    },
    lines(parts: readonly (readonly string[])[]) {
      for (let i = 0; i < parts.length; i++) {
        const p = parts[i]
        const text = p.length === 1 ? p[0] : p.join(LINE_SPLIT_DELIMITER)
        line++
        if (quoted !== null) {
          quoted.text += '\n' + text
          if (quoted.text.length > MAX_QUOTED_RECORD) throw new LogFormatError('row', quoted.line, null, 'malformed CSV: a quoted field is not closed')
          if (text.indexOf('"') < 0) continue // only a quote can close the open cell: no re-parse needed
          const cells = parseQuoted(quoted.text, quoted.line)
          if (cells) { const at = quoted.line; quoted = null; record(cells, at) }
          continue
        }
        if (text.indexOf('"') >= 0) {
          const cells = parseQuoted(text, line)
          if (cells) record(cells, line); else quoted = { text, line }
          continue
        }
        if (decodeLine === null || analyser === null) { record(Papa.parse<string[]>(text, { delimiter }).data[0] ?? [''], line); continue }
        if (text.length === 0 || (text.charCodeAt(0) <= 32 && text.trim() === '' && text.indexOf(delimiter) < 0)) continue // blank line
        analyser.push(decodeLine(text, line))
        dataRows++
      }
    },
    get dataRows() { return dataRows },
    /** Checks the log ended well and returns its layout. */
    end(): LogLayout {
      if (quoted !== null) throw new LogFormatError('row', quoted.line, null, 'malformed CSV: a quoted field is not closed at the end of the log')
      if (!layout || !analyser) throw new LogFormatError('empty', 0, null, 'the log is empty')
      if (dataRows === 0) throw new LogFormatError('empty', line, null, 'the log has a header but no data rows')
      return layout
    },
  }
}
