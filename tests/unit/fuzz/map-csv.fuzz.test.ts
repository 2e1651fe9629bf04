// Fuzzing the pure CSV map reader: whatever text arrives (a paste, a wrong file, a half-saved
// spreadsheet), fromCsv either returns a well-formed table or throws a MapFormatError that points at
// a real line and cell. Any other exception (TypeError, RangeError) would surface as a 500 in the
// import route, so it is a bug here.
import fc from 'fast-check'
import { afterAll, describe, expect, it } from 'vitest'
import { CSV_CORNER, fromCsv, MapFormatError, MAX_BREAKPOINTS, MIN_BREAKPOINTS, toCsv, type MapKind, type MapTable } from '@/maps'

/** The longest one case may take; far above a normal parse (< 1 ms), far below a hang. */
const SLOW_MS = 2_000

const counts: Record<string, number> = {}

function expectTypedOutcome(name: string, text: string, kind: MapKind): void {
  counts[name] = (counts[name] ?? 0) + 1
  const started = performance.now()
  let table: MapTable | undefined
  try {
    table = fromCsv(text, kind)
  } catch (e) {
    if (!(e instanceof MapFormatError)) throw e
    // 1-based positions that a reader can find in the file.
    expect(Number.isInteger(e.line)).toBe(true)
    expect(Number.isInteger(e.column)).toBe(true)
    expect(e.line!).toBeGreaterThanOrEqual(1)
    expect(e.column!).toBeGreaterThanOrEqual(1)
    expect(e.line!).toBeLessThanOrEqual(text.split(/\r\n|\n|\r/).length + 1)
    expect(e.message.length).toBeGreaterThan(0)
    expect(typeof e.code).toBe('string')
  }
  if (table) {
    // A table it accepts is one the rest of the app can use.
    expect(table.kind).toBe(kind)
    expect(table.rowAxis.length).toBeGreaterThanOrEqual(MIN_BREAKPOINTS)
    expect(table.colAxis.length).toBeLessThanOrEqual(MAX_BREAKPOINTS)
    expect(table.values.length).toBe(table.rowAxis.length)
    for (const row of table.values) expect(row.length).toBe(table.colAxis.length)
    for (const v of [...table.rowAxis, ...table.colAxis, ...table.values.flat()]) expect(Number.isFinite(v)).toBe(true)
  }
  expect(performance.now() - started).toBeLessThan(SLOW_MS)
}

const kind = fc.constantFrom<MapKind>('drive', 'regen')
/** Cells a spreadsheet (or a careless hand) might write. */
const cell = fc.oneof(
  fc.double().map(String),
  fc.integer({ min: -5000, max: 5000 }).map(String),
  fc.constantFrom('', ' ', 'NaN', 'Infinity', '-Infinity', '1e999', '-0', '0x1f', '1,5', '1.5.5', '"', '""', '"1"', '" 2 "', '"a,b"', '\t3', '1e-400', '٣', '１', '\u00a0', 'é', CSV_CORNER.drive, CSV_CORNER.regen),
  fc.string({ maxLength: 8 }),
)
const eol = fc.constantFrom('\n', '\r\n', '\r')
const delimiter = fc.constantFrom(',', ';', '\t')

const valid: MapTable = { kind: 'drive', rowAxis: [0, 50, 100], colAxis: [0, 20, 60], values: [[0, 0, 0], [800, 700, 400], [1600, 1500, 800]] }

describe('fuzz: fromCsv only ever throws MapFormatError with a line and column', () => {
  afterAll(() => console.log(`fuzz cases run (fromCsv): ${JSON.stringify(counts)}`))

  it('arbitrary text (any unicode, binary)', () => {
    fc.assert(fc.property(fc.oneof(fc.string({ maxLength: 400, unit: 'binary' }), fc.string({ maxLength: 400, unit: 'grapheme' })), kind, (t, k) => expectTypedOutcome('arbitrary text', t, k)), { numRuns: 1000 })
  })

  it('CSV-shaped text: random grids of awkward cells, delimiters and line ends', () => {
    const grid = fc.array(fc.array(cell, { minLength: 0, maxLength: 8 }), { minLength: 0, maxLength: 10 })
    fc.assert(
      fc.property(grid, delimiter, eol, fc.boolean(), fc.boolean(), kind, (rows, d, e, bom, trailing, k) => {
        const text = (bom ? '\uFEFF' : '') + rows.map((r) => r.join(d)).join(e) + (trailing ? e : '')
        expectTypedOutcome('csv-shaped grids', text, k)
      }),
      { numRuns: 1000 },
    )
  })

  it('a valid file with random characters overwritten, inserted or deleted', () => {
    const good = toCsv(valid)
    const edit = fc.tuple(fc.nat(good.length), fc.nat(4), fc.string({ maxLength: 3, unit: 'binary' }))
    fc.assert(
      fc.property(fc.array(edit, { minLength: 1, maxLength: 6 }), kind, (edits, k) => {
        let t = good
        for (const [at, del, ins] of edits) t = t.slice(0, at) + ins + t.slice(at + del)
        expectTypedOutcome('valid file, edited', t, k)
      }),
      { numRuns: 1000 },
    )
  })

  it('oversized and degenerate shapes: too many rows or columns, one huge line, many blank lines', () => {
    const shape = fc.oneof(
      fc.integer({ min: 0, max: 200 }).map((n) => `${CSV_CORNER.drive},${Array.from({ length: n }, (_, i) => i).join(',')}\n0,${Array.from({ length: n }, () => 1).join(',')}\n`),
      fc.integer({ min: 0, max: 200 }).map((n) => `${CSV_CORNER.drive},0,10\n${Array.from({ length: n }, (_, i) => `${i},1,2`).join('\n')}\n`),
      fc.integer({ min: 1, max: 200_000 }).map((n) => 'x'.repeat(n)),
      fc.integer({ min: 1, max: 5_000 }).map((n) => `${CSV_CORNER.drive},0,10\n0,1,2\n${'\n'.repeat(n)}100,3,4\n`),
      fc.integer({ min: 1, max: 20_000 }).map((n) => '"'.repeat(n)),
      fc.integer({ min: 1, max: 20_000 }).map((n) => ','.repeat(n)),
    )
    fc.assert(fc.property(shape, kind, (t, k) => expectTypedOutcome('degenerate shapes', t, k)), { numRuns: 300 })
  })

  it('round trip: any valid table written with toCsv reads back equal', () => {
    const axis = (n: number) => fc.uniqueArray(fc.double({ min: -1e6, max: 1e6, noNaN: true, noDefaultInfinity: true }), { minLength: n, maxLength: n }).map((a) => a.map((x) => (Object.is(x, -0) ? 0 : x)).sort((p, q) => p - q))
    const table = fc.tuple(fc.integer({ min: MIN_BREAKPOINTS, max: 8 }), fc.integer({ min: MIN_BREAKPOINTS, max: 8 }), kind).chain(([r, c, k]) =>
      fc.record({
        kind: fc.constant(k),
        rowAxis: axis(r),
        colAxis: axis(c),
        values: fc.array(fc.array(fc.double({ min: -1e5, max: 1e5, noNaN: true }), { minLength: c, maxLength: c }), { minLength: r, maxLength: r }),
      }),
    ).filter((t) => new Set(t.rowAxis).size === t.rowAxis.length && new Set(t.colAxis).size === t.colAxis.length)
    fc.assert(
      fc.property(table, (t) => {
        counts['round trip'] = (counts['round trip'] ?? 0) + 1
        const back = fromCsv(toCsv(t), t.kind)
        expect(back.rowAxis).toEqual(t.rowAxis)
        expect(back.colAxis).toEqual(t.colAxis)
        expect(back.values.flat().map((v) => (Object.is(v, -0) ? 0 : v))).toEqual(t.values.flat().map((v) => (Object.is(v, -0) ? 0 : v)))
      }),
      { numRuns: 300 },
    )
  })
})
