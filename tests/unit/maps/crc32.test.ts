import fc from 'fast-check'
import zlib from 'node:zlib'
import { describe, expect, it } from 'vitest'
import { crc32, int32LeBytes } from '../../../maps'

const ascii = (s: string) => new TextEncoder().encode(s)

describe('crc32 (CRC-32/ISO-HDLC)', () => {
  it('gives the catalogue check value for "123456789": 0xCBF43926', () => {
    expect(crc32(ascii('123456789'))).toBe(0xcbf43926)
  })

  it('is 0 for no bytes and unsigned', () => {
    expect(crc32(new Uint8Array(0))).toBe(0)
    expect(crc32(ascii('The quick brown fox jumps over the lazy dog'))).toBe(0x414fa339)
  })

  it('agrees with the zlib CRC-32 of Node (property)', () => {
    fc.assert(
      fc.property(fc.uint8Array({ maxLength: 300 }), (bytes) => {
        expect(crc32(bytes)).toBe(zlib.crc32(bytes))
      }),
    )
  })
})

describe('int32LeBytes', () => {
  it('writes each value as 4 bytes, least significant first', () => {
    expect([...int32LeBytes([1, -1, 0x12345678])]).toEqual([1, 0, 0, 0, 255, 255, 255, 255, 0x78, 0x56, 0x34, 0x12])
  })
})
