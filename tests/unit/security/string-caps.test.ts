import { describe, expect, it } from 'vitest'
import type { z } from 'zod'
import * as mapSchemas from '@/app/_schemas/map'
import * as programSchemas from '@/app/_schemas/program'
import * as reportSchemas from '@/app/_schemas/report'
import * as reviewSchemas from '@/app/_schemas/review'
import * as userSchemas from '@/app/_schemas/user'

type Def = { type: string; shape?: Record<string, z.ZodType>; innerType?: z.ZodType; element?: z.ZodType; in?: z.ZodType; out?: z.ZodType; keyType?: z.ZodType; valueType?: z.ZodType; options?: z.ZodType[]; checks?: { _zod: { def: { check: string; maximum?: number; error?: (i: unknown) => unknown } } }[] }
const def = (s: z.ZodType) => (s as unknown as { _zod: { def: Def } })._zod.def

/** Every string inside a schema, with where it sits. */
function strings(s: z.ZodType, path: string, out: { path: string; schema: z.ZodType }[] = []) {
  const d = def(s)
  // A calendar date (YYYY-MM-DD) is bounded by its format; a pipe's output is bounded by its input.
  if (d.type === 'string' && (d as { format?: string }).format !== 'date') out.push({ path, schema: s })
  if (d.type === 'object') for (const [k, v] of Object.entries(d.shape ?? {})) strings(v, `${path}.${k}`, out)
  for (const inner of [d.innerType, d.element, d.in, d.keyType, d.valueType, ...(d.options ?? [])]) if (inner) strings(inner, path, out)
  return out
}

const modules = { mapSchemas, programSchemas, reportSchemas, reviewSchemas, userSchemas }
const all = Object.entries(modules).flatMap(([m, mod]) =>
  Object.entries(mod)
    .filter(([, v]) => v && typeof v === 'object' && '_zod' in v)
    .flatMap(([name, schema]) => strings(schema as z.ZodType, `${m}.${name}`)),
)

describe('string length caps', () => {
  it('finds the text fields of every request schema', () => {
    expect(all.length).toBeGreaterThan(20)
  })

  it('every text field has a maximum, and the message for a longer one states it', () => {
    const missing: string[] = []
    for (const { path, schema } of all) {
      const max = (schema as unknown as { maxLength: number | null }).maxLength
      if (max === null || max === undefined) {
        missing.push(`${path}: no maximum`)
        continue
      }
      const r = schema.safeParse('a'.repeat(max + 1))
      const messages = r.success ? [] : r.error.issues.map((i) => i.message)
      // A sentence a person can act on ("Name must be at most 120 characters"), not zod's default wording.
      const stated = messages.some((m) => (m.includes(String(max)) || m.includes(max.toLocaleString('en-US'))) && !m.startsWith('Too big'))
      if (!stated) missing.push(`${path}: max ${max}, message ${JSON.stringify(messages)}`)
    }
    expect(missing).toEqual([])
  })

  it('e-mail addresses are at most 254 characters (the SMTP path limit, RFC 5321 §4.5.3.1.3)', () => {
    const long = `${'a'.repeat(64)}@${'b'.repeat(63)}.${'c'.repeat(63)}.${'d'.repeat(63)}.example`
    expect(long.length).toBeGreaterThan(254)
    for (const s of [userSchemas.createUserSchema, userSchemas.forgotPasswordSchema]) {
      const r = s.safeParse({ email: long, name: 'N', role: 'admin', password: 'long enough 1' })
      expect(r.success).toBe(false)
      expect(JSON.stringify(r.error?.issues)).toMatch(/at most 254 characters/)
    }
  })
})
