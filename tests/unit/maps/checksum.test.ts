import { readdirSync, readFileSync } from 'node:fs'
import path from 'node:path'
import { describe, expect, it } from 'vitest'
import { checksum, sha256Hex } from '@/db/checksum'
import { canonicalJson, MapInputError, setValue, type MapTable } from '../../../maps'
import { small } from '@/tests/support/fixtures'

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

describe('sha256Hex (node:crypto on the server)', () => {
  // Test vectors from NIST FIPS 180-2, Appendix B (SHA-256 examples), and the empty message.
  it('"abc" (FIPS 180-2 B.1)', () => {
    expect(sha256Hex('abc')).toBe('ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad')
  })

  it('the empty string', () => {
    expect(sha256Hex('')).toBe('e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855')
  })

  it('the 448-bit two-block message (FIPS 180-2 B.2)', () => {
    expect(sha256Hex('abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq')).toBe('248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1')
  })

  it('one million "a" (FIPS 180-2 B.3)', () => {
    expect(sha256Hex('a'.repeat(1_000_000))).toBe('cdc76e5c9914fb9281a1c7e284d73e67f1809a48a497200e046d39ccc7112cd0')
  })

  it('encodes strings as UTF-8, and hashes bytes as given', () => {
    // Expected digests computed with Python's hashlib (independent implementation).
    expect(sha256Hex('N·m')).toBe('ff5e02b29ab8e616b87489321be704e175086c7232ca9090c6ab1e2f800260e6')
    expect(sha256Hex(new Uint8Array(64).map((_, i) => (i * 31) & 0xff))).toBe('a08f82c23e6c13629d8e33d0d2a13005fb104363eb793b5e8842044951d27764')
  })
})

describe('checksum', () => {
  it('is the SHA-256 of the canonical JSON', () => {
    const t = small()
    expect(checksum(t)).toBe(sha256Hex(canonicalJson(t)))
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

  it('is not reachable from the browser-safe modules: maps/ and physics/ import no node: module', () => {
    const root = path.resolve(__dirname, '../../..')
    const files = ['maps', 'physics'].flatMap((dir) =>
      readdirSync(path.join(root, dir), { recursive: true, encoding: 'utf8' }).filter((f) => f.endsWith('.ts')).map((f) => path.join(root, dir, f)),
    )
    expect(files.length).toBeGreaterThan(40)
    const offenders = files.filter((f) => /from ['"](node:|crypto['"])/.test(readFileSync(f, 'utf8')))
    expect(offenders).toEqual([])
  })
})
