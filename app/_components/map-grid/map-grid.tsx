'use client'
/**
 * The Handsontable grid of one map. Handsontable never owns the data: every edit or paste is
 * cancelled in beforeChange and handed to the parent as GridEdits, which returns a new table
 * (so undo, validation and the draft all see one source of truth).
 */
import 'handsontable/styles/handsontable.min.css'
import 'handsontable/styles/ht-theme-main.min.css'
import './map-grid.css'
import { HotTable, type HotTableRef } from '@handsontable/react-wrapper'
import { registerCellType } from 'handsontable/cellTypes/registry'
import { TextCellType } from 'handsontable/cellTypes/textType'
import { registerPlugin } from 'handsontable/plugins/registry'
import { CopyPaste } from 'handsontable/plugins/copyPaste'
import { useCallback, useEffect, useMemo, useRef, useState } from 'react'
import type { Finding, MapTable } from '@/maps'
import { makeRenderer, RenderStore, type RenderContext } from './cell-renderer'
import type { ColourScale } from './colour-scale'
import { markCells } from './finding-marks'
import { toGridData, type GridEdit } from './grid-data'
import type { GridRange } from './selection'
import type { UnitSet } from '@/maps'

// Only what the editor uses, so the page does not ship every Handsontable feature.
registerCellType(TextCellType)
registerPlugin(CopyPaste)

// Module constants so their identity never changes between renders (see afterSelectionEnd).
const COPY_PASTE = { rowsLimit: 65, columnsLimit: 65 }
const colWidth = (c: number) => (c === 0 ? 118 : 58)

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
  onEdit?: (edits: GridEdit[]) => void
  onSelect?: (range: GridRange) => void
  onApi?: (api: GridApi | null) => void
  cellShade?: RenderContext['cellShade']
}

export default function MapGrid({ table, units, scale, findings, describe, readOnly = false, onEdit, onSelect, onApi, cellShade }: MapGridProps) {
  const hot = useRef<HotTableRef>(null)
  const data = useMemo(() => toGridData(table, units), [table, units])
  const [store] = useState(() => new RenderStore({ table, units, scale, marks: markCells(findings, describe), cellShade }))
  const renderer = useMemo(() => makeRenderer(store), [store])

  useEffect(() => {
    store.set({ table, units, scale, marks: markCells(findings, describe), cellShade })
    hot.current?.hotInstance?.render()
  }, [store, table, units, scale, findings, describe, cellShade])

  useEffect(() => {
    const instance = hot.current?.hotInstance
    if (!onApi || !instance) return
    onApi({
      selectCell: (row, col) => instance.selectCell(row, col),
      isEditing: () => instance.getActiveEditor()?.isOpened() ?? false,
    })
    return () => onApi(null)
  }, [onApi])

  const cells = useCallback((row: number, col: number) => ({ readOnly: readOnly || (row === 0 && col === 0) }), [readOnly])

  const beforeChange = useCallback(
    (changes: (readonly [number, string | number | unknown, unknown, unknown] | null)[]) => {
      const edits: GridEdit[] = []
      for (const ch of changes) if (ch && typeof ch[1] === 'number') edits.push({ row: ch[0], col: ch[1], value: ch[3] })
      if (edits.length > 0) onEdit?.(edits)
      return false // the parent decides; the new table comes back through `data`
    },
    [onEdit],
  )

  // Stable handlers: the wrapper passes every changed prop to updateSettings, and a selection
  // hook re-run by that update would otherwise feed back into a render loop.
  const lastRange = useRef('')
  const afterSelectionEnd = useCallback(
    (r0: number, c0: number, r1: number, c1: number) => {
      const key = `${r0},${c0},${r1},${c1}`
      if (key === lastRange.current) return
      lastRange.current = key
      onSelect?.({ r0, c0, r1, c1 })
    },
    [onSelect],
  )

  const rows = data.length
  const cols = data[0]?.length ?? 0
  return (
    <div className="mw-grid overflow-hidden rounded-md border border-line" data-testid="map-grid">
      <HotTable
        ref={hot}
        data={data}
        licenseKey="non-commercial-and-evaluation"
        themeName="ht-theme-main"
        hotRenderer={renderer}
        cells={cells}
        readOnlyCellClassName="mw-readonly" // not the default dimmed style, which would hide the colour scale
        beforeChange={beforeChange}
        afterSelectionEnd={afterSelectionEnd}
        copyPaste={COPY_PASTE}
        maxRows={rows}
        maxCols={cols}
        fixedRowsTop={1}
        fixedColumnsStart={1}
        colWidths={colWidth}
        height={rows > 24 ? 560 : 'auto'}
        width="100%"
        outsideClickDeselects={false}
        autoWrapRow
        autoWrapCol
      />
    </div>
  )
}
