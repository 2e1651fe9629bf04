/**
 * The editor's working state: the edited table with its undo history, the revision it is based
 * on, and the save message — mirrored to localStorage on every change so a reload keeps it.
 * Runs only in the browser (the editor is loaded without SSR), so the draft is read on first render.
 */
import { useCallback, useEffect, useState } from 'react'
import type { MapTable } from '@/maps'
import { newDraftId } from '@/app/_components/api-client'
import { useLocalDraft } from '../use-local-draft'
import { mapDraftKey, mapDraftSchema } from './draft-storage'
import { sameTable } from './same-table'
import { useHistory } from './use-history'

export interface Base {
  number: number
  table: MapTable
}

export function useMapDraft(mapId: number, pageBase: Base) {
  const { restored, save, clear } = useLocalDraft(mapDraftKey(mapId), mapDraftSchema)
  const [base, setBase] = useState<Base>(() => (restored ? { number: restored.baseNumber, table: restored.baseTable } : pageBase))
  const history = useHistory(restored?.table ?? pageBase.table, restored ? [restored.baseTable] : undefined)
  const [message, setMessage] = useState(restored?.message ?? '')
  const [notes, setNotes] = useState(restored?.notes ?? '')
  const [restoredAt, setRestoredAt] = useState<string | null>(restored?.savedAt ?? null)
  // Kept with the draft across reloads, so a save sent again after a lost answer is recognised.
  const [draftId, setDraftId] = useState(() => restored?.id ?? newDraftId())
  const dirty = !sameTable(history.table, base.table)

  useEffect(() => {
    if (!dirty && !message && !notes) return clear()
    save({ id: draftId, baseNumber: base.number, baseTable: base.table, table: history.table, message, notes, savedAt: new Date().toISOString() })
  }, [save, clear, base, history.table, message, notes, dirty, draftId])

  const { reset } = history
  const discard = useCallback(() => {
    clear()
    setBase(pageBase)
    reset(pageBase.table)
    setMessage('')
    setNotes('')
    setRestoredAt(null)
    setDraftId(newDraftId())
  }, [clear, pageBase, reset])

  /** Move the draft onto a newer revision (the merged table is applied by the caller, undoably). */
  const rebase = useCallback((next: Base) => setBase(next), [])

  /** After a save the draft is done with. */
  // The draft id is not renewed here: a new id would re-run the mirroring effect and store the
  // just-saved edits again as a draft on the old base (the next visit then saved on a stale parent).
  // The page navigates away after a save; the next editor gets a fresh id from the cleared storage.
  const finish = clear

  return { ...history, draftId, base, dirty, message, setMessage, notes, setNotes, restoredAt, dismissRestored: () => setRestoredAt(null), discard, rebase, finish }
}
