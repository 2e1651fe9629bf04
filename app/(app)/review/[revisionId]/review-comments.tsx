'use client'
import { useState } from 'react'
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query'
import { api, newDraftId } from '@/app/_components/api-client'
import { formatTime } from '@/app/_components/format'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

interface CommentItem {
  id: number
  row: number | null
  col: number | null
  body: string
  createdAt: string
  authorName: string
}

/** Review comments; a comment may name a cell by its pedal and speed breakpoints. */
export function ReviewComments(props: { revisionId: number; initial: CommentItem[]; canComment: boolean; rowAxis: number[]; colAxis: number[] }) {
  const qc = useQueryClient()
  const key = ['review-comments', props.revisionId]
  const list = useQuery({ queryKey: key, initialData: { comments: props.initial }, queryFn: () => api<{ comments: CommentItem[] }>(`/api/revisions/${props.revisionId}/comments`) })
  const [body, setBody] = useState('')
  const [cell, setCell] = useState('')
  // One id per comment being written: pressing the button again after a lost answer adds it once.
  const [draftId, setDraftId] = useState(newDraftId)
  const add = useMutation({
    mutationFn: () => {
      const [row, col] = cell ? cell.split(':').map(Number) : [null, null]
      return api(`/api/revisions/${props.revisionId}/comments`, { method: 'POST', json: { body, row, col }, headers: { 'idempotency-key': draftId } })
    },
    onSuccess: () => {
      setBody('')
      setDraftId(newDraftId())
      return qc.invalidateQueries({ queryKey: key })
    },
  })
  const where = (c: CommentItem) => (c.row === null || c.col === null ? '' : ` at ${props.rowAxis[c.row]} % / ${props.colAxis[c.col]} km/h`)
  return (
    <section className="card space-y-2">
      <h2 className="font-semibold">Comments</h2>
      <ul className="space-y-1 text-sm" data-testid="review-comments">
        {list.data.comments.map((c) => (
          <li key={c.id}><span className="text-slate-500">{c.authorName}, {formatTime(c.createdAt)}{where(c)}:</span> <MarkdownNotes text={c.body} /></li>
        ))}
        {list.data.comments.length === 0 && <li className="text-slate-500">No comments yet.</li>}
      </ul>
      {props.canComment && (
        <div className="grid gap-2 sm:grid-cols-[1fr_14rem_auto]">
          <input aria-label="Comment" className="field" value={body} onChange={(e) => setBody(e.target.value)} placeholder="Comment" />
          <select aria-label="Cell" className="field" value={cell} onChange={(e) => setCell(e.target.value)}>
            <option value="">Whole revision</option>
            {props.rowAxis.flatMap((p, r) => props.colAxis.map((s, c) => <option key={`${r}:${c}`} value={`${r}:${c}`}>{p} % / {s} km/h</option>))}
          </select>
          <button type="button" className="btn" disabled={!body.trim() || add.isPending} onClick={() => add.mutate()}>Add comment</button>
          {add.error && <p role="alert" className="error-text sm:col-span-3">{add.error.message}</p>}
        </div>
      )}
    </section>
  )
}
