'use client'
/**
 * The Handsontable grid of one map. The grid owns its cells: a typed or pasted change is checked
 * and applied to the table in beforeChange (the parent returns the new table, or null to refuse),
 * and the grid keeps the value it already shows, so an edit costs no reload. Changes made outside
 * the grid (undo, toolbar, unit switch) reach it as the few cells that differ (grid-sync.ts).
 * HotTable is rendered once with stable settings: the React wrapper passes every prop to
 * updateSettings on each re-render, and `data` among them reloads the whole grid.
 */
import 'handsontable/styles/handsontable.min.css'
import 'handsontable/styles/ht-theme-main.min.css'
import './map-grid.css'
import { HotTable, type HotTableProps, type HotTableRef } from '@handsontable/react-wrapper'
import { registerCellType } from 'handsontable/cellTypes/registry'
import { TextCellType } from 'handsontable/cellTypes/textType'
import { registerPlugin } from 'handsontable/plugins/registry'
import { CopyPaste } from 'handsontable/plugins/copyPaste'
import { memo, useEffect, useLayoutEffect, useRef, useState, type RefObject } from 'react'
import type { Finding, MapTable } from '@/maps'
import { makeRenderer, RenderStore, type RenderContext } from './cell-renderer'
import type { ColourScale } from './colour-scale'
import { markCells } from './finding-marks'
import { gridCellOf, toGridData, type GridCell, type GridEdit } from './grid-data'
import { gridCommand, type GridCommand } from './grid-keys'
import { changedMarks, gridSync } from './grid-sync'
import { pasteOverflow } from './paste-overflow'
import type { GridRange } from './selection'
import type { UnitSet } from '@/maps'

// Only what the editor uses, so the page does not ship every Handsontable feature.
registerCellType(TextCellType)
registerPlugin(CopyPaste)

const COPY_PASTE = { rowsLimit: 65, columnsLimit: 65 }
// Value columns leave room for a traction chip beside a five-digit number with its sign.
const colWidth = (c: number) => (c === 0 ? 118 : 66)
const heightFor = (rows: number) => (rows > 24 ? 560 : 'auto')
/**
 * The grid as wide as its columns (a little slack for borders): a wide map then scrolls in our
 * wrapper, which holds the grid's focusable parts, instead of in a holder no key can reach.
 */
const widthFor = (cols: number) => (cols > 0 ? colWidth(0) + colWidth(1) * (cols - 1) + 4 : '100%')
/** Source tag of the grid's own updates from the table, which beforeChange lets through unchecked. */
const SYNC = 'mw-sync'
/** Above this many changed marks one full render is cheaper than cell by cell. */
const CELL_RENDER_LIMIT = 120

/** What the parent may ask of the grid after it has mounted. */
export interface GridApi {
  selectCell: (row: number, col: number) => void
  /** True while a cell editor is open (then Ctrl+Z belongs to the text field). */
  isEditing: () => boolean
}

export interface MapGridProps {
  table: MapTable
  units: UnitSet
  scale: ColourScale
  findings: Finding[]
  /** How a finding reads in the current units (the cell's hover text). */
  describe: (f: Finding) => string
  readOnly?: boolean
  /** Apply typed or pasted cells; returns the new table, or null when refused (the grid then keeps its old cells). */
  onEdit?: (edits: GridEdit[]) => MapTable | null
  /** Delete, Ctrl+D, Ctrl+R on the selection (grid coordinates). */
  onCommand?: (cmd: GridCommand, range: GridRange) => void
  /** A message for the engineer from the grid (a paste that did not fit). */
  onNotice?: (text: string) => void
  onSelect?: (range: GridRange) => void
  onApi?: (api: GridApi | null) => void
  cellShade?: RenderContext['cellShade']
}

/** HotTable with settings fixed at mount: it never re-renders, so the wrapper never reloads the data. */
const GridHost = memo(function GridHost({ hotRef, settings }: { hotRef: RefObject<HotTableRef | null>; settings: HotTableProps }) {
  return <HotTable ref={hotRef} {...settings} />
})

/**
 * What the grid's event handlers read: the newest props, and what the grid's cells hold (kept
 * beside the grid so a table change is compared without reading the grid back). A plain holder,
 * like RenderStore, because Handsontable calls its hooks outside React's render.
 */
class GridBox {
  /** Set while a few changed cells have been redrawn by hand: the full render that follows is skipped. */
  skipRender = false
  constructor(
    public props: MapGridProps,
    public shown: GridCell[][],
  ) {}
  setProps(p: MapGridProps) {
    this.props = p
  }
  setShown(rows: GridCell[][]) {
    this.shown = rows
  }
}

/** The settings HotTable is created with; its hooks run with `this` bound to the grid. */
function gridSettings(box: GridBox, data: GridCell[][], renderer: ReturnType<typeof makeRenderer>, readOnly: boolean): HotTableProps {
  return {
    data,
    licenseKey: 'non-commercial-and-evaluation',
    themeName: 'ht-theme-main',
    hotRenderer: renderer,
    cells: (row: number, col: number) => ({ readOnly: readOnly || (row === 0 && col === 0) }),
    readOnlyCellClassName: 'mw-readonly', // not the default dimmed style, which would hide the colour scale
    beforeChange: (changes: (unknown[] | null)[], source: string) => {
      if (source === SYNC) return
      const edits: GridEdit[] = []
      for (const ch of changes) if (ch && typeof ch[0] === 'number' && typeof ch[1] === 'number') edits.push({ row: ch[0], col: ch[1], value: ch[3] })
      const next = edits.length > 0 ? (box.props.onEdit?.(edits) ?? null) : null
      if (!next) return false
      // Keep the shown number (rounded, in display units), not the typed text, in the cell.
      for (const ch of changes) {
        if (!ch || typeof ch[0] !== 'number' || typeof ch[1] !== 'number') continue
        ch[3] = gridCellOf(next, box.props.units, ch[0], ch[1])
        box.shown[ch[0]][ch[1]] = ch[3] as GridCell
      }
    },
    // Handsontable redraws every rendered cell (and its frozen copies) after any data change. For a
    // few cells, redraw just those here, once the data holds the new values, and skip that render.
    beforeChangeRender(this: Hot, changes: unknown[][]) {
      if (changes.length > CELL_RENDER_LIMIT) return
      renderCells(this, renderer, changes.map((ch) => [Number(ch[0]), Number(ch[1])]))
      box.skipRender = true
    },
    beforeViewRender(_forced: boolean, skip: { skipRender?: boolean }) {
      if (!box.skipRender) return
      box.skipRender = false
      skip.skipRender = true
    },
    afterChange() {
      box.skipRender = false // the render was suspended (a batch): never skip a later, unrelated one
    },
    beforeKeyDown(this: Hot, e: KeyboardEvent) {
      const cmd = gridCommand(e)
      const sel = this.getSelectedLast()
      if (!cmd || !sel || readOnly || this.getActiveEditor()?.isOpened()) return
      e.preventDefault() // the browser's bookmark (Ctrl+D) and reload (Ctrl+R)
      box.props.onCommand?.(cmd, { r0: Math.min(sel[0], sel[2]), c0: Math.min(sel[1], sel[3]), r1: Math.max(sel[0], sel[2]), c1: Math.max(sel[1], sel[3]) })
      return false // skips Handsontable's own Delete, which would empty the cells: a map cell cannot be empty
    },
    beforePaste(this: Hot, pasted: unknown[][], coords: { startRow: number; startCol: number }[]) {
      const at = coords[0]
      if (!at || pasted.length === 0) return
      const msg = pasteOverflow(this.countRows(), this.countCols(), at.startRow, at.startCol, pasted.length, Math.max(...pasted.map((r) => r.length)))
      if (msg) box.props.onNotice?.(msg)
    },
    afterSelectionEnd(this: Hot, r0: number, c0: number, r1: number, c1: number) {
      labelGrid(this) // the cell editor's field is made on the first selection
      box.props.onSelect?.({ r0, c0, r1, c1 })
    },
    copyPaste: COPY_PASTE,
    maxRows: data.length,
    maxCols: data[0]?.length ?? 0,
    fixedRowsTop: 1,
    fixedColumnsStart: 1,
    colWidths: colWidth,
    height: heightFor(data.length),
    width: widthFor(data[0]?.length ?? 0),
    outsideClickDeselects: false,
    // One Tab stop: arrows move inside the grid, Tab and Shift+Tab leave it.
    tabNavigation: false,
    // Handsontable's treegrid roles fail axe (aria-required-children: its rows sit in presentational
    // holders); without them the grid is a plain HTML table, which screen readers read as one.
    ariaTags: false,
    afterInit(this: Hot) {
      labelGrid(this)
    },
    afterBeginEditing(this: Hot) {
      labelGrid(this)
    },
    autoWrapRow: true,
    autoWrapCol: true,
  }
}

export default function MapGrid(props: MapGridProps) {
  const { table, units, scale, findings, describe, readOnly = false, cellShade } = props
  const hot = useRef<HotTableRef>(null)
  const [store] = useState(() => new RenderStore({ table, units, scale, marks: markCells(findings, describe), cellShade }))
  const [renderer] = useState(() => makeRenderer(store))
  const [box] = useState(() => new GridBox(props, toGridData(table, units)))
  // Handsontable reads the array it is given as its own data, so it gets a copy of what `shown` holds.
  const [settings] = useState(() => gridSettings(box, box.shown.map((r) => [...r]), renderer, readOnly))
  useLayoutEffect(() => {
    box.setProps(props)
  })

  // The table, units or findings changed: tell the grid only what differs.
  const lastMarks = useRef(store.get().marks)
  const lastVisual = useRef({ scale, cellShade, units })
  useEffect(() => {
    const h = hot.current?.hotInstance
    const marks = markCells(findings, describe)
    store.set({ table, units, scale, marks, cellShade })
    if (!h) return
    const next = toGridData(table, units)
    const sync = gridSync(box.shown, next)
    box.setShown(next)
    const v = lastVisual.current
    const visualChanged = v.scale.min !== scale.min || v.scale.max !== scale.max || v.cellShade !== cellShade || v.units !== units
    lastVisual.current = { scale, cellShade, units }
    const markKeys = changedMarks(lastMarks.current, marks)
    lastMarks.current = marks
    if (sync.reload) {
      h.updateSettings({ data: next.map((r) => [...r]), maxRows: next.length, maxCols: next[0]?.length ?? 0, height: heightFor(next.length), width: widthFor(next[0]?.length ?? 0) })
      return
    }
    const cells = markKeys.map((k) => k.split(':').map(Number) as [number, number])
    if (visualChanged || cells.length > CELL_RENDER_LIMIT) {
      // New colours or many new marks: one full render with the new store, after the changed values.
      h.batch(() => {
        if (sync.cells.length > 0) h.setDataAtCell(sync.cells, SYNC)
        h.render()
      })
      return
    }
    if (sync.cells.length > 0) h.setDataAtCell(sync.cells, SYNC) // redraws those cells (beforeChangeRender)
    renderCells(h, renderer, cells)
  }, [store, renderer, box, table, units, scale, findings, describe, cellShade])

  // One Tab stop: Tab and Shift+Tab go to the page's next or previous control, never to another
  // cell. Taken on the window's capture phase, before any of Handsontable's own listeners.
  const wrapper = useRef<HTMLDivElement>(null)
  useEffect(() => {
    const onKey = (e: KeyboardEvent) => {
      const h = hot.current?.hotInstance
      const box = wrapper.current
      if (e.key !== 'Tab' || e.ctrlKey || e.metaKey || e.altKey || !h || !box || !box.contains(document.activeElement) || h.getActiveEditor()?.isOpened()) return
      const to = focusableBeyond(box, e.shiftKey)
      if (!to) return
      e.preventDefault()
      e.stopImmediatePropagation()
      h.unlisten()
      to.focus()
    }
    window.addEventListener('keydown', onKey, true)
    return () => window.removeEventListener('keydown', onKey, true)
  }, [])

  useEffect(() => {
    const instance = hot.current?.hotInstance
    const onApi = props.onApi
    if (!onApi || !instance) return
    onApi({
      selectCell: (row, col) => instance.selectCell(row, col),
      isEditing: () => instance.getActiveEditor()?.isOpened() ?? false,
    })
    return () => onApi(null)
  }, [props.onApi])

  return (
    // The wrapper scrolls a wide map, so it takes focus (axe: scrollable-region-focusable) and hands it
    // straight to the grid's selected cell: still one Tab stop.
    <div
      className="mw-grid max-w-full overflow-x-auto rounded-md border border-line"
      ref={wrapper}
      data-testid="map-grid"
      role="region"
      aria-label="Map grid: arrow keys move, Enter edits"
      tabIndex={0}
      onFocus={(e) => {
        const h = hot.current?.hotInstance
        if (e.target !== e.currentTarget || !h) return
        const sel = h.getSelectedLast()
        h.selectCell(sel ? sel[0] : 1, sel ? sel[1] : 1)
        h.listen()
      }}
    >
      <GridHost hotRef={hot} settings={settings} />
    </div>
  )
}

type Hot = NonNullable<HotTableRef['hotInstance']>

/** Re-run the renderer on a few cells (a changed value or finding mark), each copy of a frozen cell too. */
function renderCells(h: Hot, render: ReturnType<typeof makeRenderer>, cells: [number, number][]): void {
  for (const [row, col] of cells) {
    const value = h.getDataAtCell(row, col)
    for (const td of cellElements(h, row, col)) render(h, td, row, col, col, value, h.getCellMeta(row, col))
  }
}

/** Every rendered TD of a cell: the scrolling master and, for the frozen axis band, its overlay copies. */
function cellElements(h: Hot, row: number, col: number): HTMLTableCellElement[] {
  const root = h.rootElement
  return [...root.querySelectorAll<HTMLTableCellElement>(`td[data-cell="${row}-${col}"]`)]
}

/** The cell editor's text field gets a name (axe: label). */
function labelGrid(h: Hot): void {
  const root = h.rootElement
  for (const t of root.ownerDocument.querySelectorAll('textarea.handsontableInput:not([aria-label])')) t.setAttribute('aria-label', 'Cell value')
}

const FOCUSABLE = ['a[href]', 'button:not([disabled])', 'input:not([disabled]):not([type="hidden"])', 'select:not([disabled])', 'textarea:not([disabled])', '[tabindex]:not([tabindex="-1"])']
  .map((s) => `${s}:not(.handsontableInput):not(.htFocusCatcher)`)
  .join(', ')

/** The first keyboard-focusable element after (or, backwards, the last before) `root`, outside it. */
function focusableBeyond(root: HTMLElement, backwards: boolean): HTMLElement | null {
  const all = [...root.ownerDocument.querySelectorAll<HTMLElement>(FOCUSABLE)].filter((el) => !root.contains(el) && el.getClientRects().length > 0)
  const after = (el: HTMLElement) => Boolean(root.compareDocumentPosition(el) & Node.DOCUMENT_POSITION_FOLLOWING)
  return backwards ? (all.filter((el) => !after(el)).at(-1) ?? null) : (all.find(after) ?? null)
}
