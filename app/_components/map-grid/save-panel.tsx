'use client'
/**
 * Save the draft as a new revision: a required message saying why, optional markdown notes.
 * The fields are checked with the API's own schema (react-hook-form + zod), so both refuse the
 * same input with the same words. A 409 (someone saved in between) keeps the draft and opens the
 * comparison and the cell-by-cell merge.
 */
import { zodResolver } from '@hookform/resolvers/zod'
import { useMutation } from '@tanstack/react-query'
import { useRouter } from 'next/navigation'
import { useEffect, useState } from 'react'
import { useForm } from 'react-hook-form'
import type { z } from 'zod'
import type { MapTable } from '@/maps'
import { saveRevisionSchema } from '@/app/_schemas/map'
import { api, ApiError } from '@/app/_components/api-client'
import { conflictDetails, type SaveAnswer } from './api-types'
import { ConflictPanel } from './conflict-panel'
import type { Base } from './use-map-draft'
import type { UnitSet } from '@/maps'

/** The part of the save body typed here; the table and the parent revision come from the editor. */
const saveFieldsSchema = saveRevisionSchema.pick({ message: true, notes: true })
type FieldsIn = z.input<typeof saveFieldsSchema>
type FieldsOut = z.output<typeof saveFieldsSchema>

export interface SavePanelProps {
  mapId: number
  /** The draft's id, sent as the Idempotency-Key. */
  draftId: string
  table: MapTable
  base: Base
  dirty: boolean
  /** Message and notes live in the editor's draft (kept in the browser); the form mirrors them. */
  message: string
  notes: string
  setMessage: (m: string) => void
  setNotes: (n: string) => void
  units: UnitSet
  onSaved: () => void
  /** After a conflict: continue with `table` on top of the newer revision `b`. */
  onMerged: (b: Base, table: MapTable) => void
}

export function SavePanel(p: SavePanelProps) {
  const router = useRouter()
  const [conflict, setConflict] = useState<{ message: string; latestNumber: number } | null>(null)
  const { register, handleSubmit, formState, getValues, setValue } = useForm<FieldsIn, unknown, FieldsOut>({
    resolver: zodResolver(saveFieldsSchema),
    defaultValues: { message: p.message, notes: p.notes },
  })
  // The draft can change the fields from outside (discard clears them): follow it.
  useEffect(() => {
    if (getValues('message') !== p.message) setValue('message', p.message)
    if (getValues('notes') !== p.notes) setValue('notes', p.notes)
  }, [p.message, p.notes, getValues, setValue])

  const save = useMutation({
    mutationFn: (fields: FieldsOut) => api<SaveAnswer>(`/api/maps/${p.mapId}/revisions`, { method: 'POST', json: { parentNumber: p.base.number, ...fields, table: p.table }, headers: { 'idempotency-key': p.draftId } }),
    onSuccess: (res) => {
      p.onSaved()
      router.push(`/maps/${p.mapId}?saved=${res.revision.number}`)
    },
    onError: (e) => {
      const c = e instanceof ApiError && e.status === 409 ? conflictDetails(e.details) : null
      setConflict(c ? { message: e.message, latestNumber: c.latestNumber } : null)
    },
  })
  const { errors } = formState

  return (
    <section aria-label="Save revision" className="card space-y-3">
      <h2 className="text-sm font-semibold">Save revision {p.base.number + 1}</h2>
      <form className="space-y-3" noValidate onSubmit={handleSubmit((fields) => save.mutate(fields))}>
        <div>
          <label className="label" htmlFor="save-message">Message (why)</label>
          <input id="save-message" className="field" maxLength={2000} aria-invalid={Boolean(errors.message)} {...register('message', { onChange: (e) => p.setMessage(e.target.value) })} />
          {errors.message && <p className="error-text">{errors.message.message}</p>}
        </div>
        <div>
          <label className="label" htmlFor="save-notes">Notes (markdown, optional)</label>
          <textarea id="save-notes" className="field min-h-20 font-mono text-xs" maxLength={20000} {...register('notes', { onChange: (e) => p.setNotes(e.target.value) })} />
          {errors.notes && <p className="error-text">{errors.notes.message}</p>}
        </div>
        <div className="flex items-center gap-3">
          <button type="submit" className="btn-primary" disabled={save.isPending || !p.dirty}>
            {save.isPending ? 'Saving…' : 'Save revision'}
          </button>
          <span className="text-xs text-slate-600">{p.dirty ? `Goes on top of revision ${p.base.number}.` : 'No changes to save yet.'}</span>
        </div>
      </form>
      {save.isError && !conflict && <p role="alert" className="error-text text-sm">{save.error.message}</p>}
      {conflict && (
        <ConflictPanel
          mapId={p.mapId}
          message={conflict.message}
          latestNumber={conflict.latestNumber}
          baseTable={p.base.table}
          table={p.table}
          units={p.units}
          onMerged={(number, theirs, merged) => {
            p.onMerged({ number, table: theirs }, merged)
            setConflict(null)
            save.reset()
          }}
        />
      )}
    </section>
  )
}
