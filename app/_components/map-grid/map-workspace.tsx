'use client'
/**
 * Grid, colour key, findings and the small plot of one table, shared by the editor and the
 * read-only revision view. Picking a finding selects its cell; the plot follows the selection.
 */
import { useCallback, useMemo, useState } from 'react'
import { validate, type Finding, type MapLimits, type MapTable, findingMessage, type UnitSet } from '@/maps'
import { ColourLegend } from './colour-legend'
import { colourScale } from './colour-scale'
import { FindingsList } from './findings-list'
import MapGrid, { type GridApi, type MapGridProps } from './map-grid'
import type { GridRange } from './selection'
import { SmallPlot } from './small-plot'
import { TractionLegend } from './traction-shading'

export interface MapWorkspaceProps {
  table: MapTable
  units: UnitSet
  limits: MapLimits | null
  range: GridRange | null
  onSelect: (r: GridRange) => void
  onEdit?: MapGridProps['onEdit']
  onCommand?: MapGridProps['onCommand']
  onNotice?: MapGridProps['onNotice']
  /** Receives the grid's API (select a cell, is a cell editor open) once it has mounted. */
  onGridApi?: (api: GridApi | null) => void
  cellShade?: MapGridProps['cellShade']
}

export function MapWorkspace({ table, units, limits, range, onSelect, onEdit, onCommand, onNotice, onGridApi, cellShade }: MapWorkspaceProps) {
  const [api, setApi] = useState<GridApi | null>(null)
  const [along, setAlong] = useState<'speed' | 'pedal'>('speed')
  const findings = useMemo(() => validate(table, limits ?? undefined), [table, limits])
  const scale = useMemo(() => colourScale(table.values, limits?.motorPeakTorqueNm), [table, limits])
  const describe = useCallback((f: Finding) => findingMessage(f, units), [units])
  const onApi = useCallback(
    (a: GridApi | null) => {
      setApi(a)
      onGridApi?.(a)
    },
    [onGridApi],
  )
  const onPick = useCallback((r: number, c: number) => api?.selectCell(r, c), [api])
  // The plot follows the selected cell; with nothing selected it shows full pedal / top speed.
  const row = range && range.r0 >= 1 ? Math.min(range.r0, table.rowAxis.length) - 1 : table.rowAxis.length - 1
  const col = range && range.c0 >= 1 ? Math.min(range.c0, table.colAxis.length) - 1 : 0

  return (
    <div className="grid gap-4 lg:grid-cols-[minmax(0,1fr)_20rem]">
      <div className="min-w-0 space-y-2">
        <MapGrid table={table} units={units} scale={scale} findings={findings} describe={describe} readOnly={!onEdit} onEdit={onEdit} onCommand={onCommand} onNotice={onNotice} onSelect={onSelect} onApi={onApi} cellShade={cellShade} />
        <ColourLegend scale={scale} units={units} ceiling={limits ? 'motor peak' : undefined} />
        {cellShade && <TractionLegend kind={table.kind} />}
        <div className="flex items-center gap-2 pt-2 text-xs">
          <span className="text-slate-600">Plot</span>
          <button type="button" className={`btn px-2 py-0.5 text-xs ${along === 'speed' ? 'bg-accent-soft' : ''}`} onClick={() => setAlong('speed')} aria-pressed={along === 'speed'}>
            selected row (along speed)
          </button>
          <button type="button" className={`btn px-2 py-0.5 text-xs ${along === 'pedal' ? 'bg-accent-soft' : ''}`} onClick={() => setAlong('pedal')} aria-pressed={along === 'pedal'}>
            selected column (along pedal)
          </button>
        </div>
        <SmallPlot table={table} units={units} limits={limits} along={along} index={along === 'speed' ? row : col} />
      </div>
      <FindingsList findings={findings} describe={describe} onPick={onPick} />
    </div>
  )
}
