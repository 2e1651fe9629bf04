import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { fromJson, MapFormatError, MapInputError, mapTableSchema, toJson, type MapTable } from '../../../maps'
import { insideTable, small } from '@/tests/support/fixtures'

function jsonError(text: string): MapFormatError {
  try {
    fromJson(text)
  } catch (e) {
    if (e instanceof MapFormatError) return e
    throw e
  }
  throw new Error('fromJson accepted the input')
}

describe('toJson / fromJson', () => {
  it('round-trips, with a format tag and version', () => {
    for (const t of [small(), insideTable('regen')]) expect(fromJson(toJson(t))).toEqual(t)
    expect(JSON.parse(toJson(small()))).toMatchObject({ format: 'mapwright-map-table', version: 1, kind: 'drive' })
  })

  it('round-trips random finite values (property)', () => {
    fc.assert(
      fc.property(fc.array(fc.double({ noNaN: true, noDefaultInfinity: true }), { minLength: 4, maxLength: 4 }), (v) => {
        const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 50], values: [v.slice(0, 2).map((x) => x + 0), v.slice(2).map((x) => x + 0)] }
        expect(fromJson(toJson(t))).toEqual(t)
      }),
    )
  })

  it('refuses to write a non-finite number (JSON would make it null)', () => {
    expect(() => toJson({ ...small(), colAxis: [0, 10, Infinity] })).toThrow(MapInputError)
  })

  it('accepts a bare table without the tag', () => {
    expect(fromJson('{"kind":"regen","rowAxis":[0,100],"colAxis":[0,80],"values":[[0,300],[0,900]]}').kind).toBe('regen')
  })

  it('reports syntax errors with line and column', () => {
    const e = jsonError('{\n  "kind": "drive",\n  oops\n}')
    expect(e).toMatchObject({ code: 'json-syntax', line: 3, column: 3 })
    expect(e.message).toMatch(/^line 3, column 3: not valid JSON/)
  })

  it('reports the path at fault', () => {
    const e = jsonError('{"kind":"drive","rowAxis":[0,100],"colAxis":[0,50],"values":[[0,0],[1,"x"]]}')
    expect(e).toMatchObject({ code: 'json-content', path: ['values', 1, 1] })
    expect(e.message).toBe('at values[1][1]: must be a finite number')
    expect(jsonError('{"kind":"drive","rowAxis":[0,0],"colAxis":[0,50],"values":[[0,0],[1,2]]}').path).toEqual(['rowAxis', 1])
    expect(jsonError('{"format":"something-else","kind":"drive"}').code).toBe('json-format')
    expect(jsonError('{"version":2}').code).toBe('json-version')
    expect(jsonError('[1,2]').code).toBe('json-content')
  })
})

describe('mapTableSchema', () => {
  const ok = small()
  const issues = (x: unknown) => {
    const r = mapTableSchema.safeParse(x)
    return r.success ? [] : r.error.issues.map((i) => i.path.join('.'))
  }

  it('accepts a valid table', () => {
    expect(mapTableSchema.parse(ok)).toEqual(ok)
  })

  it('refuses NaN, infinities, wrong sizes, non-increasing axes and a wrong shape', () => {
    expect(issues({ ...ok, values: [[0, 0, Number.NaN], [0, 0, 0], [0, 0, 0]] })).toEqual(['values.0.2'])
    expect(issues({ ...ok, colAxis: [0, 10, Infinity] })).toEqual(['colAxis.2'])
    expect(issues({ ...ok, rowAxis: [0], values: [[0, 0, 0]] })).toEqual(['rowAxis'])
    const many = Array.from({ length: 65 }, (_, i) => i)
    expect(issues({ ...ok, colAxis: many, values: ok.values.map(() => many.map(() => 0)) })).toEqual(['colAxis'])
    expect(issues({ ...ok, colAxis: [0, 40, 10] })).toEqual(['colAxis.2'])
    expect(issues({ ...ok, values: ok.values.slice(1) })).toEqual(['values'])
    expect(issues({ ...ok, values: [[0, 0], [0, 0, 0], [0, 0, 0]] })).toEqual(['values.0'])
    expect(issues({ ...ok, kind: 'coast' })).toEqual(['kind'])
  })
})
