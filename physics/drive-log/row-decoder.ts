/** Turns the text cells of one log row into a {@link LogSample}, with the line and column of any bad cell. */
import { WHEEL_CHANNELS, type LogChannel } from './columns'
import { LogFormatError } from './errors'
import type { LogLayout, ResolvedLogColumn } from './header'
import { NOT_A_NUMBER, parseLogNumber } from './number-cell'
import type { LogSample } from './types'

/** Decodes rows of one layout. The returned sample object is reused: it is valid until the next call. */
export type RowDecoder = (fields: readonly string[], line: number) => LogSample

interface Slot { index: number; factor: number; header: string }

/**
 * Builds a decoder for `layout`. Empty / `NaN` cells are missing values (NaN); a missing time, a cell
 * that is not a decimal number, or a wrong field count throws {@link LogFormatError}.
 * @example createRowDecoder(layout)(['0.02', '10', '10.4', '35'], 3).roadSpeedKmh // 10
 */
export function createRowDecoder(layout: LogLayout): RowDecoder {
  const width = layout.headers.length
  const slot = (ch: LogChannel): Slot | null => {
    const c: ResolvedLogColumn | undefined = layout.byChannel[ch]
    return c ? { index: c.index, factor: c.factor, header: c.header } : null
  }
  const time = slot('time')
  const road = slot('roadSpeed')
  const accel = slot('accelPedal')
  if (!time || !road || !accel) throw new LogFormatError('header', 1, null, 'layout lacks a required column')
  const brake = slot('brakePedal')
  const torque = slot('motorTorque')
  const motor = slot('motorSpeed')
  const current = slot('batteryCurrent')
  const voltage = slot('batteryVoltage')
  const wheels = WHEEL_CHANNELS.map(slot).filter((s): s is Slot => s !== null)
  const wheelSpeedsKmh = new Array<number>(wheels.length).fill(NaN)
  const sample: LogSample = { timeS: NaN, roadSpeedKmh: NaN, wheelSpeedsKmh, accelPedalPct: NaN, line: 0 }

  let fields: readonly string[] = []
  let line = 0
  const read = (s: Slot | null): number => {
    if (s === null) return NaN
    const cell = fields[s.index]
    const v = parseLogNumber(cell)
    if (v === NOT_A_NUMBER)
      throw new LogFormatError('row', line, { index: s.index + 1, name: s.header }, `${JSON.stringify(cell.length > 40 ? cell.slice(0, 40) + '…' : cell)} is not a number`)
    return s.factor === 1 ? v : v * s.factor
  }

  return (row, lineNo) => {
    fields = row
    line = lineNo
    if (row.length !== width) {
      const column = row.length < width ? { index: row.length + 1, name: layout.headers[row.length] } : { index: width + 1, name: '' }
      throw new LogFormatError('row', line, column, `expected ${width} fields as in the header, found ${row.length}`)
    }
    const t = read(time)
    if (Number.isNaN(t)) throw new LogFormatError('row', line, { index: time.index + 1, name: time.header }, 'time is missing')
    sample.timeS = t
    sample.roadSpeedKmh = read(road)
    sample.accelPedalPct = read(accel)
    for (let w = 0; w < wheels.length; w++) wheelSpeedsKmh[w] = read(wheels[w])
    sample.brakePedalPct = read(brake)
    sample.motorTorqueNm = read(torque)
    sample.motorSpeedRpm = read(motor)
    sample.batteryCurrentA = read(current)
    sample.batteryVoltageV = read(voltage)
    sample.line = line
    return sample
  }
}
