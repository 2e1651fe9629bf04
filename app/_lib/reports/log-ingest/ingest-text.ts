/**
 * One-shot analysis of a small log already in memory: the same sniff, record parser and sink as the
 * streaming path, fed the whole string at once. The effective-radius calibration runs as a first pass over
 * the same text unless `calibrateRadius` is false. Handy for tests and tiny uploads; use {@link ingestLog} for files.
 */
import 'server-only'
import { LogFormatError } from '@/physics/drive-log'
import { sniffLog } from './header-line'
import { createRecordParser } from './record-parser'
import { createCalibrationSink, createLogRowSink, type LogIngestResult, type LogReadOptions } from './row-sink'

/** @example ingestLogText('time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct\n0,0,0,0\n', {}).samples // 1 */
export function ingestLogText(text: string, opts: LogReadOptions = {}): LogIngestResult {
  if (text.includes('\u0000')) throw new LogFormatError('not-csv', 0, null, 'binary data (a NUL character); upload the log as CSV text')
  const body = text.replace(/^\uFEFF/, '')
  if (body.trim() === '') throw new LogFormatError('empty', 0, null, 'the log is empty')
  const { delimiter, newline } = sniffLog(body, true)!
  const parse = (record: Parameters<typeof createRecordParser>[2]) => {
    const p = createRecordParser(delimiter, newline, record)
    p.push(body)
    p.end()
  }
  let radiusCalibration = opts.radiusCalibration
  if (radiusCalibration === undefined && opts.calibrateRadius !== false) {
    const first = createCalibrationSink(opts)
    parse(first.record)
    radiusCalibration = first.finish()
  }
  const sink = createLogRowSink({ ...opts, radiusCalibration })
  parse(sink.record)
  return sink.finish(Buffer.byteLength(text))
}
