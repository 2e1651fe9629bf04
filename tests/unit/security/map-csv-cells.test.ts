import { describe, expect, it } from 'vitest'
import { fromCsv, toCsv, type MapTable } from '@/maps'

// The map CSV holds numbers only (and a fixed corner label), so it needs no formula escaping, and a
// negative torque must stay a number a spreadsheet reads as one (docs/map-formats.md).
describe('map CSV cells', () => {
  const regen: MapTable = { kind: 'regen', rowAxis: [0, 50], colAxis: [0, 20, 80], values: [[0, -1200.5, -2400], [-10, -1e-7, -3000]] }

  it('every cell is a plain number or the corner label; negative numbers are not quoted or prefixed', () => {
    const csv = toCsv(regen)
    const [header, ...rows] = csv.trim().split('\n').map((l) => l.split(','))
    expect(header[0]).toMatch(/^[a-z_\\]+$/)
    for (const cell of [...header.slice(1), ...rows.flat()]) expect(cell).toMatch(/^-?\d+(\.\d+)?(e[+-]?\d+)?$/)
    expect(rows[0][2]).toBe('-1200.5')
    expect(fromCsv(csv, 'regen')).toEqual(regen)
  })
})
