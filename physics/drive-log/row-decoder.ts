/** Turns the text cells of one log row into a {@link LogSample}, with the line and column of any bad cell. */
import { WHEEL_CHANNELS, type LogChannel, type WheelChannel } from './columns'
import { LogFormatError } from './errors'
import type { LogLayout } from './header'
import { EXACT_POW10, NOT_A_NUMBER as BAD, parseLogNumberIn } from './number-cell'
import type { LogSample } from './types'

/** Decodes rows of one layout. The returned sample object is reused: it is valid until the next call. */
export type RowDecoder = (fields: readonly string[], line: number) => LogSample
/** Decodes one unquoted CSV line in place (no cell substrings). Same reuse rule as {@link RowDecoder}. */
export type LineDecoder = (text: string, line: number) => LogSample

// Fixed slots of the scratch vector; wheel speeds follow from WHEEL0 on.
const TIME = 0, ROAD = 1, ACCEL = 2, BRAKE = 3, TORQUE = 4, MOTOR = 5, CURRENT = 6, VOLTAGE = 7, YAW = 8, WHEEL0 = 9
const FIXED: readonly [LogChannel, number][] = [
  ['time', TIME], ['roadSpeed', ROAD], ['accelPedal', ACCEL], ['brakePedal', BRAKE],
  ['motorTorque', TORQUE], ['motorSpeed', MOTOR], ['batteryCurrent', CURRENT], ['batteryVoltage', VOLTAGE], ['yawRate', YAW],
]

/**
 * Builds the decoders for `layout`: `fromFields` takes cells already split by a CSV parser, `fromLine` splits
 * an unquoted line at `delimiter` itself. Both read each cell exactly as {@link parseLogNumber} would.
 * Empty / `NaN` cells are missing values (NaN); a missing time, a cell that is not a decimal number, or a
 * wrong field count throws {@link LogFormatError}. Hot path: a flat loop into a reused vector, no per-row allocation.
 * @example createRowDecoders(layout, ',').fromLine('0.02,10,10.4,35', 3).roadSpeedKmh // 10
 */
export function createRowDecoders(layout: LogLayout, delimiter = ','): { fromFields: RowDecoder; fromLine: LineDecoder } {
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
  const v = new Float64Array(WHEEL0 + wheels)
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
  const emit = (line: number): LogSample => {
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

  const fromFields: RowDecoder = (row, line) => {
    if (row.length !== width) throw countError(row.length, line)
    v.fill(NaN)
    for (let k = 0; k < n; k++) {
      const cell = row[cols[k]]
      const x = parseIn(cell, 0, cell.length)
      if (x === bad) throw cellError(k, cell, line)
      v[slots[k]] = x * factors[k]
    }
    return emit(line)
  }

  // Per column of the file: target slot (−1 = not read), factor, and index into `used` for messages.
  const colSlot = new Int32Array(width).fill(-1)
  const colFactor = new Float64Array(width)
  const colUsed = new Int32Array(width)
  used.forEach((u, k) => { colSlot[u.index] = u.slot; colFactor[u.index] = u.factor; colUsed[u.index] = k })
  const dc = delimiter.charCodeAt(0)
  const pow10 = EXACT_POW10

  // One pass over the line: unread cells are skipped with indexOf, read cells are parsed while scanning
  // (the same fast path as parseLogNumberIn; anything else goes to it with the cell's range).
  const fromLine: LineDecoder = (text, line) => {
    v.fill(NaN)
    const len = text.length
    let f = 0
    let i = 0
    for (;;) {
      const slot = f < width ? colSlot[f] : -1
      if (slot < 0) {
        const j = text.indexOf(delimiter, i)
        f++
        if (j < 0) break
        i = j + 1
        continue
      }
      const start = i
      let neg = false
      if (i < len && text.charCodeAt(i) === 45) { neg = true; i++ }
      const first = i
      let m = 0
      let frac = -1
      let fast = true
      for (; i < len; i++) {
        const c = text.charCodeAt(i)
        if (c === dc) break
        const d = c - 48
        if (d >= 0 && d <= 9) { m = m * 10 + d; if (frac >= 0) frac++ }
        else if (c === 46 && frac < 0) frac = 0
        else { fast = false; const j = text.indexOf(delimiter, i); i = j < 0 ? len : j; break }
      }
      const digits = i - first - (frac >= 0 ? 1 : 0)
      let x: number
      if (fast && digits >= 1 && digits <= 15) { x = frac > 0 ? m / pow10[frac] : m; if (neg) x = -x }
      else x = parseIn(text, start, i)
      if (x === bad) {
        const found = text.split(delimiter).length // error path only: a wrong field count is reported first, as fromFields does
        throw found !== width ? countError(found, line) : cellError(colUsed[f], text.slice(start, i), line)
      }
      v[slot] = x * colFactor[f]
      f++
      if (i >= len) break
      i++ // past the delimiter
    }
    if (f !== width) throw countError(f, line)
    return emit(line)
  }
  return { fromFields, fromLine }
}

/** The drive-wheel channels of a layout in the order their speeds fill `LogSample.wheelSpeedsKmh`. @example layoutWheelChannels(layout) // ['wheelLeft', 'wheelRight'] */
export function layoutWheelChannels(layout: LogLayout): WheelChannel[] {
  return WHEEL_CHANNELS.filter((ch) => layout.byChannel[ch] !== undefined)
}

/** The cells decoder of {@link createRowDecoders}. @example createRowDecoder(layout)(['0.02', '10', '10.4', '35'], 3).roadSpeedKmh // 10 */
export function createRowDecoder(layout: LogLayout): RowDecoder {
  return createRowDecoders(layout).fromFields
}
