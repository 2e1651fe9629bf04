/**
 * Consumes the records of the one CSV parser (`record-parser.ts`) and feeds the pure analyser: the first
 * non-blank record is the header (it must be line 1), every other non-blank record is decoded in place
 * by the layout's record decoder. The streaming and the one-shot ingest both end here.
 */
import 'server-only'
import {
  createLogAnalyser, createRadiusCalibrator, createRecordDecoder, layoutWheelChannels, LogFormatError, resolveLogHeader,
  type AnalysisResult, type LogAnalyserOptions, type LogColumnRef, type LogHeaderMapping, type LogLayout, type LogSample,
  type RadiusCalibration, type RecordDecoder,
} from '@/physics/drive-log'
import type { RecordSink } from './record-parser'

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

/** Record consumer of one pass. */
export interface LogRowSink {
  /** Takes each record from the parser. */
  readonly record: RecordSink
  readonly dataRows: number
  finish(bytes: number): LogIngestResult
}

/** The first pass of a two-pass read: the same parsing and errors, feeding the radius calibrator only. */
export interface CalibrationSink extends Omit<LogRowSink, 'finish'> {
  finish(): RadiusCalibration
}

/** @example const sink = createLogRowSink({ surface: 'dry-asphalt' }); createRecordParser(',', '\n', sink.record).push(text); sink.finish(bytes) */
export function createLogRowSink(opts: LogReadOptions): LogRowSink {
  let analyser: ReturnType<typeof createLogAnalyser> | null = null
  const r = createRecordReader(opts, (layout, timeColumn) => {
    const a = (analyser = createLogAnalyser({ ...opts, timeColumn, wheelChannels: layoutWheelChannels(layout) }))
    const hook = opts.onSample
    return hook ? (s: LogSample) => hook(s, a.push(s)) : a.push
  })
  return {
    record: r.record,
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

/** @example const first = createCalibrationSink(opts); parse(text, first.record); createLogRowSink({ ...opts, radiusCalibration: first.finish() }) */
export function createCalibrationSink(opts: LogReadOptions): CalibrationSink {
  let calibrator: ReturnType<typeof createRadiusCalibrator> | null = null
  const r = createRecordReader(opts, (layout, timeColumn) => {
    calibrator = createRadiusCalibrator({ wheelChannels: layoutWheelChannels(layout), trackWidthM: opts.trackWidthM, maxGapS: opts.maxGapS, timeColumn })
    return calibrator.push
  })
  return {
    record: r.record,
    get dataRows() { return r.dataRows },
    finish() { r.end(); return calibrator!.result() },
  }
}

/** A record of one field holding only blanks (an empty line): skipped, as is usual for CSV. */
const isBlank = (text: string, starts: Int32Array, ends: Int32Array, count: number) =>
  count === 1 && (starts[0] === ends[0] || text.slice(starts[0], ends[0]).trim() === '')

/** Header and decoding shared by both passes; `start` makes the sample consumer from the layout. */
function createRecordReader(opts: LogReadOptions, start: (layout: LogLayout, timeColumn: LogColumnRef | undefined) => (s: LogSample) => unknown) {
  let lastLine = 0
  let dataRows = 0
  let layout: LogLayout | null = null
  let decode: RecordDecoder | null = null
  let push: ((s: LogSample) => unknown) | null = null

  const header = (text: string, starts: Int32Array, ends: Int32Array, count: number) => {
    const cells = Array.from({ length: count }, (_, k) => text.slice(starts[k], ends[k]))
    layout = resolveLogHeader(cells, { mapping: opts.mapping, wheelRadiusM: opts.wheelRadiusM, requireBrake: opts.kind === 'regen' && !!opts.map })
    const time = layout.byChannel.time
    decode = createRecordDecoder(layout)
    push = start(layout, time ? { index: time.index + 1, name: time.header } : undefined)
  }
  const record: RecordSink = (text, starts, ends, count, line) => {
    lastLine = line
    if (isBlank(text, starts, ends, count)) return
    if (decode === null || push === null) {
      if (line !== 1) throw new LogFormatError('header', line, null, 'the header must be the first line')
      header(text, starts, ends, count)
      return
    }
    push(decode(text, starts, ends, count, line))
    dataRows++
  }

  return {
    record,
    get dataRows() { return dataRows },
    /** Checks the log held a header and data, and returns its layout. */
    end(): LogLayout {
      if (!layout || !push) throw new LogFormatError('empty', 0, null, 'the log is empty')
      if (dataRows === 0) throw new LogFormatError('empty', lastLine, null, 'the log has a header but no data rows')
      return layout
    },
  }
}
