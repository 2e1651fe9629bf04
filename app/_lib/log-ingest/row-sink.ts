/**
 * Consumes parsed CSV rows (arrays of cells, header first) and feeds the pure analyser. Shared by the
 * streaming ingest and the one-shot text parse, so both give the same result for the same bytes.
 * Line numbers count physical lines, assuming no line breaks inside quoted cells.
 */
import type { ParseError } from 'papaparse'
import {
  createLogAnalyser, createRowDecoder, LogFormatError, resolveLogHeader,
  type AnalysisResult, type LogAnalyser, type LogAnalyserOptions, type LogHeaderMapping, type LogLayout, type RowDecoder,
} from '@/physics/drive-log'

/** Options for reading a log: header mapping, wheel radius for angular wheel speeds, and the analysis. */
export interface LogReadOptions extends LogAnalyserOptions {
  /** `{ ourColumn: theirHeader }`, e.g. `{ "road_speed_mph": "Speed MPH" }`. */
  mapping?: LogHeaderMapping
  /** Dynamic rolling radius, m (needed for wheel speeds in rad/s or rpm). */
  wheelRadiusM?: number
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
  readonly dataRows: number
  finish(bytes: number): LogIngestResult
}

const isBlank = (r: readonly string[]) => r.length === 1 && r[0].trim() === ''

/** @example const sink = createLogRowSink({ surface: 'dry-asphalt' }); sink.rows(papaRows, []); sink.finish(bytes) */
export function createLogRowSink(opts: LogReadOptions): LogRowSink {
  let line = 0
  let dataRows = 0
  let layout: LogLayout | null = null
  let decode: RowDecoder | null = null
  let analyser: LogAnalyser | null = null

  const header = (cells: readonly string[]) => {
    layout = resolveLogHeader(cells, { mapping: opts.mapping, wheelRadiusM: opts.wheelRadiusM, requireBrake: opts.kind === 'regen' && !!opts.map })
    const time = layout.byChannel.time
    decode = createRowDecoder(layout)
    analyser = createLogAnalyser({ ...opts, timeColumn: time ? { index: time.index + 1, name: time.header } : undefined })
  }

  return {
    rows(rows, errors) {
      const base = line
      if (errors.length) {
        const e = errors.reduce((a, b) => ((a.row ?? 0) <= (b.row ?? 0) ? a : b))
        throw new LogFormatError('row', base + (e.row ?? 0) + 1, null, `malformed CSV: ${e.message}`)
      }
      for (let i = 0; i < rows.length; i++) {
        const r = rows[i]
        line++
        if (decode === null || analyser === null) {
          if (isBlank(r)) continue
          if (line !== 1) throw new LogFormatError('header', line, null, 'the header must be the first line')
          header(r)
          continue
        }
        if (isBlank(r)) continue
        analyser.push(decode(r, line))
        dataRows++
      }
    },
    get dataRows() { return dataRows },
    finish(bytes) {
      if (!layout || !analyser) throw new LogFormatError('empty', 0, null, 'the log is empty')
      if (dataRows === 0) throw new LogFormatError('empty', line, null, 'the log has a header but no data rows')
      const l: LogLayout = layout
      return {
        ...analyser.finish(),
        columns: {
          used: l.columns.map((c) => ({ column: c.spec.name, header: c.header, index: c.index + 1, unit: c.spec.unit })),
          ignored: l.ignored.map((g) => ({ header: g.header, index: g.index + 1, reason: g.reason })),
        },
        bytes,
      }
    },
  }
}
