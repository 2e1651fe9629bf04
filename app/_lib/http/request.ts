import 'server-only'
import type { z } from 'zod'
import { ValidationError } from './errors'

/** Parse a JSON body against a schema; malformed JSON and schema failures become 400s. */
export async function readJson<S extends z.ZodType>(req: Request, schema: S): Promise<z.infer<S>> {
  let body: unknown
  try {
    body = await req.json()
  } catch {
    throw new ValidationError('The request body must be valid JSON')
  }
  return schema.parse(body)
}

/** A positive integer route parameter, or a 404-worthy 400. */
export function intParam(value: string | undefined, name: string): number {
  // Plain digits only: Number() would also take " 1", "1e3" and "0x10".
  const n = /^[1-9][0-9]{0,9}$/.test(value ?? '') ? Number(value) : NaN
  if (!Number.isInteger(n) || n > 2_147_483_647) throw new ValidationError(`${name} must be a positive whole number`)
  return n
}
