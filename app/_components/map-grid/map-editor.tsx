'use client'
/**
 * The grid editor of one map: draft (with undo, persisted locally), toolbar, unit switch,
 * workspace, save, import and export. Loaded in the browser only (see lazy.tsx).
 */
import { useCallback, useLayoutEffect, useMemo, useRef, useState } from 'react'
import { validate, type MapLimits, type MapTable, UNITS, type UnitSystem } from '@/maps'
import { ExportLinks } from './export-links'
import { applyGridEdits, type GridEdit } from './grid-data'
import type { GridCommand } from './grid-keys'
import { ImportPanel } from './import-panel'
import type { GridApi } from './map-grid'
import { MapWorkspace } from './map-workspace'
import { SavePanel } from './save-panel'
import { clearedText, runGridCommand } from './ops'
import type { GridRange } from './selection'
import { Toolbar } from './toolbar'
import { UnitSwitch } from './unit-switch'
import { useMapDraft } from './use-map-draft'
import { useUndoKeys } from './use-undo-keys'
import { TractionShadingControls, useTractionShade, type ShadingChoice } from './traction-shading'
import type { VehicleParams } from '@/physics/vehicle'
import type { ReleaseConditions } from '@/db/schema'
import { GradeBand } from './grade-band'

export interface MapEditorProps {
  mapId: number
  limits: MapLimits | null
  /** The program's vehicle, for the traction shading (null: no shading offered). */
  vehicle?: VehicleParams | null
  /** The program's design lateral acceleration, m/s² (release condition; absent = the physics default). */
  designLateralAccelMps2?: number
  /** The program's release conditions, for the full-pedal band against its declared grade (none: no band). */
  releaseConditions?: ReleaseConditions | null
  base: { number: number; table: MapTable }
  canSave: boolean
}

const when = (iso: string) => new Date(iso).toLocaleString('en-GB', { dateStyle: 'medium', timeStyle: 'short' })

export default function MapEditor({ mapId, limits, vehicle = null, designLateralAccelMps2, releaseConditions = null, base: pageBase, canSave }: MapEditorProps) {
  const [pageBaseState] = useState(pageBase)
  const draft = useMapDraft(mapId, pageBaseState)
  const [system, setSystem] = useState<UnitSystem>('metric')
  const units = UNITS[system]
  const [range, setRange] = useState<GridRange | null>(null)
  // One message line for the grid and the toolbar, so refusals replace each other instead of piling up.
  const [notice, setNotice] = useState<{ tone: 'error' | 'info'; text: string } | null>(null)
  const showError = useCallback((text: string | null) => setNotice(text ? { tone: 'error', text } : null), [])
  const gridApi = useRef<GridApi | null>(null)
  const onGridApi = useCallback((a: GridApi | null) => {
    gridApi.current = a
  }, [])
  const { table, apply, undo, redo } = draft
  const [shading, setShading] = useState<ShadingChoice | null>(null)
  const traction = useTractionShade(table, vehicle, shading, designLateralAccelMps2)

  useUndoKeys(undo, redo, useCallback(() => gridApi.current?.isEditing() ?? false, []))

  // The grid calls back from its own events, possibly twice before React renders again: read the
  // newest table from a ref, and move the ref on at once when an edit is applied.
  const current = useRef(table)
  useLayoutEffect(() => {
    current.current = table
  }, [table])
  const commit = useCallback(
    (next: MapTable) => {
      current.current = next
      apply(next)
    },
    [apply],
  )
  const onEdit = useCallback(
    (edits: GridEdit[]): MapTable | null => {
      try {
        const next = applyGridEdits(current.current, edits, units)
        commit(next)
        setNotice((n) => (n?.tone === 'error' ? null : n))
        return next
      } catch (e) {
        showError(`Edit refused — ${e instanceof Error ? e.message : String(e)}`)
        return null
      }
    },
    [commit, units, showError],
  )
  const onCommand = useCallback(
    (cmd: GridCommand, r: GridRange) => {
      try {
        commit(runGridCommand(cmd, current.current, r))
        setNotice(null)
      } catch (e) {
        showError(e instanceof Error ? e.message : String(e))
      }
    },
    [commit, showError],
  )
  const { rebase } = draft
  const onMerged = useCallback(
    (b: { number: number; table: MapTable }, merged: MapTable) => {
      rebase(b)
      commit(merged)
      setNotice({ tone: 'info', text: `Merged onto revision ${b.number}: check the result, then save.` })
    },
    [rebase, commit],
  )
  const onNotice = useCallback((text: string) => setNotice({ tone: 'info', text }), [])
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
      <Toolbar table={table} range={range} units={units} limits={limits} onApply={commit} undo={undo} redo={redo} canUndo={draft.canUndo} canRedo={draft.canRedo} onMessage={showError} />
      <p className="text-xs text-slate-600" id="grid-keys-help">
        In the grid: arrow keys move, Enter edits, Tab leaves the grid; Delete clears the selected cells to {clearedText(units)}, Ctrl+D fills down, Ctrl+R fills right, Ctrl+Z undoes.
      </p>
      {notice && (
        <p role={notice.tone === 'error' ? 'alert' : 'status'} className={notice.tone === 'error' ? 'error-text text-sm' : 'rounded-md bg-accent-soft px-3 py-2 text-sm'} data-testid="editor-message">
          {notice.text}
        </p>
      )}
      <MapWorkspace table={table} units={units} limits={limits} range={range} onSelect={setRange} onEdit={onEdit} onCommand={onCommand} onNotice={onNotice} onGridApi={onGridApi} cellShade={traction.shade} />
      <GradeBand table={table} vehicle={vehicle} conditions={releaseConditions} units={units} />
      <div className="grid gap-4 lg:grid-cols-2">
        {canSave && (
          <SavePanel mapId={mapId} draftId={draft.draftId} table={table} base={draft.base} dirty={draft.dirty} message={draft.message} notes={draft.notes} setMessage={draft.setMessage} setNotes={draft.setNotes} units={units} onSaved={draft.finish} onMerged={onMerged} />
        )}
        <div className="space-y-4">
          {canSave && <ImportPanel mapId={mapId} parentNumber={draft.base.number} blocked={draft.dirty} />}
          <ExportLinks mapId={mapId} number={draft.base.number} note="Exports the saved revision, not the unsaved edits." cRefusal={baseErrors[0]?.message ?? null} />
        </div>
      </div>
    </div>
  )
}
