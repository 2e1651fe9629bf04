/**
 * Server-side streaming ingest of a CSV drive log: bytes → validated UTF-8 text → papaparse's streaming
 * parser (Node stream input, `chunk` callback) → row sink → analyser. Papaparse carries the stream: chunk
 * boundaries, partial lines, line-ending detection and line splitting. It runs in its fast mode with a
 * delimiter that cannot occur, so each row it returns is one physical line; the sink splits unquoted
 * lines and reads the numbers in place (no cell strings, no row objects), and hands any line with a
 * double quote back to papaparse's full CSV rules. Only one parser chunk (~64 KiB of text) and the
 * analyser's bounded state are held at any time.
 */
import 'server-only'
import { Readable } from 'node:stream'
import Papa from 'papaparse'
import { LogFormatError } from '@/physics/drive-log'
import { readHead } from './header-line'
import { createCalibrationSink, createLogRowSink, LINE_SPLIT_DELIMITER, type LogIngestResult, type LogReadOptions } from './row-sink'
import { textChunks, type LogByteSource } from './text-source'

/** Options of {@link ingestLog}. */
export interface IngestOptions extends LogReadOptions {
  /** Called after each parsed chunk with bytes read so far and data rows analysed. */
  onProgress?(bytes: number, rows: number): void
  /** Refuse (`too-large`) once more bytes than this arrive. Default: no limit. */
  maxBytes?: number
}

/** Text the parser may hold without completing a row before we call the row malformed (unbalanced quote). */
const MAX_PENDING_CHARS = 1 << 20

async function* prepend(head: string, rest: AsyncIterator<string>): AsyncGenerator<string> {
  try {
    yield head
    for (;;) {
      const n = await rest.next()
      if (n.done) return
      yield n.value
    }
  } finally {
    await rest.return?.(undefined) // closes the source when the parse stops early
  }
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
  if (typeof source !== 'function') return parsePass(source, opts, (d) => createLogRowSink(opts, d), opts.onProgress, (sink, bytes) => sink.finish(bytes))
  let radiusCalibration = opts.radiusCalibration
  let firstBytes = 0
  if (radiusCalibration === undefined && opts.calibrateRadius !== false) {
    const progress = opts.onProgress && ((bytes: number, rows: number) => opts.onProgress!(Math.floor(bytes / 2), rows))
    const first = await parsePass(await source(), opts, (d) => createCalibrationSink(opts, d), progress, (sink, bytes) => { firstBytes = bytes; return sink.finish() })
    radiusCalibration = first
  }
  const again = { ...opts, radiusCalibration }
  const progress = opts.onProgress && firstBytes > 0 ? (bytes: number, rows: number) => opts.onProgress!(Math.floor((firstBytes + bytes) / 2), rows) : opts.onProgress
  return parsePass(await source(), again, (d) => createLogRowSink(again, d), progress, (sink, bytes) => sink.finish(bytes))
}

/** One streaming pass of the source through a sink made for the sniffed delimiter. */
async function parsePass<S extends { lines(l: readonly (readonly string[])[]): void; readonly dataRows: number }, R>(
  source: LogByteSource,
  opts: IngestOptions,
  makeSink: (delimiter: string) => S,
  onProgress: ((bytes: number, rows: number) => void) | undefined,
  finish: (sink: S, bytes: number) => R,
): Promise<R> {
  const counter = { bytes: 0 }
  const chunks = textChunks(source, counter, opts.maxBytes)
  const { head, delimiter } = await readHead(chunks)
  const sink = makeSink(delimiter)
  const readable = Readable.from(prepend(head, chunks), { objectMode: true })
  let fed = 0
  readable.on('data', (s: string) => { fed += s.length }) // runs before papaparse's listener: chars handed over so far

  return new Promise<R>((resolve, reject) => {
    let settled = false
    const fail = (e: unknown) => {
      if (settled) return
      settled = true
      readable.destroy()
      reject(e)
    }
    Papa.parse<string[], NodeJS.ReadableStream>(readable, {
      delimiter: LINE_SPLIT_DELIMITER,
      fastMode: true, // split lines only; quotes are handled per line by the sink
      header: false,
      dynamicTyping: false,
      skipEmptyLines: false,
      chunk(results, parser) {
        if (settled) return
        try {
          sink.lines(results.data)
          if (fed - results.meta.cursor > MAX_PENDING_CHARS)
            throw new LogFormatError('row', 0, null, `no complete row in over ${MAX_PENDING_CHARS} characters after row ${sink.dataRows + 1} of data (an unbalanced quote?)`)
          onProgress?.(counter.bytes, sink.dataRows)
        } catch (e) {
          fail(e) // first: abort() calls complete() synchronously
          parser.abort()
        }
      },
      complete() {
        if (settled) return
        try {
          const result = finish(sink, counter.bytes)
          settled = true
          resolve(result)
        } catch (e) { fail(e) }
      },
      error(e: Error) { fail(e) },
    })
  })
}
