'use client'
/**
 * Import a CSV file as a new revision through the import API. It is refused while there are
 * unsaved edits, so importing can never silently drop a draft.
 */
import { useMutation } from '@tanstack/react-query'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import { api, newDraftId } from '@/app/_components/api-client'
import type { SaveAnswer } from './api-types'

export function ImportPanel({ mapId, parentNumber, blocked }: { mapId: number; parentNumber: number; blocked: boolean }) {
  const router = useRouter()
  const [file, setFile] = useState<File | null>(null)
  const [message, setMessage] = useState('')
  // One id per chosen file: pressing Import again after a lost answer makes one revision.
  const [draftId, setDraftId] = useState(newDraftId)
  const upload = useMutation({
    mutationFn: async () => {
      if (!file) throw new Error('Choose a CSV file first')
      if (!message.trim()) throw new Error('A message saying why is required')
      const csv = await file.text()
      return api<SaveAnswer>(`/api/maps/${mapId}/import`, { method: 'POST', json: { parentNumber, message: message.trim(), notes: `Imported from ${file.name}`, csv }, headers: { 'idempotency-key': draftId } })
    },
    onSuccess: (res) => router.push(`/maps/${mapId}?saved=${res.revision.number}`),
  })
  return (
    <section aria-label="Import CSV" className="card space-y-2">
      <h2 className="text-sm font-semibold">Import CSV as a new revision</h2>
      <input
        type="file"
        accept=".csv,text/csv"
        aria-label="CSV file"
        className="block text-xs"
        onChange={(e) => {
          const f = e.target.files?.[0] ?? null
          setFile(f)
          setDraftId(newDraftId())
          if (f && !message) setMessage(`Import ${f.name}`)
        }}
      />
      <input className="field" aria-label="Import message" placeholder="Message (why)" value={message} onChange={(e) => setMessage(e.target.value)} />
      <button type="button" className="btn" disabled={blocked || upload.isPending || !file} onClick={() => upload.mutate()}>
        {upload.isPending ? 'Importing…' : 'Import'}
      </button>
      {blocked && <p className="text-xs text-slate-600">Save or discard your edits before importing.</p>}
      {upload.isError && <p role="alert" className="error-text text-sm">{upload.error.message}</p>}
    </section>
  )
}
