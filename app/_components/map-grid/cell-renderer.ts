/**
 * One renderer for every grid cell. It reads a context object (kept in a ref by the grid) rather
 * than closing over props, so Handsontable keeps one stable renderer and a re-render is enough
 * when the table, units or findings change.
 */
import type Handsontable from 'handsontable/base'
import { baseRenderer } from 'handsontable/renderers/baseRenderer'
import type { MapTable } from '@/maps'
import type { ColourScale } from './colour-scale'
import { markKey, type CellMark } from './finding-marks'
import { cellNumber, type UnitSet } from '@/maps'
import { TRACTION_STYLE, tractionText, type CellTraction } from './traction-marks'

export interface RenderContext {
  table: MapTable
  units: UnitSet
  scale: ColourScale
  marks: Map<string, CellMark>
  /** Optional traction per value cell (table row and column, 0-based), shown as a marked chip and in the hover text. */
  cellShade?: (row: number, col: number) => CellTraction | null
}

type Renderer = (instance: Handsontable.Core, TD: HTMLTableCellElement, row: number, col: number, prop: string | number, value: unknown, cellProperties: Handsontable.CellProperties) => void

const AXIS_BAND = '#e3e9ed'
const AXIS_CORNER = '#cfd8de'
const MW_CLASSES = ['mw-cell', 'mw-corner', 'mw-axis', 'mw-value', 'mw-error', 'mw-warning']

/**
 * Holds the context the renderer reads. Handsontable calls the renderer outside React's render,
 * so a plain holder (not React state) is the right home for it.
 */
export class RenderStore {
  constructor(private ctx: RenderContext) {}
  set(ctx: RenderContext) {
    this.ctx = ctx
  }
  get(): RenderContext {
    return this.ctx
  }
}

export function makeRenderer(store: RenderStore): Renderer {
  return (instance, TD, row, col, prop, value, cellProperties) => {
    baseRenderer(instance, TD, row, col, prop, value, cellProperties)
    const { scale, marks, cellShade, units } = store.get()
    const isAxis = row === 0 || col === 0
    // Cells are recycled while scrolling: drop the previous cell's marks before adding ours.
    TD.classList.remove(...MW_CLASSES)
    TD.classList.add('mw-cell', row === 0 && col === 0 ? 'mw-corner' : isAxis ? 'mw-axis' : 'mw-value')
    TD.style.backgroundColor = ''
    TD.style.color = ''
    TD.textContent = typeof value === 'number' ? cellNumber(value) : String(value ?? '')
    let traction: CellTraction | null = null
    // Inline like the value colours, so the theme's cell background cannot win over the axis band.
    if (isAxis) TD.style.backgroundColor = row === 0 && col === 0 ? AXIS_CORNER : AXIS_BAND
    if (!isAxis && typeof value === 'number') {
      const nm = units.torqueIn(value)
      TD.style.backgroundColor = scale.colour(nm)
      TD.style.color = scale.text(nm)
      traction = cellShade?.(row - 1, col - 1) ?? null
      if (traction && traction.level !== 'margin') {
        const style = TRACTION_STYLE[traction.level]
        const chip = document.createElement('span')
        chip.className = `mw-traction mw-traction-${traction.level}`
        chip.setAttribute('aria-hidden', 'true')
        chip.textContent = style.glyph
        TD.prepend(chip)
      }
      if (traction) {
        // Read after the number by screen readers; sighted users get it on hover.
        const sr = document.createElement('span')
        sr.className = 'sr-only'
        sr.textContent = `, ${tractionText(traction)}`
        TD.append(sr)
      }
    }
    const mark = marks.get(markKey(row, col))
    TD.title = [...(mark ? mark.messages : []), ...(traction ? [`Traction: ${tractionText(traction)}`] : [])].join('\n')
    if (mark) TD.classList.add(mark.severity === 'error' ? 'mw-error' : 'mw-warning')
    TD.setAttribute('data-cell', `${row}-${col}`)
    // The grid marks the selected cell with aria-selected, which a plain table cell may not carry.
    TD.setAttribute('role', 'gridcell')
    // The grid moves the browser's focus to the selected cell; Handsontable makes cells focusable only
    // with its ARIA tags, which are off (see map-grid.tsx). Without this the focus stayed on the page's
    // body, and Tab went into the grid's own focus catcher instead of leaving it.
    TD.tabIndex = -1
  }
}
