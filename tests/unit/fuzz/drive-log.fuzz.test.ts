// Fuzzing the server-side drive-log readers with random bytes and random options: the streaming
// reader (`ingestLog`, what the upload job runs) and the one-shot one (`ingestLogText`) may only
// ever throw LogFormatError with a line ≥ 0 and a 1-based column (or none), never a TypeError or a
// RangeError (which would mark an upload as failed with a meaningless message), and never hang.
// The two readers are documented to agree, so they must also agree on accept vs refuse.
import fc from 'fast-check'
import { afterAll, describe, expect, it } from 'vitest'
import { ingestLog, ingestLogText, type LogIngestResult, type LogReadOptions } from '@/app/_lib/reports/log-ingest'
import { LogFormatError } from '@/physics/drive-log'
import { SURFACE_IDS } from '@/physics'
import { generateLog, LOG_GEN_COLUMNS } from '@/tests/support/log-generator'

/** The longest one case may take; a normal parse of these sizes is well under 50 ms. */
const SLOW_MS = 3_000
const counts: Record<string, number> = {}
const HEADER = 'time_s,road_speed_kmh,wheel_speed_kmh,accel_pedal_pct'
const MAP = { rowAxis: [0, 50, 100], colAxis: [0, 20, 60] }

type Outcome = { ok: true; samples: number } | { ok: false; code: string }

function checkError(e: unknown): Outcome {
  if (!(e instanceof LogFormatError)) throw e
  expect(Number.isInteger(e.line)).toBe(true)
  expect(e.line).toBeGreaterThanOrEqual(0)
  if (e.column !== null) {
    expect(Number.isInteger(e.column.index)).toBe(true)
    expect(e.column.index).toBeGreaterThanOrEqual(1)
    expect(typeof e.column.name).toBe('string')
  }
  expect(e.message.length).toBeGreaterThan(0)
  return { ok: false, code: e.code }
}

function checkResult(r: LogIngestResult): Outcome {
  expect(r.samples).toBeGreaterThan(0)
  expect(Number.isFinite(r.bytes)).toBe(true)
  return { ok: true, samples: r.samples }
}

function oneShot(text: string, opts: LogReadOptions): Outcome {
  try {
    return checkResult(ingestLogText(text, opts))
  } catch (e) {
    return checkError(e)
  }
}

async function streamed(chunks: Uint8Array[], opts: LogReadOptions): Promise<Outcome> {
  async function* source() { for (const c of chunks) yield c }
  try {
    return checkResult(await ingestLog(source(), opts))
  } catch (e) {
    return checkError(e)
  }
}

/** Split bytes at the given cut points (sorted, deduplicated), so chunk boundaries land anywhere. */
function split(bytes: Uint8Array, cuts: number[]): Uint8Array[] {
  const at = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b)
  const out: Uint8Array[] = []
  let prev = 0
  for (const c of [...at, bytes.length]) {
    if (c > prev) out.push(bytes.subarray(prev, c))
    prev = Math.max(prev, c)
  }
  return out
}

/** Run both readers on the same bytes: each may only refuse with a typed error, and they agree. */
async function both(name: string, bytes: Uint8Array, cuts: number[], opts: LogReadOptions): Promise<void> {
  counts[name] = (counts[name] ?? 0) + 1
  const started = performance.now()
  const s = await streamed(split(bytes, cuts), opts)
  let text: string | null = null
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes)
  } catch {
    // Not UTF-8: only the byte reader sees this file; it must refuse it.
    expect(s).toMatchObject({ ok: false, code: 'not-csv' })
  }
  if (text !== null) {
    const o = oneShot(text, opts)
    expect({ text, ok: s.ok }).toEqual({ text, ok: o.ok })
    if (s.ok && o.ok) expect(s.samples).toBe(o.samples)
  }
  expect(performance.now() - started).toBeLessThan(SLOW_MS)
}

const enc = new TextEncoder()
const cuts = fc.array(fc.nat(), { maxLength: 6 })
const cell = fc.oneof(
  fc.double().map(String),
  fc.integer({ min: -200, max: 200 }).map(String),
  fc.constantFrom('', ' ', 'NaN', 'nan', 'Infinity', '1e999', '-0', '0x1f', '"', '""', '"1"', '"1,2"', '"\n"', '\r', ',', ';', '\t', '\u0000', 'é', '١', '\u00a0'),
  fc.string({ maxLength: 6 }),
)
// Surfaces come from the report's validated enum, so only known ids reach the reader.
const surface = fc.constantFrom(undefined, ...SURFACE_IDS)
/** Options as a caller may pass them, including mappings an upload form could send. */
const opts: fc.Arbitrary<LogReadOptions> = fc.record(
  {
    map: fc.constantFrom(undefined, MAP),
    kind: fc.constantFrom(undefined, 'drive' as const, 'regen' as const),
    mapping: fc.dictionary(fc.constantFrom(...LOG_GEN_COLUMNS, 'road_speed_mph', 'wheel_speed_rpm', 'wheel_speed_rads', '__proto__', 'constructor', 'toString', 'nonsense'), fc.oneof(fc.constantFrom(...LOG_GEN_COLUMNS), fc.string({ maxLength: 10 })), { maxKeys: 4 }),
    wheelRadiusM: fc.constantFrom(undefined, 0.5, 0, -1, Number.NaN, Number.POSITIVE_INFINITY, 1e-12),
  },
  { requiredKeys: [] },
).chain((o) => surface.map((s) => ({ ...o, ...(s ? { surface: s } : {}) }) as LogReadOptions))

describe('fuzz: drive-log readers only throw LogFormatError, agree with each other, never hang', () => {
  afterAll(() => console.log(`fuzz cases run (drive-log readers): ${JSON.stringify(counts)}`))

  it('random bytes (including invalid UTF-8 and NUL) in random chunk splits', async () => {
    await fc.assert(fc.asyncProperty(fc.uint8Array({ maxLength: 400 }), cuts, opts, (b, c, o) => both('random bytes', b, c, o)), { numRuns: 400 })
  })

  it('random unicode text', async () => {
    await fc.assert(fc.asyncProperty(fc.string({ maxLength: 300, unit: 'grapheme' }), cuts, opts, (t, c, o) => both('random text', enc.encode(t), c, o)), { numRuns: 300 })
  })

  it('a valid header with random rows of awkward cells, random line ends and delimiters', async () => {
    const rows = fc.array(fc.array(cell, { maxLength: 7 }), { maxLength: 25 })
    await fc.assert(
      fc.asyncProperty(rows, fc.constantFrom('\n', '\r\n', '\r'), fc.constantFrom(',', ';', '\t'), fc.boolean(), cuts, opts, (r, eol, d, bom, c, o) => {
        const text = (bom ? '\uFEFF' : '') + [HEADER.replaceAll(',', d), ...r.map((x) => x.join(d))].join(eol)
        return both('header + random rows', enc.encode(text), c, o)
      }),
      { numRuns: 400 },
    )
  })

  it('a generated truck log with random bytes overwritten, inserted or deleted', async () => {
    const good = enc.encode(generateLog({ durationS: 4, rateHz: 20, seed: 3 }).csv)
    const edit = fc.tuple(fc.nat(good.length), fc.nat(3), fc.uint8Array({ maxLength: 3 }))
    await fc.assert(
      fc.asyncProperty(fc.array(edit, { minLength: 1, maxLength: 5 }), cuts, opts, async (edits, c, o) => {
        let b: Uint8Array = good
        for (const [at, del, ins] of edits) b = new Uint8Array([...b.subarray(0, at), ...ins, ...b.subarray(at + del)])
        await both('generated log, edited', b, c, o)
      }),
      { numRuns: 300 },
    )
  })

  it('degenerate shapes: an unclosed quote, a huge header line, only delimiters, only line ends', async () => {
    const shape = fc.oneof(
      fc.integer({ min: 1, max: 100_000 }).map((n) => `${HEADER}\n0,1,1,1\n"${'x'.repeat(n)}`),
      fc.integer({ min: 1, max: 100_000 }).map((n) => 'a,'.repeat(n)),
      fc.integer({ min: 1, max: 50_000 }).map((n) => ','.repeat(n)),
      fc.integer({ min: 1, max: 50_000 }).map((n) => `${HEADER}${'\n'.repeat(n)}`),
      fc.integer({ min: 1, max: 5_000 }).map((n) => `${HEADER}\n${Array.from({ length: n }, (_, i) => `${i},1,1,1`).join('\n')}\n`),
    )
    await fc.assert(fc.asyncProperty(shape, cuts, (t, c) => both('degenerate shapes', enc.encode(t), c, { map: MAP })), { numRuns: 100 })
    // "Never hangs" is checked per case (SLOW_MS); 100 cases of up to 100 kB can take longer than
    // vitest's 5 s default when the suite shares two cores, which says nothing about a hang.
  }, 60_000)
})
