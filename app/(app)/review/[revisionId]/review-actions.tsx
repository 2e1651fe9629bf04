'use client'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { ACTION_LABELS, type ReviewAction } from '@/domain/review-actions'

/** Submit, approve or send back, as open to this person now; the server checks them again. A release is done on a map set. */
export function ReviewActions(props: { revisionId: number; actions: ReviewAction[] }) {
  const router = useRouter()
  const [comment, setComment] = useState('')
  const [error, setError] = useState<string | null>(null)
  const run = useMutation({
    mutationFn: (action: ReviewAction) =>
      api(`/api/revisions/${props.revisionId}/actions`, {
        method: 'POST',
        json: { action, comment },
      }),
    onSuccess: () => {
      setError(null)
      setComment('')
      router.refresh()
    },
    onError: (e) => setError(e.message),
  })
  return (
    <section className="card space-y-3" aria-label="Review actions">
      <h2 className="font-semibold">Your decision</h2>
      <div>
        <label htmlFor="review-comment" className="label">Comment (required to send back)</label>
        <textarea id="review-comment" rows={3} className="field" value={comment} onChange={(e) => setComment(e.target.value)} />
      </div>
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      <div className="flex flex-wrap gap-2">
        {props.actions.map((a) => (
          <button key={a} type="button" className={a === 'send_back' ? 'btn' : 'btn-primary'} disabled={run.isPending} onClick={() => run.mutate(a)}>
            {ACTION_LABELS[a]}
          </button>
        ))}
      </div>
    </section>
  )
}
