/**
 * Server-side streaming ingest of a CSV drive log, one path: bytes → validated UTF-8 text in ~64 KiB chunks
 * → one sniff of the first line (delimiter, line break) → the record parser (quotes, chunk boundaries) →
 * the record decoder (numbers read in place) → the analyser. Only one text chunk, at most one unfinished
 * record (bounded) and the analyser's bounded state are held at any time.
 */
import 'server-only'
import { readHead } from './header-line'
import { createRecordParser, type RecordSink } from './record-parser'
import { createCalibrationSink, createLogRowSink, type LogIngestResult, type LogReadOptions } from './row-sink'
import { textChunks, type LogByteSource } from './text-source'

/** Options of {@link ingestLog}. */
export interface IngestOptions extends LogReadOptions {
  /** Called after each parsed chunk with bytes read so far and data rows analysed. */
  onProgress?(bytes: number, rows: number): void
  /** Refuse (`too-large`) once more bytes than this arrive. Default: no limit. */
  maxBytes?: number
}

/** A source that can be opened again: the radius calibration reads the log once before the analysis. */
export type ReopenableLogSource = () => Promise<LogByteSource> | LogByteSource

/**
 * Reads, validates and analyses a CSV drive log from a stream. Rejects with {@link LogFormatError}
 * (line and column where known) for non-CSV input, a bad header, a malformed row, time going
 * backwards, or more than `maxBytes`; other errors from the source are passed through.
 * Given a function that opens the source, it reads the log twice: first for the effective-radius
 * calibration (`createRadiusCalibrator`), then for the analysis with that calibration; progress is then
 * reported as half the bytes of each pass, so it still rises once from 0 to the file size. Given a
 * stream, it reads once and runs no calibration (unless `radiusCalibration` is passed).
 * @example const result = await ingestLog(() => fs.createReadStream('log.csv'), { surface: 'wet-asphalt' })
 */
export async function ingestLog(source: LogByteSource | ReopenableLogSource, opts: IngestOptions = {}): Promise<LogIngestResult> {
  if (typeof source !== 'function') return parsePass(source, opts, createLogRowSink(opts), opts.onProgress, (sink, bytes) => sink.finish(bytes))
  let radiusCalibration = opts.radiusCalibration
  let firstBytes = 0
  if (radiusCalibration === undefined && opts.calibrateRadius !== false) {
    const progress = opts.onProgress && ((bytes: number, rows: number) => opts.onProgress!(Math.floor(bytes / 2), rows))
    const first = await parsePass(await source(), opts, createCalibrationSink(opts), progress, (sink, bytes) => { firstBytes = bytes; return sink.finish() })
    radiusCalibration = first
  }
  const again = { ...opts, radiusCalibration }
  const progress = opts.onProgress && firstBytes > 0 ? (bytes: number, rows: number) => opts.onProgress!(Math.floor((firstBytes + bytes) / 2), rows) : opts.onProgress
  return parsePass(await source(), again, createLogRowSink(again), progress, (sink, bytes) => sink.finish(bytes))
}

/** One streaming pass of the source through a sink: sniff, then each text chunk straight into the record parser. */
async function parsePass<S extends { readonly record: RecordSink; readonly dataRows: number }, R>(
  source: LogByteSource,
  opts: IngestOptions,
  sink: S,
  onProgress: ((bytes: number, rows: number) => void) | undefined,
  finish: (sink: S, bytes: number) => R,
): Promise<R> {
  const counter = { bytes: 0 }
  const chunks = textChunks(source, counter, opts.maxBytes)
  try {
    const { head, delimiter, newline } = await readHead(chunks)
    const parser = createRecordParser(delimiter, newline, sink.record)
    parser.push(head)
    onProgress?.(counter.bytes, sink.dataRows)
    for (;;) {
      const next = await chunks.next()
      if (next.done) break
      parser.push(next.value)
      onProgress?.(counter.bytes, sink.dataRows)
    }
    parser.end()
    onProgress?.(counter.bytes, sink.dataRows)
    return finish(sink, counter.bytes)
  } finally {
    await chunks.return(undefined) // closes the source when the parse stops early
  }
}
