'use client'
/** A and B as 3D surfaces with one shared camera and colour range, and the difference B − A as a heat map beside the change table. */
import { useMemo, useState } from 'react'
import { ChangeTable, type ChangeRow } from '@/app/_components/plots/change-table'
import { DifferenceHeatmap } from '@/app/_components/plots/difference-heatmap'
import { SurfacePending } from '@/app/_components/plots/surface-pending'
import { SurfacePlot, type Camera } from '@/app/_components/plots/surface-plot'
import { useSurfacesLater } from '@/app/_components/plots/use-surfaces-later'
import type { UnitSet } from '@/maps'
import type { MapDiff, MapTable } from '@/maps'
import type { MapOverlay } from '@/physics/overlay'
import type { Side } from './compare-data'

interface Props {
  a: Side
  b: Side
  diff: MapDiff
  units: UnitSet
  limits: { a?: MapOverlay; b?: MapOverlay } | null
  rows: ChangeRow[]
}

function range(tables: MapTable[]) {
  let min = Infinity
  let max = -Infinity
  for (const t of tables) for (const row of t.values) for (const v of row) [min, max] = [Math.min(min, v), Math.max(max, v)]
  return { min, max: max > min ? max : min + 1 }
}

/** B − A on A's grid (zero where nothing changed), and which cells changed. */
function difference(a: MapTable, d: MapDiff): { table: MapTable; changed: boolean[][] } {
  const values = a.values.map((row) => row.map(() => 0))
  const changed = a.values.map((row) => row.map(() => false))
  for (const c of d.changed) { values[c.row][c.col] = c.delta; changed[c.row][c.col] = true }
  return { table: { ...a, values }, changed }
}

const limitOf = (o?: MapOverlay) => o?.tractionLimitBySpeed.map((p) => p.tractionLimitNm)

export function CompareSurfaces({ a, b, diff, units, limits, rows }: Props) {
  // One camera for both surfaces: a drag on either sets it, the other follows.
  const [camera, setCamera] = useState<Camera | undefined>(undefined)
  const shared = useMemo(() => range([a.table, b.table]), [a.table, b.table])
  const delta = useMemo(() => difference(a.table, diff), [a.table, diff])
  const common = { units, camera, onCamera: setCamera, range: shared }
  // The heat maps and the change table come first; the two WebGL surfaces follow.
  const draw = useSurfacesLater()
  const titleA = `A: ${a.mapName} r${a.number}`
  const titleB = `B: ${b.mapName} r${b.number}`
  return (
    <>
      <div className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]" data-testid="compare-surfaces">
        <div className="card p-2">{draw ? <SurfacePlot {...common} table={a.table} title={titleA} filename={`map-${a.mapId}-r${a.number}`} limitBySpeed={limits ? limitOf(limits.a) : undefined} /> : <SurfacePending />}</div>
        <div className="card p-2">{draw ? <SurfacePlot {...common} table={b.table} title={titleB} filename={`map-${b.mapId}-r${b.number}`} limitBySpeed={limits ? limitOf(limits.b) : undefined} /> : <SurfacePending />}</div>
      </div>
      <section className="grid grid-cols-[minmax(0,1fr)] gap-4 lg:grid-cols-[minmax(0,1fr)_minmax(0,1fr)]">
        <div className="card p-2" data-testid="difference-heatmap">
          <DifferenceHeatmap delta={delta.table} changed={delta.changed} units={units} title="Difference B − A" filename={`difference-${a.mapId}-r${a.number}-${b.mapId}-r${b.number}`} />
        </div>
        <div className="card space-y-2">
          <h2 className="font-semibold">Changed cells, largest first</h2>
          <ChangeTable rows={rows} units={units} />
        </div>
      </section>
    </>
  )
}
