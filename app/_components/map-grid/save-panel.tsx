'use client'
/**
 * Save the draft as a new revision: a required message saying why, optional markdown notes.
 * A 409 (someone saved in between) keeps the draft and opens the comparison and rebase offer.
 */
import { useMutation } from '@tanstack/react-query'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import type { MapTable } from '@/maps'
import { api, ApiError } from '@/app/_components/api-client'
import { conflictDetails, type SaveAnswer } from './api-types'
import { ConflictPanel } from './conflict-panel'
import type { Base } from './use-map-draft'
import type { UnitSet } from './units'

export interface SavePanelProps {
  mapId: number
  /** The draft's id, sent as the Idempotency-Key. */
  draftId: string
  table: MapTable
  base: Base
  dirty: boolean
  message: string
  notes: string
  setMessage: (m: string) => void
  setNotes: (n: string) => void
  units: UnitSet
  onSaved: () => void
  onRebase: (b: Base) => void
}

export function SavePanel(p: SavePanelProps) {
  const router = useRouter()
  const [touched, setTouched] = useState(false)
  const [conflict, setConflict] = useState<{ message: string; latestNumber: number } | null>(null)
  const save = useMutation({
    mutationFn: () => api<SaveAnswer>(`/api/maps/${p.mapId}/revisions`, { method: 'POST', json: { parentNumber: p.base.number, message: p.message.trim(), notes: p.notes, table: p.table }, headers: { 'idempotency-key': p.draftId } }),
    onSuccess: (res) => {
      p.onSaved()
      router.push(`/maps/${p.mapId}?saved=${res.revision.number}`)
    },
    onError: (e) => {
      const c = e instanceof ApiError && e.status === 409 ? conflictDetails(e.details) : null
      setConflict(c ? { message: e.message, latestNumber: c.latestNumber } : null)
    },
  })
  const missing = p.message.trim() === ''
  const submit = () => {
    setTouched(true)
    if (!missing) save.mutate()
  }

  return (
    <section aria-label="Save revision" className="card space-y-3">
      <h2 className="text-sm font-semibold">Save revision {p.base.number + 1}</h2>
      <div>
        <label className="label" htmlFor="save-message">Message (why)</label>
        <input id="save-message" className="field" value={p.message} onChange={(e) => p.setMessage(e.target.value)} maxLength={2000} aria-invalid={touched && missing} />
        {touched && missing && <p className="error-text">A message saying why is required</p>}
      </div>
      <div>
        <label className="label" htmlFor="save-notes">Notes (markdown, optional)</label>
        <textarea id="save-notes" className="field min-h-20 font-mono text-xs" value={p.notes} onChange={(e) => p.setNotes(e.target.value)} maxLength={20000} />
      </div>
      <div className="flex items-center gap-3">
        <button type="button" className="btn-primary" onClick={submit} disabled={save.isPending || !p.dirty}>
          {save.isPending ? 'Saving…' : 'Save revision'}
        </button>
        <span className="text-xs text-slate-600">{p.dirty ? `Goes on top of revision ${p.base.number}.` : 'No changes to save yet.'}</span>
      </div>
      {save.isError && !conflict && <p role="alert" className="error-text text-sm">{save.error.message}</p>}
      {conflict && (
        <ConflictPanel
          mapId={p.mapId}
          message={conflict.message}
          latestNumber={conflict.latestNumber}
          baseTable={p.base.table}
          units={p.units}
          onRebase={(number, table) => {
            p.onRebase({ number, table })
            setConflict(null)
            save.reset()
          }}
        />
      )}
    </section>
  )
}
