'use client'
import { useRouter } from 'next/navigation'
import { useState } from 'react'
import { useMutation } from '@tanstack/react-query'
import { api } from '@/app/_components/api-client'
import { ACTION_LABELS, type ReviewAction } from '@/domain/review-actions'

/** The actions open to this person now; the server checks them again. */
export function ReviewActions(props: { revisionId: number; actions: ReviewAction[]; exceptions: { key: string; label: string }[] }) {
  const router = useRouter()
  const [comment, setComment] = useState('')
  const [acks, setAcks] = useState<Record<string, string>>({})
  const [error, setError] = useState<string | null>(null)
  const run = useMutation({
    mutationFn: (action: ReviewAction) =>
      api(`/api/revisions/${props.revisionId}/actions`, {
        method: 'POST',
        json: { action, comment, acknowledgements: Object.entries(acks).filter(([, r]) => r.trim()).map(([key, reason]) => ({ key, reason })) },
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
        <label htmlFor="review-comment" className="label">Comment (required to send back or withdraw)</label>
        <textarea id="review-comment" rows={3} className="field" value={comment} onChange={(e) => setComment(e.target.value)} />
      </div>
      {props.actions.includes('release') && props.exceptions.length > 0 && (
        <fieldset className="space-y-2 rounded border border-amber-300 bg-amber-50 p-2">
          <legend className="text-sm font-semibold">Cells above the traction limit: acknowledge each with a reason to release anyway</legend>
          {props.exceptions.map((e) => (
            <div key={e.key}>
              <label htmlFor={`ack-${e.key}`} className="text-sm">{e.label}</label>
              <input id={`ack-${e.key}`} className="field" value={acks[e.key] ?? ''} onChange={(ev) => setAcks({ ...acks, [e.key]: ev.target.value })} />
            </div>
          ))}
        </fieldset>
      )}
      {error && <p role="alert" className="error-text text-sm">{error}</p>}
      <div className="flex flex-wrap gap-2">
        {props.actions.map((a) => (
          <button key={a} type="button" className={a === 'send_back' || a === 'withdraw' ? 'btn' : 'btn-primary'} disabled={run.isPending} onClick={() => run.mutate(a)}>
            {ACTION_LABELS[a]}
          </button>
        ))}
      </div>
    </section>
  )
}
