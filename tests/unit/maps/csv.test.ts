import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { fromCsv, MapFormatError, MapInputError, toCsv, type MapTable } from '../../../maps'
import { small } from '@/tests/support/fixtures'

/** The error fromCsv throws for `text`, so its fields can be checked. */
function csvError(text: string): MapFormatError {
  try {
    fromCsv(text, 'drive')
  } catch (e) {
    if (e instanceof MapFormatError) return e
    throw e
  }
  throw new Error('fromCsv accepted the input')
}

const strictlyIncreasing = (n: number) =>
  fc.uniqueArray(fc.double({ noNaN: true, noDefaultInfinity: true, min: -1e6, max: 1e6 }), { minLength: 2, maxLength: n, comparator: (a, b) => a === b || (a === 0 && b === 0) }).map((a) => [...a].sort((x, y) => x - y))

const randomTable: fc.Arbitrary<MapTable> = fc
  .tuple(fc.constantFrom('drive' as const, 'regen' as const), strictlyIncreasing(8), strictlyIncreasing(8))
  .chain(([kind, rowAxis, colAxis]) =>
    fc.array(fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: colAxis.length, maxLength: colAxis.length }), { minLength: rowAxis.length, maxLength: rowAxis.length }).map((values) => ({ kind, rowAxis, colAxis, values })),
  )

describe('toCsv', () => {
  it('writes the documented layout', () => {
    expect(toCsv(small())).toBe('pedal_pct\\speed_kmh,0,10,40\n0,0,0,0\n50,400,300,100\n100,800,700,400\n')
    expect(toCsv({ ...small(), kind: 'regen' }).split('\n')[0]).toBe('brake_pedal_pct\\speed_kmh,0,10,40')
  })

  it('round-trips awkward numbers exactly', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 1e-7, 33.333333333333336], colAxis: [-0, 0.1, 1e21], values: [[0.1 + 0.2, -0, 5e-324], [1.7976931348623157e308, -1e-300, 123456789.123], [2 / 3, -2 / 3, 1e-7]] }
    const back = fromCsv(toCsv(t), 'drive')
    expect(back).toEqual(t)
    expect(Object.is(back.values[0][1], -0)).toBe(true)
  })

  it('refuses to write a non-finite number rather than a "NaN" cell', () => {
    const t = small()
    t.values[1][2] = Number.NaN
    expect(() => toCsv(t)).toThrow(MapInputError)
    expect(() => toCsv(t)).toThrow('cannot write CSV: value in row 2, column 3 is NaN')
  })

  it('round-trips random tables exactly (property)', () => {
    fc.assert(
      fc.property(randomTable, (t) => {
        expect(fromCsv(toCsv(t), t.kind)).toStrictEqual(t)
      }),
      { numRuns: 300 },
    )
  })
})

describe('fromCsv accepts what spreadsheets write', () => {
  it('semicolon delimiter with decimal comma, CRLF, BOM and trailing empty lines', () => {
    const text = '\uFEFFpedal_pct\\speed_kmh;0;10;40\r\n0;0;0;0\r\n50;400;300,5;100\r\n100;800;700;400\r\n\r\n\r\n'
    const t = fromCsv(text, 'drive')
    expect(t.values[1][2]).toBe(100)
    expect(t.values[1][1]).toBe(300.5)
    expect(t.rowAxis).toEqual([0, 50, 100])
  })

  it('quoted cells, spaces around numbers and any corner text', () => {
    const t = fromCsv('"pedal, %","0"," 10 ",40\n0,0,0,0\n100,"1,5e3",2,3\n'.replace('"1,5e3"', '"1.5e3"'), 'regen')
    expect(t).toEqual({ kind: 'regen', rowAxis: [0, 100], colAxis: [0, 10, 40], values: [[0, 0, 0], [1500, 2, 3]] })
    expect(fromCsv(',0,10\n0,1,2\n100,3,4', 'drive').values).toEqual([[1, 2], [3, 4]])
  })
})

describe('fromCsv refuses bad input, naming line and column', () => {
  it('a non-number', () => {
    const e = csvError('pedal_pct\\speed_kmh,0,10,40\n0,0,0,0\n50,400,300,100\n100,800,abc,400\n')
    expect(e).toMatchObject({ code: 'not-a-number', line: 4, column: 3 })
    expect(e.message).toBe("line 4, column 3: 'abc' is not a number")
  })

  it('empty cells and values like Infinity or hex are not numbers', () => {
    expect(csvError('x,0,10\n0,,1\n100,1,1\n')).toMatchObject({ line: 2, column: 2, message: 'line 2, column 2: an empty cell is not a number' })
    expect(csvError('x,0,10\n0,Infinity,1\n100,1,1\n')).toMatchObject({ line: 2, column: 2 })
    expect(csvError('x,0,0x10\n0,1,1\n100,1,1\n')).toMatchObject({ line: 1, column: 3 })
  })

  it('a ragged row', () => {
    expect(csvError('x,0,10,40\n0,0,0,0\n50,400,300\n100,1,2,3\n')).toMatchObject({ code: 'ragged-row', line: 3, column: 4, message: 'line 3, column 4: the row has 3 cells but the first row has 4' })
    expect(csvError('x,0,10\n0,0,0,9\n100,1,2\n')).toMatchObject({ code: 'ragged-row', line: 2, column: 4 })
  })

  it('non-increasing breakpoints on either axis', () => {
    expect(csvError('x,0,20,20\n0,0,0,0\n100,1,2,3\n')).toMatchObject({ code: 'axis-order', line: 1, column: 4, message: 'line 1, column 4: speed breakpoint 20 is not greater than the previous one (20)' })
    expect(csvError('x,0,20\n50,0,0\n10,1,2\n')).toMatchObject({ code: 'axis-order', line: 3, column: 1 })
  })

  it('an empty file', () => {
    expect(csvError('')).toMatchObject({ code: 'empty-file', line: 1, column: 1, message: 'line 1, column 1: the file is empty' })
    expect(csvError('\uFEFF\r\n  \n')).toMatchObject({ code: 'empty-file' })
  })

  it('too few rows or columns, too many rows', () => {
    expect(csvError('x,0,10\n0,1,2\n')).toMatchObject({ code: 'row-count', line: 3, column: 1 })
    expect(csvError('x,0,10\n')).toMatchObject({ code: 'row-count', line: 2 })
    expect(csvError('x,0\n0,1\n100,2\n')).toMatchObject({ code: 'column-count', line: 1 })
    const rows = Array.from({ length: 65 }, (_, i) => `${i},0,0`).join('\n')
    expect(csvError(`x,0,10\n${rows}\n`)).toMatchObject({ code: 'row-count', line: 66 })
  })

  it('a blank line inside the table, an unclosed quote, a corner naming the other kind', () => {
    expect(csvError('x,0,10\n0,1,2\n\n100,3,4\n')).toMatchObject({ code: 'empty-line', line: 3 })
    expect(csvError('x,0,10\n0,"1,2\n100,3,4\n')).toMatchObject({ code: 'bad-quote', line: 2 })
    expect(csvError('brake_pedal_pct\\speed_kmh,0,10\n0,1,2\n100,3,4\n')).toMatchObject({ code: 'kind-mismatch', line: 1, column: 1 })
  })
})
