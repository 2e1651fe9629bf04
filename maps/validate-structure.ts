/**
 * Structural rules: axes and shape. When these fail, value rules are skipped because cell
 * positions would be meaningless.
 */
import { cellLabel, kmh, pedalWord, sentence, type MessagePart } from './finding-text'
import { finding, type Finding } from './findings'
import { humanNumber } from './number-format'
import { MAX_BREAKPOINTS, MIN_BREAKPOINTS, type MapTable } from './table'

const isNum = (v: unknown): v is number => typeof v === 'number' && Number.isFinite(v)

function checkAxis(axis: unknown, which: 'row' | 'col', kind: MapTable['kind'], out: Finding[]): void {
  const name = which === 'row' ? pedalWord(kind) : 'speed'
  // A breakpoint with its unit: pedal % never changes with the unit system, speeds do.
  const value = (v: number): MessagePart => (which === 'row' ? `${humanNumber(v)} %` : kmh(v))
  const at = (i: number, v: number) => (which === 'row' ? { row: i, pedalPct: v } : { col: i, speedKmh: v })
  if (!Array.isArray(axis)) {
    out.push(finding({ severity: 'error', rule: 'shape', parts: [`the ${name} axis is not a list of breakpoints`] }))
    return
  }
  if (axis.length < MIN_BREAKPOINTS || axis.length > MAX_BREAKPOINTS)
    out.push(finding({ severity: 'error', rule: 'axis-size', parts: [`the ${name} axis has ${axis.length} breakpoints; ${MIN_BREAKPOINTS} to ${MAX_BREAKPOINTS} are allowed`] }))
  axis.forEach((v: unknown, i) => {
    if (!isNum(v)) {
      out.push(finding({ severity: 'error', rule: 'not-finite', ...(which === 'row' ? { row: i } : { col: i }), parts: [`${name} breakpoint ${i + 1} is ${String(v)}, not a finite number`] }))
      return
    }
    const prev: unknown = axis[i - 1]
    if (i > 0 && isNum(prev) && v <= prev)
      out.push(finding({ severity: 'error', rule: 'axis-order', ...at(i, v), parts: sentence`${name} breakpoint ${i + 1} (${value(v)}) is not greater than the one before (${value(prev)})` }))
    const outOfRange = which === 'row' ? v < 0 || v > 100 : v < 0
    if (outOfRange)
      out.push(finding({ severity: 'error', rule: 'axis-range', ...at(i, v), parts: sentence`${name} breakpoint ${value(v)} is outside ${which === 'row' ? '0–100 %' : sentence`${kmh(0)} and up`}` }))
  })
}

/**
 * Axis, shape and finiteness findings. Returns `cellsUsable` = false when later rules must not run.
 * @example checkStructure({ kind: 'drive', rowAxis: [0, 0], colAxis: [0, 1], values: [[0, 0], [0, 0]] }).findings[0].rule // 'axis-order'
 */
export function checkStructure(table: MapTable): { findings: Finding[]; cellsUsable: boolean } {
  const out: Finding[] = []
  checkAxis(table.rowAxis, 'row', table.kind, out)
  checkAxis(table.colAxis, 'col', table.kind, out)
  const axesOk = out.length === 0
  const rows: unknown = table.values
  if (!Array.isArray(rows) || !Array.isArray(table.rowAxis) || rows.length !== table.rowAxis.length) {
    const n = Array.isArray(rows) ? rows.length : 'no'
    out.push(finding({ severity: 'error', rule: 'shape', parts: [`there are ${n} value rows for ${Array.isArray(table.rowAxis) ? table.rowAxis.length : 'no'} pedal breakpoints`] }))
    return { findings: out, cellsUsable: false }
  }
  let shapeOk = true
  rows.forEach((row: unknown, r) => {
    const want = Array.isArray(table.colAxis) ? table.colAxis.length : 0
    if (!Array.isArray(row) || row.length !== want) {
      shapeOk = false
      out.push(finding({ severity: 'error', rule: 'shape', row: r, parts: [`value row ${r + 1} has ${Array.isArray(row) ? row.length : 'no'} values for ${want} speed breakpoints`] }))
      return
    }
    row.forEach((v: unknown, c) => {
      if (isNum(v)) return
      const p = table.rowAxis[r]
      const sp = table.colAxis[c]
      const cell = isNum(p) && isNum(sp) ? { pedalPct: p, speedKmh: sp } : {}
      const where = isNum(p) && isNum(sp) ? cellLabel(table.kind, p, sp) : [`in row ${r + 1}, column ${c + 1}`]
      out.push(finding({ severity: 'error', rule: 'not-finite', row: r, col: c, ...cell, parts: sentence`${where}: the value is ${String(v)}, not a finite number` }))
    })
  })
  return { findings: out, cellsUsable: axesOk && shapeOk }
}
