// Bytes → text for the ingest: native validation plus decoding must accept and refuse exactly what the
// WHATWG fatal UTF-8 decoder does, wherever the chunks are cut (characters split across chunks included).
import fc from 'fast-check'
import { describe, expect, it } from 'vitest'
import { textChunks } from '@/app/_lib/reports/log-ingest/text-source'
import { LogFormatError } from '@/physics'

async function decode(bytes: Uint8Array, cuts: number[]): Promise<string | LogFormatError> {
  const at = [...new Set(cuts.map((c) => c % (bytes.length + 1)))].sort((a, b) => a - b)
  async function* source() { let prev = 0; for (const c of [...at, bytes.length]) { yield bytes.subarray(prev, c); prev = c } }
  try {
    let out = ''
    for await (const t of textChunks(source(), { bytes: 0 })) out += t
    return out
  } catch (e) { if (e instanceof LogFormatError) return e; throw e }
}

function reference(bytes: Uint8Array): string | null {
  try { return new TextDecoder('utf-8', { fatal: true, ignoreBOM: true }).decode(bytes) } catch { return null }
}

describe('textChunks', () => {
  it('property: the text of the fatal UTF-8 decoder, or a not-csv refusal where it throws', async () => {
    // Bytes drawn around multi-byte sequences: leads, continuations, overlongs, surrogates, and plain ASCII.
    const byte = fc.oneof(fc.integer({ min: 1, max: 0x7f }), fc.integer({ min: 0x80, max: 0xff }), fc.constantFrom(0xc3, 0xa9, 0xe2, 0x82, 0xac, 0xf0, 0x9f, 0x98, 0x80, 0xed, 0xa0, 0xc0, 0xf5))
    await fc.assert(fc.asyncProperty(fc.array(byte, { maxLength: 40 }), fc.array(fc.nat(), { maxLength: 5 }), async (b, cuts) => {
      const bytes = Uint8Array.from(b)
      const want = reference(bytes)
      const got = await decode(bytes, cuts)
      if (want === null) expect(got).toMatchObject({ code: 'not-csv' })
      else expect(got).toBe(want)
    }), { numRuns: 3000 })
  })
  it('a character cut at every byte reads whole; one cut off at the end is refused', async () => {
    const bytes = new TextEncoder().encode('a,€,😀,é\n')
    for (let c = 1; c < bytes.length; c++) expect(await decode(bytes, [c])).toBe('a,€,😀,é\n')
    expect(await decode(bytes.subarray(0, 4), [3])).toMatchObject({ code: 'not-csv', message: 'the file ends inside a UTF-8 character' })
  })
})
