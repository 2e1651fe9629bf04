import { z } from 'zod'

/** The largest row id the database's integer columns hold (2^31 - 1). */
export const MAX_ID = 2_147_483_647

/** A row id as text: plain digits only (Number() would also take " 1", "1e3" and "0x10"). */
export const ID_DIGITS = /^[1-9][0-9]{0,9}$/

/** Query-string values: each says what it accepts, and unknown names are refused (see parseQuery). */
export const idFilter = (name: string) =>
  z
    .string()
    .regex(ID_DIGITS, `${name} must be a positive whole number`)
    .transform(Number)
    .refine((n) => n <= MAX_ID, `${name} must be a positive whole number below 2,147,483,648`)

export const limitParam = (max: number, fallback: number) =>
  z
    .string()
    .regex(/^[0-9]{1,9}$/, `limit must be a whole number from 1 to ${max}`)
    .transform(Number)
    .refine((n) => n >= 1 && n <= max, `limit must be a whole number from 1 to ${max}`)
    .optional()
    .transform((n) => n ?? fallback)

/** Years the database stores the same on PGlite and PostgreSQL, and that mean something here. */
export const MIN_DATE = '1970-01-01'
export const MAX_DATE = '9999-12-31'

/** A calendar date or an ISO date-time within MIN_DATE..MAX_DATE, as a Date. */
export const dateFilter = (name: string) => {
  const message = `${name} must be a date from ${MIN_DATE} to ${MAX_DATE} (YYYY-MM-DD or an ISO date-time)`
  return z
    .string()
    .regex(/^\d{4}-\d{2}-\d{2}(T\d{2}:\d{2}(:\d{2}(\.\d{1,6})?)?(Z|[+-]\d{2}:\d{2})?)?$/, message)
    .transform((s) => new Date(s))
    .refine((d) => !Number.isNaN(d.getTime()) && d.getUTCFullYear() >= 1970 && d.getUTCFullYear() <= 9999, message)
}

export const flagParam = (name: string) => z.enum(['0', '1'], { error: `${name} must be 0 or 1` }).optional()

/** The query string of a request against a strict schema: an unknown name or a bad value is a 400. */
export function parseQuery<S extends z.ZodType>(req: Request, schema: S): z.infer<S> {
  return schema.parse(Object.fromEntries(new URL(req.url).searchParams))
}
