import { createHash } from 'node:crypto'
import { describe, expect, it } from 'vitest'
import { canonicalJson, checksum, MapInputError, setValue, type MapTable } from '../../../maps'
import { small } from './fixtures'

describe('canonicalJson', () => {
  it('has fixed key order, no whitespace and shortest numbers', () => {
    const t: MapTable = { kind: 'drive', rowAxis: [0, 100], colAxis: [0, 50], values: [[0, 0.1 + 0.2], [1500, 1e21]] }
    expect(canonicalJson(t)).toBe('{"kind":"drive","rowAxis":[0,100],"colAxis":[0,50],"values":[[0,0.30000000000000004],[1500,1e+21]]}')
  })

  it('ignores the key order of the input object and the sign of zero', () => {
    const a = small()
    const b: MapTable = { values: a.values, colAxis: a.colAxis, rowAxis: a.rowAxis, kind: a.kind }
    expect(canonicalJson(b)).toBe(canonicalJson(a))
    expect(checksum(setValue(a, { r0: 0, c0: 0, r1: 0, c1: 0 }, -0))).toBe(checksum(a))
  })

  it('refuses non-finite numbers with a typed error', () => {
    expect(() => canonicalJson({ ...small(), values: [[Number.NaN, 0, 0], [0, 0, 0], [0, 0, 0]] })).toThrow(MapInputError)
  })
})

describe('checksum', () => {
  it('is the SHA-256 of the canonical JSON (checked against node:crypto)', () => {
    const t = small()
    expect(checksum(t)).toBe(createHash('sha256').update(canonicalJson(t), 'utf8').digest('hex'))
    expect(checksum(t)).toMatch(/^[0-9a-f]{64}$/)
  })

  it('changes with any value, breakpoint or the kind', () => {
    const t = small()
    const sums = new Set([
      checksum(t),
      checksum(setValue(t, { r0: 2, c0: 2, r1: 2, c1: 2 }, 400.0001)),
      checksum({ ...t, colAxis: [0, 10, 41] }),
      checksum({ ...t, kind: 'regen' }),
    ])
    expect(sums.size).toBe(4)
  })
})
