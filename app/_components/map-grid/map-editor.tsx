'use client'
/**
 * The grid editor of one map: draft (with undo, persisted locally), toolbar, unit switch,
 * workspace, save, import and export. Loaded in the browser only (see lazy.tsx).
 */
import { useCallback, useMemo, useRef, useState } from 'react'
import { validate, type MapLimits, type MapTable, UNITS, type UnitSystem } from '@/maps'
import { ExportLinks } from './export-links'
import { applyGridEdits, type GridEdit } from './grid-data'
import { ImportPanel } from './import-panel'
import type { GridApi } from './map-grid'
import { MapWorkspace } from './map-workspace'
import { SavePanel } from './save-panel'
import type { GridRange } from './selection'
import { Toolbar } from './toolbar'
import { UnitSwitch } from './unit-switch'
import { useMapDraft } from './use-map-draft'
import { useUndoKeys } from './use-undo-keys'
import { TractionShadingControls, useTractionShade, type ShadingChoice } from './traction-shading'
import type { VehicleParams } from '@/physics/vehicle'

export interface MapEditorProps {
  mapId: number
  limits: MapLimits | null
  /** The program's vehicle, for the traction shading (null: no shading offered). */
  vehicle?: VehicleParams | null
  /** The program's design lateral acceleration, m/s² (release condition; absent = the physics default). */
  designLateralAccelMps2?: number
  base: { number: number; table: MapTable }
  canSave: boolean
}

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })

export default function MapEditor({ mapId, limits, vehicle = null, designLateralAccelMps2, base: pageBase, canSave }: MapEditorProps) {
  const [pageBaseState] = useState(pageBase)
  const draft = useMapDraft(mapId, pageBaseState)
  const [system, setSystem] = useState<UnitSystem>('metric')
  const units = UNITS[system]
  const [range, setRange] = useState<GridRange | null>(null)
  const [editError, setEditError] = useState<string | null>(null)
  const gridApi = useRef<GridApi | null>(null)
  const onGridApi = useCallback((a: GridApi | null) => {
    gridApi.current = a
  }, [])
  const { table, apply, undo, redo } = draft
  const [shading, setShading] = useState<ShadingChoice | null>(null)
  const traction = useTractionShade(table, vehicle, shading, designLateralAccelMps2)

  useUndoKeys(undo, redo, useCallback(() => gridApi.current?.isEditing() ?? false, []))

  const onEdit = useCallback(
    (edits: GridEdit[]) => {
      try {
        apply(applyGridEdits(table, edits, units))
        setEditError(null)
      } catch (e) {
        setEditError(e instanceof Error ? e.message : String(e))
      }
    },
    [apply, table, units],
  )
  const baseErrors = useMemo(() => validate(draft.base.table).filter((f) => f.severity === 'error'), [draft.base.table])

  return (
    <div className="space-y-4">
      {draft.restoredAt && (
        <div role="status" className="flex flex-wrap items-center gap-3 rounded-md bg-accent-soft px-3 py-2 text-sm">
          <span>Restored unsaved edits from {when(draft.restoredAt)} (based on revision {draft.base.number}).</span>
          <button type="button" className="btn px-2 py-0.5 text-xs" onClick={draft.dismissRestored}>Keep editing</button>
        </div>
      )}
      <div className="flex flex-wrap items-center gap-3 text-sm">
        <span data-testid="draft-state" className={draft.dirty ? 'font-semibold text-warn' : 'text-slate-600'}>
          {draft.dirty ? `Unsaved edits on top of revision ${draft.base.number}` : `No unsaved edits (revision ${draft.base.number})`}
        </span>
        {(draft.dirty || draft.restoredAt) && (
          <button type="button" className="btn px-2 py-0.5 text-xs" onClick={() => confirm('Discard all unsaved edits of this map?') && draft.discard()}>
            Discard edits
          </button>
        )}
        <TractionShadingControls vehicle={vehicle} choice={shading} onChange={setShading} counts={traction} kind={table.kind} />
        <span className="ml-auto"><UnitSwitch value={system} onChange={setSystem} /></span>
      </div>
      <Toolbar table={table} range={range} units={units} limits={limits} onApply={apply} undo={undo} redo={redo} canUndo={draft.canUndo} canRedo={draft.canRedo} />
      {editError && <p role="alert" className="error-text text-sm">Edit refused — {editError}</p>}
      <MapWorkspace table={table} units={units} limits={limits} range={range} onSelect={setRange} onEdit={onEdit} onGridApi={onGridApi} cellShade={traction.shade} />
      <div className="grid gap-4 lg:grid-cols-2">
        {canSave && (
          <SavePanel mapId={mapId} draftId={draft.draftId} table={table} base={draft.base} dirty={draft.dirty} message={draft.message} notes={draft.notes} setMessage={draft.setMessage} setNotes={draft.setNotes} units={units} onSaved={draft.finish} onRebase={draft.rebase} />
        )}
        <div className="space-y-4">
          {canSave && <ImportPanel mapId={mapId} parentNumber={draft.base.number} blocked={draft.dirty} />}
          <ExportLinks mapId={mapId} number={draft.base.number} note="Exports the saved revision, not the unsaved edits." cRefusal={baseErrors[0]?.message ?? null} />
        </div>
      </div>
    </div>
  )
}
