/** Turns the text cells of one log row into a {@link LogSample}, with the line and column of any bad cell. */
import { WHEEL_CHANNELS, type LogChannel } from './columns'
import { LogFormatError } from './errors'
import type { LogLayout } from './header'
import { NOT_A_NUMBER as BAD, parseLogNumber } from './number-cell'
import type { LogSample } from './types'

/** Decodes rows of one layout. The returned sample object is reused: it is valid until the next call. */
export type RowDecoder = (fields: readonly string[], line: number) => LogSample

// Fixed slots of the scratch vector; wheel speeds follow from WHEEL0 on.
const TIME = 0, ROAD = 1, ACCEL = 2, BRAKE = 3, TORQUE = 4, MOTOR = 5, CURRENT = 6, VOLTAGE = 7, WHEEL0 = 8
const FIXED: readonly [LogChannel, number][] = [
  ['time', TIME], ['roadSpeed', ROAD], ['accelPedal', ACCEL], ['brakePedal', BRAKE],
  ['motorTorque', TORQUE], ['motorSpeed', MOTOR], ['batteryCurrent', CURRENT], ['batteryVoltage', VOLTAGE],
]

/**
 * Builds a decoder for `layout`. Empty / `NaN` cells are missing values (NaN); a missing time, a cell
 * that is not a decimal number, or a wrong field count throws {@link LogFormatError}.
 * Hot path: one flat loop over the used columns into a reused vector, no per-row allocation.
 * @example createRowDecoder(layout)(['0.02', '10', '10.4', '35'], 3).roadSpeedKmh // 10
 */
export function createRowDecoder(layout: LogLayout): RowDecoder {
  const width = layout.headers.length
  const used: { slot: number; index: number; factor: number; header: string }[] = []
  for (const [ch, slot] of FIXED) {
    const c = layout.byChannel[ch]
    if (c) used.push({ slot, index: c.index, factor: c.factor, header: c.header })
  }
  let wheels = 0
  for (const ch of WHEEL_CHANNELS) {
    const c = layout.byChannel[ch]
    if (c) used.push({ slot: WHEEL0 + wheels++, index: c.index, factor: c.factor, header: c.header })
  }
  const byChannel = layout.byChannel
  if (!byChannel.time || !byChannel.roadSpeed || !byChannel.accelPedal || wheels === 0)
    throw new LogFormatError('header', 1, null, 'layout lacks a required column')
  const timeCol = { index: byChannel.time.index + 1, name: byChannel.time.header }
  const n = used.length
  const slots = Int32Array.from(used, (u) => u.slot)
  const cols = Int32Array.from(used, (u) => u.index)
  const factors = Float64Array.from(used, (u) => u.factor)
  const v = new Float64Array(WHEEL0 + wheels)
  const wheelSpeedsKmh = new Array<number>(wheels).fill(NaN)
  const sample: LogSample = { timeS: NaN, roadSpeedKmh: NaN, wheelSpeedsKmh, accelPedalPct: NaN, line: 0 }
  // Local bindings: some loaders compile imports to getter calls, which cost more than the parse itself.
  const parse = parseLogNumber
  const bad = BAD

  return (row, line) => {
    if (row.length !== width) {
      const column = row.length < width ? { index: row.length + 1, name: layout.headers[row.length] } : { index: width + 1, name: '' }
      throw new LogFormatError('row', line, column, `expected ${width} fields as in the header, found ${row.length}`)
    }
    v.fill(NaN)
    for (let k = 0; k < n; k++) {
      const x = parse(row[cols[k]])
      if (x === bad) {
        const cell = row[cols[k]]
        const shown = JSON.stringify(cell.length > 40 ? cell.slice(0, 40) + '…' : cell)
        throw new LogFormatError('row', line, { index: cols[k] + 1, name: used[k].header }, `${shown} is not a number`)
      }
      v[slots[k]] = x * factors[k]
    }
    if (v[TIME] !== v[TIME]) throw new LogFormatError('row', line, timeCol, 'time is missing')
    sample.timeS = v[TIME]
    sample.roadSpeedKmh = v[ROAD]
    sample.accelPedalPct = v[ACCEL]
    sample.brakePedalPct = v[BRAKE]
    sample.motorTorqueNm = v[TORQUE]
    sample.motorSpeedRpm = v[MOTOR]
    sample.batteryCurrentA = v[CURRENT]
    sample.batteryVoltageV = v[VOLTAGE]
    for (let w = 0; w < wheels; w++) wheelSpeedsKmh[w] = v[WHEEL0 + w]
    sample.line = line
    return sample
  }
}
