'use client'
/** Read-only view of one saved revision: grid, findings, plot, unit switch and exports. */
import { useMemo, useState } from 'react'
import { validate, type MapLimits, type MapTable, UNITS, type UnitSystem } from '@/maps'
import { ExportLinks } from './export-links'
import { MapWorkspace } from './map-workspace'
import type { GridRange } from './selection'
import { UnitSwitch } from './unit-switch'

export interface RevisionViewerProps {
  mapId: number
  number: number
  table: MapTable
  limits: MapLimits | null
}

export default function RevisionViewer({ mapId, number, table, limits }: RevisionViewerProps) {
  const [system, setSystem] = useState<UnitSystem>('metric')
  const [range, setRange] = useState<GridRange | null>(null)
  const cRefusal = useMemo(() => validate(table).find((f) => f.severity === 'error')?.message ?? null, [table])
  return (
    <div className="space-y-4">
      <div className="flex justify-end">
        <UnitSwitch value={system} onChange={setSystem} />
      </div>
      <MapWorkspace table={table} units={UNITS[system]} limits={limits} range={range} onSelect={setRange} />
      <ExportLinks mapId={mapId} number={number} cRefusal={cRefusal} />
    </div>
  )
}
