/** Bit-for-bit equality of two tables (Object.is, so -0 and NaN are told apart as the checksum does). */
import type { MapTable } from '@/maps'

const sameList = (a: number[], b: number[]) => a.length === b.length && a.every((v, i) => Object.is(v, b[i]))

export function sameTable(a: MapTable, b: MapTable): boolean {
  return a === b || (a.kind === b.kind && sameList(a.rowAxis, b.rowAxis) && sameList(a.colAxis, b.colAxis) && a.values.length === b.values.length && a.values.every((row, r) => sameList(row, b.values[r])))
}
