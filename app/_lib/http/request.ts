import 'server-only'
import type { z } from 'zod'
import { ID_DIGITS, MAX_ID } from '@/app/_schemas/query'
import { BodyTooLargeError, MalformedIdError, ValidationError } from './errors'

/** Every JSON body is capped at this unless a route says otherwise (the CSV import needs more). */
export const JSON_BODY_LIMIT = 1024 * 1024

/**
 * The body as UTF-8 text, refused with 413 once it passes `maxBytes`: a declared Content-Length over
 * the limit before a byte is read, an undeclared or understated one as soon as the count passes it
 * (the rest is never pulled, so a huge body cannot fill the server's memory).
 */
export async function readBodyText(req: Request, maxBytes = JSON_BODY_LIMIT): Promise<string> {
  const declared = Number(req.headers.get('content-length') ?? NaN)
  if (declared > maxBytes) {
    await req.body?.cancel().catch(() => {})
    throw new BodyTooLargeError(maxBytes)
  }
  if (!req.body) return ''
  const reader = req.body.getReader()
  const chunks: Uint8Array[] = []
  let size = 0
  for (;;) {
    const { done, value } = await reader.read()
    if (done) break
    size += value.byteLength
    if (size > maxBytes) {
      await reader.cancel().catch(() => {})
      throw new BodyTooLargeError(maxBytes)
    }
    chunks.push(value)
  }
  try {
    return new TextDecoder('utf-8', { fatal: true }).decode(Buffer.concat(chunks))
  } catch {
    throw new ValidationError('The request body must be UTF-8 text')
  }
}

/** Parse a JSON body (at most `maxBytes`) against a schema; malformed JSON and schema failures become 400s. */
export async function readJson<S extends z.ZodType>(req: Request, schema: S, opts: { maxBytes?: number } = {}): Promise<z.infer<S>> {
  const text = await readBodyText(req, opts.maxBytes)
  let body: unknown
  try {
    body = JSON.parse(text)
  } catch {
    throw new ValidationError('The request body must be valid JSON')
  }
  assertWellFormedText(body)
  return schema.parse(body)
}

/**
 * JSON's \uD800-style escapes can carry half a UTF-16 pair, which no database text or JSON column
 * can hold: refuse it in any string or key, anywhere in the body, naming where.
 */
function assertWellFormedText(value: unknown, path: string[] = []): void {
  const bad = (s: string) => /\p{Cs}/u.test(s) // in u-mode only an unpaired surrogate is a Cs code point
  if (typeof value === 'string') {
    if (bad(value)) throw new ValidationError(`${path.join('.') || 'body'}: text must be valid Unicode (it holds a lone surrogate)`)
  } else if (Array.isArray(value)) {
    value.forEach((v, i) => assertWellFormedText(v, [...path, String(i)]))
  } else if (value && typeof value === 'object') {
    for (const [k, v] of Object.entries(value)) {
      if (bad(k)) throw new ValidationError(`${[...path, '?'].join('.')}: a field name must be valid Unicode (it holds a lone surrogate)`)
      assertWellFormedText(v, [...path, k])
    }
  }
}

/**
 * A positive integer route parameter. Anything else (`abc`, `1e30`, an id beyond an integer column)
 * names nothing, so it is a 404 like an unknown id, and never reaches the database.
 */
export function intParam(value: string | undefined, name: string): number {
  const n = ID_DIGITS.test(value ?? '') ? Number(value) : NaN
  if (!Number.isInteger(n) || n > MAX_ID) throw new MalformedIdError(name, value ?? '')
  return n
}
