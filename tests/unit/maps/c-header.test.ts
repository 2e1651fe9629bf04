import { spawnSync } from 'node:child_process'
import { mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import path from 'node:path'
import { afterAll, describe, expect, it } from 'vitest'
import { checksum, verifiedChecksum } from '@/db/checksum'
import {
  cIdentifier,
  commentText,
  crc32,
  decimalPlaces,
  fixedAxis,
  fixedLookup,
  int32LeBytes,
  largestLookupDifference,
  lookup,
  MapInputError,
  SAFETY_CAUTION,
  toCHeader,
  toFixedTable,
  type CHeaderMeta,
  type MapTable,
} from '../../../maps'
import { upperBound3 } from '../../../maps/c-header'
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

  it('holds breakpoints on the 0.1 grid and the values as int32 tenths, with the right counts', () => {
    expect(define(h, 'DRIVE_MAIN_ROWS')).toBe('4')
    expect(define(h, 'DRIVE_MAIN_COLS')).toBe('5')
    // 12.5 % needs one decimal, so both axes keep the smallest scale, 10.
    expect(define(h, 'DRIVE_MAIN_PEDAL_SCALE')).toBe('10')
    expect(define(h, 'DRIVE_MAIN_SPEED_SCALE')).toBe('10')
    expect(define(h, 'DRIVE_MAIN_VALUE_SCALE')).toBe('10')
    // The single scale is gone on purpose: firmware using it must not compile against new headers.
    expect(define(h, 'DRIVE_MAIN_SCALE')).toBeUndefined()
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

  it('refuses invalid maps, bad revisions, a wrong checksum and numbers beyond int32', () => {
    const bad = { ...table, values: table.values.map((r, i) => (i === 3 ? r.map(() => 0) : r)) }
    expect(() => toCHeader(bad, meta)).toThrow(expect.objectContaining({ code: 'invalid-table' }))
    expect(() => toCHeader(table, { ...meta, revision: 1.5 })).toThrow(MapInputError)
    expect(() => toCHeader(table, { ...meta, revision: -1 })).toThrow(/revision/)
    expect(() => toCHeader(table, { ...meta, checksum: '00' })).toThrow(expect.objectContaining({ code: 'bad-checksum' }))
    expect(() => verifiedChecksum(table, checksum(small()))).toThrow(expect.objectContaining({ code: 'checksum-mismatch' }))
    expect(toCHeader(table, { ...meta, checksum: verifiedChecksum(table, checksum(table).toUpperCase()) })).toBe(h)
    expect(() => toCHeader({ ...table, values: table.values.map((r) => r.map((v) => v * 1e9)) }, meta)).toThrow(expect.objectContaining({ code: 'out-of-range' }))
  })
})

/** A map whose breakpoints are off the 0.1 grid; values have at most 2 decimals. */
const frac: MapTable = {
  kind: 'drive',
  rowAxis: [0, 12.75, 37.5, 100],
  colAxis: [0, 0.125, 10, 40.5, 80],
  values: [
    [0, 0, 0, 0, 0],
    [300, 280.25, 250, 200, 100],
    [900, 850, 700.04, 500, 250],
    [1800, 1700, 1400, 1000, 500],
  ],
}
const fracMeta: CHeaderMeta = { name: 'frac', revision: 2, mapName: 'Fractional breakpoints', vehicleProgram: 'Test', checksum: checksum(frac) }

/** The "Largest difference ..." figure a header states, N·m. */
function statedDifference(header: string): number {
  const m = /Largest difference from the app's lookup over all cell corners and centres: (\S+) N\*m\./.exec(header)
  if (!m) throw new Error('no stated difference')
  return Number(m[1])
}

/** Every breakpoint and every midpoint of adjacent breakpoints. */
const cornersAndCentres = (axis: number[]) => axis.flatMap((v, i) => (i + 1 < axis.length ? [v, (v + axis[i + 1]) / 2] : [v]))

/**
 * Deterministic pseudo-random numbers in [0, 1): a 32-bit linear congruential generator with the
 * constants 1664525 and 1013904223 from Press et al., "Numerical Recipes", §7.1.
 */
function lcg(seed: number): () => number {
  let x = seed >>> 0
  return () => {
    x = (Math.imul(x, 1664525) + 1013904223) >>> 0
    return x / 2 ** 32
  }
}

const gcc = spawnSync('gcc', ['--version'], { encoding: 'utf8' })
const haveGcc = gcc.error === undefined && gcc.status === 0
if (!haveGcc) console.warn('c-header.test: gcc not found on PATH; the compiled reference lookup test is skipped')

describe('exact breakpoints and the stated largest difference', () => {
  const h = toCHeader(frac, fracMeta)
  const fixed = toFixedTable(frac)

  it('keeps 12.75 % as 12.75 % (the old header wrote 128 tenths, i.e. 12.8 %)', () => {
    expect(arrayNumbers(h, 'frac_pedal_axis')).toEqual([0, 1275, 3750, 10000])
    const scale = Number(define(h, 'FRAC_PEDAL_SCALE'))
    expect(scale).toBe(100)
    expect(arrayNumbers(h, 'frac_pedal_axis')[1] / scale).toBe(12.75)
  })

  it('picks the smallest scale of 10, 100, 1000 per axis and stores every breakpoint exactly', () => {
    expect(define(h, 'FRAC_SPEED_SCALE')).toBe('1000')
    expect(define(h, 'FRAC_VALUE_SCALE')).toBe('10')
    expect(arrayNumbers(h, 'frac_speed_axis')).toEqual([0, 125, 10000, 40500, 80000])
    expect(arrayNumbers(h, 'frac_speed_axis').map((v) => v / 1000)).toEqual(frac.colAxis)
    // Two breakpoints 0.03 km/h apart (once refused as closer than 0.1) now export exactly at 0.01.
    const close = toCHeader({ ...table, colAxis: [0, 10.01, 10.04, 40, 80] }, meta)
    expect(define(close, 'DRIVE_MAIN_SPEED_SCALE')).toBe('100')
    expect(arrayNumbers(close, 'drive_main_speed_axis')).toEqual([0, 1001, 1004, 4000, 8000])
  })

  it('counts decimals on the shortest decimal form, so float error is not taken for an exact value', () => {
    expect(decimalPlaces(12.75)).toBe(2)
    expect(decimalPlaces(100)).toBe(0)
    expect(decimalPlaces(1e-7)).toBe(7)
    expect(decimalPlaces(1e21)).toBe(0)
    expect(decimalPlaces(0.1 + 0.2)).toBe(17)
    // 1.005 × 1000 is 1004.9999999999999 in doubles; the stored integer is still 1005.
    expect(fixedAxis([0, 1.005, 2], 'speed', 'km/h')).toEqual({ points: [0, 1005, 2000], scale: 1000 })
  })

  it('refuses a breakpoint no scale holds, naming it and the nearest exportable value', () => {
    const third = { ...frac, rowAxis: [0, 12.75, 33.3333, 100] }
    expect(() => toCHeader(third, { ...fracMeta, checksum: checksum(third) })).toThrow(
      expect.objectContaining({ code: 'axis-resolution', message: expect.stringContaining('pedal breakpoint 3 (33.3333 %)') }),
    )
    expect(() => toCHeader(third, { ...fracMeta, checksum: checksum(third) })).toThrow(/nearest exportable value is 33\.333 %/)
    expect(() => fixedAxis([0, 0.0625, 10], 'speed', 'km/h')).toThrow(/speed breakpoint 2 \(0\.0625 km\/h\).*0\.001 km\/h.*nearest exportable value is 0\.063 km\/h/)
    expect(() => fixedAxis([0, 0.1 + 0.2, 10], 'speed', 'km/h')).toThrow(/speed breakpoint 2 \(0\.30000000000000004 km\/h\).*nearest exportable value is 0\.3 km\/h/)
    expect(() => fixedAxis([0, 0.1 + 0.2, 10], 'speed', 'km/h')).toThrow(MapInputError)
  })

  it('states the largest difference from lookup over corners and centres; with exact axes that is the value rounding', () => {
    // 280.25 N·m is stored as 2803 tenths: 0.05 N·m, the most a value with 2 decimals can lose.
    expect(fixed.maxLookupDiffNm).toBeCloseTo(0.05, 12)
    expect(fixed.maxLookupDiffNm).toBeCloseTo(fixed.maxRoundingNm, 12)
    expect(statedDifference(h)).toBe(0.05)
    expect(statedDifference(h)).toBe(Number(upperBound3(fixed.maxLookupDiffNm)))
    // A map whose values are on the 0.1 grid loses nothing.
    const onGrid = { ...frac, values: frac.values.map((r) => r.map((v) => Math.round(v))) }
    expect(statedDifference(toCHeader(onGrid, { ...fracMeta, checksum: checksum(onGrid) }))).toBe(0)
  })

  it('counts a moved breakpoint in the figure, not only the value rounding', () => {
    // The old header's pedal axis: 12.75 % and 37.5 % written as 128 and 375 tenths.
    const old = { ...fixed, rowAxis: [0, 128, 375, 1000], pedalScale: 10 }
    // Worst at 12.75 %, 0 km/h: the old axis reads 300 N·m × 12.75 / 12.8 there, 300 × 0.05 / 12.8 short.
    expect(largestLookupDifference(frac, old)).toBeCloseTo((300 * 0.05) / 12.8, 12)
    expect(largestLookupDifference(frac, fixed)).toBeLessThan(0.0501)
  })

  it('rounds the stated figure up to 3 significant digits', () => {
    expect(upperBound3(0)).toBe('0')
    expect(upperBound3(0.05000000000001137)).toBe('0.05')
    expect(upperBound3(0.012346)).toBe('0.0124')
    expect(upperBound3(0.09994)).toBe('0.1')
    expect(upperBound3(1.171875)).toBe('1.18')
    expect(upperBound3(1234.5)).toBe('1240')
  })

  it.skipIf(!haveGcc)('agrees with the reference C lookup of docs/map-formats.md, compiled with gcc, within the stated figure', () => {
    // The C function is taken from the docs, so the documented code is the tested code.
    const docs = readFileSync(path.join(__dirname, '../../../docs/map-formats.md'), 'utf8')
    const ref = /```c\n([^`]*static double name_lookup\(double pedal_pct, double speed_kmh\)[^`]*)```/.exec(docs)
    expect(ref, 'reference lookup in docs/map-formats.md').not.toBeNull()
    const fn = ref![1].replace(/\bNAME_/g, 'FRAC_').replace(/\bname_/g, 'frac_')

    const rnd = lcg(20240611)
    const points: [number, number][] = []
    for (const p of cornersAndCentres(frac.rowAxis)) for (const s of cornersAndCentres(frac.colAxis)) points.push([p, s])
    for (let i = 0; i < 300; i++) points.push([-10 + 120 * rnd(), -5 + 95 * rnd()]) // some outside both axes
    points.push([12.75, 0.125], [12.7499, 0.1249], [100, 80], [150, 1000], [-1, -1])

    // String(x) is the shortest decimal that reads back as x, and gcc rounds decimal literals
    // correctly, so the C program sees the same doubles.
    const program = `#include <stdio.h>
#include "frac.h"
${fn}
static const double points[][2] = {
${points.map(([p, s]) => `  { ${String(p)}, ${String(s)} }`).join(',\n')}
};
int main(void) {
  for (size_t i = 0; i < sizeof points / sizeof points[0]; i++) printf("%.17g\\n", frac_lookup(points[i][0], points[i][1]));
  return 0;
}
`
    writeFileSync(path.join(dir, 'frac.h'), h)
    writeFileSync(path.join(dir, 'lookup.c'), program)
    const exe = path.join(dir, 'lookup')
    const cc = spawnSync('gcc', ['-std=c99', '-Wall', '-Werror', '-ffp-contract=off', '-o', exe, path.join(dir, 'lookup.c')], { encoding: 'utf8' })
    expect(cc.stderr).toBe('')
    expect(cc.status).toBe(0)
    const run = spawnSync(exe, { encoding: 'utf8' })
    expect(run.status).toBe(0)
    const got = run.stdout.trim().split('\n').map(Number)
    expect(got.length).toBe(points.length)

    const stated = statedDifference(h)
    expect(stated).toBeLessThanOrEqual(0.05)
    let worst = 0
    points.forEach(([p, s], i) => {
      // The TypeScript mirror gives the same double as the compiled C (no fused multiply-adds).
      expect(got[i], `fixedLookup at ${p} %, ${s} km/h`).toBe(fixedLookup(fixed, p, s))
      const d = Math.abs(got[i] - lookup(frac, p, s))
      expect(d, `C vs lookup at ${p} %, ${s} km/h`).toBeLessThanOrEqual(stated + 1e-9)
      worst = Math.max(worst, d)
    })
    // The corners reach the stated figure, so it is not a loose bound.
    expect(worst).toBeGreaterThan(stated - 1e-9)
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
