/**
 * Fixed-point form of a map for the C header: every number stored as int32 in tenths of its
 * unit (0.1 % pedal, 0.1 km/h, 0.1 N·m). Integers make the CRC independent of any float
 * formatting or compiler rounding, and suit controllers without an FPU.
 */
import { MapInputError } from './errors'
import { crc32, int32LeBytes } from './crc32'
import type { MapTable } from './table'

/** Stored integer = round(physical × C_SCALE). */
export const C_SCALE = 10

// INT32_MIN is left out: its literal cannot be written in C without an expression.
const LIMIT = 2 ** 31 - 1

/**
 * round(x × 10) with halves rounded away from zero (symmetric for regen and drive signs).
 * @example toFixed10(12.25) // 123;  toFixed10(-12.25) // -123
 */
export function toFixed10(x: number, what: string): number {
  const scaled = x * C_SCALE
  const n = Math.sign(scaled) * Math.round(Math.abs(scaled))
  if (!Number.isFinite(n) || Math.abs(n) > LIMIT) throw new MapInputError('out-of-range', `${what} (${x}) does not fit an int32 in tenths`)
  return n === 0 ? 0 : n // no -0 in the output
}

export interface FixedTable {
  rowAxis: number[]
  colAxis: number[]
  /** Row-major values, length rows × cols. */
  values: number[]
  /** Largest |stored/10 − physical| over all values, N·m (rounding loss shown in the header). */
  maxRoundingNm: number
}

/**
 * The fixed-point table; throws MapInputError if rounding would merge two breakpoints.
 * @example toFixedTable(t).values // [0, 0, 15000, 9005] for values [[0, 0], [1500, 900.5]]
 */
export function toFixedTable(table: MapTable): FixedTable {
  const axis = (a: number[], name: string, unit: string) => {
    const out = a.map((v, i) => toFixed10(v, `${name} breakpoint ${i + 1}`))
    out.forEach((v, i) => {
      if (i > 0 && v <= out[i - 1])
        throw new MapInputError('axis-resolution', `${name} breakpoints ${a[i - 1]} and ${a[i]} ${unit} are closer than the header's 0.1 ${unit} resolution`)
    })
    return out
  }
  let maxRoundingNm = 0
  const values = table.values.flatMap((row, r) =>
    row.map((v, c) => {
      const n = toFixed10(v, `value in row ${r + 1}, column ${c + 1}`)
      maxRoundingNm = Math.max(maxRoundingNm, Math.abs(n / C_SCALE - v))
      return n
    }),
  )
  return { rowAxis: axis(table.rowAxis, 'pedal', '%'), colAxis: axis(table.colAxis, 'speed', 'km/h'), values, maxRoundingNm }
}

/**
 * The two CRCs the header carries (CRC-32/ISO-HDLC, see crc32.ts):
 * values — over the int32 values, row-major, 4 bytes each little-endian;
 * table — over the pedal axis, then the speed axis, then the values, same encoding.
 * @example headerCrcs(toFixedTable(t)).values === crc32(int32LeBytes(toFixedTable(t).values)) // true
 */
export function headerCrcs(f: FixedTable): { values: number; table: number } {
  return { values: crc32(int32LeBytes(f.values)), table: crc32(int32LeBytes([...f.rowAxis, ...f.colAxis, ...f.values])) }
}
