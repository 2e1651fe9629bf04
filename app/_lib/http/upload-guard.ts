import 'server-only'
import { pipeline, Readable, Transform, type TransformCallback } from 'node:stream'
import type { ReadableStream as WebReadableStream } from 'node:stream/web'
import { HttpError } from './errors'

export class PayloadTooLargeError extends HttpError {
  constructor(limit: number) {
    super(413, 'too_large', `The file is larger than the limit of ${Math.round(limit / (1024 * 1024))} MB`)
  }
}
export class UnsupportedFileError extends HttpError {
  constructor(message: string) {
    super(415, 'unsupported_file', message)
  }
}

export class UploadInterruptedError extends HttpError {
  constructor() {
    super(400, 'upload_interrupted', 'The upload was interrupted before the whole file arrived; nothing was kept. Send the file again.')
  }
}

/**
 * Passes bytes through while counting them; fails with 413 the moment the limit is passed, and
 * with 415 if the first bytes are not CSV text (a NUL byte, or no delimiter in the first line).
 */
export class CsvUploadGuard extends Transform {
  bytes = 0
  private sniffed = false
  private head = ''

  constructor(private readonly limit: number) {
    super()
  }

  _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback) {
    this.bytes += chunk.length
    if (this.bytes > this.limit) return done(new PayloadTooLargeError(this.limit))
    if (!this.sniffed) {
      if (chunk.includes(0)) return done(new UnsupportedFileError('This is not a CSV text file (it contains binary data)'))
      this.head += chunk.toString('utf8', 0, Math.min(chunk.length, 65536))
      const nl = this.head.search(/\r?\n/)
      if (nl >= 0 || this.head.length >= 65536) {
        this.sniffed = true
        const first = nl >= 0 ? this.head.slice(0, nl) : this.head
        if (!/[,;\t]/.test(first)) return done(new UnsupportedFileError('This is not a CSV file: its first line has no comma, semicolon or tab between column names'))
      }
    }
    done(null, chunk)
  }

  _flush(done: TransformCallback) {
    if (this.bytes === 0) return done(new UnsupportedFileError('The file is empty'))
    done()
  }
}

/**
 * The request body through the guard. pipeline, not pipe: a client that drops the connection then
 * ends the guard with an error (pipe would leave the upload waiting for bytes forever, and the
 * body's error, with no listener, would be an uncaughtException); a refusal by the guard stops
 * reading the client.
 */
export function guardedBody(body: WebReadableStream<Uint8Array>, guard: CsvUploadGuard): CsvUploadGuard {
  pipeline(Readable.fromWeb(body), guard, () => {
    /* the error, if any, is on the guard: see uploadFailure */
  })
  return guard
}

/** Why a guarded upload failed: the guard's own 413/415, an interrupted body, or the store's error. */
export function uploadFailure(guard: CsvUploadGuard, storeError: unknown): unknown {
  const e = guard.errored
  if (e instanceof HttpError) return e
  return e ? new UploadInterruptedError() : storeError
}
