import { createHash } from 'node:crypto'
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { sha256Hex } from '../../../maps'

describe('sha256Hex', () => {
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

  it('encodes strings as UTF-8', () => {
    expect(sha256Hex('N·m')).toBe(createHash('sha256').update('N·m', 'utf8').digest('hex'))
  })

  it('agrees with node:crypto around the padding boundaries and at random (property)', () => {
    for (const n of [55, 56, 63, 64, 65, 119, 120, 128]) {
      const bytes = new Uint8Array(n).map((_, i) => (i * 31) & 0xff)
      expect(sha256Hex(bytes)).toBe(createHash('sha256').update(bytes).digest('hex'))
    }
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 400 }), (bytes) => {
        expect(sha256Hex(bytes)).toBe(createHash('sha256').update(bytes).digest('hex'))
      }),
    )
  })
})
