import 'server-only'
import { Transform, type TransformCallback } from 'node:stream'
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
