import 'server-only'
import { sha256Hex } from '@/db/checksum'
import type { Db } from '@/db/client'
import { runOnce } from '@/db/queries/idempotency'
import { HttpError, ValidationError } from './errors'

/**
 * Creations a person retries (a report, a comment, a revision) take an `Idempotency-Key` header:
 * the client's id for the draft. A repeat by the same user with the same key and the same content
 * creates nothing and answers as the first request did; the same key with other content is a 422.
 * Without the header a request creates as before (scripts and API clients that never retry).
 */
export const IDEMPOTENCY_HEADER = 'idempotency-key'

/** A UUID fits; anything of 8 to 100 plain characters is accepted. */
const KEY = /^[A-Za-z0-9_.:-]{8,100}$/

export class IdempotencyKeyReusedError extends HttpError {
  constructor(what: string, resultId: number | null) {
    super(
      422,
      'idempotency_key_reused',
      `This draft was already sent as ${what}${resultId ? ` ${resultId}` : ''} with different content; nothing new was created. Open it to make changes, or start a new draft.`,
      { resultId },
    )
  }
}

/** The request's key, or null when it sends none; a malformed key is a 400 naming the header. */
export function idempotencyKeyOf(req: Request): string | null {
  const raw = req.headers.get(IDEMPOTENCY_HEADER)
  if (raw === null) return null
  const key = raw.trim()
  if (!KEY.test(key)) throw new ValidationError('Idempotency-Key: must be 8 to 100 letters, digits or - _ . : (the id of the draft being sent)')
  return key
}

/**
 * Run `create` at most once per (user, scope, key). `request` is the parsed input (and target):
 * its hash tells a true repeat from a reused key. `create` gets the transaction to write in.
 */
export async function createOnce(
  req: Request,
  opts: { userId: number; scope: string; what: string; request: unknown },
  create: (conn: Db | undefined) => Promise<number>,
): Promise<{ id: number; replayed: boolean }> {
  const key = idempotencyKeyOf(req)
  if (key === null) return { id: await create(undefined), replayed: false }
  const requestHash = sha256Hex(JSON.stringify(opts.request))
  const r = await runOnce({ userId: opts.userId, scope: opts.scope, key, requestHash }, create)
  if ('mismatch' in r) throw new IdempotencyKeyReusedError(opts.what, r.resultId)
  return { id: r.resultId, replayed: r.replayed }
}

/** The 201 answer; a replay says so in a header (the body is the first request's result). */
export function createdResponse(body: unknown, replayed: boolean): Response {
  return Response.json(body, { status: 201, headers: replayed ? { 'idempotency-replayed': 'true' } : {} })
}
