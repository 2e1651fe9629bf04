/**
 * Fixed-point form of a map for the C header: every number stored as int32 = physical × scale.
 * Integers make the CRC independent of any float formatting or compiler rounding, and suit
 * controllers without an FPU.
 *
 * Breakpoints are stored exactly or not at all: a moved breakpoint (12.75 % stored as 12.8 %)
 * shifts the whole surface on both sides of it, far more than any value rounding, so each axis
 * gets the smallest scale in AXIS_SCALES that holds all its breakpoints exactly, and a breakpoint
 * no scale holds is refused. Torque values are rounded to 0.1 N·m; a value error stays local
 * and is stated in the header as the computed largest difference from the app's lookup.
 */
import { MapInputError } from './errors'
import { crc32, int32LeBytes } from './crc32'
import { fixedLookup, type FixedGrid } from './c-lookup'
import { lookup } from './lookup'
import type { MapTable } from './table'

/**
 * Axis scales tried in order. 10 comes first so a map on the 0.1 grid gives the same arrays
 * (and CRCs) as headers made before per-axis scales; 1000 (0.001 % and 0.001 km/h) is the
 * finest, enough for any breakpoint typed with up to three decimals.
 */
export const AXIS_SCALES = [10, 100, 1000] as const

/** Stored value = round(N·m × VALUE_SCALE), halves away from zero. */
export const VALUE_SCALE = 10

// INT32_MIN is left out: its literal cannot be written in C without an expression.
const LIMIT = 2 ** 31 - 1

/**
 * Decimal places of the shortest decimal that reads back as x (ECMAScript String(x)), so float
 * error cannot pass for an exact value: 12.75 → 2, 0.1 + 0.2 (0.30000000000000004) → 17.
 * @example decimalPlaces(1e-7) // 7
 */
export function decimalPlaces(x: number): number {
  const [mantissa, exponent = '0'] = String(Math.abs(x)).split('e')
  return Math.max(0, (mantissa.split('.')[1]?.length ?? 0) - Number(exponent))
}

/** round(x × scale), halves away from zero (symmetric for regen and drive signs); no -0. */
function scaled(x: number, scale: number, what: string): number {
  const n = Math.sign(x) * Math.round(Math.abs(x * scale))
  if (!Number.isFinite(n) || Math.abs(n) > LIMIT) throw new MapInputError('out-of-range', `${what} (${x}) does not fit an int32 at scale ${scale}`)
  return n === 0 ? 0 : n
}

export interface FixedAxis {
  /** Stored integer = breakpoint × scale, exactly. */
  points: number[]
  scale: number
}

/**
 * An axis stored exactly at the smallest scale of AXIS_SCALES that holds every breakpoint.
 * Throws MapInputError 'axis-resolution' naming the first breakpoint no scale holds and the
 * nearest value the finest scale can hold.
 * @example fixedAxis([0, 12.75, 100], 'pedal', '%') // { points: [0, 1275, 10000], scale: 100 }
 */
export function fixedAxis(axis: readonly number[], name: string, unit: string): FixedAxis {
  const finest = AXIS_SCALES[AXIS_SCALES.length - 1]
  const needed = Math.max(0, ...axis.map(decimalPlaces))
  const scale = AXIS_SCALES.find((s) => s >= 10 ** needed)
  if (scale === undefined) {
    const i = axis.findIndex((v) => decimalPlaces(v) > Math.log10(finest))
    const nearest = scaled(axis[i], finest, `${name} breakpoint ${i + 1}`) / finest
    throw new MapInputError(
      'axis-resolution',
      `${name} breakpoint ${i + 1} (${axis[i]} ${unit}) cannot be stored exactly in the C header, which holds breakpoints to ${1 / finest} ${unit}; the nearest exportable value is ${nearest} ${unit}`,
    )
  }
  return { points: axis.map((v, i) => scaled(v, scale, `${name} breakpoint ${i + 1}`)), scale }
}

/** The header's numbers: axes exact at their scales, values round(N·m × VALUE_SCALE), row-major. */
export interface FixedTable extends FixedGrid {
  rowAxis: number[]
  colAxis: number[]
  values: number[]
  /** Largest |stored / valueScale − value| over all values, N·m. */
  maxRoundingNm: number
  /**
   * Largest |fixedLookup − lookup| over every breakpoint pair (cell corner) and every cell
   * centre, N·m: what firmware following the header's lookup can differ from the app by.
   */
  maxLookupDiffNm: number
}

/** The lookup points the stated difference covers: every breakpoint and every midpoint of adjacent breakpoints. */
function cornersAndCentres(axis: readonly number[]): number[] {
  return axis.flatMap((v, i) => (i + 1 < axis.length ? [v, (v + axis[i + 1]) / 2] : [v]))
}

/**
 * Largest |fixedLookup(fixed) − lookup(table)| over all cell corners and centres, N·m. Between
 * them the difference of two bilinear surfaces on the same grid is itself bilinear per cell, so
 * it cannot exceed the largest corner difference; the centres guard the mirror itself.
 * @example largestLookupDifference(t, toFixedTable(t)) // ≈ 0.05 when a value 280.25 is stored as 2803
 */
export function largestLookupDifference(table: MapTable, fixed: FixedGrid): number {
  let max = 0
  for (const p of cornersAndCentres(table.rowAxis))
    for (const s of cornersAndCentres(table.colAxis)) max = Math.max(max, Math.abs(fixedLookup(fixed, p, s) - lookup(table, p, s)))
  return max
}

/**
 * The fixed-point table of a validated map (at least 2 breakpoints per axis); throws
 * MapInputError for a breakpoint no axis scale holds exactly or a number that does not fit an int32.
 * @example toFixedTable(t).values // [0, 0, 15000, 9005] for values [[0, 0], [1500, 900.5]]
 */
export function toFixedTable(table: MapTable): FixedTable {
  const pedal = fixedAxis(table.rowAxis, 'pedal', '%')
  const speed = fixedAxis(table.colAxis, 'speed', 'km/h')
  let maxRoundingNm = 0
  const values = table.values.flatMap((row, r) =>
    row.map((v, c) => {
      const n = scaled(v, VALUE_SCALE, `value in row ${r + 1}, column ${c + 1}`)
      maxRoundingNm = Math.max(maxRoundingNm, Math.abs(n / VALUE_SCALE - v))
      return n
    }),
  )
  const fixed = { rowAxis: pedal.points, pedalScale: pedal.scale, colAxis: speed.points, speedScale: speed.scale, values, valueScale: VALUE_SCALE }
  return { ...fixed, maxRoundingNm, maxLookupDiffNm: largestLookupDifference(table, fixed) }
}

/**
 * The two CRCs the header carries (CRC-32/ISO-HDLC, see crc32.ts):
 * values — over the int32 values, row-major, 4 bytes each little-endian;
 * table — over the pedal axis, then the speed axis, then the values, same encoding.
 * @example headerCrcs(toFixedTable(t)).values === crc32(int32LeBytes(toFixedTable(t).values)) // true
 */
export function headerCrcs(f: Pick<FixedTable, 'rowAxis' | 'colAxis' | 'values'>): { values: number; table: number } {
  return { values: crc32(int32LeBytes(f.values)), table: crc32(int32LeBytes([...f.rowAxis, ...f.colAxis, ...f.values])) }
}
