// Shared machinery for fuzzing the JSON API: random bodies (garbage text, arbitrary JSON, and
// mutations of a valid body), sent to a real route handler with a real session cookie; every answer
// must be a 2xx or a well-formed 4xx, and a 4xx must leave the database as it was.
import fc from 'fast-check'
import { expect } from 'vitest'
import { sql } from 'drizzle-orm'
import type { z } from 'zod'
import { getDb } from '@/db/client'
import { call } from '@/tests/support/api'

type Handler<P> = (req: Request, ctx: { params: Promise<P> }) => Promise<Response>

export interface FuzzTarget<P = Record<string, string>> {
  /** How the report names it, e.g. `POST /api/users`. */
  name: string
  handler: Handler<P>
  method: 'POST' | 'PUT' | 'PATCH'
  /** Session of a role allowed to call the route (none for the public ones). */
  cookie?: string
  params?: P
  /** A body the route accepts: the seed for the mutations. */
  valid: Record<string, unknown>
  /**
   * The route's own schema, when it is exported: a body it refuses must never get a 2xx. Without it
   * the weaker rule is that only a JSON object can succeed.
   */
  schema?: z.ZodType
  numRuns?: number
}

/** Where the request body came from; decides which answers are plausible. */
type Origin = 'garbage text' | 'arbitrary json' | 'mutated valid' | 'valid'
export interface FuzzCase { origin: Origin; raw: string }

// A placeholder for a value too deep for JSON.stringify to write; spliced into the text afterwards.
const DEEP = '\u0001deep\u0001'
const DEPTH = 5_000
const deepArray = '['.repeat(DEPTH) + ']'.repeat(DEPTH)
const deepObject = '{"a":'.repeat(DEPTH) + '1' + '}'.repeat(DEPTH)

/** Values that break careless code: wrong types, edge numbers, NaN-like and SQL-like strings, huge and deep values. */
const nasty: fc.Arbitrary<unknown> = fc.oneof(
  fc.constantFrom<unknown>(
    null, true, false, 0, -1, 1.5, -0.000001, 2 ** 31, -(2 ** 31) - 1, 2 ** 53, 2 ** 63, 1e308, -1e308, 5e-324,
    '', ' ', '\t\n', 'NaN', 'Infinity', '-Infinity', '1e999', '-0', 'null', 'undefined', 'true', '0', '-1', '12abc',
    "'; DROP TABLE users; --", 'SELECT 1', '<script>alert(1)</script>', '\u0000', '\u202e', 'é', '🚛', '\ud800',
    '../../etc/passwd', '%s%n', '${7*7}', [], {}, [1, 2, 3], { a: 1 }, [null], ['x'], JSON.parse('{"__proto__":{"admin":true}}'),
    `${DEEP}array`, `${DEEP}object`,
  ),
  fc.integer({ min: 1_000, max: 300_000 }).map((n) => 'x'.repeat(n)),
  fc.constant('y'.repeat(2_100_000)),
  fc.integer(),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
  fc.string({ maxLength: 20, unit: 'binary' }),
  fc.jsonValue({ maxDepth: 2 }),
)

type Path = (string | number)[]

function paths(v: unknown, prefix: Path = []): Path[] {
  if (v === null || typeof v !== 'object') return [prefix]
  const entries = Array.isArray(v) ? v.map((x, i) => [i, x] as const) : Object.entries(v)
  return [prefix, ...entries.flatMap(([k, x]) => paths(x, [...prefix, k]))]
}

function clone<T>(v: T): T {
  return JSON.parse(JSON.stringify(v)) as T
}

/** A value of the wrong JSON type for `v`, close to it (12 → "12", "a" → 1, [1] → {0:1}, …). */
function retype(v: unknown): unknown {
  if (typeof v === 'number') return String(v)
  if (typeof v === 'string') return Number.isFinite(Number(v)) && v.trim() !== '' ? Number(v) : v.length
  if (typeof v === 'boolean') return v ? 'true' : 0
  if (Array.isArray(v)) return { ...v }
  if (v && typeof v === 'object') return Object.values(v)
  return 'null'
}

type Op = { kind: 'drop' | 'replace' | 'retype' | 'extra' | 'negate'; pick: number; value: unknown }

function applyOp(body: unknown, op: Op): unknown {
  const all = paths(body)
  const path = all[op.pick % all.length]
  if (path.length === 0) return op.kind === 'drop' ? undefined : op.kind === 'retype' ? retype(body) : op.kind === 'replace' ? op.value : body
  const parent = path.slice(0, -1).reduce<unknown>((o, k) => (o as Record<string | number, unknown>)[k], body) as Record<string | number, unknown> | unknown[]
  const key = path[path.length - 1]
  const cur = (parent as Record<string | number, unknown>)[key]
  if (op.kind === 'drop') {
    if (Array.isArray(parent)) parent.splice(Number(key), 1)
    else delete parent[key]
  } else if (op.kind === 'replace') (parent as Record<string | number, unknown>)[key] = op.value
  else if (op.kind === 'retype') (parent as Record<string | number, unknown>)[key] = retype(cur)
  else if (op.kind === 'negate') (parent as Record<string | number, unknown>)[key] = typeof cur === 'number' ? -cur - 1 : cur
  else if (!Array.isArray(parent) && cur && typeof cur === 'object') (cur as Record<string, unknown>)[`extra_${op.pick}`] = op.value
  return body
}

function write(v: unknown): string {
  const text = JSON.stringify(v) ?? 'null'
  return text.replaceAll(`"${DEEP}array"`, deepArray).replaceAll(`"${DEEP}object"`, deepObject)
}

/** Bodies for one route: garbage text, arbitrary JSON, one to four mutations of the valid body, or the valid body itself. */
export function fuzzBodies(valid: Record<string, unknown>): fc.Arbitrary<FuzzCase> {
  const json = JSON.stringify(valid)
  const op: fc.Arbitrary<Op> = fc.record({ kind: fc.constantFrom('drop', 'replace', 'replace', 'retype', 'extra', 'negate'), pick: fc.nat(), value: nasty })
  const garbage = fc.oneof(
    fc.string({ maxLength: 200, unit: 'binary' }),
    fc.nat(json.length - 1).map((n) => json.slice(0, n)), // truncated upload
    fc.constantFrom('', ' ', 'NaN', 'undefined', "{'a': 1}", '{"a": NaN}', '{"a": 1,}', '[1, 2', '{"a": 1} trailing', '// comment\n{}', '\u0000', '{"a": Infinity}', '0x10', 'true false'),
    fc.string({ maxLength: 50 }).map((s) => `${json}${s}x`), // valid JSON followed by junk
  )
  return fc.oneof(
    { weight: 2, arbitrary: garbage.map((raw): FuzzCase => ({ origin: 'garbage text', raw })) },
    { weight: 2, arbitrary: fc.oneof(fc.anything({ maxDepth: 3 }), fc.jsonValue({ maxDepth: 4 })).map((v): FuzzCase => ({ origin: 'arbitrary json', raw: write(v) })) },
    {
      weight: 6,
      arbitrary: fc.array(op, { minLength: 1, maxLength: 4 }).map((ops): FuzzCase => {
        let body: unknown = clone(valid)
        for (const o of ops) body = applyOp(body, o)
        const proto = ops[0].pick % 7 === 0 // now and then a __proto__ key, as JSON.parse would create it
        const raw = write(body)
        return { origin: 'mutated valid', raw: proto && raw.startsWith('{"') ? `{"__proto__":{"role":"admin"},${raw.slice(1)}` : raw }
      }),
    },
    { weight: 1, arbitrary: fc.constant<FuzzCase>({ origin: 'valid', raw: json }) },
  )
}

/**
 * Deterministic probes run before the random cases: every number in the valid body set to the edges of
 * an int4 column and of a double, every string emptied and made huge. Random runs hit these only by luck.
 */
export function edgeCases(valid: Record<string, unknown>): FuzzCase[] {
  const out: FuzzCase[] = []
  paths(valid).forEach((p, i) => {
    if (p.length === 0) return
    const leaf = p.reduce<unknown>((o, k) => (o as Record<string | number, unknown>)[k], valid)
    const probes = typeof leaf === 'number' ? (Number.isInteger(leaf) ? [2 ** 31, 2 ** 53, -1, 0.5] : [-1, 1e308]) : typeof leaf === 'string' ? ['', 'z'.repeat(300_000), 'nul\u0000inside', 'lone \ud800 surrogate'] : []
    for (const value of probes) out.push({ origin: 'mutated valid', raw: write(applyOp(clone(valid), { kind: 'replace', pick: i, value })) })
  })
  return out
}

/** Text that must never appear in an answer unless the client sent it: stack frames, SQL, file paths. */
const LEAKS: RegExp[] = [/\n\s+at /, /\bat [\w.<>]+ \(.*:\d+:\d+\)/, /\bSELECT\b/, /\bINSERT\b/, /\bUPDATE\b.*\bSET\b/, /node_modules/, /\/work\//, /violates|constraint|relation "/]

export function expectWellFormedError(status: number, body: unknown, sent: string): void {
  const ctx = `status ${status}, body ${JSON.stringify(body)?.slice(0, 400)}, sent ${sent.slice(0, 200)}`
  expect(body, ctx).toMatchObject({ error: { code: expect.any(String), message: expect.any(String) } })
  const { code, message } = (body as { error: { code: string; message: string } }).error
  expect(code.length, ctx).toBeGreaterThan(0)
  expect(message.trim().length, ctx).toBeGreaterThan(0)
  const text = JSON.stringify(body)
  for (const leak of LEAKS) if (!leak.test(sent)) expect(text, ctx).not.toMatch(leak)
}

/** Every table's row count and content hash (mail by recipient and text: the sender updates its status in the background). */
export async function snapshot(): Promise<Record<string, string>> {
  const tables = ['users', 'vehicle_programs', 'maps', 'map_revisions', 'audit_log', 'drive_reports', 'drive_logs', 'report_comments', 'revision_events', 'review_comments', 'param_versions', 'map_sets', 'set_releases', 'auth_tokens']
  const parts = tables.map((t) => `select '${t}' as t, count(*)::int as n, coalesce(md5(string_agg(row_to_json(x)::text, '|' order by x.id)), '') as h from ${t} x`)
  parts.push(`select 'mail_outbox' as t, count(*)::int as n, coalesce(md5(string_agg(json_build_array(x.id, x."to", x.subject, x.text)::text, '|' order by x.id)), '') as h from mail_outbox x`)
  const db = await getDb()
  const res = (await db.execute(sql.raw(parts.join(' union all ')))) as unknown as { rows: { t: string; n: number; h: string }[] }
  return Object.fromEntries(res.rows.map((r) => [r.t, `${r.n}:${r.h}`]))
}

export interface FuzzStats { name: string; cases: number; byOrigin: Record<string, number>; byStatus: Record<string, number> }

function parsesAsJson(raw: string): { ok: true; value: unknown } | { ok: false } {
  try {
    return { ok: true, value: JSON.parse(raw.replace(/^\uFEFF/, '')) }
  } catch {
    return { ok: false }
  }
}

/** Fuzz one route; throws (with a shrunk counterexample) on a 500, a malformed error, a 2xx for a refused body, or a 4xx that changed data. */
export async function fuzzRoute<P>(t: FuzzTarget<P>): Promise<FuzzStats> {
  const stats: FuzzStats = { name: t.name, cases: 0, byOrigin: {}, byStatus: {} }
  let before = await snapshot()
  const edges = edgeCases(t.valid)
  const random = t.numRuns ?? 100
  await fc.assert(
    fc.asyncProperty(fuzzBodies(t.valid), async (c) => {
      stats.cases++
      stats.byOrigin[c.origin] = (stats.byOrigin[c.origin] ?? 0) + 1
      const res = await call(t.handler, { method: t.method, cookie: t.cookie, params: t.params, rawBody: c.raw })
      stats.byStatus[res.status] = (stats.byStatus[res.status] ?? 0) + 1
      const ctx = `${t.name} (${c.origin}) → ${res.status} ${JSON.stringify(res.body)?.slice(0, 300)}; sent ${c.raw.slice(0, 300)}`
      expect(res.status, ctx).toBeLessThan(500)
      expect(res.status, ctx).toBeGreaterThanOrEqual(200)
      const after = await snapshot()
      if (res.status >= 400) {
        expectWellFormedError(res.status, res.body, c.raw)
        expect(after, `a ${res.status} changed saved data: ${ctx}`).toEqual(before)
        return
      }
      // A success is only plausible for a body that is JSON, of the route's shape.
      const parsed = parsesAsJson(c.raw)
      expect(parsed.ok, ctx).toBe(true)
      if (parsed.ok) {
        if (t.schema) expect(t.schema.safeParse(parsed.value).success, ctx).toBe(true)
        else expect(parsed.value !== null && typeof parsed.value === 'object' && !Array.isArray(parsed.value), ctx).toBe(true)
      }
      before = after
    }),
    // The probes count towards numRuns, so the random cases are added on top.
    { numRuns: random + edges.length, endOnFailure: true, examples: edges.map((c) => [c]) },
  )
  console.log(`fuzz cases run: ${t.name}: ${stats.cases} (${edges.length} edge probes + ${stats.cases - edges.length} random) — by origin ${JSON.stringify(stats.byOrigin)}, by status ${JSON.stringify(stats.byStatus)}`)
  return stats
}
