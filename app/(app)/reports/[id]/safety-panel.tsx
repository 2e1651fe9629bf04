'use client'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { MarkdownNotes } from '@/app/_components/markdown-notes'

/** An open safety concern stays visible until a lead engineer resolves it with a comment. */
export function SafetyPanel(props: { reportId: number; safety: string; resolution: string | null; canResolve: boolean }) {
  const router = useRouter()
  const [comment, setComment] = useState('')
  const resolve = useMutation({
    mutationFn: () => api(`/api/reports/${props.reportId}/safety`, { method: 'POST', json: { comment } }),
    onSuccess: () => router.refresh(),
  })
  if (props.safety === 'none') return null
  if (props.safety === 'resolved')
    return (
      <section className="card text-sm">
        <h2 className="font-semibold">Safety concern resolved</h2>
        <MarkdownNotes text={props.resolution ?? ''} />
      </section>
    )
  return (
    <section className="card border-danger" role="region" aria-label="Open safety concern">
      <h2 className="font-semibold text-danger">Open safety concern</h2>
      <p className="text-sm">A flagged point has the highest severity. It stays open until a lead engineer resolves it.</p>
      {props.canResolve && (
        <div className="mt-2 space-y-2">
          <label htmlFor="resolution" className="label">How it was resolved</label>
          <textarea id="resolution" className="field" rows={3} value={comment} onChange={(e) => setComment(e.target.value)} />
          {resolve.error && <p role="alert" className="error-text">{resolve.error.message}</p>}
          <button type="button" className="btn-primary" disabled={resolve.isPending} onClick={() => resolve.mutate()}>Resolve safety concern</button>
        </div>
      )}
    </section>
  )
}
