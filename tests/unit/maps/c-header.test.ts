import { spawnSync } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { checksum, verifiedChecksum } from '@/db/checksum'
import { cIdentifier, commentText, crc32, int32LeBytes, MapInputError, SAFETY_CAUTION, toCHeader, type CHeaderMeta, type MapTable } from '../../../maps'
import { insideTable, small } from '@/tests/support/fixtures'

const table: MapTable = {
  kind: 'drive',
  rowAxis: [0, 12.5, 50, 100],
  colAxis: [0, 10, 20, 40, 80],
  values: [
    [0, 0, 0, 0, 0],
    [300, 280.25, 250, 200, 100],
    [900, 850, 700.04, 500, 250],
    [1800, 1700, 1400, 1000, 500],
  ],
}
const meta: CHeaderMeta = { name: 'drive main', revision: 7, mapName: 'Drive main', vehicleProgram: '6×4 tractor, 40 t', checksum: checksum(table) }

/** Numbers inside `static const int32_t <array>[...] = { ... };`. */
function arrayNumbers(header: string, array: string): number[] {
  const m = new RegExp(`static const int32_t ${array}\\[[^=]*= \\{([^;]*)\\};`).exec(header)
  if (!m) throw new Error(`array ${array} not found`)
  return m[1].replace(/\/\*[^*]*\*\//g, '').match(/-?\d+/g)?.map(Number) ?? []
}

const define = (header: string, name: string) => new RegExp(`#define ${name} (\\S+)`).exec(header)?.[1]

const dir = mkdtempSync(path.join(tmpdir(), 'mapwright-cheader-'))
afterAll(() => rmSync(dir, { recursive: true, force: true }))

describe('toCHeader', () => {
  const h = toCHeader(table, meta)

  it('holds the breakpoints and values as int32 tenths, with the right counts', () => {
    expect(define(h, 'DRIVE_MAIN_ROWS')).toBe('4')
    expect(define(h, 'DRIVE_MAIN_COLS')).toBe('5')
    expect(define(h, 'DRIVE_MAIN_SCALE')).toBe('10')
    expect(define(h, 'DRIVE_MAIN_REVISION')).toBe('7u')
    expect(define(h, 'DRIVE_MAIN_IS_REGEN')).toBe('0')
    expect(arrayNumbers(h, 'drive_main_pedal_axis')).toEqual([0, 125, 500, 1000])
    expect(arrayNumbers(h, 'drive_main_speed_axis')).toEqual([0, 100, 200, 400, 800])
    const values = arrayNumbers(h, 'drive_main_values')
    expect(values.length).toBe(20)
    // 280.25 N·m → 2802.5 → 2803 (half away from zero); 700.04 → 7000.4 → 7000.
    expect(values.slice(5, 10)).toEqual([3000, 2803, 2500, 2000, 1000])
    expect(values[12]).toBe(7000)
  })

  it('carries CRC-32s over the documented little-endian int32 bytes', () => {
    const fixed = table.values.flat().map((v) => Math.round(v * 10))
    expect(define(h, 'DRIVE_MAIN_VALUES_CRC32')).toBe('0x' + crc32(int32LeBytes(fixed)).toString(16).toUpperCase().padStart(8, '0') + 'u')
    const all = [...table.rowAxis.map((v) => v * 10), ...table.colAxis.map((v) => v * 10), ...fixed]
    expect(define(h, 'DRIVE_MAIN_TABLE_CRC32')).toBe('0x' + crc32(int32LeBytes(all)).toString(16).toUpperCase().padStart(8, '0') + 'u')
  })

  it('has the include guard, stdint, the content checksum and the safety caution', () => {
    expect(h).toContain('#ifndef MAPWRIGHT_DRIVE_MAIN_H')
    expect(h).toContain('#include <stdint.h>')
    expect(h).toContain(checksum(table))
    for (const line of SAFETY_CAUTION) expect(h).toContain(line)
    expect(h).toContain('closed course before it is used on public roads')
    expect(h).toContain('6x4 tractor, 40 t')
    expect(/^[\x20-\x7e\n]*$/.test(h)).toBe(true)
  })

  it('gives the CRCs stated for the worked example in docs/map-formats.md', () => {
    const doc = toCHeader(small(), { name: 'drive_example', revision: 1, mapName: 'Drive example', vehicleProgram: 'Example 4x2', checksum: checksum(small()) })
    expect(define(doc, 'DRIVE_EXAMPLE_VALUES_CRC32')).toBe('0xA6ACF816u')
    expect(define(doc, 'DRIVE_EXAMPLE_TABLE_CRC32')).toBe('0x9C724DB3u')
    expect(checksum(small())).toBe('15c436cc04b9f54db17ee41dc6fa98e079dc1f171f95e154137d3643281fd736')
  })

  it('is deterministic without generatedAt, and shows it when given', () => {
    expect(toCHeader(table, meta)).toBe(h)
    expect(toCHeader(table, { ...meta, generatedAt: new Date('2025-01-02T03:04:05Z') })).toContain('Generated: 2025-01-02T03:04:05.000Z')
  })

  it('is valid C (gcc -fsyntax-only)', () => {
    const r = spawnSync('gcc', ['-fsyntax-only', '-Wall', '-Wextra', '-Werror', '-Wno-unused-variable', '-x', 'c', '-'], { input: h, encoding: 'utf8' })
    expect(r.error).toBeUndefined()
    expect(r.stderr).toBe('')
    expect(r.status).toBe(0)
  })

  it('lets firmware recompute the CRC: a C program including it prints the same CRC', () => {
    writeFileSync(path.join(dir, 'map.h'), h)
    const program = `#include <stdio.h>
#include "map.h"
static uint32_t crc(const uint8_t *p, size_t n) {
  uint32_t c = 0xFFFFFFFFu;
  for (size_t i = 0; i < n; i++) { c ^= p[i]; for (int k = 0; k < 8; k++) c = (c & 1u) ? (c >> 1) ^ 0xEDB88320u : c >> 1; }
  return c ^ 0xFFFFFFFFu;
}
int main(void) {
  uint8_t b[4 * DRIVE_MAIN_ROWS * DRIVE_MAIN_COLS];
  size_t n = 0;
  for (int r = 0; r < DRIVE_MAIN_ROWS; r++) for (int c = 0; c < DRIVE_MAIN_COLS; c++) {
    uint32_t v = (uint32_t)drive_main_values[r][c];
    for (int k = 0; k < 4; k++) b[n++] = (uint8_t)(v >> (8 * k));
  }
  printf("%d\\n", crc(b, n) == DRIVE_MAIN_VALUES_CRC32 && drive_main_pedal_axis[1] == 125);
  return 0;
}
`
    writeFileSync(path.join(dir, 'check.c'), program)
    const cc = spawnSync('gcc', ['-std=c99', '-Wall', '-Werror', '-o', path.join(dir, 'check'), path.join(dir, 'check.c')], { encoding: 'utf8' })
    expect(cc.stderr).toBe('')
    const run = spawnSync(path.join(dir, 'check'), { encoding: 'utf8' })
    expect(run.stdout.trim()).toBe('1')
  })

  it('sanitises names and comment text so any input still compiles', () => {
    const odd = toCHeader(insideTable('regen'), { name: '3rd map */ #define x', revision: 0, mapName: 'Lift-off */ int x; /* ??/', vehicleProgram: 'Prüfstand\nline two', checksum: checksum(insideTable('regen')) })
    expect(define(odd, 'MAP_3RD_MAP_DEFINE_X_IS_REGEN')).toBe('1')
    expect(odd).not.toContain('*/ int')
    const r = spawnSync('gcc', ['-fsyntax-only', '-Wall', '-Werror', '-Wno-unused-variable', '-x', 'c', '-'], { input: odd, encoding: 'utf8' })
    expect(r.stderr).toBe('')
    expect(r.status).toBe(0)
  })

  it('refuses invalid maps, bad revisions, a wrong checksum and breakpoints finer than 0.1', () => {
    const bad = { ...table, values: table.values.map((r, i) => (i === 3 ? r.map(() => 0) : r)) }
    expect(() => toCHeader(bad, meta)).toThrow(expect.objectContaining({ code: 'invalid-table' }))
    expect(() => toCHeader(table, { ...meta, revision: 1.5 })).toThrow(MapInputError)
    expect(() => toCHeader(table, { ...meta, revision: -1 })).toThrow(/revision/)
    expect(() => toCHeader(table, { ...meta, checksum: '00' })).toThrow(expect.objectContaining({ code: 'bad-checksum' }))
    expect(() => verifiedChecksum(table, checksum(small()))).toThrow(expect.objectContaining({ code: 'checksum-mismatch' }))
    expect(toCHeader(table, { ...meta, checksum: verifiedChecksum(table, checksum(table).toUpperCase()) })).toBe(h)
    expect(() => toCHeader({ ...table, colAxis: [0, 10.01, 10.04, 40, 80] }, meta)).toThrow(expect.objectContaining({ code: 'axis-resolution' }))
    expect(() => toCHeader({ ...table, values: table.values.map((r) => r.map((v) => v * 1e9)) }, meta)).toThrow(expect.objectContaining({ code: 'out-of-range' }))
  })
})

describe('cIdentifier / commentText', () => {
  it('makes C identifiers from free text', () => {
    expect(cIdentifier('Drive map 3.1 (6×4)')).toBe('drive_map_3_1_6_4')
    expect(cIdentifier('__Reserved')).toBe('reserved')
    expect(cIdentifier('9mm')).toBe('map_9mm')
    expect(cIdentifier('***')).toBe('map')
    expect(cIdentifier('x'.repeat(100)).length).toBe(40)
  })

  it('keeps comment text inside the comment and in ASCII', () => {
    expect(commentText('a */ b /* c')).toBe('a * / b / * c')
    expect(commentText('6×4\nN·m ü ???')).toBe('6x4 N*m ? ? ? ?')
  })
})
