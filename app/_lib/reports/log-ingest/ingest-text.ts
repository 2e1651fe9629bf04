/**
 * One-shot analysis of a small log already in memory: papaparse's full CSV parse of the whole string into
 * cells, then the same row sink as the streaming path (which splits lines itself), so the two cross-check.
 * The effective-radius calibration runs as a first pass over the same rows unless `calibrateRadius` is false.
 * Handy for tests and tiny uploads; use {@link ingestLog} for files.
 */
import 'server-only'
import Papa from 'papaparse'
import { LogFormatError } from '@/physics/drive-log'
import { sniffHeaderLine } from './header-line'
import { createCalibrationSink, createLogRowSink, type LogIngestResult, type LogReadOptions } from './row-sink'

/** @example ingestLogText('time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n0,0,0,0\n', {}).samples // 1 */
export function ingestLogText(text: string, opts: LogReadOptions = {}): LogIngestResult {
  if (text.includes('\u0000')) throw new LogFormatError('not-csv', 0, null, 'binary data (a NUL character); upload the log as CSV text')
  const body = text.replace(/^\uFEFF/, '')
  if (body.trim() === '') throw new LogFormatError('empty', 0, null, 'the log is empty')
  const nl = body.search(/[\r\n]/)
  const delimiter = sniffHeaderLine(nl >= 0 ? body.slice(0, nl) : body)
  const parsed = Papa.parse<string[]>(body, { delimiter, header: false, dynamicTyping: false, skipEmptyLines: false })
  // Two passes over the rows already in memory: the radius calibration first, then the analysis with it.
  let radiusCalibration = opts.radiusCalibration
  if (radiusCalibration === undefined && opts.calibrateRadius !== false) {
    const first = createCalibrationSink(opts, delimiter)
    first.rows(parsed.data, parsed.errors)
    radiusCalibration = first.finish()
  }
  const sink = createLogRowSink({ ...opts, radiusCalibration }, delimiter)
  sink.rows(parsed.data, parsed.errors)
  return sink.finish(Buffer.byteLength(text))
}
