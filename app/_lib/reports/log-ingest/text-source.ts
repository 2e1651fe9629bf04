/**
 * Byte source → validated UTF-8 text (a leading byte-order mark is left for the sniff to drop). Accepts a Node Readable, a web ReadableStream or any async iterable
 * of bytes; refuses binary data (a NUL byte), text that is not UTF-8, and uploads larger than `maxBytes`.
 * Small chunks are coalesced to about 64 KiB so the CSV parser sees few, large pieces.
 */
import 'server-only'
import { isUtf8 } from 'node:buffer'
import { LogFormatError } from '@/physics/drive-log'

/** Anything the ingest reads bytes from. */
export type LogByteSource = NodeJS.ReadableStream | ReadableStream<Uint8Array> | AsyncIterable<Uint8Array | string>

/** Running byte count, shared with the caller for progress reports. */
export interface ByteCounter { bytes: number }

const COALESCE_CHARS = 65_536

function isWebStream(s: LogByteSource): s is ReadableStream<Uint8Array> {
  return 'getReader' in s && typeof s.getReader === 'function'
}

async function* bytesOf(source: LogByteSource): AsyncGenerator<Uint8Array | string> {
  if (isWebStream(source)) {
    const reader = source.getReader()
    try {
      for (;;) {
        const { done, value } = await reader.read()
        if (done) return
        yield value
      }
    } finally { reader.releaseLock() }
  } else {
    for await (const chunk of source) yield chunk
  }
}

/**
 * Decoded text in chunks of ≥ 64 KiB (the last may be shorter). Throws {@link LogFormatError}
 * (`not-csv`, `too-large`) as soon as a bad byte or the size limit is seen.
 */
export async function* textChunks(source: LogByteSource, counter: ByteCounter, maxBytes = Infinity): AsyncGenerator<string> {
  let pending: Buffer | null = null // the first bytes of a character cut by a chunk boundary
  let parts: string[] = []
  let len = 0
  for await (const chunk of bytesOf(source)) {
    let text: string
    if (typeof chunk === 'string') { text = chunk; counter.bytes += Buffer.byteLength(chunk) }
    else {
      const buf = Buffer.from(chunk.buffer, chunk.byteOffset, chunk.byteLength) // a view, no copy
      const nul = buf.indexOf(0)
      if (nul >= 0) throw new LogFormatError('not-csv', 0, null, `binary data (a NUL byte at byte ${counter.bytes + nul + 1}); upload the log as CSV text`)
      counter.bytes += buf.byteLength
      const all: Buffer = pending ? Buffer.concat([pending, buf]) : buf
      const cut = completeUpTo(all)
      pending = cut < all.length ? Buffer.from(all.subarray(cut)) : null
      // Validate natively, then decode: a third of the cost of a fatal TextDecoder, and the same refusals.
      if (!isUtf8(all.subarray(0, cut))) throw new LogFormatError('not-csv', 0, null, `the file is not UTF-8 text (bad byte sequence before byte ${counter.bytes + 1})`)
      text = all.toString('utf8', 0, cut)
    }
    if (counter.bytes > maxBytes) throw new LogFormatError('too-large', 0, null, `the log is larger than the limit of ${maxBytes} bytes`)
    if (typeof chunk === 'string' && text.includes('\u0000')) throw new LogFormatError('not-csv', 0, null, 'binary data (a NUL character); upload the log as CSV text')
    parts.push(text)
    len += text.length
    if (len >= COALESCE_CHARS) { yield parts.length === 1 ? parts[0] : parts.join(''); parts = []; len = 0 }
  }
  if (pending) throw new LogFormatError('not-csv', 0, null, 'the file ends inside a UTF-8 character')
  if (parts.length) yield parts.join('')
}

/** Length of `b` without a UTF-8 character cut off at its end (its lead byte announces more bytes than follow). */
function completeUpTo(b: Buffer): number {
  const end = b.length
  let k = end - 1
  while (k >= 0 && k > end - 4 && (b[k] & 0xc0) === 0x80) k-- // step back over continuation bytes
  if (k < 0) return end
  const lead = b[k]
  const need = lead >= 0xf0 ? 4 : lead >= 0xe0 ? 3 : lead >= 0xc0 ? 2 : 1
  return end - k < need ? k : end
}
