/** Turns the fields of one log record into a {@link LogSample}, with the line and column of any bad cell. */
import { WHEEL_CHANNELS, type LogChannel, type WheelChannel } from './columns'
import { LogFormatError } from './errors'
import type { LogLayout } from './header'
import { NOT_A_NUMBER as BAD, parseLogNumberIn } from './number-cell'
import type { LogSample } from './types'

/**
 * Decodes one record given as field ranges of `text` (field k is `text.slice(starts[k], ends[k])`), as the
 * record parser yields it. The returned sample object is reused: it is valid until the next call.
 */
export type RecordDecoder = (text: string, starts: Int32Array, ends: Int32Array, count: number, line: number) => LogSample
/** Decodes a record given as cell strings. Same reuse rule as {@link RecordDecoder}. */
export type RowDecoder = (fields: readonly string[], line: number) => LogSample

// Fixed slots of the scratch vector; wheel speeds follow from WHEEL0 on.
const TIME = 0, ROAD = 1, ACCEL = 2, BRAKE = 3, TORQUE = 4, MOTOR = 5, CURRENT = 6, VOLTAGE = 7, YAW = 8, WHEEL0 = 9
const FIXED: readonly [LogChannel, number][] = [
  ['time', TIME], ['roadSpeed', ROAD], ['accelPedal', ACCEL], ['brakePedal', BRAKE],
  ['motorTorque', TORQUE], ['motorSpeed', MOTOR], ['batteryCurrent', CURRENT], ['batteryVoltage', VOLTAGE], ['yawRate', YAW],
]

/**
 * Builds the decoder for `layout`. Each used cell is read in place by {@link parseLogNumberIn} (exactly
 * `parseLogNumber` of the cell, no substring). Empty / `NaN` cells are missing values (NaN); a wrong field
 * count (checked first), a missing time or a cell that is not a decimal number throws {@link LogFormatError}
 * with the line and the column. Hot path: a flat loop into a reused vector, no per-row allocation.
 * @example createRecordDecoder(layout)('0.02,10,10.4,35', Int32Array.of(0, 5, 8, 13), Int32Array.of(4, 7, 12, 15), 4, 3).roadSpeedKmh // 10
 */
export function createRecordDecoder(layout: LogLayout): RecordDecoder {
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
  used.sort((a, b) => a.index - b.index) // read in file order, so the leftmost bad cell is the one reported
  const byChannel = layout.byChannel
  if (!byChannel.time || !byChannel.roadSpeed || !byChannel.accelPedal || wheels === 0)
    throw new LogFormatError('header', 1, null, 'layout lacks a required column')
  const timeCol = { index: byChannel.time.index + 1, name: byChannel.time.header }
  const n = used.length
  const slots = Int32Array.from(used, (u) => u.slot)
  const cols = Int32Array.from(used, (u) => u.index)
  const factors = Float64Array.from(used, (u) => u.factor)
  const v = new Float64Array(WHEEL0 + wheels).fill(NaN)
  const wheelSpeedsKmh = new Array<number>(wheels).fill(NaN)
  const sample: LogSample = { timeS: NaN, roadSpeedKmh: NaN, wheelSpeedsKmh, accelPedalPct: NaN, line: 0 }
  // Local bindings: some loaders compile imports to getter calls, which cost more than the parse itself.
  const parseIn = parseLogNumberIn
  const bad = BAD

  const countError = (found: number, line: number) => {
    const column = found < width ? { index: found + 1, name: layout.headers[found] } : { index: width + 1, name: '' }
    return new LogFormatError('row', line, column, `expected ${width} fields as in the header, found ${found}`)
  }
  const cellError = (k: number, cell: string, line: number) => {
    const shown = JSON.stringify(cell.length > 40 ? cell.slice(0, 40) + '…' : cell)
    return new LogFormatError('row', line, { index: cols[k] + 1, name: used[k].header }, `${shown} is not a number`)
  }

  return (text, starts, ends, count, line) => {
    if (count !== width) throw countError(count, line)
    // No reset: every used slot is written below (or the record throws), unused slots stay NaN.
    for (let k = 0; k < n; k++) {
      const c = cols[k]
      const x = parseIn(text, starts[c], ends[c])
      if (x === bad) throw cellError(k, text.slice(starts[c], ends[c]), line)
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
    sample.yawRateRadS = v[YAW]
    for (let w = 0; w < wheels; w++) wheelSpeedsKmh[w] = v[WHEEL0 + w]
    sample.line = line
    return sample
  }
}

/** The drive-wheel channels of a layout in the order their speeds fill `LogSample.wheelSpeedsKmh`. @example layoutWheelChannels(layout) // ['wheelLeft', 'wheelRight'] */
export function layoutWheelChannels(layout: LogLayout): WheelChannel[] {
  return WHEEL_CHANNELS.filter((ch) => layout.byChannel[ch] !== undefined)
}

/**
 * {@link createRecordDecoder} for cells already split into strings (tests, callers with arrays): the cells are
 * laid end to end in one string and decoded by their ranges, so both forms read a cell identically.
 * @example createRowDecoder(layout)(['0.02', '10', '10.4', '35'], 3).roadSpeedKmh // 10
 */
export function createRowDecoder(layout: LogLayout): RowDecoder {
  const decode = createRecordDecoder(layout)
  let starts = new Int32Array(16)
  let ends = new Int32Array(16)
  return (fields, line) => {
    if (fields.length > starts.length) { starts = new Int32Array(fields.length); ends = new Int32Array(fields.length) }
    let at = 0
    for (let k = 0; k < fields.length; k++) { starts[k] = at; at += fields[k].length; ends[k] = at }
    return decode(fields.join(''), starts, ends, fields.length, line)
  }
}
