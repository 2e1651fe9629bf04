import 'server-only'
import { ZodError } from 'zod'
import { MapError, MapFormatError } from '@/maps'

/** A domain error with the HTTP status it maps to; the message is shown to the user as is. */
export class HttpError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly details?: unknown,
  ) {
    super(message)
  }
}
export class UnauthorizedError extends HttpError {
  constructor(message = 'Sign in to continue') {
    super(401, 'unauthorized', message)
  }
}
export class ForbiddenError extends HttpError {
  constructor(message = 'Your role may not do this') {
    super(403, 'forbidden', message)
  }
}
export class NotFoundError extends HttpError {
  constructor(what: string) {
    super(404, 'not_found', `${what} was not found`)
  }
}
/** A path id that cannot name anything (not plain digits, or beyond an integer column): a 404, with the rule. */
export class MalformedIdError extends HttpError {
  constructor(name: string, value: string) {
    const shown = value.length > 24 ? `${value.slice(0, 24)}…` : value
    super(404, 'not_found', `${name} ${JSON.stringify(shown)} names nothing: ids are whole numbers from 1 to 2147483647`)
  }
}
export class ConflictError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(409, 'conflict', message, details)
  }
}
export class ValidationError extends HttpError {
  constructor(message: string, details?: unknown) {
    super(400, 'invalid_input', message, details)
  }
}

export class BodyTooLargeError extends HttpError {
  constructor(limit: number) {
    super(413, 'too_large', `The request body is larger than the limit of ${Math.round(limit / (1024 * 1024))} MB`)
  }
}

export interface ErrorBody {
  error: { code: string; message: string; details?: unknown }
}

export function jsonError(status: number, code: string, message: string, details?: unknown): Response {
  const body: ErrorBody = { error: { code, message, ...(details === undefined ? {} : { details }) } }
  return Response.json(body, { status })
}

/** Map any thrown value to the one error shape; unknown errors are logged and never leak their text. */
export function errorResponse(e: unknown): Response {
  if (e instanceof HttpError) return jsonError(e.status, e.code, e.message, e.details)
  if (e instanceof ZodError) {
    const issues = e.issues.map((i) => ({ path: i.path.join('.'), message: i.message }))
    const first = issues[0]
    const where = first?.path ? `${first.path}: ` : ''
    return jsonError(400, 'invalid_input', `${where}${first?.message ?? 'Invalid input'}`, { issues })
  }
  if (e instanceof MapFormatError) return jsonError(400, 'invalid_format', e.message, { line: e.line, column: e.column, path: e.path })
  if (e instanceof MapError) return jsonError(400, 'invalid_map', e.message, { rule: e.code })
  if (isUniqueViolation(e)) return jsonError(409, 'conflict', 'That already exists')
  if (CLIENT_VALUE_CODES.some((c) => hasPgCode(e, c))) return jsonError(400, 'invalid_input', 'A value cannot be stored: ids are whole numbers below 2,147,483,648, and text may not hold NUL characters or broken Unicode')
  console.error('Unhandled error in route handler', e)
  return jsonError(500, 'internal', 'Something went wrong on the server; the change was not saved')
}

/** PostgreSQL unique_violation (23505), possibly wrapped by the driver or Drizzle. */
export function isUniqueViolation(e: unknown): boolean {
  return hasPgCode(e, '23505')
}

/**
 * PostgreSQL codes for a client's value the database cannot store — bad input, not a 500: an id beyond
 * an integer column (22003, e.g. /api/maps/99999999999; 22P02 for one Number() writes as 1e+28), a NUL
 * character in text (22021) or in JSON (22P05), a lone surrogate in JSON (22P02).
 */
const CLIENT_VALUE_CODES = ['22003', '22P02', '22021', '22P05']

/** A PostgreSQL error code, possibly wrapped by the driver or Drizzle. */
function hasPgCode(e: unknown, code: string): boolean {
  let cur: unknown = e
  for (let i = 0; i < 4 && typeof cur === 'object' && cur !== null; i++) {
    if ('code' in cur && cur.code === code) return true
    cur = 'cause' in cur ? cur.cause : undefined
  }
  return false
}
