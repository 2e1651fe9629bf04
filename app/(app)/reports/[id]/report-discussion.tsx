'use client'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import { useMutation, useQuery, useQueryClient } from '@tanstack/react-query'
import { api, newDraftId } from '@/app/_components/api-client'
import { formatTime } from '@/app/_components/format'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

interface CommentItem { id: number; body: string; createdAt: string; authorName: string }

/** Engineers' comments on a report, the filing driver's answers, and the lead's "read" mark that ends the driver's edits (not the answers). */
export function ReportDiscussion(props: { reportId: number; canComment: boolean; canMarkRead: boolean; readAt: string | null; isDriver?: boolean }) {
  const router = useRouter()
  const qc = useQueryClient()
  const key = ['report-comments', props.reportId]
  const list = useQuery({ queryKey: key, queryFn: () => api<{ comments: CommentItem[] }>(`/api/reports/${props.reportId}/comments`) })
  const [body, setBody] = useState('')
  // One id per comment being written: pressing Comment again after a lost answer adds it once.
  const [draftId, setDraftId] = useState(newDraftId)
  const add = useMutation({
    mutationFn: () => api(`/api/reports/${props.reportId}/comments`, { method: 'POST', json: { body }, headers: { 'idempotency-key': draftId } }),
    onSuccess: () => {
      setBody('')
      setDraftId(newDraftId())
      return qc.invalidateQueries({ queryKey: key })
    },
  })
  const read = useMutation({ mutationFn: () => api(`/api/reports/${props.reportId}/read`, { method: 'POST' }), onSuccess: () => router.refresh() })
  return (
    <section className="card space-y-2">
      <h2 className="font-semibold">Discussion</h2>
      <p className="text-xs text-slate-500">{props.readAt ? `Read by a lead engineer on ${formatTime(props.readAt)}; the driver can no longer edit it, but can still answer here.` : 'Not yet read by a lead engineer.'}</p>
      {props.canMarkRead && !props.readAt && <button type="button" className="btn" onClick={() => read.mutate()}>Mark as read</button>}
      <ul className="space-y-1 text-sm">
        {list.data?.comments.map((c) => <li key={c.id}><span className="text-slate-500">{c.authorName}, {formatTime(c.createdAt)}:</span> <MarkdownNotes text={c.body} /></li>)}
      </ul>
      {props.canComment && (
        <div className="space-y-1">
          {/* Several lines: an answer to "where was the spin?" is rarely one. The text stays until the server has it. */}
          <label htmlFor={`report-${props.reportId}-comment`} className="label">{props.isDriver ? 'Answer on this report' : 'Comment on this report'}</label>
          <textarea id={`report-${props.reportId}-comment`} rows={3} className="field w-full" value={body} onChange={(e) => setBody(e.target.value)} />
          <button type="button" className="btn" disabled={!body.trim() || add.isPending} onClick={() => add.mutate()}>{add.isPending ? 'Sending…' : props.isDriver ? 'Answer' : 'Comment'}</button>
        </div>
      )}
      {add.error && <p role="alert" className="error-text text-sm">{add.error.message}</p>}
    </section>
  )
}
